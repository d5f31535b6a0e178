using System.Numerics;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Recognises a capacitive or inductive far end: the reflection's exponential approach from −1 to +1 (a C to ground,
/// τ = Z·C) or from +1 to −1 (an L to ground, τ = L/Z), instead of peeling it into segments.
/// </summary>
/// <remarks>
/// <para>Models: <see cref="LumpedResponse.End"/>. The end's reflection starts at a change of level (a departure from a
/// settled level, found as <see cref="LumpedDiscontinuities"/> finds one, outside the lumped excursions); the changes are
/// tried from the last back (a later one can be a ghost inside the end's own approach, up to eight of them). From the change
/// to the end of the record the trace is fitted, as (ρ − ρ_b)/(1 − ρ_b²) on the line of the level ρ_b before it,
/// by both models with the arrival time and τ free (<see cref="BoundedLeastSquares"/>). The edge reaching the end has passed
/// the parts before it, which slowed it: the model first passes it through their transmission out and back
/// (<see cref="LumpedResponse.TransmissionPoles"/>); if that does not fit, through a first-order low-pass τf fitted between 0
/// and four ramp lengths instead (loss, or parts too faint to be found).</para>
/// <para>Acceptance (common practice, no source): τ at least half the edge's 10-90 % rise time (a shorter one cannot be told
/// from an open or a short at this edge, which is what the profile then reports), and an RMS residual of at most 2 % of the
/// swing of 2 plus twice the noise.</para>
/// </remarks>
internal static class ReactiveEndFit
{
    /// <summary>Longest tail fitted, layers: a reactive end's approach is the last thing in a record, never most of it.</summary>
    const int MaxLayers = 2000;

    /// <summary>A recognised end.</summary>
    /// <param name="Capacitive">C to ground (true) or L to ground (false).</param>
    /// <param name="ArrivalS">Round-trip time of the end, s, including the delay τf of the fitted low-pass (the delay of the
    /// parts before the end, which the caller removes).</param>
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
    /// <param name="poles">The transmission poles of the parts of each of <paramref name="lumped"/>
    /// (<see cref="LumpedResponse.TransmissionPoles"/>).</param>
    internal static Outcome? Find(double[] rho, double dt, double ramp, double rise, double z0, double threshold, double sigma,
        IReadOnlyList<LumpedDiscontinuity> lumped, IReadOnlyList<IReadOnlyList<Complex>> poles)
    {
        // Latest first: a later change may be a ghost (the end's reflection bounced off a part before it) inside the end's
        // own approach; if that one does not fit, the one before it may.
        foreach (var (start, baseline) in Enumerable.Reverse(LevelChanges(rho, threshold, lumped)).Take(8))
        {
            // The edge first through the transmission of the parts before, out and back (exact for each part on a matched
            // line); then through a free first-order low-pass (loss, or parts too faint to be found) if that does not fit.
            var passed = lumped.SelectMany((e, i) => e.EndIndex < start ? poles[i].Concat(poles[i].Select(p => p * (1 + LumpedResponse.TwinPoleOffset))) : []).ToList();
            var found = FitFrom(rho, start, baseline, dt, ramp, rise, z0, sigma, passed)
                        ?? FitFrom(rho, start, baseline, dt, ramp, rise, z0, sigma, null);
            if (found is not null)
                return found;
        }
        return null;
    }

    static Outcome? FitFrom(double[] rho, int start, double baseline, double dt, double ramp, double rise, double z0, double sigma,
        IReadOnlyList<Complex>? passed)
    {
        if (Math.Abs(baseline) >= 0.9) return null;
        double scale = 1 - baseline * baseline;
        int lo = Math.Max(0, start - 3), m = rho.Length - lo;
        if (m < 6 || m > MaxLayers) return null;   // a tail that long is not one end's approach (and would cost)
        var y = new double[m];
        for (int i = 0; i < m; i++) y[i] = (rho[lo + i] - baseline) / scale;
        double tStart = start * dt, span = m * dt;
        // The edge reaching the end has passed every part before it and is slower than the instrument's: a first-order
        // low-pass τf on top of the instrument's ramp stands for that slowing, and is fitted too.
        // The arrival is that of the edge before the filter, earlier than the onset by up to the filter's delay.
        double filterDelay = passed is null ? 4 * ramp : passed.Sum(p => (-1 / p).Real);
        double[] lower = [Math.Max(0, tStart - 3 * ramp - dt - filterDelay), ramp / 20, 0], upper = [tStart + 4 * ramp, 100 * span, 4 * ramp];
        if (passed is not null)
        {
            lower = lower[..2];
            upper = upper[..2];
        }

        Outcome? best = null;
        double bestRms = double.PositiveInfinity;
        foreach (bool capacitive in new[] { true, false })
        {
            double[] Residual(double[] x)
            {
                var response = LumpedResponse.End(capacitive, x[1]);
                if (passed is null) response = LumpedResponse.Filtered(response, x[2]);
                else foreach (Complex p in passed) response = LumpedResponse.Filtered(response, p);
                double[] model = LumpedResponse.Layers(response, x[0], ramp, dt, lo, m);
                for (int i = 0; i < m; i++) model[i] -= y[i];
                return model;
            }
            foreach (double tau0 in new[] { ramp, 4 * ramp, span / 4, span })
            foreach (double ts0 in new[] { tStart - ramp / 2, tStart, tStart + ramp, tStart - filterDelay })
            {
                double[] x0 = [Math.Clamp(ts0, lower[0] + 1e-3 * ramp, upper[0] - 1e-3 * ramp), Math.Clamp(tau0, 2 * lower[1], upper[1] / 2), ramp / 4];
                if (passed is not null) x0 = x0[..2];
                LeastSquaresResult f;
                try { f = BoundedLeastSquares.Fit(Residual, x0, lower, upper, 300); }
                catch (NumericalException) { continue; }
                if (f.RmsResidual < bestRms)
                {
                    bestRms = f.RmsResidual;
                    double z = StepReflectometry.ImpedanceOf(baseline, z0);
                    // The filter delays the edge by τf (or by the parts' 2·Στ), which the caller takes off again for the parts
                    // found before the end.
                    double delay = passed is null ? f.Values[2] : filterDelay;
                    best = new Outcome(capacitive, f.Values[0] + delay, f.Values[1], z, Math.Max(1, Math.Min(start, (int)Math.Floor((f.Values[0] - ramp / 2) / dt))));
                }
            }
        }
        if (best is null || best.TauS < rise / 2 || bestRms * scale > 0.04 + 2 * sigma) return null;
        return best;
    }

    /// <summary>Every departure from a settled level outside the lumped excursions: its first layer and that level.</summary>
    static List<(int Start, double Baseline)> LevelChanges(double[] rho, double threshold, IReadOnlyList<LumpedDiscontinuity> lumped)
    {
        var found = new List<(int, double)>();
        int lastTested = int.MinValue;
        for (int i = 3 + LumpedDiscontinuities.Gap; i < rho.Length; i++)
        {
            // With the baseline two layers back (as for lumped parts), an edge slowed by the parts it passed is still caught
            // at its onset. A slow approach can pass for a run of departures too; a run counts once, at its first layer, and
            // the fit rejects it.
            if (!LumpedDiscontinuities.Departs(rho, i, threshold, out double baseline)
                || lumped.Any(e => i >= e.StartIndex - 3 && i <= e.EndIndex + 3))
                continue;
            bool continues = i <= lastTested + 3;
            lastTested = i;
            if (continues) continue;
            found.Add((LumpedDiscontinuities.Onset(rho, i, baseline, threshold / 2), baseline));
        }
        return found;
    }
}
