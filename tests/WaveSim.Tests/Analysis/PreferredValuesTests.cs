using WaveSim.Core;
using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// E24 and E96 tables and rounding to them. Values: IEC 60063:2015, "Preferred number series for resistors
/// and capacitors" (tables from memory). Rounding in log space: the boundary between neighbours a and b is
/// √(a·b), as the series is geometric (same standard, series definition 10^(i/n)).
/// </summary>
public class PreferredValuesTests
{
    [Fact]
    public void Tables_have_the_standard_lengths_and_increase()
    {
        Assert.Equal(24, PreferredValues.E24.Count);    // IEC 60063:2015: E24 has 24 values per decade
        Assert.Equal(96, PreferredValues.E96.Count);    // IEC 60063:2015: E96 has 96 values per decade
        for (int i = 1; i < 24; i++) Assert.True(PreferredValues.E24[i] > PreferredValues.E24[i - 1]);
        for (int i = 1; i < 96; i++) Assert.True(PreferredValues.E96[i] > PreferredValues.E96[i - 1]);
    }

    [Fact]
    public void E96_is_the_rounded_geometric_series_without_exceptions()
    {
        // IEC 60063:2015: E96 value i = 10^(i/96) rounded to three figures, no exceptions (from memory).
        for (int i = 0; i < 96; i++)
            Assert.Equal((int)Math.Round(100 * Math.Pow(10, i / 96.0)), PreferredValues.E96[i]);
    }

    [Fact]
    public void E24_keeps_its_historical_exceptions()
    {
        // IEC 60063:2015: eight E24 values differ from round(10 * 10^(i/24)) (from memory).
        var differing = Enumerable.Range(0, 24)
            .Where(i => PreferredValues.E24[i] != (int)Math.Round(10 * Math.Pow(10, i / 24.0)))
            .Select(i => PreferredValues.E24[i]);
        Assert.Equal([27, 30, 33, 36, 39, 43, 47, 82], differing);
    }

    [Theory]
    [InlineData(new[] { 10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91 })]
    public void E24_matches_the_printed_table(int[] printed) // IEC 60063:2015, E24 table
        => Assert.Equal(printed, PreferredValues.E24);

    [Theory]
    [InlineData(100, 0)] [InlineData(121, 8)] [InlineData(249, 38)] [InlineData(499, 67)]
    [InlineData(590, 74)] [InlineData(909, 92)] [InlineData(976, 95)]
    public void E96_spot_values(int value, int index) => Assert.Equal(value, PreferredValues.E96[index]); // IEC 60063:2015, E96 table

    [Theory]
    [InlineData(9.95, PreferredSeries.E24, 10)]      // sqrt(9.1*10) = 9.54: rounds up into the next decade
    [InlineData(9.9, PreferredSeries.E24, 10)]
    [InlineData(97.9, PreferredSeries.E96, 97.6)]    // sqrt(97.6*100) = 98.79
    [InlineData(99, PreferredSeries.E96, 100)]
    [InlineData(35, PreferredSeries.E24, 36)]        // sqrt(33*36) = 34.47
    [InlineData(34.46, PreferredSeries.E24, 33)]     // below the geometric midpoint (the arithmetic one is 34.5)
    [InlineData(34.48, PreferredSeries.E24, 36)]
    [InlineData(35, PreferredSeries.E96, 34.8)]      // sqrt(34.8*35.7) = 35.25
    [InlineData(49.9, PreferredSeries.E96, 49.9)]
    [InlineData(47, PreferredSeries.E24, 47)]
    [InlineData(0.1, PreferredSeries.E24, 0.1)]
    [InlineData(0.098, PreferredSeries.E96, 0.0976)]
    [InlineData(990e3, PreferredSeries.E96, 1e6)]    // sqrt(976k*1M) = 987.9k
    [InlineData(987e3, PreferredSeries.E96, 976e3)]
    [InlineData(1e6, PreferredSeries.E96, 1e6)]
    [InlineData(1.04e6, PreferredSeries.E96, 1.05e6)] // sqrt(1.02M*1.05M) = 1.0349M
    [InlineData(9.6e6, PreferredSeries.E24, 10e6)]   // sqrt(9.1M*10M) = 9.54M
    [InlineData(10e6, PreferredSeries.E24, 10e6)]
    public void Nearest_rounds_in_log_space_across_decades(double ohms, PreferredSeries series, double expected)
    {
        Assert.Equal(expected, PreferredValues.Nearest(ohms, series), expected * 1e-12);
    }

    [Theory]
    [InlineData(0)] [InlineData(-5)] [InlineData(double.NaN)] [InlineData(double.PositiveInfinity)]
    public void Nearest_rejects_non_positive_values(double ohms)
        => Assert.Throws<InputException>(() => PreferredValues.Nearest(ohms, PreferredSeries.E96));
}
