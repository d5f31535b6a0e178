namespace WaveSim.Core.Measurements;

/// <summary>
/// Recognises a capacitive or inductive far end: the reflection's exponential approach from −1 to +1 (a C to ground,
/// τ = Z·C) or from +1 to −1 (an L to ground, τ = L/Z), instead of peeling it into segments.
/// </summary>
/// <remarks>
/// <para>Models: <see cref="LumpedResponse.End"/>. The last change of level in the trace that does not come back (found as
/// <see cref="LumpedDiscontinuities"/> finds an excursion, but one that never returns) is where the end's reflection starts;
/// from there to the end of the record the trace is fitted, as (ρ − ρ_b)/(1 − ρ_b²) on the line of the level ρ_b before it,
/// by both models with the arrival time and τ free (<see cref="BoundedLeastSquares"/>).</para>
/// <para>Acceptance (common practice, no source): τ at least half the edge's 10-90 % rise time (a shorter one cannot be told
/// from an open or a short at this edge, which is what the profile then reports), and an RMS residual of at most 2 % of the
/// swing of 2 plus twice the noise.</para>
/// </remarks>
internal static class ReactiveEndFit
{
    /// <summary>A recognised end.</summary>
    /// <param name="Capacitive">C to ground (true) or L to ground (false).</param>
    /// <param name="ArrivalS">Round-trip time of the end, s.</param>
    /// <param name="TauS">Fitted τ, s.</param>
    /// <param name="LineOhms">Impedance of the line at the end, Ω.</param>
    /// <param name="FirstLayer">First layer that belongs to the end's reflection.</param>
    internal sealed record Outcome(bool Capacitive, double ArrivalS, double TauS, double LineOhms, int FirstLayer)
    {
        /// <summary>C = τ/Z in farads, or L = τ·Z in henries.</summary>
        public double Value => Capacitive ? TauS / LineOhms : TauS * LineOhms;
    }

    /// <summary>Looks for a reactive end in <paramref name="rho"/>; null when there is none.</summary>
    /// <param name="rho">Layer ρ, layer k centred on k·dt.</param>
    /// <param name="dt">Layer step, s.</param>
    /// <param name="ramp">Incident ramp length, s.</param>
    /// <param name="rise">10-90 % rise time, s.</param>
    /// <param name="z0">Reference impedance, Ω.</param>
    /// <param name="threshold">Detection threshold in ρ.</param>
    /// <param name="sigma">Noise of one layer's ρ.</param>
    /// <param name="lumped">Excursions taken as lumped parts (a start inside one is not the end).</param>
    internal static Outcome? Find(double[] rho, double dt, double ramp, double rise, double z0, double threshold, double sigma,
        IReadOnlyList<LumpedDiscontinuity> lumped)
    {
        int start = LastLevelChange(rho, threshold, lumped);
        if (start < 0) return null;
        double baseline = (rho[start - 1] + rho[start - 2] + rho[start - 3]) / 3;
        if (Math.Abs(baseline) >= 0.9) return null;
        double scale = 1 - baseline * baseline;
        int lo = Math.Max(0, start - 3), m = rho.Length - lo;
        if (m < 6) return null;
        var y = new double[m];
        for (int i = 0; i < m; i++) y[i] = (rho[lo + i] - baseline) / scale;
        double tStart = start * dt, span = m * dt;
        double[] lower = [Math.Max(0, tStart - 2 * ramp - dt), ramp / 20], upper = [tStart + ramp, 100 * span];

        Outcome? best = null;
        double bestRms = double.PositiveInfinity;
        foreach (bool capacitive in new[] { true, false })
        {
            double[] Residual(double[] x)
            {
                double[] model = LumpedResponse.Layers(LumpedResponse.End(capacitive, x[1]), x[0], ramp, dt, lo, m);
                for (int i = 0; i < m; i++) model[i] -= y[i];
                return model;
            }
            foreach (double tau0 in new[] { ramp, 4 * ramp, span / 4, span })
            foreach (double ts0 in new[] { tStart - ramp / 2, tStart })
            {
                double[] x0 = [Math.Clamp(ts0, lower[0] + 1e-3 * ramp, upper[0] - 1e-3 * ramp), Math.Clamp(tau0, 2 * lower[1], upper[1] / 2)];
                FitResult f;
                try { f = BoundedLeastSquares.Fit(Residual, x0, lower, upper, 300); }
                catch (NumericalException) { continue; }
                if (f.RmsResidual < bestRms)
                {
                    bestRms = f.RmsResidual;
                    double z = StepReflectometry.ImpedanceOf(baseline, z0);
                    best = new Outcome(capacitive, f.Values[0], f.Values[1], z, Math.Max(1, (int)Math.Floor((f.Values[0] - ramp / 2) / dt)));
                }
            }
        }
        if (best is null || best.TauS < rise / 2 || bestRms * scale > 0.04 + 2 * sigma) return null;
        return best;
    }

    /// <summary>Start of the last departure from a settled level that never returns to it, outside the lumped excursions; -1 if none.</summary>
    static int LastLevelChange(double[] rho, double threshold, IReadOnlyList<LumpedDiscontinuity> lumped)
    {
        double quiet = threshold / 2;
        int last = -1;
        for (int i = 3; i < rho.Length; i++)
        {
            double baseline = (rho[i - 1] + rho[i - 2] + rho[i - 3]) / 3;
            bool settled = Math.Abs(rho[i - 1] - baseline) <= quiet && Math.Abs(rho[i - 2] - baseline) <= quiet
                                                                     && Math.Abs(rho[i - 3] - baseline) <= quiet;
            if (!settled || Math.Abs(rho[i] - baseline) <= threshold || lumped.Any(e => i >= e.StartIndex - 3 && i <= e.EndIndex + 3))
                continue;
            last = i;
        }
        return last;
    }
}
