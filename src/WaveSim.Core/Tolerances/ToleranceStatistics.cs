namespace WaveSim.Core.Tolerances;

/// <summary>Mean, spread, percentiles, min and max of one figure over the samples where it applies.</summary>
/// <param name="Count">Samples with a value.</param>
/// <param name="Mean">Arithmetic mean.</param>
/// <param name="StandardDeviation">Sample standard deviation (divisor n − 1); 0 for one sample.</param>
/// <param name="Min">Smallest value.</param>
/// <param name="Max">Largest value.</param>
/// <param name="P1">1st percentile.</param>
/// <param name="P50">Median.</param>
/// <param name="P99">99th percentile.</param>
public sealed record FigureStatistics(int Count, double Mean, double StandardDeviation, double Min, double Max, double P1, double P50, double P99);

/// <summary>A proportion's confidence interval.</summary>
/// <param name="Low">Lower bound.</param>
/// <param name="High">Upper bound.</param>
public readonly record struct Interval(double Low, double High);

/// <summary>The statistics of a tolerance run, each by a named, published definition.</summary>
public static class ToleranceStatistics
{
    /// <summary>z of a two-sided 95 % normal interval.</summary>
    public const double Z95 = 1.959963984540054;

    /// <summary>Mean, sample standard deviation (Welford's one-pass update), min, max and the type-7 percentiles; null when empty.</summary>
    public static FigureStatistics? Describe(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0) return null;
        double mean = 0, m2 = 0;
        for (int i = 0; i < values.Count; i++)
        {
            double d = values[i] - mean;
            mean += d / (i + 1);
            m2 += d * (values[i] - mean);
        }
        var sorted = values.Order().ToArray();
        double sd = values.Count > 1 ? Math.Sqrt(m2 / (values.Count - 1)) : 0;
        return new FigureStatistics(values.Count, mean, sd, sorted[0], sorted[^1],
            QuantileSorted(sorted, 0.01), QuantileSorted(sorted, 0.5), QuantileSorted(sorted, 0.99));
    }

    /// <summary>
    /// The p-quantile of ascending <paramref name="sorted"/> by Hyndman and Fan's type 7 (R. J. Hyndman, Y. Fan, "Sample
    /// quantiles in statistical packages", The American Statistician 50, 1996): h = (n − 1)p, then linear interpolation
    /// between the values at ⌊h⌋ and ⌊h⌋ + 1 (0-based).
    /// </summary>
    public static double QuantileSorted(IReadOnlyList<double> sorted, double p)
    {
        ArgumentNullException.ThrowIfNull(sorted);
        if (sorted.Count == 0) throw new ArgumentException("no values", nameof(sorted));
        double h = (sorted.Count - 1) * Math.Clamp(p, 0, 1);
        int lo = (int)Math.Floor(h);
        return lo + 1 >= sorted.Count ? sorted[^1] : sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
    }

    /// <summary>
    /// The Wilson score interval of a proportion of <paramref name="passes"/> in <paramref name="trials"/> (E. B. Wilson,
    /// "Probable inference, the law of succession, and statistical inference", J. Am. Stat. Assoc. 22, 1927):
    /// centre (p + z²/2n)/(1 + z²/n), half-width z·√(p(1 − p)/n + z²/4n²)/(1 + z²/n), clamped to [0, 1].
    /// </summary>
    public static Interval Wilson(int passes, int trials, double z = Z95)
    {
        if (trials <= 0 || passes < 0 || passes > trials) throw new ArgumentOutOfRangeException(nameof(passes), "expected 0 <= passes <= trials, trials > 0");
        double n = trials, p = passes / n, z2 = z * z;
        double centre = (p + z2 / (2 * n)) / (1 + z2 / n);
        double half = z * Math.Sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / (1 + z2 / n);
        return new Interval(Math.Max(0, centre - half), Math.Min(1, centre + half));
    }

    /// <summary>Ranks 1..n, tied values sharing the mean of the ranks they span.</summary>
    public static double[] Ranks(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var order = Enumerable.Range(0, values.Count).OrderBy(i => values[i]).ToArray();
        var ranks = new double[values.Count];
        for (int a = 0; a < order.Length;)
        {
            int b = a;
            while (b + 1 < order.Length && values[order[b + 1]] == values[order[a]]) b++;
            double mean = (a + b) / 2.0 + 1;
            for (int k = a; k <= b; k++) ranks[order[k]] = mean;
            a = b + 1;
        }
        return ranks;
    }

    /// <summary>
    /// Spearman's rank correlation (C. Spearman, 1904): Pearson's correlation of the ranks, ties averaged. Null when fewer
    /// than two pairs or when either side is constant (no ranking to correlate).
    /// </summary>
    public static double? Spearman(IReadOnlyList<double> x, IReadOnlyList<double> y)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (x.Count != y.Count) throw new ArgumentException("x and y differ in length", nameof(y));
        if (x.Count < 2) return null;
        var rx = Ranks(x);
        var ry = Ranks(y);
        double mx = rx.Average(), my = ry.Average(), sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < rx.Length; i++)
        {
            sxy += (rx[i] - mx) * (ry[i] - my);
            sxx += (rx[i] - mx) * (rx[i] - mx);
            syy += (ry[i] - my) * (ry[i] - my);
        }
        return sxx > 0 && syy > 0 ? Math.Clamp(sxy / Math.Sqrt(sxx * syy), -1, 1) : null;
    }
}
