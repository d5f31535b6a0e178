using SkiaSharp;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// A logarithmic scale places v at x0 + (log10 v − log10 lo)/(log10 hi − log10 lo)·width (definition of a logarithmic
// scale: common practice, no source). Tick choices (decades, 2..9 minor ticks, 1-2-5 below a decade) are common practice,
// no source; every expected tick list below is worked by hand from the rules in LogTicks.
public class LogAxisTests
{
    const int W = 600, H = 320;
    const double Pico = 1e-12, Nano = 1e-9;
    static readonly SKColor Blue = Palette.Traces[0];

    static double ByDefinition(double v, double lo, double hi, double x0, double width) =>
        x0 + (Math.Log10(v) - Math.Log10(lo)) / (Math.Log10(hi) - Math.Log10(lo)) * width;

    // y = log10(x / 1 pF) over 1 pF..1 nF: a straight line on a log X axis, from 0 at the left to 3 at the right.
    static ChartSpec LogXyChart()
    {
        double[] x = Enumerable.Range(0, 301).Select(i => Pico * Math.Pow(10, i / 100.0)).ToArray();
        return new ChartSpec("Log line", "load.c", "F", [new ChartPanel("Decades", "", [new PlotSeries("log10(C/1pF)", x, x.Select(c => Math.Log10(c / Pico)).ToArray())]) { YRange = new AxisRange(0, 3) }])
        {
            XKind = AxisKind.Logarithmic,
        };
    }

    [Theory]
    [InlineData(1e-12)]
    [InlineData(4.7e-12)]
    [InlineData(3.3e-11)]
    [InlineData(1e-10)]
    [InlineData(1e-9)]
    public void Pixel_x_on_a_log_chart_follows_the_definition_of_a_log_scale(double v)
    {
        ChartGeometry g = XyChart.Layout(LogXyChart(), W, H).Panels[0].Geometry;
        SKRect r = g.PlotArea;
        Assert.Equal(AxisKind.Logarithmic, g.X.Kind);
        Assert.Equal(ByDefinition(v, Pico, Nano, r.Left, r.Width), g.XToPixel(v), 0.01);
        Assert.Equal(v, g.PixelToX(g.XToPixel(v)), v * 1e-5); // the inverse goes back (float pixels: ~1e-7 relative)
    }

    [Fact]
    public void Decades_are_equally_spaced_and_the_geometric_mean_sits_halfway()
    {
        // Worked by hand: 1 pF..1 nF is three decades, so 10 pF and 100 pF fall at 1/3 and 2/3; √10 pF at 1/6.
        var axis = AxisScale.Logarithmic("load.c", "F", Pico, Nano, 8);
        Assert.Equal(1 / 3.0, axis.Fraction(10 * Pico), 1e-12);
        Assert.Equal(2 / 3.0, axis.Fraction(100 * Pico), 1e-12);
        Assert.Equal(1 / 6.0, axis.Fraction(Math.Sqrt(10) * Pico), 1e-12);
        Assert.Equal(Math.Sqrt(10) * Pico, axis.ValueAt(1 / 6.0), 1e-24);
    }

