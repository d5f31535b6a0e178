using SkiaSharp;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// Checks of the drawing against its analytic input (plot geometry; common practice, no external source).
public class EyePlotTests
{
    const double Ui = 100e-12;

    static List<(double[] T, double[] V)> Traces()
    {
        double[] t = Enumerable.Range(0, 81).Select(i => i * 2 * Ui / 80).ToArray();
        // Four bit pairs: steady 0, steady 1, rising and falling at 1 UI (linear over 0.2 UI).
        double Edge(double x) => Math.Clamp((x - 0.9 * Ui) / (0.2 * Ui), 0, 1);
        return [(t, t.Select(_ => 0.0).ToArray()), (t, t.Select(_ => 1.0).ToArray()),
                (t, t.Select(Edge).ToArray()), (t, t.Select(x => 1 - Edge(x)).ToArray())];
    }

    [Fact]
    public void Eye_levels_are_inked_and_the_open_eye_is_blank()
    {
        var options = new EyePlotOptions { VoltageRange = new AxisRange(-0.5, 1.5) };
        ChartGeometry g = EyePlot.Layout(Traces(), Ui, 300, 220, options);
        using SKBitmap bmp = PngProbe.Decode(EyePlot.RenderPng("eye", Traces(), Ui, 300, 220, options));
        Assert.Equal((300, 220), (bmp.Width, bmp.Height));
        SKRect r = g.PlotArea;
        int col = (int)g.XToPixel(0.4 * Ui);
        foreach (double v in new[] { 0.0, 1.0 })
        {
            int handRow = (int)(r.Bottom - (v + 0.5) / 2.0 * r.Height);
            Assert.True(PngProbe.Distance(bmp.GetPixel(col, handRow), SKColors.White) > 60, $"{v} V level inked");
        }
        // Midway between the levels at 0.4 UI no trace passes: background or grid only.
        SKColor mid = bmp.GetPixel(col, (int)(r.Bottom - 1.0 / 2.0 * r.Height) - 2);
        Assert.True(PngProbe.Distance(mid, SKColors.White) < 40);
    }

    [Fact]
    public void Opening_box_and_unit_interval_axis_are_drawn()
    {
        var options = new EyePlotOptions { Opening = new EyeOpening(0.2 * Ui, 0.8 * Ui, 0.2, 0.8, "eye") };
        ChartGeometry g = EyePlot.Layout(Traces(), Ui, 300, 220, options);
        Assert.Equal("Time [UI]", g.X.Title);
        Assert.Equal("1.0", g.X.FormatTick(Ui));
        using SKBitmap bmp = PngProbe.Decode(EyePlot.RenderPng("eye", Traces(), Ui, 300, 220, options));
        int left = (int)Math.Round(g.XToPixel(0.2 * Ui)), row = (int)g.YToPixel(0.5);
        bool boxEdge = Enumerable.Range(left - 1, 3).Any(c => PngProbe.Near(bmp.GetPixel(c, row), Palette.Traces[1], 80));
        Assert.True(boxEdge, "opening box left edge in the box colour");
    }
}
