namespace WaveSim.Core.Measurements;

/// <summary>
/// Finds short dips and bumps in a reflection step response (ρ against round-trip time) and sizes them as a
/// shunt capacitance or a series inductance from their area.
/// </summary>
/// <remarks>
/// <para>Derivation (by Laplace transform, as in Bogatin's TDR chapter; tests/WaveSim.Tests/ReferenceData/published-checks.md §11, "TDR relations"). A shunt C on a line matched at Z0 loads it with
/// Z0 ∥ 1/(sC) = Z0 / (1 + sCZ0), so Γ(s) = (Z - Z0)/(Z + Z0) = -sCZ0 / (2 + sCZ0) = -sτ/(1 + sτ), τ = Z0·C/2.
/// The step response is ρ(t) = -exp(-t/τ), whose area ∫ρ dt = Γ(s)/s at s = 0 = -τ, so C = -2·A/Z0.
/// A series L gives Z = Z0 + sL, Γ = sτ/(1 + sτ), τ = L/(2·Z0), area +τ, so L = 2·Z0·A.
/// The measured trace is ρ convolved with the unit-area derivative of the normalised incident edge, which keeps
/// the area: the estimate does not depend on the rise time.</para>
/// <para>On a stretch whose level is ρ_b (impedance Z1 = Z0(1+ρ_b)/(1-ρ_b)) the element reflects -Z1·C/2 (or
/// L/(2·Z1)) locally, seen through the step into Z1 and back scaled by (1+ρ_b)(1-ρ_b); so C = -2·A / (Z0 (1+ρ_b)²)
/// and L = 2·Z0·A / (1-ρ_b)². This first-order correction ignores multiple reflections between earlier steps.</para>
/// <para>Detection: an excursion is found where ρ leaves the baseline (the mean of three samples that agree within half
/// the threshold, ending two samples before) by more than the threshold; it starts at the first sample after the baseline
/// that is more than half the threshold from it, and ends where three samples in a row are back within half the threshold
/// of that baseline. If it does not return within the allowed width it
/// is a change of impedance, not a lumped element, and is skipped.</para>
/// </remarks>
public static class LumpedDiscontinuities
{
    const int QuietRun = 3;

    /// <summary>Samples between the baseline and the sample tested against it.</summary>
    internal const int Gap = 2;

    /// <summary>Finds lumped discontinuities in a reflection step response.</summary>
    /// <param name="rho">Reflection step response ρ = v_r / v_inc, evenly sampled, sample 0 at the reference plane.</param>
    /// <param name="sampleSeconds">Sample interval, s. Must be positive.</param>
    /// <param name="referenceOhms">Reference impedance Z0, Ω. Must be positive.</param>
    /// <param name="velocityMetresPerSecond">Propagation velocity, m/s, for the distances. Must be positive.</param>
    /// <param name="threshold">Smallest |ρ - baseline| that starts an excursion. Default 0.01; set it above the noise. Must be positive.</param>
    /// <param name="maxWidthSamples">Longest excursion still taken as lumped, samples. Default 64. Must be at least 1.</param>
    /// <returns>The discontinuities in order of time.</returns>
    public static IReadOnlyList<LumpedDiscontinuity> Find(double[] rho, double sampleSeconds, double referenceOhms,
        double velocityMetresPerSecond, double threshold = 0.01, int maxWidthSamples = 64)
    {
        ArgumentNullException.ThrowIfNull(rho);
        RequirePositive(sampleSeconds, "sample interval", "s");
        RequirePositive(referenceOhms, "reference impedance", "ohm");
        RequirePositive(velocityMetresPerSecond, "velocity", "m/s");
        RequirePositive(threshold, "detection threshold", "");
        if (maxWidthSamples < 1)
            throw new InputException($"the largest lumped width must be at least 1 sample, got {maxWidthSamples}");

        var found = new List<LumpedDiscontinuity>();
        double quiet = threshold / 2;
        int i = QuietRun + Gap;
        while (i < rho.Length)
        {
            if (!Departs(rho, i, threshold, out double baseline))
            {
                i++;
                continue;
            }
            int start = Onset(rho, i, baseline, quiet);
            int end = FindReturn(rho, i, baseline, quiet, maxWidthSamples);
            if (end < 0)
            {
                i++;
                continue;
            }

            double area = 0;
            int extreme = start;
            for (int k = start; k <= end; k++)
            {
                double d = rho[k] - baseline;
                area += d * sampleSeconds;
                if (Math.Abs(d) > Math.Abs(rho[extreme] - baseline))
                    extreme = k;
            }
            double t = extreme * sampleSeconds;
            double distance = velocityMetresPerSecond * t / 2;
            found.Add(area < 0
                ? new LumpedDiscontinuity(LumpedKind.ShuntCapacitance, t, distance, area,
                    -2 * area / (referenceOhms * (1 + baseline) * (1 + baseline)), start, end, baseline)
                : new LumpedDiscontinuity(LumpedKind.SeriesInductance, t, distance, area,
                    2 * referenceOhms * area / ((1 - baseline) * (1 - baseline)), start, end, baseline));
            i = end + 1 + QuietRun;
        }
        return found;
    }

    /// <summary>
    /// True when sample <paramref name="i"/> is more than <paramref name="threshold"/> from a settled baseline: the mean of
    /// three samples that agree within half the threshold, taken <see cref="Gap"/> samples before it, so that the first
    /// layers of a gradual onset (an edge spans about 2.5 layers of half its rise time) do not drag the baseline along.
    /// </summary>
    /// <param name="rho">The trace.</param>
    /// <param name="i">The sample tested; at least 3 + <paramref name="gap"/>.</param>
    /// <param name="threshold">The detection threshold.</param>
    /// <param name="baseline">The mean of the three baseline samples.</param>
    /// <param name="gap">Samples skipped between the baseline and <paramref name="i"/>.</param>
    internal static bool Departs(double[] rho, int i, double threshold, out double baseline, int gap = Gap)
    {
        double quiet = threshold / 2;
        int b = i - gap;
        baseline = (rho[b - 1] + rho[b - 2] + rho[b - 3]) / 3;
        bool settled = Math.Abs(rho[b - 1] - baseline) <= quiet && Math.Abs(rho[b - 2] - baseline) <= quiet
                                                                 && Math.Abs(rho[b - 3] - baseline) <= quiet;
        return settled && Math.Abs(rho[i] - baseline) > threshold;
    }

    /// <summary>The first sample after the baseline that leaves it by more than <paramref name="quiet"/>.</summary>
    internal static int Onset(double[] rho, int i, double baseline, double quiet)
    {
        int start = i;
        for (int k = i - Gap; k < i; k++)
            if (Math.Abs(rho[k] - baseline) > quiet) { start = k; break; }
        return start;
    }

    /// <summary>Last sample of the excursion starting at <paramref name="start"/>, or -1 if it does not come back in time.</summary>
    static int FindReturn(double[] rho, int start, double baseline, double quiet, int maxWidth)
    {
        int run = 0;
        int limit = Math.Min(rho.Length, start + maxWidth + QuietRun);
        for (int k = start + 1; k < limit; k++)
        {
            run = Math.Abs(rho[k] - baseline) <= quiet ? run + 1 : 0;
            if (run == QuietRun)
                return k - QuietRun;
        }
        return -1;
    }

    static void RequirePositive(double x, string what, string unit)
    {
        if (!(x > 0) || double.IsInfinity(x))
            throw new InputException($"the {what} must be positive, got {x} {unit}".TrimEnd());
    }
}
