using SkiaSharp;
using WaveSim.Core.Units;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Draws one animation frame: voltage along the line at one instant on a fixed voltage scale, the time stamp,
/// and the line's elements marked along the position axis so a viewer sees where waves reflect. Branches get their own
/// axes below the main one; a legend at the foot names the marks.
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

    /// <summary>
    /// Places the plot, header, element labels, branch axes and marker legend for a frame of the given size. The main line
    /// has the top axis; each branch gets its own shorter axis below it, starting under its junction (see
    /// <see cref="BranchAxis"/>), so no branch trace is drawn over the main one.
    /// </summary>
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
        double[] mainX = layout.MainX;
        var (xMin, xMax) = mainX[^1] > mainX[0] ? (mainX[0], mainX[^1]) : layout.Extent();
        float pad = fs * 0.8f, tick = fs * 0.35f;
        // The main axis's tick count depends on the heights found below, so the margin holds the widest of any count.
        float widest = Enumerable.Range(2, 9).Max(n => AxisPainter.WidestTick(AxisScale.Exact("Voltage", "V", vMin, vMax, n), font));
        float left = pad + fs * 1.6f + widest + tick + fs * 0.3f;
        float right = width - pad * 1.5f;
        float headerH = fs * 1.8f, rowH = small.Size * 1.35f;

        var legend = LegendEntries(layout, small, pad, right, height - pad, out float legendH);
        float bottom = height - pad - legendH;
        const float mainFootEm = 3.1f; // tick numbers and the axis title below the main plot
        // Label rows depend on the X mapping only, so place them on a provisional geometry first.
        var xAxis = ElementPainter.PositionAxis(layout, xMin, xMax, Math.Clamp((int)((right - left) / (fs * 6.5f)), 2, 12));
        var provisional = new ChartGeometry(new SKRect(left, headerH, right, bottom - fs * mainFootEm), xAxis, AxisScale.Exact("Voltage", "V", vMin, vMax, 2));
        int[] rowOf = ElementPainter.LabelRows(layout.MainMarks, provisional, small, MaxLabelRows, out int rows);
        float top = headerH + rows * rowH + (rows > 0 ? fs * 0.3f : 0);

        // Branch rows: each branch below its parent, side by side where their axes do not overlap.
        var plans = PlanBranches(layout, provisional, fs);
        int branchRows = plans.Count == 0 ? 0 : plans.Max(b => b.Row) + 1;
        float nameH = small.Size * 1.5f, branchFoot = fs * 1.6f, rowGap = fs * 0.3f;
        float available = bottom - top - fs * mainFootEm - branchRows * (nameH + branchFoot + rowGap);
        // The main line keeps the larger share (about 2.2 branch rows' worth), a branch at least three text lines.
        float branchH = branchRows == 0 ? 0 : Math.Max(fs * 3f, available / (2.2f + branchRows));
        float mainH = available - branchRows * branchH;
        if (mainH < fs * 4 && branchRows > 0)
        {
            // A small frame with many branch rows: the branch axes give way first, down to a line and a half of text.
            branchH = Math.Max(fs * 1.5f, (available - fs * 4) / branchRows);
            mainH = available - branchRows * branchH;
        }
        if (mainH < fs * 4)
            throw new ArgumentException($"A {width}×{height} px frame is too small for the main line and {plans.Count} branch(es) in {branchRows} row(s); choose a larger frame size.");
        var yAxis = AxisScale.Exact("Voltage", "V", vMin, vMax, Math.Clamp((int)(mainH / 30f), 3, 10));
        var geometry = new ChartGeometry(new SKRect(left, top, right, top + mainH), xAxis, yAxis);

        var placed = new List<BranchAxis>();
        float rowsTop = geometry.PlotArea.Bottom + fs * mainFootEm;
        foreach (var b in plans)
        {
            float rowTop = rowsTop + b.Row * (nameH + branchH + branchFoot + rowGap);
            var rect = new SKRect(b.Left, rowTop + nameH, b.Right, rowTop + nameH + branchH);
            var bx = ElementPainter.PositionAxis(layout, 0, b.Length, Math.Clamp((int)(rect.Width / (fs * 4.5f)), 1, 6));
            var by = AxisScale.Exact("Voltage", "V", vMin, vMax, Math.Clamp((int)(branchH / 25f), 3, 5));
            var g = new ChartGeometry(rect, bx, by);
            ChartGeometry parent = b.Parent == 0 ? geometry : placed.First(p => p.Piece == b.Parent).Geometry;
            double parentOffset = b.Parent == 0 ? 0 : placed.First(p => p.Piece == b.Parent).Junction;
            float jx = parent.XToPixel(b.Junction - parentOffset), jy = parent.PlotArea.Bottom;
            float elbow = rowTop + nameH * 0.2f;
            SKPoint[] connector = Math.Abs(jx - rect.Left) < 0.5f
                ? [new(jx, jy), new(jx, rect.Top)]
                : [new(jx, jy), new(jx, elbow), new(rect.Left, elbow), new(rect.Left, rect.Top)];
            placed.Add(new BranchAxis(b.Piece, b.Parent, b.Junction, b.Row, g, new SKRect(rect.Left, rowTop, rect.Right, rowTop + nameH), connector));
        }
        return new FrameLayout(geometry, new SKRect(left, 0, right, headerH), rows, rowOf, fs, placed, legend);
    }

    /// <summary>A branch's place before the heights are known: its row and horizontal extent.</summary>
    sealed record BranchPlan(int Piece, int Parent, double Junction, double Length, int Row, float Left, float Right);

    static List<BranchPlan> PlanBranches(LineLayout layout, ChartGeometry main, float fs)
    {
        var plans = new List<BranchPlan>();
        var taken = new List<(int Row, float From, float To)>();
        float minWidth = Math.Max(fs * 9, main.PlotArea.Width * 0.18f);
        float labelRoom = fs * 3.2f; // the branch's Y tick numbers sit left of its axis
        for (int p = 1; p < layout.Pieces.Count; p++)
        {
            LinePiece piece = layout.Pieces[p];
            int parent = ParentOf(layout, p);
            double junction = piece.X[0], length = piece.X[^1] - piece.X[0];
            if (!(length > 0)) length = layout.LengthFactor; // a branch of no length still gets an axis to show its load
            BranchPlan? parentPlan = plans.FirstOrDefault(b => b.Piece == parent);
            float jx = parentPlan is null
                ? main.XToPixel(junction)
                : parentPlan.Left + (float)((junction - parentPlan.Junction) / parentPlan.Length) * (parentPlan.Right - parentPlan.Left);
            // The main line's scale where it leaves room, else wide enough to read; kept inside the plot's right edge.
            float w = Math.Max(minWidth, (float)(length / (main.X.Max - main.X.Min)) * main.PlotArea.Width);
            w = Math.Min(w, main.PlotArea.Width);
            float l = Math.Min(jx, main.PlotArea.Right - w);
            int row = parentPlan is null ? 0 : parentPlan.Row + 1;
            while (taken.Any(t => t.Row == row && t.From < l + w + fs && l - labelRoom < t.To)) row++;
            taken.Add((row, l - labelRoom, l + w));
            plans.Add(new BranchPlan(p, parent, junction, length, row, l, l + w));
        }
        return plans;
    }

    /// <summary>The piece a branch leaves: the one whose name is the longest path prefix of its name ("a/b" leaves "a"), else the main line.</summary>
    static int ParentOf(LineLayout layout, int piece)
    {
        string name = layout.Pieces[piece].Name;
        int best = 0, bestLength = -1;
        for (int q = 1; q < layout.Pieces.Count; q++)
        {
            string other = layout.Pieces[q].Name;
            if (q != piece && name.StartsWith(other + "/", StringComparison.Ordinal) && other.Length > bestLength) { best = q; bestLength = other.Length; }
        }
        return best;
    }

    /// <summary>Legend entries for the kinds present, flowing left to right and wrapping, bottom-aligned at <paramref name="bottom"/>.</summary>
    static List<(NetMarkKind Kind, string Text, SKPoint At)> LegendEntries(LineLayout layout, SKFont font, float left, float right, float bottom, out float height)
    {
        var kinds = layout.Elements.Select(e => e.Kind).ToHashSet();
        var present = ElementPainter.LegendNames.Where(n => kinds.Contains(n.Kind)).ToList();
        var rows = new List<List<(NetMarkKind, string, float)>> { new() };
        float x = left, symbol = font.Size * 1.4f, gap = font.Size * 1.3f;
        foreach (var (kind, text) in present)
        {
            float w = symbol + Ink.Width(font, text);
            if (x > left && x + w > right) { rows.Add([]); x = left; }
            rows[^1].Add((kind, text, x + symbol * 0.4f));
            x += w + gap;
        }
        float rowH = font.Size * 1.5f;
        height = present.Count == 0 ? 0 : rows.Count * rowH + font.Size * 0.3f;
        var entries = new List<(NetMarkKind, string, SKPoint)>();
        for (int r = 0; r < rows.Count; r++)
            foreach (var (kind, text, cx) in rows[r])
                entries.Add((kind, text, new SKPoint(cx, bottom - height + font.Size * 0.3f + (r + 0.5f) * rowH)));
        return entries;
    }

    static void Draw(SKCanvas canvas, LineLayout layout, LineSnapshot snapshot, FrameLayout fl)
    {
        ChartGeometry g = fl.Geometry;
        float fs = fl.FontSize, tick = fs * 0.35f;
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        canvas.Clear(Palette.Background);
        // Connectors first: tick numbers and titles are drawn over them.
        foreach (BranchAxis b in fl.Branches)
        {
            using SKPaint link = Ink.Stroke(Palette.TraceColour(b.Piece), 1.25f);
            for (int k = 1; k < b.Connector.Count; k++) canvas.DrawLine(b.Connector[k - 1], b.Connector[k], link);
        }

        var mainMarks = layout.MainMarks;
        var mainProbes = layout.Elements.Where(e => e.Piece == 0 && e.Kind == NetMarkKind.Probe).ToList();
        AxisPainter.Grid(canvas, g);
        ElementPainter.Lines(canvas, g, mainMarks, Palette.Muted);
        Trace(canvas, g, layout.Pieces[0].X, snapshot.Voltages[0], 0, 2.5f);
        ElementPainter.Symbols(canvas, g, mainMarks, fs);
        ElementPainter.Probes(canvas, g, mainProbes, small);
        AxisPainter.Frame(canvas, g, tick);
        AxisPainter.YTickLabels(canvas, g, font, tick + fs * 0.3f);
        AxisPainter.XTickLabels(canvas, g, font, tick + fs * 0.25f);
        Ink.TextVertical(canvas, g.Y.Title, fs * 0.8f + fs * 0.8f, (g.PlotArea.Top + g.PlotArea.Bottom) / 2, font, text);
        Ink.TextCentredV(canvas, g.X.Title, g.PlotArea.MidX, g.PlotArea.Bottom + fs * 2.35f, SKTextAlign.Center, font, text);
        ElementPainter.Labels(canvas, g, mainMarks, fl.LabelRowOf, small, small.Size * 1.35f);

        foreach (BranchAxis b in fl.Branches)
        {
            ChartGeometry bg = b.Geometry;
            // The branch's own elements, moved to its axis (which counts from the junction).
            var marks = layout.Elements.Where(e => e.Piece == b.Piece).Select(e => e with { Position = e.Position - b.Junction }).ToList();
            var lines = marks.Where(e => e.Kind != NetMarkKind.Probe).ToList();
            AxisPainter.Grid(canvas, bg);
            ElementPainter.Lines(canvas, bg, lines, Palette.Muted);
            double[] x = layout.Pieces[b.Piece].X.Select(v => v - b.Junction).ToArray();
            Trace(canvas, bg, x, snapshot.Voltages[b.Piece], b.Piece, 2f);
            ElementPainter.Symbols(canvas, bg, lines, fs * 0.85f);
            ElementPainter.Probes(canvas, bg, marks, small);
            AxisPainter.Frame(canvas, bg, tick);
            AxisPainter.YTickLabels(canvas, bg, small, tick + fs * 0.25f);
            AxisPainter.XTickLabels(canvas, bg, small, tick + fs * 0.2f);
            using SKPaint name = Ink.Fill(Palette.TraceColour(b.Piece));
            string title = BranchTitle(layout, b, small);
            Ink.TextCentredV(canvas, title, b.NameBox.Left + fs * 0.45f, b.NameBox.MidY, SKTextAlign.Left, small, name);
        }

        foreach (var (kind, label, at) in fl.Legend)
        {
            ElementPainter.Symbol(canvas, kind, at.X, at.Y, small.Size * 0.45f);
            Ink.TextCentredV(canvas, label, at.X + small.Size * 0.9f, at.Y, SKTextAlign.Left, small, text);
        }
        Ink.TextCentredV(canvas, TimeStamp(snapshot.Time), fl.HeaderBox.Left, fl.HeaderBox.MidY, SKTextAlign.Left, font, text);
    }

    static void Trace(SKCanvas canvas, ChartGeometry g, double[] x, double[] v, int colour, float width)
    {
        canvas.Save();
        canvas.ClipRect(g.PlotArea);
        using SKPath path = Ink.TracePath(g, x, v);
        using SKPaint stroke = Ink.Stroke(Palette.TraceColour(colour), width);
        canvas.DrawPath(path, stroke);
        canvas.Restore();
    }

    /// <summary>"stub: distance from the junction at 60 mm [mm]", shortened to what fits over the branch axis.</summary>
    static string BranchTitle(LineLayout layout, BranchAxis b, SKFont font)
    {
        string name = layout.Pieces[b.Piece].Name;
        string at = (b.Junction / layout.LengthFactor).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + " " + layout.LengthUnit;
        foreach (string candidate in new[] { $"{name}: distance from its junction at {at} [{layout.LengthUnit}]", $"{name} (junction at {at}) [{layout.LengthUnit}]", $"{name} [{layout.LengthUnit}]" })
            if (Ink.Width(font, candidate) <= b.Geometry.PlotArea.Width) return candidate;
        return name;
    }

    /// <summary>The time stamp text of a frame, e.g. "t = 3.25 ns".</summary>
    public static string TimeStamp(double time) => "t = " + Quantity.Format(time, "s");

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
