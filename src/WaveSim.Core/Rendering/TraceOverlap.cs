namespace WaveSim.Core.Rendering;

/// <summary>Whether two traces of a panel would be drawn on top of each other, so the legend can say so.</summary>
public static class TraceOverlap
{
    /// <summary>
    /// Traces closer than this share of the panel's Y span everywhere count as one curve on the page: 0.5 % is one or two
    /// pixels on a panel a few hundred pixels high, under the width of a trace (common practice, no source).
    /// </summary>
    public const double SpanFraction = 0.005;

    /// <summary>
    /// True when <paramref name="a"/> and <paramref name="b"/> cover nearly the same X span (their common span is at least
    /// 90 % of the span of either) and, at every finite point of either inside the common span, the other (interpolated
    /// linearly) lies within <paramref name="tolerance"/> of it.
    /// </summary>
    /// <param name="a">One trace (X ascending).</param>
    /// <param name="b">The other trace (X ascending).</param>
    /// <param name="tolerance">Largest vertical distance, in Y units, at which the two still look like one line.</param>
    public static bool Coincide(PlotSeries a, PlotSeries b, double tolerance)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!(tolerance >= 0)) return false;
        var (a0, a1) = Span(a);
        var (b0, b1) = Span(b);
        double lo = Math.Max(a0, b0), hi = Math.Min(a1, b1);
        if (!(hi > lo) || hi - lo < 0.9 * (a1 - a0) || hi - lo < 0.9 * (b1 - b0)) return false;
        return Within(a, b, lo, hi, tolerance) && Within(b, a, lo, hi, tolerance);
    }

    /// <summary>Every finite point of <paramref name="p"/> in [lo, hi] has <paramref name="q"/> within the tolerance.</summary>
    static bool Within(PlotSeries p, PlotSeries q, double lo, double hi, double tolerance)
    {
        int k = 0, compared = 0;
        for (int i = 0; i < p.X.Length; i++)
        {
            double x = p.X[i], y = p.Y[i];
            if (!double.IsFinite(x) || !double.IsFinite(y) || x < lo || x > hi) continue;
            while (k + 1 < q.X.Length && q.X[k + 1] < x) k++;
            double other = At(q, k, x);
            if (double.IsNaN(other)) continue;   // a gap in the other trace: nothing drawn there to tell apart
            if (!(Math.Abs(other - y) <= tolerance)) return false;
            compared++;
        }
        return compared >= 2;
    }

    /// <summary>q at x, interpolated between its points k and k + 1 (or its point k when x falls on it); NaN in a gap.</summary>
    static double At(PlotSeries q, int k, double x)
    {
        if (q.X.Length == 0) return double.NaN;
        if (k + 1 >= q.X.Length || x <= q.X[k]) return q.X[k] == x ? q.Y[k] : double.NaN;
        double x0 = q.X[k], x1 = q.X[k + 1], y0 = q.Y[k], y1 = q.Y[k + 1];
        if (!double.IsFinite(y0) || !double.IsFinite(y1) || !(x1 > x0)) return double.NaN;
        return y0 + (x - x0) / (x1 - x0) * (y1 - y0);
    }

    static (double Min, double Max) Span(PlotSeries s)
    {
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        for (int i = 0; i < s.X.Length; i++)
            if (double.IsFinite(s.X[i]) && double.IsFinite(s.Y[i])) { min = Math.Min(min, s.X[i]); max = Math.Max(max, s.X[i]); }
        return (min, max);
    }
}
