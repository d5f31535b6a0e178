using System.Xml.Linq;
using SkiaSharp;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// These check the drawing against its analytic input: an ideal delayed ramp-step (0 V before 2 ns, linear to 1 V at
// 2.5 ns, then 1 V) must appear where plain plot geometry puts it. Expected rows are also worked out by hand from the
// plot-area edges (linear axis, Y up), which needs no external source beyond common practice.
public class XyChartTests
{
    const int W = 420, H = 300;
    static readonly SKColor Blue = Palette.Traces[0];

    static double Ramp(double t) => t < 2e-9 ? 0 : t < 2.5e-9 ? (t - 2e-9) / 0.5e-9 : 1;

    static PlotSeries RampSeries()
    {
        double[] t = Enumerable.Range(0, 2001).Select(i => i * 10e-9 / 2000).ToArray();
        return new PlotSeries("V(far)", t, t.Select(Ramp).ToArray());
    }

    static ChartSpec RampChart(AxisRange? yRange, string title = "Delayed ramp-step") =>
        new(title, "Time", "s", [new ChartPanel("Voltage", "V", [RampSeries()]) { YRange = yRange }]);

    [Fact]
    public void Png_has_the_requested_size()
    {
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(RampChart(null), W, H));
        Assert.Equal((W, H), (bmp.Width, bmp.Height));
    }

    [Fact]
    public void Ramp_step_trace_lies_on_the_expected_rows()
    {
        ChartSpec spec = RampChart(new AxisRange(-0.25, 1.25));
        ChartGeometry g = XyChart.Layout(spec, W, H).Panels[0].Geometry;
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(spec, W, H));
        SKRect r = g.PlotArea;
        foreach (double t in new[] { 1e-9, 2.25e-9, 5e-9, 9e-9 })
        {
            int col = (int)g.XToPixel(t);
            // By hand: x maps linearly 0..10 ns onto left..right; y maps −0.25..1.25 V onto bottom..top.
            Assert.Equal(r.Left + t / 10e-9 * r.Width, col, 1.0);
            // The pixel column covers a small time span; on the steep edge take the time at its centre.
            double tc = (col + 0.5 - r.Left) / r.Width * 10e-9;
            double handRow = r.Bottom - (Ramp(tc) + 0.25) / 1.5 * r.Height;
            double seen = PngProbe.MeanRowOf(bmp, col, Blue, (int)r.Top, (int)r.Bottom);
            Assert.False(double.IsNaN(seen), $"no trace pixels in column {col} (t = {t} s)");
            Assert.InRange(seen, handRow - 3, handRow + 3);
            Assert.InRange(g.YToPixel(Ramp(tc)), handRow - 0.01, handRow + 0.01);
        }
    }

    [Fact]
    public void One_volt_row_is_above_zero_volt_row_by_the_fitted_fraction_of_the_plot()
    {
        // Fitted range is the data 0..1 V plus 5 % head-room each side, so 1 V spans 1/1.1 of the plot height.
        ChartSpec spec = RampChart(null);
        ChartGeometry g = XyChart.Layout(spec, W, H).Panels[0].Geometry;
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(spec, W, H));
        SKRect r = g.PlotArea;
        double row0 = PngProbe.MeanRowOf(bmp, (int)g.XToPixel(1e-9), Blue, (int)r.Top, (int)r.Bottom);
        double row1 = PngProbe.MeanRowOf(bmp, (int)g.XToPixel(8e-9), Blue, (int)r.Top, (int)r.Bottom);
        Assert.True(row1 < row0, "1 V must be drawn above 0 V");
        Assert.Equal(1 / 1.1, (row0 - row1) / r.Height, 0.015);
    }

    [Fact]
    public void Title_legend_and_axis_text_are_drawn()
    {
        ChartSpec spec = RampChart(null);
        ChartLayout layout = XyChart.Layout(spec, W, H);
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(spec, W, H));
        Assert.True(PngProbe.InkCount(bmp, layout.TitleBox) > 30, "title");
        Assert.True(PngProbe.InkCount(bmp, layout.Panels[0].LegendBox) > 30, "legend");
        Assert.True(PngProbe.InkCount(bmp, layout.Panels[0].YTickLabelBox) > 30, "Y tick numbers");
        Assert.True(PngProbe.InkCount(bmp, layout.Panels[0].YTitleBox) > 30, "Y title");
        Assert.True(PngProbe.InkCount(bmp, layout.XTickLabelBox) > 30, "X tick numbers");
        Assert.True(PngProbe.InkCount(bmp, layout.XTitleBox) > 30, "X title");

        // The same box stays blank when there is no title: the check can fail.
        ChartSpec untitled = RampChart(null, title: "");
        using SKBitmap blank = PngProbe.Decode(XyChart.RenderPng(untitled, W, H));
        Assert.Equal(0, PngProbe.InkCount(blank, new SKRect(layout.TitleBox.Left, 0, layout.TitleBox.Right, XyChart.Layout(untitled, W, H).TitleBox.Bottom)));
    }

    [Fact]
    public void Stacked_panels_share_the_x_mapping_and_the_lower_panel_is_below()
    {
        PlotSeries s = RampSeries();
        var spec = new ChartSpec("V and I", "Time", "s", [
            new ChartPanel("Voltage", "V", [s]),
            new ChartPanel("Current", "A", [s with { Name = "I", Y = s.Y.Select(v => v / 50).ToArray() }]) { HeightWeight = 0.5 }]);
        ChartLayout layout = XyChart.Layout(spec, W, H);
        ChartGeometry upper = layout.Panels[0].Geometry, lower = layout.Panels[1].Geometry;
        Assert.Equal(upper.XToPixel(3e-9), lower.XToPixel(3e-9));
        Assert.True(lower.PlotArea.Top > upper.PlotArea.Bottom);
        Assert.Equal(0.5, lower.PlotArea.Height / upper.PlotArea.Height, 0.1);
        Assert.Equal("Current [mA]", lower.Y.Title);
    }

    [Theory]
    [InlineData(3)]
    [InlineData(5)] // more than four traces: dashed, which the SVG writer emits as a filled outline
    public void Svg_is_xml_with_one_path_per_trace(int traceCount)
    {
        PlotSeries s = RampSeries();
        var series = Enumerable.Range(0, traceCount).Select(k => s with { Name = $"trace {k}", Y = s.Y.Select(v => v * (1 + 0.1 * k)).ToArray() }).ToList();
        var spec = new ChartSpec("Traces", "Time", "s", [new ChartPanel("Voltage", "V", series)]);
        XDocument doc = XDocument.Parse(XyChart.RenderSvg(spec, W, H));
        XNamespace svg = "http://www.w3.org/2000/svg";
        var paths = doc.Descendants(svg + "path").ToList();
        for (int k = 0; k < traceCount; k++)
        {
            string hex = "#" + Palette.TraceColour(k).ToString()[3..]; // SKColor prints #AARRGGBB
            int n = paths.Count(p => string.Equals((string?)p.Attribute("stroke"), hex, StringComparison.OrdinalIgnoreCase)
                                  || string.Equals((string?)p.Attribute("fill"), hex, StringComparison.OrdinalIgnoreCase));
            Assert.Equal(1, n);
        }
        Assert.NotEmpty(doc.Descendants(svg + "text"));
    }

    [Fact]
    public void Mismatched_series_lengths_are_refused()
    {
        var spec = new ChartSpec("", "Time", "s", [new ChartPanel("V", "V", [new PlotSeries("bad", [0, 1, 2], [0, 1])])]);
        Assert.Throws<ArgumentException>(() => XyChart.RenderPng(spec, W, H));
    }
}
