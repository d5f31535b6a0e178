using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// Tick and prefix rules are common practice, no source: steps of 1, 2 or 5 × 10^k, the smallest that gives at most
// the requested number of intervals; prefixes in steps of 10^3 so axis numbers run 1..999. Expected values are
// worked by hand from that rule.
public class NiceTicksTests
{
    [Theory]
    [InlineData(3.3, 8, 0.5)]     // 3.3/8 = 0.41 → 0.5
    [InlineData(3.3, 4, 1.0)]     // 0.83 → 1
    [InlineData(10e-9, 5, 2e-9)]  // 2 ns exactly fits
    [InlineData(10e-9, 4, 5e-9)]  // 2.5 ns → 5 ns
    [InlineData(0.07, 6, 0.02)]   // 0.0117 → 0.02
    [InlineData(1500, 3, 500)]
    public void Step_is_the_smallest_1_2_5_step_within_the_interval_limit(double span, int maxIntervals, double expected)
    {
        Assert.Equal(expected, NiceTicks.Step(span, maxIntervals), expected * 1e-12);
    }

    [Fact]
    public void Covering_0_to_3p3_with_8_intervals_gives_half_volt_ticks_to_3p5()
    {
        Assert.Equal([0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5], NiceTicks.Covering(0, 3.3, 8));
    }

    [Fact]
    public void Within_0_to_3p3_with_4_intervals_gives_whole_volts_to_3()
    {
        Assert.Equal([0, 1, 2, 3], NiceTicks.Within(0, 3.3, 4));
    }

    [Fact]
    public void Ticks_are_exact_decimals_and_cross_zero_cleanly()
    {
        double[] ticks = NiceTicks.Within(-0.25, 0.35, 6); // step 0.1
        Assert.Equal([-0.2, -0.1, 0, 0.1, 0.2, 0.3], ticks);
        Assert.False(double.IsNegative(ticks[2])); // no "-0" label
    }

    [Fact]
    public void Bad_ranges_are_refused()
    {
        Assert.Throws<ArgumentException>(() => NiceTicks.Within(1, 1, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => NiceTicks.Step(1, 0));
    }

    [Theory]
    [InlineData(2e-9, "n", 1e-9)]
    [InlineData(999e-12, "p", 1e-12)]
    [InlineData(1e-6, "\u00b5", 1e-6)]
    [InlineData(0.25, "m", 1e-3)]
    [InlineData(3.3, "", 1)]
    [InlineData(0.0, "", 1)]
    public void Prefix_keeps_axis_numbers_between_1_and_999(double magnitude, string symbol, double factor)
    {
        EngineeringPrefix p = EngineeringPrefix.ForMagnitude(magnitude);
        Assert.Equal(symbol, p.Symbol);
        Assert.Equal(factor, p.Factor);
    }

    [Fact]
    public void Time_axis_over_2_ns_reads_in_ns_and_current_over_20_mA_in_mA()
    {
        var time = AxisScale.Exact("Time", "s", 0, 2e-9, 4);
        Assert.Equal("Time [ns]", time.Title);
        Assert.Equal(["0.0", "0.5", "1.0", "1.5", "2.0"], time.Ticks.Select(time.FormatTick));
        var current = AxisScale.Exact("Current", "A", -0.02, 0.02, 4);
        Assert.Equal("Current [mA]", current.Title);
        Assert.Equal("\u221220", current.FormatTick(-0.02));
    }

    [Fact]
    public void Units_without_prefixes_are_left_alone()
    {
        Assert.Equal(EngineeringPrefix.None, EngineeringPrefix.ForAxis("UI", 0, 0.002));
        Assert.Equal(EngineeringPrefix.None, EngineeringPrefix.ForAxis("%", 0, 1000));
    }
}
