namespace WaveSim.Core.Measurements;

/// <summary>
/// Fits the lumped models of <see cref="LumpedResponse"/> to one excursion of a reflection trace: a series L alone, a shunt C
/// alone, and an L-C pair in either order, and keeps the pair only when both parts are resolvable.
/// </summary>
/// <remarks>
/// <para>The measured excursion is (ρ − ρ_b)/(1 − ρ_b²) on a line of Z = Z0ref(1 + ρ_b)/(1 − ρ_b): the part reflects on
/// the local line and its reflection passes the step into that line and back (first order, as in
/// <see cref="LumpedDiscontinuities"/>). Parameters: the arrival time t_s and a = L/Z, b = C·Z, fitted by
/// <see cref="BoundedLeastSquares"/> with a, b ≥ 0.</para>
/// <para>Pair or single (common practice, no source): the pair is kept when its RMS residual is at most half the best
/// single part's, the smaller part is more than three of its standard deviations from zero, and that part alone would
/// reflect at least the detection threshold (peak (τ/R)(1 − e^(−R/τ)) for a ramp of length R).</para>
/// </remarks>
internal static class LumpedFit
{
    /// <summary>The fit kept.</summary>
    /// <param name="ArrivalS">t_s, s.</param>
    /// <param name="A">L/Z, s (0 when there is no L).</param>
    /// <param name="B">C·Z, s (0 when there is no C).</param>
    /// <param name="SeriesFirst">For a pair: the L comes first.</param>
    /// <param name="Pair">Both parts resolved.</param>
    /// <param name="Rms">RMS residual in units of ρ.</param>
    internal sealed record Outcome(double ArrivalS, double A, double B, bool SeriesFirst, bool Pair, double Rms);

    const int Budget = 400;

    /// <summary>Fits layers <paramref name="first"/> … <paramref name="last"/> of <paramref name="rho"/> (a margin is added).</summary>
    /// <param name="rho">Layer ρ, layer k centred on k·dt.</param>
    /// <param name="first">First layer of the excursion.</param>
    /// <param name="last">Last layer of the excursion.</param>
    /// <param name="baseline">ρ_b, the level before it.</param>
    /// <param name="dt">Layer step, s.</param>
    /// <param name="ramp">Incident ramp length, s.</param>
    /// <param name="threshold">Smallest excursion of ρ taken as real: the smaller part of a pair must reach it on its own.</param>
    internal static Outcome Fit(double[] rho, int first, int last, double baseline, double dt, double ramp, double threshold)
    {
        int lo = Math.Max(0, first - 3), hi = Math.Min(rho.Length - 1, last + 3), m = hi - lo + 1;
        double scale = 1 - baseline * baseline;
        var y = new double[m];
        for (int i = 0; i < m; i++) y[i] = (rho[lo + i] - baseline) / scale;
        double area = y.Sum() * dt, plus = y.Where(v => v > 0).Sum() * dt, minus = -y.Where(v => v < 0).Sum() * dt;
        double span = m * dt, tFirst = first * dt;
        double tMin = Math.Max(lo * dt - ramp, tFirst - 2 * ramp - 2 * dt), tMax = tFirst + ramp;

        double[] Residual(LumpedResponse.StepResponse s, double ts)
        {
            double[] model = LumpedResponse.Layers(s, ts, ramp, dt, lo, m);
            for (int i = 0; i < m; i++) model[i] -= y[i];
            return model;
        }
        LeastSquaresResult? Best(Func<double[], double[]> residual, IEnumerable<double[]> starts, double[] lower, double[] upper)
        {
            LeastSquaresResult? best = null;
            foreach (double[] start in starts)
            {
                for (int j = 0; j < start.Length; j++) start[j] = Math.Clamp(start[j], lower[j] + 1e-3 * (upper[j] - lower[j]), upper[j] - 1e-3 * (upper[j] - lower[j]));
                try
                {
                    var f = BoundedLeastSquares.Fit(residual, start, lower, upper, Budget);
                    if (best is null || f.RmsResidual < best.RmsResidual) best = f;
                }
                catch (NumericalException) { }
            }
            return best;
        }

        double top = 4 * span;
        double[] tsStarts = [tFirst - ramp, tFirst - ramp / 2, tFirst];
        // Singles: L alone (a) and C alone (b); the arrival starts where the centroid less τ puts it, exact for a single part.
        double centroid = Centroid(y, lo, dt);
        double aStart = Math.Max(2 * Math.Max(area, plus), dt / 4), bStart = Math.Max(2 * Math.Max(-area, minus), dt / 4);
        var singleL = Best(x => Residual(LumpedResponse.Pair(x[1], 0, true), x[0]),
            tsStarts.Append(centroid - aStart / 2).Select(t => new[] { t, aStart }), [tMin, 0], [tMax, top]);
        var singleC = Best(x => Residual(LumpedResponse.Pair(0, x[1], true), x[0]),
            tsStarts.Append(centroid - bStart / 2).Select(t => new[] { t, bStart }), [tMin, 0], [tMax, top]);
        var pairs = new[] { true, false }.Select(order => (Order: order,
            Fit: Best(x => Residual(LumpedResponse.Pair(x[1], x[2], order), x[0]),
                tsStarts.Select(t => new[] { t, Math.Max(2 * plus, dt / 4), Math.Max(2 * minus, dt / 4) }), [tMin, 0, 0], [tMax, top, top])))
            .Where(p => p.Fit is not null).OrderBy(p => p.Fit!.RmsResidual).ToList();

        bool lBetter = singleC is null || (singleL is not null && singleL.RmsResidual <= singleC.RmsResidual);
        LeastSquaresResult single = (lBetter ? singleL : singleC) ?? throw new NumericalException("the lumped-element fit failed on every start");
        Outcome one = lBetter
            ? new Outcome(single.Values[0], single.Values[1], 0, true, false, single.RmsResidual * scale)
            : new Outcome(single.Values[0], 0, single.Values[1], true, false, single.RmsResidual * scale);
        if (pairs.Count == 0) return one;
        var (seriesFirst, pair) = pairs[0];
        double a = pair!.Values[1], b = pair.Values[2];
        double sa = pair.Uncertainty[1], sb = pair.Uncertainty[2];
        bool resolved = pair.RmsResidual <= 0.5 * single.RmsResidual
                        && double.IsFinite(sa) && double.IsFinite(sb) && a > 3 * sa && b > 3 * sb
                        && Peak(Math.Min(a, b) / 2, ramp) * scale >= threshold;
        return resolved ? new Outcome(pair.Values[0], a, b, seriesFirst, true, pair.RmsResidual * scale) : one;
    }

    /// <summary>Largest |ρ| of one part of time constant τ seen with a ramp of length R: (τ/R)(1 − e^(−R/τ)).</summary>
    static double Peak(double tau, double ramp) => tau <= 0 ? 0 : tau / ramp * (1 - Math.Exp(-ramp / tau));

    static double Centroid(double[] y, int lo, double dt)
    {
        double sum = 0, moment = 0;
        for (int i = 0; i < y.Length; i++) { sum += y[i]; moment += y[i] * (lo + i) * dt; }
        return sum != 0 ? moment / sum : lo * dt;
    }
}
