using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Draws a <see cref="ChartSpec"/>: white page, light grid, labelled axes with engineering units, a legend above
/// each panel, stacked panels over one shared X axis. PNG and SVG come from the same drawing code.
/// </summary>
public static class XyChart
{
    /// <summary>Renders the chart as PNG bytes.</summary>
    /// <param name="spec">What to draw.</param>
    /// <param name="width">Image width, px (160..16384).</param>
    /// <param name="height">Image height, px (120..16384).</param>
    public static byte[] RenderPng(ChartSpec spec, int width, int height)
    {
        ChartLayout layout = Layout(spec, width, height);
        return ImageOutput.Png(width, height, c => Draw(c, spec, layout));
    }

    /// <summary>Renders the chart as an SVG document; each trace is exactly one &lt;path&gt; element.</summary>
    /// <param name="spec">What to draw.</param>
    /// <param name="width">Image width, px (160..16384).</param>
    /// <param name="height">Image height, px (120..16384).</param>
    public static string RenderSvg(ChartSpec spec, int width, int height)
    {
        ChartLayout layout = Layout(spec, width, height);
        return ImageOutput.Svg(width, height, c => Draw(c, spec, layout));
    }

    /// <summary>Places title, panels, legends and axes for an image of the given size (what the renderers draw into).</summary>
    public static ChartLayout Layout(ChartSpec spec, int width, int height)
    {
        Validate(spec);
        ImageOutput.CheckSize(width, height);
        float fs = Ink.BaseFontSize(width, height);
        using SKFont font = FontProvider.CreateFont(fs);
        float pad = fs * 0.8f, tick = fs * 0.35f, gap = fs * 0.6f, lineH = fs * 1.5f;

        float titleH = string.IsNullOrWhiteSpace(spec.Title) ? pad : fs * 2.2f;
        float xTickH = fs * 1.5f, xTitleH = fs * 1.6f;
        float top = titleH, bottom = height - pad - xTitleH - xTickH;
        float yTitleW = fs * 1.6f;

        (double xMin, double xMax) = XRange(spec);
        int n = spec.Panels.Count;
        double weightSum = spec.Panels.Sum(p => p.HeightWeight);
        var yRanges = spec.Panels.Select(YRange).ToArray();
        var styles = spec.Panels.Select((p, i) => TraceStyle.For(p, yRanges[i])).ToArray();

        // Pass 1: provisional heights (one legend row each) → Y ticks → left margin.
        float left = pad + yTitleW + fs * 2.5f;
        float right = width - pad * 1.5f;
        AxisScale[] yAxes = YAxes(spec, yRanges, PanelHeights(spec, top, bottom, weightSum, [.. Enumerable.Repeat(1, n)], lineH, gap));
        left = pad + yTitleW + yAxes.Max(a => AxisPainter.WidestTick(a, font)) + tick + fs * 0.3f;

        // Pass 2: legend rows for the actual width, final heights and ticks.
        float legendSwatch = fs * 1.8f;
        var legends = styles.Select(st => LegendRows(st, font, left, right, legendSwatch, fs)).ToArray();
        float[] heights = PanelHeights(spec, top, bottom, weightSum, legends.Select(l => l.Rows).ToArray(), lineH, gap);
        yAxes = YAxes(spec, yRanges, heights);
        left = Math.Max(left, pad + yTitleW + yAxes.Max(a => AxisPainter.WidestTick(a, font)) + tick + fs * 0.3f);

        float plotWidth = right - left;
        if (plotWidth < 20 || heights.Any(h => h < 10))
            throw new ArgumentException($"A {width}×{height} px image is too small for {n} panel(s) with these labels (plot {plotWidth:F0} px wide, left {left:F0}, heights {string.Join(",", heights.Select(h => h.ToString("F0")))}, y {string.Join(";", yRanges.Select(r => r.ToString()))}).");
        int xIntervals = Math.Clamp((int)(plotWidth / (fs * 6.5f)), 2, 12);
        var xAxis = spec.XKind == AxisKind.Logarithmic
            ? AxisScale.Logarithmic(spec.XLabel, spec.XUnit, xMin, xMax, xIntervals)
            : AxisScale.Exact(spec.XLabel, spec.XUnit, xMin, xMax, xIntervals);
        // The X prefix must agree across panels, so every panel uses this one axis.
        var panels = new List<PanelLayout>(n);
        float y = top;
        for (int i = 0; i < n; i++)
        {
            var (rows, entries) = LegendRows(styles[i], font, left, right, legendSwatch, fs);
            float legendTop = y;
            float plotTop = y + rows * lineH;
            var rect = new SKRect(left, plotTop, right, plotTop + heights[i]);
            var geometry = new ChartGeometry(rect, xAxis, yAxes[i]);
            var placed = entries.Select(e => (new SKPoint(e.X, legendTop + (e.Row + 0.5f) * lineH), e.Series)).ToList();
            float legendRight = entries.Count == 0 ? left : entries.Max(e => e.Right);
            var legendBox = new SKRect(left, legendTop, legendRight, legendTop + rows * lineH);
            float tickW = AxisPainter.WidestTick(yAxes[i], font);
            var yTickBox = new SKRect(left - tick - fs * 0.3f - tickW, rect.Top - fs, left - tick - fs * 0.3f, rect.Bottom + fs);
            var yTitleBox = new SKRect(pad, rect.Top, pad + yTitleW, rect.Bottom);
            panels.Add(new PanelLayout(spec.Panels[i], geometry, legendBox, yTickBox, yTitleBox, placed, styles[i]));
            y = rect.Bottom + gap;
        }
        float plotBottom = panels[^1].Geometry.PlotArea.Bottom;
        var titleBox = new SKRect(left, 0, right, titleH);
        var xTickBox = new SKRect(left - fs * 2, plotBottom + tick, right + fs * 2, plotBottom + tick + xTickH);
        var xTitleBox = new SKRect(left, xTickBox.Bottom, right, xTickBox.Bottom + xTitleH);
        return new ChartLayout(width, height, fs, panels, titleBox, xTickBox, xTitleBox);
    }

