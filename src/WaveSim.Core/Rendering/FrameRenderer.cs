using SkiaSharp;
using WaveSim.Core.Units;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Draws one animation frame: voltage along the line at one instant on a fixed voltage scale, the time stamp,
/// and the line's elements marked along the position axis so a viewer sees where waves reflect.
/// </summary>
public static class FrameRenderer
{
    const int MaxLabelRows = 3;

    /// <summary>Renders one frame as PNG bytes.</summary>
    /// <param name="layout">The line's pieces and elements.</param>
    /// <param name="snapshot">Voltages at one instant; one array per piece, one value per node.</param>
    /// <param name="vMin">Bottom of the voltage axis, V (the same on every frame).</param>
    /// <param name="vMax">Top of the voltage axis, V; greater than <paramref name="vMin"/>.</param>
    /// <param name="width">Image width, px (160..16384).</param>
    /// <param name="height">Image height, px (120..16384).</param>
    public static byte[] RenderPng(LineLayout layout, LineSnapshot snapshot, double vMin, double vMax, int width, int height)
    {
        FrameLayout fl = Layout(layout, vMin, vMax, width, height);
        CheckSnapshot(layout, snapshot);
        return ImageOutput.Png(width, height, c => Draw(c, layout, snapshot, fl));
    }

    /// <summary>Places the plot, header and element labels for a frame of the given size.</summary>
    public static FrameLayout Layout(LineLayout layout, double vMin, double vMax, int width, int height)
    {
        ArgumentNullException.ThrowIfNull(layout);
        layout.Validate();
        ImageOutput.CheckSize(width, height);
        if (!double.IsFinite(vMin) || !double.IsFinite(vMax) || !(vMax > vMin))
            throw new ArgumentException($"Voltage scale {vMin}..{vMax} V must be finite with max > min.");
        float fs = Ink.BaseFontSize(width, height);
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        var (xMin, xMax) = layout.Extent();
        var yAxis = AxisScale.Exact("Voltage", "V", vMin, vMax, Math.Clamp((int)(height / 60f), 2, 10));
        float pad = fs * 0.8f, tick = fs * 0.35f;
        float left = pad + fs * 1.6f + AxisPainter.WidestTick(yAxis, font) + tick + fs * 0.3f;
        float right = width - pad * 1.5f;
        float headerH = fs * 1.8f, rowH = small.Size * 1.35f;
        float bottom = height - pad - fs * 3.1f;
        // Label rows depend on the X mapping only, so place them on a provisional geometry first.
        var xAxis = ElementPainter.PositionAxis(layout, xMin, xMax, Math.Clamp((int)((right - left) / (fs * 6.5f)), 2, 12));
        var provisional = new ChartGeometry(new SKRect(left, headerH, right, bottom), xAxis, yAxis);
        int[] rowOf = ElementPainter.LabelRows(layout.Elements, provisional, small, MaxLabelRows, out int rows);
        float top = headerH + rows * rowH + (rows > 0 ? fs * 0.3f : 0);
        var geometry = new ChartGeometry(new SKRect(left, top, right, bottom), xAxis, yAxis);
        return new FrameLayout(geometry, new SKRect(left, 0, right, headerH), rows, rowOf, fs);
    }

    static void Draw(SKCanvas canvas, LineLayout layout, LineSnapshot snapshot, FrameLayout fl)
    {
        ChartGeometry g = fl.Geometry;
        float fs = fl.FontSize, tick = fs * 0.35f;
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        canvas.Clear(Palette.Background);
        AxisPainter.Grid(canvas, g);
        ElementPainter.Lines(canvas, g, layout.Elements, Palette.Muted);

        canvas.Save();
        canvas.ClipRect(g.PlotArea);
        // Branches first and thinner, so the main line stays on top and prominent.
        for (int p = layout.Pieces.Count - 1; p >= 0; p--)
        {
            using SKPath path = Ink.TracePath(g, layout.Pieces[p].X, snapshot.Voltages[p]);
            using SKPaint stroke = Ink.Stroke(Palette.TraceColour(p), p == 0 ? 2.5f : 1.5f);
            canvas.DrawPath(path, stroke);
        }
        canvas.Restore();
        for (int p = 1; p < layout.Pieces.Count; p++)
            BranchLabel(canvas, g, layout.Pieces[p], snapshot.Voltages[p], Palette.TraceColour(p), small);

        ElementPainter.Symbols(canvas, g, layout.Elements, fs);
        AxisPainter.Frame(canvas, g, tick);
        AxisPainter.YTickLabels(canvas, g, font, tick + fs * 0.3f);
        AxisPainter.XTickLabels(canvas, g, font, tick + fs * 0.25f);
        Ink.TextVertical(canvas, g.Y.Title, fs * 0.8f + fs * 0.8f, (g.PlotArea.Top + g.PlotArea.Bottom) / 2, font, text);
        Ink.TextCentredV(canvas, g.X.Title, g.PlotArea.MidX, g.PlotArea.Bottom + fs * 2.35f, SKTextAlign.Center, font, text);
        ElementPainter.Labels(canvas, g, layout.Elements, fl.LabelRowOf, small, small.Size * 1.35f);
        Ink.TextCentredV(canvas, TimeStamp(snapshot.Time), fl.HeaderBox.Left, fl.HeaderBox.MidY, SKTextAlign.Left, font, text);
    }

    /// <summary>The time stamp text of a frame, e.g. "t = 3.25 ns".</summary>
    public static string TimeStamp(double time) => "t = " + Quantity.Format(time, "s");

    static void BranchLabel(SKCanvas canvas, ChartGeometry g, LinePiece piece, double[] v, SKColor colour, SKFont font)
    {
        int last = Array.FindLastIndex(v, double.IsFinite);
        if (last < 0 || string.IsNullOrEmpty(piece.Name)) return;
        float x = g.XToPixel(piece.X[last]), y = Math.Clamp(g.YToPixel(v[last]), g.PlotArea.Top + font.Size, g.PlotArea.Bottom - font.Size);
        bool leftSide = x > g.PlotArea.MidX;
        using SKPaint text = Ink.Fill(colour);
        canvas.DrawText(piece.Name, leftSide ? x - font.Size * 0.4f : x + font.Size * 0.4f, y - font.Size * 0.4f,
                        leftSide ? SKTextAlign.Right : SKTextAlign.Left, font, text);
    }

    internal static void CheckSnapshot(LineLayout layout, LineSnapshot snapshot)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        if (snapshot.Voltages.Count != layout.Pieces.Count)
            throw new ArgumentException($"Snapshot at t = {snapshot.Time} s has {snapshot.Voltages.Count} voltage arrays for {layout.Pieces.Count} line pieces.");
        for (int p = 0; p < layout.Pieces.Count; p++)
            if (snapshot.Voltages[p].Length != layout.Pieces[p].X.Length)
                throw new ArgumentException($"Snapshot at t = {snapshot.Time} s has {snapshot.Voltages[p].Length} voltages for the {layout.Pieces[p].X.Length} nodes of piece '{layout.Pieces[p].Name}'.");
    }
}
