using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

/// <summary>
/// A nearly constant figure (a noise margin that varies by 1e-13 V over a sweep) gets an axis span of at least 0.1 % of its
/// value, so its tick numbers need a few digits, not a dozen (common practice, no source).
/// </summary>
public class NearlyFlatAxisTests
{
    [Fact]
    public void A_figure_varying_by_rounding_noise_gets_a_sensible_span_and_short_ticks()
    {
        double v = 0.45;
        var panel = new ChartPanel("rx noise margin high", "V", [new PlotSeries("margin", [1, 2, 3], [v, v + 1e-13, v - 0.5e-13])]);
        var (min, max) = XyChart.YRange(panel);
        // At least 0.1 % of 0.45 V (0.45 mV), plus the 5 % head-room each side, centred on the value.
        Assert.True(max - min >= XyChart.MinimumRelativeSpan * v, $"span {max - min}");
        Assert.Equal(v, 0.5 * (min + max), 1e-12);
        var axis = AxisScale.Exact("margin", "V", min, max, 5);
        Assert.True(axis.Ticks.Count >= 2);
        // 0.1 mV steps in mV: "449.8" ... "450.2", one decimal.
        Assert.All(axis.Ticks, t => Assert.True(axis.FormatTick(t).Length <= 6, axis.FormatTick(t)));
    }

    [Fact]
    public void A_real_small_variation_keeps_its_own_span()
    {
        // 1 mV on 0.45 V is 0.22 %, above the least span: the axis follows the data (plus the 5 % head-room).
        var panel = new ChartPanel("m", "V", [new PlotSeries("margin", [1, 2], [0.45, 0.451])]);
        var (min, max) = XyChart.YRange(panel);
        Assert.Equal(0.001 * 1.1, max - min, 1e-12);
    }
}
