using MathNet.Numerics.Statistics;
using WaveSim.Core.Tolerances;

namespace WaveSim.Tests.Tolerances;

/// <summary>The statistics of a tolerance run against published values and MathNet.Numerics as the reference library.</summary>
public class StatisticsTests
{
    [Fact]
    public void SplitMix64_gives_the_reference_outputs()
    {
        // Reference outputs of splitmix64.c (S. Vigna) for seed 1234567, as listed on Rosetta Code, "Pseudo-random numbers/Splitmix64".
        var rng = new SplitMix64(1234567);
        ulong[] expected = [6457827717110365317, 3203168211198807973, 9817491932198370423, 4593380528125082431, 16408922859458223821];
        foreach (ulong e in expected) Assert.Equal(e, rng.Next());
        // Seed 0: first output 0xE220A8397B1DCDAF (the same reference implementation).
        var zero = new SplitMix64(0);
        Assert.Equal(0xE220A8397B1DCDAFUL, zero.Next());
    }

    [Theory]
    // Worked values of the Wilson score interval (E. B. Wilson, J. Am. Stat. Assoc. 22, 1927; z = 1.96), checks section 15.
    [InlineData(8, 10, 0.490, 0.943)]
    [InlineData(0, 20, 0.000, 0.161)]
    [InlineData(20, 20, 0.839, 1.000)]
    public void Wilson_interval_matches_the_worked_values(int k, int n, double low, double high)
    {
        var w = ToleranceStatistics.Wilson(k, n);
        Assert.Equal(low, w.Low, 0.0005);
        Assert.Equal(high, w.High, 0.0005);
    }

    [Fact]
    public void Wilson_interval_matches_the_formula_computed_here()
    {
        // Independent evaluation of Wilson's formula in its other form, (2np + z² ± z√(z² + 4np(1−p))) / (2(n + z²)).
        double z = 1.959963984540054, n = 50, p = 37 / 50.0;
        double root = z * Math.Sqrt(z * z + 4 * n * p * (1 - p));
        var w = ToleranceStatistics.Wilson(37, 50);
        Assert.Equal((2 * n * p + z * z - root) / (2 * (n + z * z)), w.Low, 1e-12);
        Assert.Equal((2 * n * p + z * z + root) / (2 * (n + z * z)), w.High, 1e-12);
    }

    [Fact]
    public void Type_7_percentiles_match_hand_values_and_MathNet()
    {
        // Hyndman & Fan type 7 by hand: h = (n − 1)p; {1, 2, 3, 4} at p = 0.25 gives h = 0.75 → 1.75; the median 2.5; p = 0.99 → 3.97.
        double[] four = [4, 1, 3, 2];
        var st = ToleranceStatistics.Describe(four)!;
        Assert.Equal(2.5, st.P50, 1e-15);
        Assert.Equal(1.03, st.P1, 1e-12);
        Assert.Equal(3.97, st.P99, 1e-12);
        Assert.Equal(1.75, ToleranceStatistics.QuantileSorted([1, 2, 3, 4], 0.25), 1e-15);
        // Drawn values (fixed seed) against MathNet's descriptive statistics and its R-7 quantile.
        var rng = new SplitMix64(42);
        var x = Enumerable.Range(0, 1001).Select(_ => 3 + 2 * rng.NextNormal()).ToArray();
        var mine = ToleranceStatistics.Describe(x)!;
        var d = new DescriptiveStatistics(x);
        Assert.Equal(d.Mean, mine.Mean, 1e-12);
        Assert.Equal(d.StandardDeviation, mine.StandardDeviation, 1e-12);
        Assert.Equal(d.Minimum, mine.Min);
        Assert.Equal(d.Maximum, mine.Max);
        foreach (var (p, v) in new[] { (0.01, mine.P1), (0.5, mine.P50), (0.99, mine.P99) })
            Assert.Equal(Statistics.QuantileCustom(x, p, QuantileDefinition.R7), v, 1e-12);
    }

    [Fact]
    public void Spearman_matches_a_textbook_example_and_MathNet_with_ties()
    {
        // IQ against hours of television per week, ten people: rho = −29/165 ≈ −0.1758 (the worked example of the Wikipedia
        // article "Spearman's rank correlation coefficient", from memory; no ties, so 1 − 6Σd²/(n(n² − 1)) applies).
        double[] iq = [106, 100, 86, 101, 99, 103, 97, 113, 112, 110];
        double[] tv = [7, 27, 2, 50, 28, 29, 20, 12, 6, 17];
        Assert.Equal(-29.0 / 165, ToleranceStatistics.Spearman(iq, tv)!.Value, 1e-12);
        Assert.Equal(Correlation.Spearman(iq, tv), ToleranceStatistics.Spearman(iq, tv)!.Value, 1e-12);
        // Ties share their mean rank: against MathNet's Correlation.Spearman (which averages tied ranks).
        double[] a = [1, 2, 2, 3, 5, 5, 5, 8];
        double[] b = [2, 1, 4, 4, 3, 9, 9, 7];
        Assert.Equal(Correlation.Spearman(a, b), ToleranceStatistics.Spearman(a, b)!.Value, 1e-12);
        Assert.Equal([1, 2.5, 2.5, 4, 6, 6, 6, 8], ToleranceStatistics.Ranks(a));
        Assert.Null(ToleranceStatistics.Spearman([1, 1, 1], [1, 2, 3]));
    }

    [Fact]
    public void Draws_follow_their_distributions()
    {
        // Moments of the drawn values against the distributions' own: uniform mean (a+b)/2, sd (b−a)/√12; normal μ, σ.
        // 20,000 draws: the standard error of the mean is σ/√n ≈ 0.7 % of σ, so 3 % bounds leave room for a fixed seed.
        var u = ToleranceDistribution.Parse("uniform(10..20 ohm)", "x");
        var nrm = ToleranceDistribution.Parse("normal(5 V, 0.5 V)", "x");
        var us = new double[20000];
        var ns = new double[20000];
        for (int i = 0; i < us.Length; i++)
        {
            var rng = SplitMix64.ForSample(9, i);
            us[i] = u.Draw(ref rng);
            ns[i] = nrm.Draw(ref rng);
        }
        Assert.Equal(15, us.Mean(), 0.03 * 10 / Math.Sqrt(12));
        Assert.Equal(10 / Math.Sqrt(12), us.StandardDeviation(), 0.03 * 10 / Math.Sqrt(12));
        Assert.True(us.Min() >= 10 && us.Max() < 20);
        Assert.Equal(5, ns.Mean(), 0.03 * 0.5);
        Assert.Equal(0.5, ns.StandardDeviation(), 0.03 * 0.5);
    }
}
