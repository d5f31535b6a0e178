namespace WaveSim.Core.Fitting;

/// <summary>A coarse least-squares search for the capture's time offset against one fixed simulation, before the fit refines it.</summary>
/// <remarks>
/// Levenberg-Marquardt only walks downhill from where it starts. A 50 % crossing can sit tens of picoseconds off the best
/// alignment when the starting scenario's edge is slower or its first reflection differs, and a residual with edges in it is
/// far from quadratic beyond an edge's width. Scanning the mean square residual over a grid of offsets needs no further
/// simulation (the simulated waveform is interpolated at shifted times), so it costs nothing of the fit's budget.
/// </remarks>
internal static class OffsetSearch
{
    /// <summary>Upper bound on interpolations per search, so a long capture keeps the search quick.</summary>
    const long WorkLimit = 20_000_000;

    /// <summary>The offset within [centre − window, centre + window] that minimises the mean square of captured minus simulated.</summary>
    /// <remarks>Only offsets that leave at least half of the capture's span inside the simulated record are tried; the mean is over
    /// the samples inside. Between 101 and 1001 evenly spaced offsets, the centre among them; the centre wins ties.</remarks>
    /// <param name="simT">Simulated times, s, increasing.</param>
    /// <param name="simV">Simulated values, V.</param>
    /// <param name="capT">Captured times, s, increasing.</param>
    /// <param name="capV">Captured values, V.</param>
    /// <param name="centre">The alignment's offset, s.</param>
    /// <param name="window">Half-width of the search, s, positive.</param>
    /// <returns>The best offset, s; <paramref name="centre"/> when no offset leaves half of the capture inside.</returns>
    public static double Best(double[] simT, double[] simV, double[] capT, double[] capV, double centre, double window)
    {
        int half = (int)Math.Clamp(WorkLimit / Math.Max(1, capT.Length) / 2, 50, 500);
        double step = window / half;
        double best = centre, bestValue = MeanSquare(simT, simV, capT, capV, centre);
        for (int k = -half; k <= half; k++)
        {
            if (k == 0)
                continue;
            double offset = centre + k * step;
            double value = MeanSquare(simT, simV, capT, capV, offset);
            if (value < bestValue)
            {
                bestValue = value;
                best = offset;
            }
        }
        return best;
    }

    static double MeanSquare(double[] simT, double[] simV, double[] capT, double[] capV, double offset)
    {
        double c0 = capT[0] + offset, c1 = capT[^1] + offset;
        if (Measurements.CaptureTimeSpan.OverlapFraction(c0, c1, simT[0], simT[^1]) < Measurements.CaptureTimeSpan.MinimumOverlapFraction)
            return double.PositiveInfinity;
        double sum = 0;
        int count = 0, k = 0;
        for (int i = 0; i < capT.Length; i++)
        {
            double t = capT[i] + offset;
            if (t < simT[0] || t > simT[^1])
                continue;
            while (k + 2 < simT.Length && simT[k + 1] < t)
                k++;
            double f = (t - simT[k]) / (simT[k + 1] - simT[k]);
            double r = simV[k] + f * (simV[k + 1] - simV[k]) - capV[i];
            sum += r * r;
            count++;
        }
        return count > 0 ? sum / count : double.PositiveInfinity;
    }
}
