using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Draws the grid, frame, ticks and tick numbers of a <see cref="ChartGeometry"/>.</summary>
internal static class AxisPainter
{
    public static void Grid(SKCanvas canvas, ChartGeometry g, bool vertical = true, bool horizontal = true)
    {
        using SKPaint grid = Ink.Stroke(Palette.Grid, 1f);
        grid.IsAntialias = false;
        using SKPaint minor = Ink.Stroke(Palette.GridMinor, 1f);
        minor.IsAntialias = false;
        SKRect r = g.PlotArea;
        // Minor lines first, so a major line drawn over the same column wins.
        if (vertical)
            foreach (double t in g.X.MinorTicks) { float px = Ink.Snap(g.XToPixel(t)); canvas.DrawLine(px, r.Top, px, r.Bottom, minor); }
        if (horizontal)
            foreach (double t in g.Y.MinorTicks) { float py = Ink.Snap(g.YToPixel(t)); canvas.DrawLine(r.Left, py, r.Right, py, minor); }
        if (vertical)
            foreach (double t in g.X.Ticks) { float px = Ink.Snap(g.XToPixel(t)); canvas.DrawLine(px, r.Top, px, r.Bottom, grid); }
        if (horizontal)
            foreach (double t in g.Y.Ticks) { float py = Ink.Snap(g.YToPixel(t)); canvas.DrawLine(r.Left, py, r.Right, py, grid); }
    }

    public static void Frame(SKCanvas canvas, ChartGeometry g, float tickLength, bool xTicks = true, bool yTicks = true)
    {
        using SKPaint ink = Ink.Stroke(Palette.Ink, 1f);
        ink.IsAntialias = false;
        SKRect r = g.PlotArea;
        canvas.DrawRect(Ink.Snap(r.Left), Ink.Snap(r.Top), MathF.Round(r.Width) - 1, MathF.Round(r.Height) - 1, ink);
        float minorLength = tickLength * 0.55f;
        if (xTicks)
        {
            foreach (double t in g.X.Ticks) { float px = Ink.Snap(g.XToPixel(t)); canvas.DrawLine(px, r.Bottom, px, r.Bottom + tickLength, ink); }
            foreach (double t in g.X.MinorTicks) { float px = Ink.Snap(g.XToPixel(t)); canvas.DrawLine(px, r.Bottom, px, r.Bottom + minorLength, ink); }
        }
        if (yTicks)
        {
            foreach (double t in g.Y.Ticks) { float py = Ink.Snap(g.YToPixel(t)); canvas.DrawLine(r.Left - tickLength, py, r.Left, py, ink); }
            foreach (double t in g.Y.MinorTicks) { float py = Ink.Snap(g.YToPixel(t)); canvas.DrawLine(r.Left - minorLength, py, r.Left, py, ink); }
        }
    }

    public static void YTickLabels(SKCanvas canvas, ChartGeometry g, SKFont font, float gap)
    {
        using SKPaint text = Ink.Fill(Palette.Ink);
        foreach (double t in g.Y.Ticks)
            Ink.TextCentredV(canvas, g.Y.FormatTick(t), g.PlotArea.Left - gap, g.YToPixel(t), SKTextAlign.Right, font, text);
    }

    public static void XTickLabels(SKCanvas canvas, ChartGeometry g, SKFont font, float gap)
    {
        using SKPaint text = Ink.Fill(Palette.Ink);
        float baseline = g.PlotArea.Bottom + gap - font.Metrics.Ascent;
        foreach (double t in g.X.Ticks)
            canvas.DrawText(g.X.FormatTick(t), g.XToPixel(t), baseline, SKTextAlign.Center, font, text);
    }

    /// <summary>The widest Y tick number of an axis, in pixels.</summary>
    public static float WidestTick(AxisScale axis, SKFont font) =>
        axis.Ticks.Count == 0 ? 0 : axis.Ticks.Max(t => Ink.Width(font, axis.FormatTick(t)));
}
