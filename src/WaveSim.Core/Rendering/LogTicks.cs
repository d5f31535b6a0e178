namespace WaveSim.Core.Rendering;

/// <summary>
/// Ticks of a logarithmic axis. Rules (common practice, no source), tried in order:
/// <list type="number">
/// <item>Below two decades, or when fewer than three decade values fall inside, 1, 2 and 5 × each decade first (as in
/// item 3) when they fit: two decade labels alone leave the axis nearly unreadable.</item>
/// <item>Decades (1, 10, 100 … × the unit), every k-th decade when there are more decades than label slots; at least two must
/// fall inside the range. When every decade is labelled, 2..9 × each decade are minor ticks; otherwise the unlabelled
/// decades are.</item>
/// <item>1, 2 and 5 × each decade, when at least two fall inside and neighbours are at least one label slot apart;
/// the other whole multiples (3, 4, 6 … 9) are minor ticks.</item>
/// <item>For less than about a decade: evenly stepped ticks of 1, 2 or 5 × 10^k (<see cref="NiceTicks.Within"/>), the
/// densest whose closest neighbours (at the top end of a log axis) are still one label slot apart, placed logarithmically.</item>
/// </list>
/// A label slot is 1/<c>maxIntervals</c> of the axis length.
/// </summary>
public static class LogTicks
{
    const double Eps = 1e-9;

    /// <summary>Labelled (major) and unlabelled (minor) ticks inside [min, max], both ascending.</summary>
    /// <param name="min">Axis start, greater than 0.</param>
    /// <param name="max">Axis end, greater than <paramref name="min"/>.</param>
    /// <param name="maxIntervals">Label slots across the axis (at least 1): neighbouring labels stay 1/maxIntervals of it apart.</param>
    /// <exception cref="ArgumentOutOfRangeException">The range is not finite and positive with max &gt; min, or maxIntervals &lt; 1.</exception>
    public static (double[] Major, double[] Minor) Within(double min, double max, int maxIntervals)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max) || !(min > 0) || !(max > min))
            throw new ArgumentOutOfRangeException(nameof(min), $"A logarithmic axis needs 0 < min < max (finite); got {min}..{max}.");
        if (maxIntervals < 1) throw new ArgumentOutOfRangeException(nameof(maxIntervals), "Must be at least 1.");
        double lo = Math.Log10(min), hi = Math.Log10(max), span = hi - lo;
        double slot = 1.0 / maxIntervals;
        int eLo = (int)Math.Floor(lo + Eps), eHi = (int)Math.Floor(hi + Eps);

        var oneTwoFive = Multiples(eLo, eHi, [1, 2, 5], min, max);
        bool oneTwoFiveFits = oneTwoFive.Length >= 2 && SmallestGap(oneTwoFive, span) >= slot * (1 - Eps);
        double[] OneTwoFiveMinor() => Multiples(eLo, eHi, [3, 4, 6, 7, 8, 9], min, max);
        int decadesInside = Multiples(eLo, eHi, [1], min, max).Length;
        if ((span < 2 - Eps || decadesInside < 3) && oneTwoFiveFits) return (oneTwoFive, OneTwoFiveMinor());

        // Decades, every k-th one so that labels keep a slot apart.
        int k = Math.Max(1, (int)Math.Ceiling(span / maxIntervals - Eps));
        var decades = Multiples(eLo, eHi, [1], min, max);
        var labelled = decades.Where(d => FloorMod(Exponent(d), k) == 0).ToArray();
        if (labelled.Length >= 2)
        {
            double[] minor = k == 1 ? Multiples(eLo, eHi, [2, 3, 4, 5, 6, 7, 8, 9], min, max) : decades.Except(labelled).ToArray();
            return (labelled, minor);
        }

        // 1-2-5 within each decade.
        if (oneTwoFiveFits) return (oneTwoFive, OneTwoFiveMinor());

        // Even 1-2-5 steps, log-placed: the densest that keeps a slot between neighbours.
        for (int n = 4 * maxIntervals; n >= 1; n--)
        {
            double[] even = NiceTicks.Within(min, max, n);
            if (even.Length >= 2 && SmallestGap(even, span) >= slot * (1 - Eps))
                return (even, Multiples(eLo, eHi, [1, 2, 3, 4, 5, 6, 7, 8, 9], min, max).Where(m => !even.Any(t => Same(t, m))).ToArray());
        }

        // A very short axis: the 1-2-5 ticks thinned so that none is closer than a slot to one already kept, decades first.
        var kept = new List<double>();
        foreach (double t in oneTwoFive.OrderBy(t => Mantissa(t) == 1 ? 0 : Mantissa(t) == 5 ? 1 : 2))
            if (kept.All(o => Math.Abs(Math.Log10(t / o)) / span >= slot * (1 - Eps))) kept.Add(t);
        kept.Sort();
        return (kept.ToArray(), []);
    }

    /// <summary>m × 10^e for every e in [eLo, eHi] and m in <paramref name="mantissas"/>, inside [min, max], ascending.</summary>
    static double[] Multiples(int eLo, int eHi, int[] mantissas, double min, double max)
    {
        var list = new List<double>();
        for (int e = eLo; e <= eHi; e++)
            foreach (int m in mantissas)
            {
                double v = Scaled(m, e);
                if (v >= min * (1 - Eps) && v <= max * (1 + Eps)) list.Add(v);
            }
        return list.ToArray();
    }

    /// <summary>The smallest distance between neighbours as a fraction of a log axis spanning <paramref name="span"/> decades.</summary>
    static double SmallestGap(double[] ticks, double span)
    {
        double gap = double.PositiveInfinity;
        for (int i = 1; i < ticks.Length; i++) gap = Math.Min(gap, Math.Log10(ticks[i] / ticks[i - 1]) / span);
        return gap;
    }

    static int Exponent(double v) => (int)Math.Floor(Math.Log10(v) + Eps);

    static double Mantissa(double v) => Math.Round(v / Scaled(1, Exponent(v)), 9);

    static bool Same(double a, double b) => Math.Abs(a - b) <= Eps * Math.Max(Math.Abs(a), Math.Abs(b));

    static int FloorMod(int a, int k) => ((a % k) + k) % k;

    // Division for negative exponents keeps 10^-12 exact to the last bit (1 / 1e12), as in NiceTicks.
    static double Scaled(double mantissa, int exponent) =>
        exponent >= 0 ? mantissa * Math.Pow(10, exponent) : mantissa / Math.Pow(10, -exponent);
}
