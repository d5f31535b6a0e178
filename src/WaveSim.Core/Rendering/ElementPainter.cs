using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Draws line elements: thin vertical lines across a plot, a symbol per kind on the axis, labels in rows above.</summary>
internal static class ElementPainter
{
    /// <summary>Label rows: each label goes in the first row where it does not overlap the previous label.</summary>
    public static int[] LabelRows(IReadOnlyList<NetMark> elements, ChartGeometry g, SKFont font, int maxRows, out int rowsUsed)
    {
        var rows = new int[elements.Count];
        var rowEnd = Enumerable.Repeat(float.NegativeInfinity, maxRows).ToArray();
        int used = 0;
        foreach (int i in Enumerable.Range(0, elements.Count).OrderBy(i => elements[i].Position))
        {
            float w = Ink.Width(font, elements[i].Label), cx = LabelCentre(g, elements[i].Position, w, font.Size);
            float left = cx - w / 2;
            int row = Array.FindIndex(rowEnd, end => end + font.Size * 0.5f < left);
            if (row < 0) row = Array.IndexOf(rowEnd, rowEnd.Min());
            rows[i] = row;
            rowEnd[row] = cx + w / 2;
            used = Math.Max(used, row + 1);
        }
        rowsUsed = used;
        return rows;
    }

    public static void Lines(SKCanvas canvas, ChartGeometry g, IReadOnlyList<NetMark> elements, SKColor colour)
    {
        using SKPaint solid = Ink.Stroke(colour, 1f);
        using SKPaint dotted = Ink.Stroke(colour, 1f, [2f, 3f]);
        SKRect r = g.PlotArea;
        foreach (NetMark e in elements)
        {
            if (!InRange(g, e) || e.Kind == NetMarkKind.Probe) continue;
            float px = Ink.Snap(g.XToPixel(e.Position));
            canvas.DrawLine(px, r.Top, px, r.Bottom, e.Kind == NetMarkKind.SegmentBoundary ? dotted : solid);
        }
    }

    /// <summary>Symbols sitting on the bottom edge of the plot, so each kind is told apart at a glance (probes: see <see cref="Probes"/>).</summary>
    public static void Symbols(SKCanvas canvas, ChartGeometry g, IReadOnlyList<NetMark> elements, float size)
    {
        float y = g.PlotArea.Bottom - size * 0.9f;
        foreach (NetMark e in elements)
            if (InRange(g, e) && e.Kind != NetMarkKind.Probe) Symbol(canvas, e.Kind, g.XToPixel(e.Position), y, size * 0.5f);
    }

    /// <summary>
    /// One element's symbol centred on (x, y), half-size <paramref name="s"/>: two plates for a shunt part, an open box for a
    /// series part, a ring for the source, a filled bar for the load, a diamond for a branch junction, a downward triangle for
    /// a probe, a short dotted stroke for a segment boundary (drawn in the plot as a dotted line).
    /// </summary>
    public static void Symbol(SKCanvas canvas, NetMarkKind kind, float x, float y, float s)
    {
        using SKPaint outline = Ink.Stroke(Palette.Ink, 1.25f);
        using SKPaint fill = Ink.Fill(Palette.Ink);
        using SKPaint paper = Ink.Fill(Palette.Background);
        switch (kind)
        {
            case NetMarkKind.Shunt:
                canvas.DrawRect(x - s, y - s * 0.55f, 2 * s, s * 1.1f, paper);
                canvas.DrawLine(x - s, y - s * 0.3f, x + s, y - s * 0.3f, outline);
                canvas.DrawLine(x - s, y + s * 0.3f, x + s, y + s * 0.3f, outline);
                break;
            case NetMarkKind.Series:
                canvas.DrawRect(x - s * 0.5f, y - s, s, 2 * s, paper);
                canvas.DrawRect(x - s * 0.5f, y - s, s, 2 * s, outline);
                break;
            case NetMarkKind.Source:
                canvas.DrawCircle(x, y, s, paper);
                canvas.DrawCircle(x, y, s, outline);
                break;
            case NetMarkKind.Load:
                canvas.DrawRect(x - s * 0.5f, y - s, s, 2 * s, fill);
                break;
            case NetMarkKind.Branch:
                using (SKPath diamond = Polygon([(x, y - s), (x + s, y), (x, y + s), (x - s, y)])) { canvas.DrawPath(diamond, paper); canvas.DrawPath(diamond, outline); }
                break;
            case NetMarkKind.Probe:
                using (SKPath down = Polygon([(x - s * 0.8f, y - s * 0.7f), (x + s * 0.8f, y - s * 0.7f), (x, y + s * 0.7f)])) canvas.DrawPath(down, fill);
                break;
            case NetMarkKind.SegmentBoundary:
                using (SKPaint dotted = Ink.Stroke(Palette.Muted, 1.25f, [2f, 3f])) canvas.DrawLine(x, y - s * 1.2f, x, y + s * 1.2f, dotted);
                break;
        }
    }

