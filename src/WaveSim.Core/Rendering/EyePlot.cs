using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Draws an eye diagram: many traces already folded into a 2-UI window, overlaid in one colour with transparency
/// so that often-travelled paths come out darker.
/// </summary>
public static class EyePlot
{
    static readonly SKColor TraceColour = Palette.Traces[0];
    static readonly SKColor BoxColour = Palette.Traces[1];

    /// <summary>Renders the eye diagram as PNG bytes.</summary>
    /// <param name="title">Title above the plot.</param>
    /// <param name="traces">Traces, each (time s in 0..2 UI, voltage V), equal lengths per trace.</param>
    /// <param name="unitInterval">The unit interval, s. Must be greater than 0.</param>
    /// <param name="width">Image width, px (160..16384).</param>
    /// <param name="height">Image height, px (120..16384).</param>
    /// <param name="options">Thresholds, opening box, axis style; null for none.</param>
    public static byte[] RenderPng(string title, IReadOnlyList<(double[] T, double[] V)> traces, double unitInterval, int width, int height, EyePlotOptions? options = null)
    {
        ChartGeometry g = Layout(traces, unitInterval, width, height, options);
        return ImageOutput.Png(width, height, c => Draw(c, title, traces, unitInterval, options ?? new EyePlotOptions(), g, width, height));
    }

    /// <summary>The plot area and mapping of an eye diagram: X in seconds (0..2 UI), Y in volts.</summary>
    public static ChartGeometry Layout(IReadOnlyList<(double[] T, double[] V)> traces, double unitInterval, int width, int height, EyePlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(traces);
        if (!(unitInterval > 0) || !double.IsFinite(unitInterval)) throw new ArgumentOutOfRangeException(nameof(unitInterval), "Must be finite and greater than zero.");
        ImageOutput.CheckSize(width, height);
        foreach (var (t, v) in traces)
            if (t.Length != v.Length) throw new ArgumentException($"An eye trace has {t.Length} times but {v.Length} voltages.");
        options ??= new EyePlotOptions();
        float fs = Ink.BaseFontSize(width, height);
        using SKFont font = FontProvider.CreateFont(fs);
        var thresholds = options.Thresholds.Select(r => r.Y).ToList();
        if (options.Opening is { } o) thresholds.AddRange([o.VLow, o.VHigh]);
        var all = traces.SelectMany(tr => tr.V).Concat(thresholds).Where(double.IsFinite).ToArray();
        double vMin, vMax;
        if (options.VoltageRange is { } fixedRange) (vMin, vMax) = (fixedRange.Min, fixedRange.Max);
        else if (all.Length == 0 || all.Max() == all.Min()) (vMin, vMax) = all.Length == 0 ? (-1, 1) : (all[0] - 1, all[0] + 1);
        else { double lo = all.Min(), hi = all.Max(), pad = 0.05 * (hi - lo); (vMin, vMax) = (lo - pad, hi + pad); }
        float pad0 = fs * 0.8f, tick = fs * 0.35f;
        float top = fs * 2.2f, bottom = height - pad0 - fs * 3.1f;
        int yIntervals = Math.Clamp((int)((bottom - top) / 36f), 2, 10);
        var yAxis = AxisScale.Exact("Voltage", "V", vMin, vMax, yIntervals);
        float left = pad0 + fs * 1.6f + AxisPainter.WidestTick(yAxis, font) + tick + fs * 0.3f;
        float right = width - pad0 * 1.5f;
        int xIntervals = Math.Clamp((int)((right - left) / (fs * 6.5f)), 2, 12);
        AxisScale xAxis = options.TimeInUnitIntervals
            ? new AxisScale("Time", "UI", 0, 2 * unitInterval, NiceTicks.Within(0, 2, xIntervals).Select(u => u * unitInterval).ToArray(), new EngineeringPrefix("", unitInterval))
            : AxisScale.Exact("Time", "s", 0, 2 * unitInterval, xIntervals);
        return new ChartGeometry(new SKRect(left, top, right, bottom), xAxis, yAxis);
    }

    static void Draw(SKCanvas canvas, string title, IReadOnlyList<(double[] T, double[] V)> traces, double ui, EyePlotOptions options, ChartGeometry g, int width, int height)
    {
        float fs = Ink.BaseFontSize(width, height), tick = fs * 0.35f;
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        using SKFont titleFont = FontProvider.CreateFont(fs * 1.25f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        canvas.Clear(Palette.Background);
        AxisPainter.Grid(canvas, g);

        // Opacity falls with the trace count so a dense eye still shows where traces crowd (floor keeps rare paths visible).
        byte alpha = (byte)Math.Clamp(3000.0 / Math.Max(1, traces.Count), 40, 230);
        canvas.Save();
        canvas.ClipRect(g.PlotArea);
        using (SKPaint stroke = Ink.Stroke(TraceColour.WithAlpha(alpha), 1.25f))
            foreach (var (t, v) in traces)
            {
                using SKPath path = Ink.TracePath(g, t, v);
                canvas.DrawPath(path, stroke);
            }
        canvas.Restore();

        XyChart.DrawReferenceLines(canvas, g, options.Thresholds, small);
        if (options.Opening is { } o)
        {
            var box = new SKRect(g.XToPixel(o.TimeStart), g.YToPixel(o.VHigh), g.XToPixel(o.TimeEnd), g.YToPixel(o.VLow));
            using SKPaint outline = Ink.Stroke(BoxColour, 1.75f);
            canvas.DrawRect(box, outline);
            using SKPaint label = Ink.Fill(BoxColour);
            if (!string.IsNullOrEmpty(o.Label))
                canvas.DrawText(o.Label, box.MidX, box.Top - small.Size * 0.45f, SKTextAlign.Center, small, label);
        }
        AxisPainter.Frame(canvas, g, tick);
        AxisPainter.YTickLabels(canvas, g, font, tick + fs * 0.3f);
        AxisPainter.XTickLabels(canvas, g, font, tick + fs * 0.25f);
        Ink.TextVertical(canvas, g.Y.Title, fs * 1.6f, g.PlotArea.MidY, font, text);
        Ink.TextCentredV(canvas, g.X.Title, g.PlotArea.MidX, g.PlotArea.Bottom + fs * 2.35f, SKTextAlign.Center, font, text);
        if (!string.IsNullOrWhiteSpace(title))
            Ink.TextCentredV(canvas, title, g.PlotArea.MidX, fs * 1.1f, SKTextAlign.Center, titleFont, text);
    }
}
