using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

/// <summary>
/// The axis code takes any finite range (issue 14): a span of 1e-308 made the 1-2-5 step underflow to 0 and the tick
/// array's size absurd (IndexOutOfRange); −1e308..1e308 has an infinite max − min. What must hold is the contract of
/// <see cref="NiceTicks"/> and <see cref="AxisScale"/> (common practice, no source): finite, increasing ticks, those of
/// Within inside the range, a finite positive step, and positions in 0..1.
/// </summary>
public class ExtremeSpanTests
{
    [Theory]
    [InlineData(0, 1e-308)]
    [InlineData(1, 1 + 1e-308)]          // rounds to 1..1: refused below as max == min
    [InlineData(0, 5e-324)]              // the smallest positive double
    [InlineData(-1e-310, 1e-310)]
    [InlineData(0, 1e-300)]
    [InlineData(-1e308, 1e308)]          // max − min overflows
    [InlineData(-1.7e308, 1.7e308)]
    [InlineData(1e300, 1e301)]
    [InlineData(0, double.MaxValue)]
    public void Any_finite_range_gets_finite_increasing_ticks(double min, double max)
    {
        if (!(max > min)) { Assert.Throws<ArgumentException>(() => NiceTicks.Within(min, max, 5)); return; }
        foreach (int n in new[] { 1, 2, 5, 10 })
        {
            double[] within = NiceTicks.Within(min, max, n), covering = NiceTicks.Covering(min, max, n);
            Assert.NotEmpty(covering);
            Assert.All(within.Concat(covering), t => Assert.True(double.IsFinite(t), $"tick {t}"));
            for (int i = 1; i < within.Length; i++) Assert.True(within[i] > within[i - 1]);
            for (int i = 1; i < covering.Length; i++) Assert.True(covering[i] > covering[i - 1]);
            Assert.All(within, t => Assert.InRange(t, min, max));
            var axis = AxisScale.Exact("Voltage", "V", min, max, n);
            Assert.All(axis.Ticks, t => Assert.InRange(axis.Fraction(t), 0.0, 1.0));
            Assert.InRange(axis.Fraction(max), 1 - 1e-12, 1 + 1e-12);
            Assert.All(axis.Ticks, t => Assert.False(string.IsNullOrEmpty(axis.FormatTick(t))));
        }
    }
}