    static SKPath Polygon((float X, float Y)[] corners)
    {
        var b = new SKPathBuilder();
        b.MoveTo(corners[0].X, corners[0].Y);
        foreach (var (cx, cy) in corners.Skip(1)) b.LineTo(cx, cy);
        b.Close();
        return b.Detach();
    }

    /// <summary>Probe marks: a triangle on the top edge of the plot pointing at the probe's position, its name beside it.</summary>
    public static void Probes(SKCanvas canvas, ChartGeometry g, IReadOnlyList<NetMark> elements, SKFont font)
    {
        using SKPaint text = Ink.Fill(Palette.Ink);
        float s = font.Size * 0.5f, y = g.PlotArea.Top + s * 0.8f;
        foreach (NetMark e in elements)
        {
            if (e.Kind != NetMarkKind.Probe || !InRange(g, e)) continue;
            float x = g.XToPixel(e.Position);
            Symbol(canvas, NetMarkKind.Probe, x, y, s);
            if (string.IsNullOrEmpty(e.Label)) continue;
            bool leftSide = x > g.PlotArea.Right - Ink.Width(font, e.Label) - font.Size;
            Ink.TextCentredV(canvas, e.Label, leftSide ? x - s : x + s, y + font.Size * 0.15f, leftSide ? SKTextAlign.Right : SKTextAlign.Left, font, text);
        }
    }

    /// <summary>The legend's words for each kind, in the order the legend lists them.</summary>
    public static readonly IReadOnlyList<(NetMarkKind Kind, string Text)> LegendNames =
    [
        (NetMarkKind.Source, "source"),
        (NetMarkKind.SegmentBoundary, "segment boundary"),
        (NetMarkKind.Series, "series part"),
        (NetMarkKind.Shunt, "shunt part"),
        (NetMarkKind.Branch, "branch junction"),
        (NetMarkKind.Load, "load"),
        (NetMarkKind.Probe, "probe"),
    ];

    /// <summary>Labels centred over each element, row 0 nearest the plot.</summary>
    public static void Labels(SKCanvas canvas, ChartGeometry g, IReadOnlyList<NetMark> elements, int[] rows, SKFont font, float rowHeight)
    {
        using SKPaint text = Ink.Fill(Palette.Ink);
        for (int i = 0; i < elements.Count; i++)
        {
            NetMark e = elements[i];
            if (!InRange(g, e) || string.IsNullOrEmpty(e.Label)) continue;
            float x = LabelCentre(g, e.Position, Ink.Width(font, e.Label), font.Size);
            float cy = g.PlotArea.Top - (rows[i] + 0.5f) * rowHeight;
            Ink.TextCentredV(canvas, e.Label, x, cy, SKTextAlign.Center, font, text);
        }
    }

    /// <summary>A label's centre: over its element, but pushed inwards so it stays within the margins beside the plot.</summary>
    static float LabelCentre(ChartGeometry g, double position, float labelWidth, float fontSize)
    {
        float lo = g.PlotArea.Left - 2 * fontSize + labelWidth / 2, hi = g.PlotArea.Right + fontSize - labelWidth / 2;
        float x = g.XToPixel(position);
        return lo <= hi ? Math.Clamp(x, lo, hi) : g.PlotArea.MidX;
    }

    static bool InRange(ChartGeometry g, NetMark e) =>
        double.IsFinite(e.Position) && e.Position >= g.X.Min - 1e-12 * Math.Abs(g.X.Max - g.X.Min) && e.Position <= g.X.Max + 1e-12 * Math.Abs(g.X.Max - g.X.Min);

    /// <summary>The position axis in the layout's display unit, with 1-2-5 ticks counted in that unit.</summary>
    public static AxisScale PositionAxis(LineLayout layout, double min, double max, int maxIntervals)
    {
        double f = layout.LengthFactor;
        double[] ticks = NiceTicks.Within(min / f, max / f, maxIntervals).Select(t => t * f).ToArray();
        return new AxisScale("Position", layout.LengthUnit, min, max, ticks, new EngineeringPrefix("", f));
    }
}
