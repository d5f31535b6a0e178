using System.Runtime.InteropServices;
using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Draws a space-time map: position across, time downwards, voltage as colour (<see cref="DivergingColourMap"/>
/// around a reference level), element positions as thin lines, and a labelled colour bar.
/// </summary>
public static class SpaceTimeRenderer
{
    const int MaxLabelRows = 3;

    /// <summary>Renders the map as PNG bytes.</summary>
    /// <param name="layout">The line; only its main piece is mapped.</param>
    /// <param name="times">Instants of the rows, s, ascending; at least two.</param>
    /// <param name="voltageRows">One row per instant, one voltage per main-line node, V.</param>
    /// <param name="referenceV">The level drawn near-white, V (e.g. the line's resting voltage).</param>
    /// <param name="vMin">The voltage drawn darkest blue, V (at or below <paramref name="referenceV"/>).</param>
    /// <param name="vMax">The voltage drawn darkest red, V (at or above <paramref name="referenceV"/>); greater than <paramref name="vMin"/>.</param>
    /// <param name="width">Image width, px (160..16384).</param>
    /// <param name="height">Image height, px (120..16384).</param>
    public static byte[] RenderPng(LineLayout layout, double[] times, double[][] voltageRows, double referenceV, double vMin, double vMax, int width, int height)
    {
        FrameLayout fl = Layout(layout, times, referenceV, vMin, vMax, width, height);
        if (voltageRows is null || voltageRows.Length != times.Length)
            throw new ArgumentException($"Space-time map has {voltageRows?.Length ?? 0} voltage rows for {times.Length} instants.");
        for (int r = 0; r < voltageRows.Length; r++)
            if (voltageRows[r] is null || voltageRows[r].Length != layout.MainX.Length)
                throw new ArgumentException($"Space-time row {r} has {voltageRows[r]?.Length ?? 0} voltages for {layout.MainX.Length} main-line nodes.");
        return ImageOutput.Png(width, height, c => Draw(c, layout, times, voltageRows, referenceV, vMin, vMax, fl));
    }

    /// <summary>
    /// Places the map for an image of the given size; its geometry maps position (m) across and time (s) down,
    /// with whole-pixel plot edges so each map pixel is one image pixel.
    /// </summary>
    public static FrameLayout Layout(LineLayout layout, double[] times, double referenceV, double vMin, double vMax, int width, int height)
    {
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentNullException.ThrowIfNull(times);
        layout.Validate();
        ImageOutput.CheckSize(width, height);
        if (times.Length < 2) throw new ArgumentException("A space-time map needs at least two instants.");
        for (int i = 1; i < times.Length; i++)
            if (!(times[i] > times[i - 1])) throw new ArgumentException($"Space-time instants must be finite and ascending (row {i}).");
        if (!double.IsFinite(vMin) || !double.IsFinite(vMax) || !(vMax > vMin) || !(referenceV >= vMin && referenceV <= vMax))
            throw new ArgumentException($"Colour scale {vMin}..{vMax} V must be finite with max > min and hold the reference {referenceV} V.");
        float fs = Ink.BaseFontSize(width, height);
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        var tAxis = AxisScale.Exact("Time", "s", times[0], times[^1], Math.Clamp((int)(height / 60f), 2, 10));
        var vAxis = AxisScale.Exact("Voltage", "V", vMin, vMax, Math.Clamp((int)(height / 60f), 2, 10));
        float pad = fs * 0.8f, tick = fs * 0.35f;
        float left = MathF.Ceiling(pad + fs * 1.6f + AxisPainter.WidestTick(tAxis, font) + tick + fs * 0.3f);
        float barBlock = fs * 1.2f + tick + fs * 0.3f + AxisPainter.WidestTick(vAxis, font) + fs * 2.2f;
        float right = MathF.Floor(width - pad - barBlock - fs);
        float headerH = fs * 1.8f, rowH = small.Size * 1.35f;
        float bottom = MathF.Floor(height - pad - fs * 3.1f);
        var (xMin, xMax) = (layout.MainX[0], layout.MainX[^1]);
        var xAxis = ElementPainter.PositionAxis(layout, xMin, xMax, Math.Clamp((int)((right - left) / (fs * 6.5f)), 2, 12));
        var provisional = new ChartGeometry(new SKRect(left, headerH, right, bottom), xAxis, tAxis, yDown: true);
        int[] rowOf = ElementPainter.LabelRows(layout.MainMarks, provisional, small, MaxLabelRows, out int rows);
        float top = MathF.Ceiling(headerH + rows * rowH + (rows > 0 ? fs * 0.3f : 0));
        var geometry = new ChartGeometry(new SKRect(left, top, right, bottom), xAxis, tAxis, yDown: true);
        return new FrameLayout(geometry, new SKRect(left, 0, right, headerH), rows, rowOf, fs);
    }

    /// <summary>The colour-bar box right of the map (top = <c>vMax</c>, bottom = <c>vMin</c>).</summary>
    public static SKRect ColourBarBox(FrameLayout fl)
    {
        SKRect r = fl.Geometry.PlotArea;
        float fs = fl.FontSize;
        return new SKRect(r.Right + fs * 1.2f, r.Top, r.Right + fs * 2.4f, r.Bottom);
    }

    static void Draw(SKCanvas canvas, LineLayout layout, double[] times, double[][] rows, double reference, double vMin, double vMax, FrameLayout fl)
    {
        ChartGeometry g = fl.Geometry;
        float fs = fl.FontSize, tick = fs * 0.35f;
        using SKFont font = FontProvider.CreateFont(fs);
        using SKFont small = FontProvider.CreateFont(fs * 0.85f);
        using SKPaint text = Ink.Fill(Palette.Ink);
        canvas.Clear(Palette.Background);

        using (SKImage map = MapImage(g, layout.MainX, times, rows, reference, vMin, vMax))
            canvas.DrawImage(map, g.PlotArea, new SKSamplingOptions(SKFilterMode.Nearest));
        ElementPainter.Lines(canvas, g, layout.MainMarks, new SKColor(0x30, 0x30, 0x30, 0xA0));
        AxisPainter.Frame(canvas, g, tick);
        AxisPainter.YTickLabels(canvas, g, font, tick + fs * 0.3f);
        AxisPainter.XTickLabels(canvas, g, font, tick + fs * 0.25f);
        Ink.TextVertical(canvas, g.Y.Title, fs * 1.6f, g.PlotArea.MidY, font, text);
        Ink.TextCentredV(canvas, g.X.Title, g.PlotArea.MidX, g.PlotArea.Bottom + fs * 2.35f, SKTextAlign.Center, font, text);
        ElementPainter.Labels(canvas, g, layout.MainMarks, fl.LabelRowOf, small, small.Size * 1.35f);
        Ink.TextCentredV(canvas, "Voltage along the line", fl.HeaderBox.Left, fl.HeaderBox.MidY, SKTextAlign.Left, font, text);
        ColourBar(canvas, ColourBarBox(fl), reference, vMin, vMax, g.Y.Ticks.Count, font, tick);
    }

    static SKImage MapImage(ChartGeometry g, double[] x, double[] times, double[][] rows, double reference, double vMin, double vMax)
    {
        int w = (int)MathF.Round(g.PlotArea.Width), h = (int)MathF.Round(g.PlotArea.Height);
        // Per column: the main-line interval and weight of the pixel centre's position (linear along the line).
        var colIndex = new int[w];
        var colWeight = new double[w];
        for (int c = 0; c < w; c++)
            (colIndex[c], colWeight[c]) = Bracket(x, g.PixelToX(g.PlotArea.Left + c + 0.5));
        var pixels = new uint[w * h];
        Parallel.For(0, h, r =>
        {
            // Per row: the two time rows around the pixel centre's instant, blended linearly.
            var (k, wt) = Bracket(times, g.PixelToY(g.PlotArea.Top + r + 0.5));
            double[] a = rows[k], b = rows[Math.Min(k + 1, rows.Length - 1)];
            for (int c = 0; c < w; c++)
            {
                int i = colIndex[c], j = Math.Min(i + 1, x.Length - 1);
                double wx = colWeight[c];
                double va = a[i] + (a[j] - a[i]) * wx, vb = b[i] + (b[j] - b[i]) * wx;
                SKColor col = DivergingColourMap.Map(va + (vb - va) * wt, reference, vMin, vMax);
                pixels[r * w + c] = (uint)(col.Red | col.Green << 8 | col.Blue << 16 | 0xFF << 24);
            }
        });
        var info = new SKImageInfo(w, h, SKColorType.Rgba8888, SKAlphaType.Opaque);
        return SKImage.FromPixelCopy(info, MemoryMarshal.AsBytes(pixels.AsSpan()), w * 4)
            ?? throw new InvalidOperationException("Could not build the space-time image.");
    }

    /// <summary>The interval [i, i+1] of ascending <paramref name="grid"/> holding <paramref name="value"/> and the weight of i+1 (clamped at the ends).</summary>
    internal static (int Index, double Weight) Bracket(double[] grid, double value)
    {
        if (value <= grid[0]) return (0, 0);
        if (value >= grid[^1]) return (grid.Length - 2, 1);
        int hi = Array.BinarySearch(grid, value);
        if (hi >= 0) return (Math.Min(hi, grid.Length - 2), hi == grid.Length - 1 ? 1 : 0);
        hi = ~hi;
        int lo = hi - 1;
        return (lo, (value - grid[lo]) / (grid[hi] - grid[lo]));
    }

    static void ColourBar(SKCanvas canvas, SKRect bar, double reference, double vMin, double vMax, int tickHint, SKFont font, float tick)
    {
        int top = (int)bar.Top, bottom = (int)bar.Bottom;
        using var fill = new SKPaint { IsAntialias = false, Style = SKPaintStyle.Fill };
        for (int y = top; y < bottom; y++)
        {
            double v = vMax - (y + 0.5 - bar.Top) / bar.Height * (vMax - vMin);
            fill.Color = DivergingColourMap.Map(v, reference, vMin, vMax);
            canvas.DrawRect(bar.Left, y, bar.Width, 1, fill);
        }
        using SKPaint ink = Ink.Stroke(Palette.Ink, 1f);
        ink.IsAntialias = false;
        canvas.DrawRect(Ink.Snap(bar.Left), Ink.Snap(bar.Top), MathF.Round(bar.Width) - 1, MathF.Round(bar.Height) - 1, ink);
        var axis = AxisScale.Exact("Voltage", "V", vMin, vMax, Math.Max(2, tickHint));
        var g = new ChartGeometry(bar, axis, axis);
        using SKPaint text = Ink.Fill(Palette.Ink);
        float labelsRight = bar.Right;
        foreach (double t in axis.Ticks)
        {
            float py = Ink.Snap(g.YToPixel(t));
            canvas.DrawLine(bar.Right, py, bar.Right + tick, py, ink);
            string label = axis.FormatTick(t);
            Ink.TextCentredV(canvas, label, bar.Right + tick + font.Size * 0.3f, g.YToPixel(t), SKTextAlign.Left, font, text);
            labelsRight = Math.Max(labelsRight, bar.Right + tick + font.Size * 0.3f + Ink.Width(font, label));
        }
        // A notch marks the reference level (the near-white colour).
        float ry = g.YToPixel(reference);
        var b = new SKPathBuilder();
        b.MoveTo(bar.Left - 1, ry); b.LineTo(bar.Left - font.Size * 0.5f, ry - font.Size * 0.3f); b.LineTo(bar.Left - font.Size * 0.5f, ry + font.Size * 0.3f); b.Close();
        using (SKPath notch = b.Detach()) canvas.DrawPath(notch, text);
        Ink.TextVertical(canvas, axis.Title, labelsRight + font.Size * 1.0f, bar.MidY, font, text);
    }
}