    [Fact]
    public void A_log_line_is_drawn_straight_across_a_log_chart()
    {
        ChartSpec spec = LogXyChart();
        ChartGeometry g = XyChart.Layout(spec, W, H).Panels[0].Geometry;
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(spec, W, H));
        SKRect r = g.PlotArea;
        foreach (double v in new[] { 2 * Pico, 10 * Pico, 50 * Pico, 300 * Pico })
        {
            int col = (int)Math.Round(ByDefinition(v, Pico, Nano, r.Left, r.Width));
            double frac = (col + 0.5 - r.Left) / r.Width; // the pixel column's centre, as a fraction of the width
            double handRow = r.Bottom - frac * r.Height;   // y = 3·frac on a 0..3 Y axis
            double seen = PngProbe.MeanRowOf(bmp, col, Blue, (int)r.Top, (int)r.Bottom);
            Assert.False(double.IsNaN(seen), $"no trace pixels in column {col} ({v} F)");
            Assert.InRange(seen, handRow - 3, handRow + 3);
        }
    }

    [Fact]
    public void Three_decades_get_prefixed_decade_labels_and_minor_ticks_at_2_to_9()
    {
        var axis = AxisScale.Logarithmic("load.c", "F", Pico, Nano, 8);
        Assert.Equal([1e-12, 1e-11, 1e-10, 1e-9], axis.Ticks);
        Assert.Equal(["1 p", "10 p", "100 p", "1 n"], axis.Ticks.Select(axis.FormatTick));
        Assert.Equal("load.c [F]", axis.Title); // the prefix is on each number, not in the title
        Assert.Equal(24, axis.MinorTicks.Count); // 2..9 in each of three decades
        Assert.Equal(2e-12, axis.MinorTicks[0], 1e-24);
        Assert.Equal(9e-10, axis.MinorTicks[^1], 1e-22);
        Assert.Equal(["4.7 p", "330 p"], new[] { 4.7e-12, 3.3e-10 }.Select(axis.FormatTick));
    }

    [Fact]
    public void Many_decades_label_every_second_decade_and_keep_the_others_as_minor_ticks()
    {
        // 1 fF..1 mF is 12 decades; 6 label slots → every 2nd decade (even exponents −14..−4), the odd ones minor.
        var axis = AxisScale.Logarithmic("load.c", "F", 1e-15, 1e-3, 6);
        Assert.Equal(["10 f", "1 p", "100 p", "10 n", "1 \u00b5", "100 \u00b5"], axis.Ticks.Select(axis.FormatTick));
        Assert.Equal(7, axis.MinorTicks.Count);
    }

    [Fact]
    public void One_to_two_decades_label_1_2_5()
    {
        // 2 pF..30 pF holds only one decade (10 pF): label 2, 5, 10, 20 pF; 3, 4, 6..9 and 30 pF are minor.
        var axis = AxisScale.Logarithmic("load.c", "F", 2 * Pico, 30 * Pico, 8);
        Assert.Equal(["2 p", "5 p", "10 p", "20 p"], axis.Ticks.Select(axis.FormatTick));
        Assert.Equal([3, 4, 6, 7, 8, 9, 30], axis.MinorTicks.Select(t => Math.Round(t / Pico, 9)));
    }

    [Fact]
    public void Under_two_decades_1_2_5_labels_win_over_two_lone_decade_labels()
    {
        // 1 pF..50 pF spans 1.7 decades but holds two decade values (1 and 10 pF): those alone would be two labels.
        var axis = AxisScale.Logarithmic("load.c", "F", Pico, 50 * Pico, 8);
        Assert.Equal(["1 p", "2 p", "5 p", "10 p", "20 p", "50 p"], axis.Ticks.Select(axis.FormatTick));
        Assert.Equal([3, 4, 6, 7, 8, 9, 30, 40], axis.MinorTicks.Select(t => Math.Round(t / Pico, 9)));
        // 33 MHz..8 GHz spans 2.4 decades with only 100 MHz and 1 GHz inside: 1-2-5 steps again, as the frequency plot needs.
        var band = AxisScale.Logarithmic("Frequency", "Hz", 33e6, 8e9, 10);
        Assert.Equal(["50 M", "100 M", "200 M", "500 M", "1 G", "2 G", "5 G"], band.Ticks.Select(band.FormatTick));
        // Three decade values inside keep decade labels.
        var decades = AxisScale.Logarithmic("Frequency", "Hz", 1e6, 1e9, 10);
        Assert.Equal(["1 M", "10 M", "100 M", "1 G"], decades.Ticks.Select(decades.FormatTick));
    }

    [Fact]
    public void Less_than_a_decade_falls_back_to_1_2_5_ticks_placed_logarithmically()
    {
        // 1 pF..5 pF: no second decade, so 1, 2, 5 pF, with 3 and 4 pF minor.
        var narrow = AxisScale.Logarithmic("load.c", "F", Pico, 5 * Pico, 8);
        Assert.Equal(["1 p", "2 p", "5 p"], narrow.Ticks.Select(narrow.FormatTick));
        Assert.Equal(Math.Log10(2) / Math.Log10(5), narrow.Fraction(2 * Pico), 1e-12);

        // 1.2 V..1.8 V: no 1-2-5 value inside, so even 0.1 V steps (0.05 V would put 1.75 and 1.8 V closer than
        // one of 8 label slots: log10(1.8/1.75)/log10(1.5) = 0.07 < 0.125), still placed by the logarithm.
        var tiny = AxisScale.Logarithmic("Level", "V", 1.2, 1.8, 8);
        Assert.Equal(["1.2", "1.3", "1.4", "1.5", "1.6", "1.7", "1.8"], tiny.Ticks.Select(tiny.FormatTick));
        Assert.Equal(Math.Log10(1.5 / 1.2) / Math.Log10(1.5), tiny.Fraction(1.5), 1e-12);
        double[] gaps = tiny.Ticks.Zip(tiny.Ticks.Skip(1), (a, b) => tiny.Fraction(b) - tiny.Fraction(a)).ToArray();
        Assert.True(gaps.Zip(gaps.Skip(1)).All(p => p.Second < p.First), "equal steps must crowd towards the top of a log axis");
    }

    [Fact]
    public void Units_without_prefixes_read_as_plain_numbers_and_powers_of_ten()
    {
        var length = AxisScale.Logarithmic("Length", "m", 1e-3, 1, 8);
        Assert.Equal(["0.001", "0.01", "0.1", "1"], length.Ticks.Select(length.FormatTick));
        Assert.Equal("Length [m]", length.Title);
        var ratio = AxisScale.Logarithmic("Ratio", "", 1, 1e6, 8);
        Assert.Equal(["1", "10", "100", "1000", "10000", "1e5", "1e6"], ratio.Ticks.Select(ratio.FormatTick));
        Assert.Equal("2e\u22125", ratio.FormatTick(2e-5));
    }

    [Fact]
    public void Data_at_or_below_zero_on_a_log_axis_is_an_error_not_a_NaN()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => AxisScale.Logarithmic("load.c", "F", 0, Nano, 8));
        var axis = AxisScale.Logarithmic("load.c", "F", Pico, Nano, 8);
        Assert.Throws<ArgumentOutOfRangeException>(() => axis.Fraction(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => axis.Fraction(-Pico));

        ChartSpec good = LogXyChart();
        var panel = good.Panels[0];
        var bad = good with { Panels = [panel with { Series = [new PlotSeries("with zero", [0, Pico, Nano], [0, 1, 2])] }] };
        var ex = Assert.Throws<ArgumentException>(() => XyChart.RenderPng(bad, W, H));
        Assert.Contains("with zero", ex.Message);
        Assert.Contains("logarithmic", ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
        Assert.Throws<ArgumentException>(() => XyChart.Layout(good with { XRange = new AxisRange(0, Nano) }, W, H));
    }

    [Fact]
    public void Linear_axes_are_unchanged_and_have_no_minor_ticks()
    {
        var axis = AxisScale.Exact("Time", "s", 0, 2e-9, 4);
        Assert.Equal(AxisKind.Linear, axis.Kind);
        Assert.Empty(axis.MinorTicks);
        Assert.Equal(0.25, axis.Fraction(0.5e-9), 1e-12);
        Assert.Equal(0.5e-9, axis.ValueAt(0.25), 1e-21);
        ChartGeometry g = XyChart.Layout(LogXyChart() with { XKind = AxisKind.Linear }, W, H).Panels[0].Geometry;
        Assert.Equal(AxisKind.Linear, g.X.Kind);
    }
}