    static void Draw(SKCanvas canvas, ChartSpec spec, ChartLayout layout)
    {
        float fs = layout.FontSize;
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        using SKFont titleFont = FontProvider.CreateFont(fs * 1.25f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        float tick = fs * 0.35f;
        canvas.Clear(Palette.Background);

        if (!string.IsNullOrWhiteSpace(spec.Title))
            Ink.TextCentredV(canvas, spec.Title, layout.TitleBox.MidX, layout.TitleBox.MidY, SKTextAlign.Center, titleFont, text);

        for (int p = 0; p < layout.Panels.Count; p++)
        {
            PanelLayout pl = layout.Panels[p];
            ChartGeometry g = pl.Geometry;
            bool isBottom = p == layout.Panels.Count - 1;
            AxisPainter.Grid(canvas, g);
            DrawTraces(canvas, g, pl.Panel.Series, pl.Styles);
            DrawReferenceLines(canvas, g, pl.Panel.ReferenceLines, small); // over the traces: a threshold must stay visible
            DrawMarkers(canvas, g, pl.Panel.Markers, small);
            AxisPainter.Frame(canvas, g, tick, xTicks: true, yTicks: true);
            AxisPainter.YTickLabels(canvas, g, font, tick + fs * 0.3f);
            Ink.TextVertical(canvas, g.Y.Title, pl.YTitleBox.MidX, pl.YTitleBox.MidY, font, text);
            foreach (var (at, s) in pl.LegendEntries)
            {
                TraceStyle st = pl.Styles[s];
                Ink.LegendSwatch(canvas, at.X, at.Y, fs * 1.8f, st.Colour, st.Dash, Math.Max(3f, st.Width));
                Ink.TextCentredV(canvas, st.Legend, at.X + fs * 2.2f, at.Y, SKTextAlign.Left, font, text);
            }
            if (isBottom)
            {
                AxisPainter.XTickLabels(canvas, g, font, tick + fs * 0.25f);
                Ink.TextCentredV(canvas, g.X.Title, layout.XTitleBox.MidX, layout.XTitleBox.MidY, SKTextAlign.Center, font, text);
            }
        }
    }

    /// <summary>Reference bands first, then the lines in panel order, so no trace disappears under a band.</summary>
    static void DrawTraces(SKCanvas canvas, ChartGeometry g, IReadOnlyList<PlotSeries> series, IReadOnlyList<TraceStyle> styles)
    {
        canvas.Save();
        canvas.ClipRect(g.PlotArea);
        foreach (int s in Enumerable.Range(0, series.Count).OrderBy(s => styles[s].Beneath ? 0 : 1))
        {
            using SKPath path = Ink.TracePath(g, series[s].X, series[s].Y);
            if (path.IsEmpty) continue;
            TraceStyle st = styles[s];
            using SKPaint stroke = Ink.Stroke(st.Colour, st.Width, st.Dash);
            if (st.Beneath) stroke.StrokeCap = SKStrokeCap.Round;
            canvas.DrawPath(path, stroke);
        }
        canvas.Restore();
    }

    internal static void DrawReferenceLines(SKCanvas canvas, ChartGeometry g, IReadOnlyList<ReferenceLine> lines, SKFont font)
    {
        if (lines.Count == 0) return;
        SKRect r = g.PlotArea;
        foreach (ReferenceLine rl in lines)
        {
            if (!double.IsFinite(rl.Y) || rl.Y < g.Y.Min || rl.Y > g.Y.Max) continue;
            using SKPaint line = rl.Colour is { } c ? Ink.Stroke(c, 1.5f, [9f, 4f]) : Ink.Stroke(Palette.Muted, 1f, [5f, 4f]);
            using SKPaint text = Ink.Fill(rl.Colour ?? Palette.Muted);
            float py = Ink.Snap(g.YToPixel(rl.Y));
            canvas.DrawLine(r.Left, py, r.Right, py, line);
            if (string.IsNullOrEmpty(rl.Label)) continue;
            // On a paper patch above the line, so neither the dashes nor a trace strike through the words.
            float w = Ink.Width(font, rl.Label), pad = font.Size * 0.25f, baseline = py - font.Size * 0.45f;
            var patch = new SKRect(r.Right - font.Size * 0.4f - w - pad, baseline + font.Metrics.Ascent - pad * 0.5f, r.Right - font.Size * 0.4f + pad, baseline + font.Metrics.Descent);
            using (SKPaint paper = Ink.Fill(Palette.Background.WithAlpha(0xE0))) canvas.DrawRect(patch, paper);
            canvas.DrawText(rl.Label, r.Right - font.Size * 0.4f, baseline, SKTextAlign.Right, font, text);
        }
    }

    static void DrawMarkers(SKCanvas canvas, ChartGeometry g, IReadOnlyList<Marker> markers, SKFont font)
    {
        if (markers.Count == 0) return;
        using SKPaint ring = Ink.Stroke(Palette.Ink, 1.25f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        // Highlighted points last, so nothing covers them.
        foreach (Marker m in markers.OrderBy(m => m.Style == MarkerStyle.Highlight ? 1 : 0))
        {
            if (!double.IsFinite(m.X) || !double.IsFinite(m.Y)) continue;
            float px = g.XToPixel(m.X), py = g.YToPixel(m.Y);
            bool leftSide = px > g.PlotArea.MidX;
            float tx = leftSide ? px - font.Size * 0.6f : px + font.Size * 0.6f;
            float ty = py < g.PlotArea.Top + font.Size * 1.5f ? py + font.Size * 1.2f : py - font.Size * 0.5f;
            if (m.Style == MarkerStyle.Highlight) { Highlight(canvas, g, m.Label, px, py, font); continue; }
            canvas.DrawCircle(px, py, font.Size * 0.35f, ring);
            canvas.DrawText(m.Label, tx, ty, leftSide ? SKTextAlign.Right : SKTextAlign.Left, font, text);
        }
    }

    /// <summary>A filled diamond in <see cref="Palette.Highlight"/> with a paper rim, and its label in a box beside it.</summary>
    static void Highlight(SKCanvas canvas, ChartGeometry g, string label, float px, float py, SKFont font)
    {
        float s = font.Size * 0.6f;
        var b = new SKPathBuilder();
        b.MoveTo(px, py - s); b.LineTo(px + s, py); b.LineTo(px, py + s); b.LineTo(px - s, py); b.Close();
        using SKPath diamond = b.Detach();
        using SKPaint fill = Ink.Fill(Palette.Highlight);
        using SKPaint rim = Ink.Stroke(Palette.Background, 2f);
        canvas.DrawPath(diamond, rim);
        canvas.DrawPath(diamond, fill);
        if (string.IsNullOrEmpty(label)) return;
        float w = Ink.Width(font, label), pad = font.Size * 0.35f, h = font.Size * 1.35f;
        bool leftSide = px > g.PlotArea.MidX;
        float boxLeft = leftSide ? px - s - pad - w - 2 * pad : px + s + pad;
        // Above the point unless that leaves the plot; then below it.
        float boxTop = py - s - h < g.PlotArea.Top ? py + s * 0.5f : py - s * 0.5f - h;
        var box = new SKRect(boxLeft, boxTop, boxLeft + w + 2 * pad, boxTop + h);
        using SKPaint paper = Ink.Fill(Palette.Background);
        using SKPaint edge = Ink.Stroke(Palette.Highlight, 1.25f);
        using SKPaint ink = Ink.Fill(Palette.Ink);
        canvas.DrawRoundRect(box, pad, pad, paper);
        canvas.DrawRoundRect(box, pad, pad, edge);
        Ink.TextCentredV(canvas, label, box.Left + pad, box.MidY, SKTextAlign.Left, font, ink);
    }

    static (int Rows, List<(float X, float Right, int Row, int Series)> Entries) LegendRows(IReadOnlyList<TraceStyle> styles, SKFont font, float left, float right, float swatch, float fs)
    {
        var entries = new List<(float, float, int, int)>();
        float x = left;
        int row = 0;
        for (int s = 0; s < styles.Count; s++)
        {
            float w = swatch + fs * 0.4f + Ink.Width(font, styles[s].Legend);
            if (x > left && x + w > right) { row++; x = left; }
            entries.Add((x, x + w, row, s));
            x += w + fs * 1.4f;
        }
        return (styles.Count == 0 ? 0 : row + 1, entries);
    }

    static float[] PanelHeights(ChartSpec spec, float top, float bottom, double weightSum, int[] legendRows, float lineH, float gap)
    {
        int n = spec.Panels.Count;
        float available = bottom - top - legendRows.Sum() * lineH - (n - 1) * gap;
        return spec.Panels.Select(p => (float)(available * p.HeightWeight / weightSum)).ToArray();
    }

    static AxisScale[] YAxes(ChartSpec spec, (double Min, double Max)[] ranges, float[] heights)
    {
        var axes = new AxisScale[spec.Panels.Count];
        for (int i = 0; i < axes.Length; i++)
        {
            int intervals = Math.Clamp((int)(heights[i] / 36f), 2, 10);
            if (spec.Panels[i].YTicks is { } fixedTicks)
            {
                axes[i] = new AxisScale(spec.Panels[i].YLabel, spec.Panels[i].YUnit, ranges[i].Min, ranges[i].Max, fixedTicks);
                continue;
            }
            axes[i] = AxisScale.Exact(spec.Panels[i].YLabel, spec.Panels[i].YUnit, ranges[i].Min, ranges[i].Max, intervals);
        }
        return axes;
    }

    static (double Min, double Max) XRange(ChartSpec spec)
    {
        if (spec.XRange is { } fixedRange) return (fixedRange.Min, fixedRange.Max);
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (ChartPanel p in spec.Panels)
            foreach (PlotSeries s in p.Series)
                foreach (double x in s.X)
                    if (double.IsFinite(x)) { min = Math.Min(min, x); max = Math.Max(max, x); }
        return spec.XKind == AxisKind.Logarithmic ? WidenedLog(min, max) : Widened(min, max);
    }

    /// <summary>A usable logarithmic range: no data → 1..10, one value v → v/2..2v (common practice, no source).</summary>
    static (double, double) WidenedLog(double min, double max)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max)) return (1, 10);
        return max > min ? (min, max) : (min / 2, max * 2);
    }

    /// <summary>
    /// The fitted Y range: the data (plus reference lines and markers) with 5 % head-room each side,
    /// so a trace at its extreme does not sit on the frame (common practice, no source).
    /// </summary>
    internal static (double Min, double Max) YRange(ChartPanel panel)
    {
        if (panel.YRange is { } fixedRange) return (fixedRange.Min, fixedRange.Max);
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (PlotSeries s in panel.Series)
            foreach (double y in s.Y)
                if (double.IsFinite(y)) { min = Math.Min(min, y); max = Math.Max(max, y); }
        foreach (ReferenceLine r in panel.ReferenceLines)
            if (double.IsFinite(r.Y)) { min = Math.Min(min, r.Y); max = Math.Max(max, r.Y); }
        foreach (Marker m in panel.Markers)
            if (double.IsFinite(m.Y)) { min = Math.Min(min, m.Y); max = Math.Max(max, m.Y); }
        (min, max) = Widened(min, max);
        double headroom = 0.05 * (max - min);
        return (min - headroom, max + headroom);
    }

    /// <summary>
    /// Least span of a fitted Y range, as a fraction of the magnitude of its middle: 0.001. A figure that varies by less (a
    /// noise margin that changes by 1e-13 V over a sweep, rounding in the solver) is drawn nearly flat on a span of 0.1 % of
    /// its value, not on a span of its rounding noise, whose ticks would need a dozen digits. A chart a few hundred pixels
    /// high cannot show a smaller relative change anyway (common practice, no source).
    /// </summary>
    public const double MinimumRelativeSpan = 1e-3;

    /// <summary>
    /// A usable range from data extremes: no data → −1..1, a flat line → ±10 % (or ±1) around it, a nearly flat one → at
    /// least <see cref="MinimumRelativeSpan"/> of its middle's magnitude, centred on it.
    /// </summary>
    internal static (double, double) Widened(double min, double max)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max)) return (-1, 1);
        double mid = 0.5 * (min + max), least = MinimumRelativeSpan * Math.Abs(mid);
        if (max > min && max - min < least) return (mid - 0.5 * least, mid + 0.5 * least);
        if (max > min) return (min, max);
        double half = min == 0 ? 1 : Math.Abs(min) * 0.1;
        return (min - half, max + half);
    }

    static void Validate(ChartSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        if (spec.Panels is null || spec.Panels.Count == 0) throw new ArgumentException("A chart needs at least one panel.", nameof(spec));
        if (spec.XRange is { } xr && !(xr.Max > xr.Min)) throw new ArgumentException($"X range {xr.Min}..{xr.Max} must have max > min.", nameof(spec));
        bool logX = spec.XKind == AxisKind.Logarithmic;
        if (logX && spec.XRange is { } lr && !(lr.Min > 0))
            throw new ArgumentException($"X range {lr.Min}..{lr.Max} is on a logarithmic axis and must start above 0.", nameof(spec));
        foreach (ChartPanel p in spec.Panels)
        {
            if (!(p.HeightWeight > 0)) throw new ArgumentException($"Panel '{p.YLabel}' height weight must be greater than 0.", nameof(spec));
            if (p.YRange is { } yr && !(yr.Max > yr.Min)) throw new ArgumentException($"Panel '{p.YLabel}' Y range {yr.Min}..{yr.Max} must have max > min.", nameof(spec));
            if (p.YTicks is not null && (p.YRange is not { } tr || p.YTicks.Any(t => !(t >= tr.Min && t <= tr.Max))))
                throw new ArgumentException($"Panel '{p.YLabel}' has fixed Y ticks: they need a Y range that holds them all.", nameof(spec));
            foreach (PlotSeries s in p.Series)
            {
                if (s.X.Length != s.Y.Length)
                    throw new ArgumentException($"Series '{s.Name}' has {s.X.Length} X values but {s.Y.Length} Y values.", nameof(spec));
                if (logX && Array.FindIndex(s.X, x => x <= 0) is var i and >= 0)
                    throw new ArgumentException($"Series '{s.Name}' has X = {s.X[i].ToString(System.Globalization.CultureInfo.InvariantCulture)} at point {i}; a logarithmic X axis needs values greater than 0.", nameof(spec));
            }
            if (logX && p.Markers.FirstOrDefault(m => m.X <= 0) is { } bad)
                throw new ArgumentException($"Marker '{bad.Label}' has X = {bad.X.ToString(System.Globalization.CultureInfo.InvariantCulture)}; a logarithmic X axis needs values greater than 0.", nameof(spec));
        }
    }
}
