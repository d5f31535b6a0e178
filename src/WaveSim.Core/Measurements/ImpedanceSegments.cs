namespace WaveSim.Core.Measurements;

/// <summary>Groups the layers of an <see cref="ImpedanceProfile"/> into segments of one impedance each.</summary>
public static class ImpedanceSegments
{
    /// <summary>
    /// Joins consecutive layers whose impedance stays within <paramref name="toleranceOhm"/> of the running mean of
    /// the segment being built; a layer outside it starts a new segment. Layer k spans distances
    /// [k, k+1]·v·Δt/2 (distance = v·t_roundtrip/2; tests/WaveSim.Tests/ReferenceData/published-checks.md §11).
    /// </summary>
    /// <remarks>A finite rise time leaves a few intermediate layers at each step; they come out as short segments
    /// of their own, which the caller may drop by length.</remarks>
    /// <param name="profile">The layer profile.</param>
    /// <param name="roundTripSeconds">Δt, the round-trip time of one layer (the sample interval of the trace), s. Must be positive.</param>
    /// <param name="velocityMetresPerSecond">Propagation velocity on the line, m/s. Must be positive.</param>
    /// <param name="toleranceOhm">Largest departure from the segment mean that still joins it, Ω. Must be positive.</param>
    /// <returns>Segments in order of distance, covering the whole profile.</returns>
    public static IReadOnlyList<ImpedanceSegment> Group(ImpedanceProfile profile, double roundTripSeconds, double velocityMetresPerSecond, double toleranceOhm)
    {
        ArgumentNullException.ThrowIfNull(profile);
        RequirePositive(roundTripSeconds, "layer round-trip time", "s");
        RequirePositive(velocityMetresPerSecond, "velocity", "m/s");
        RequirePositive(toleranceOhm, "impedance tolerance", "ohm");

        double layerMetres = velocityMetresPerSecond * roundTripSeconds / 2;
        double[] z = profile.Impedance;
        var segments = new List<ImpedanceSegment>();
        int start = 0;
        double sum = 0;
        for (int k = 0; k < z.Length; k++)
        {
            int count = k - start;
            if (count > 0 && Math.Abs(z[k] - sum / count) > toleranceOhm)
            {
                segments.Add(new ImpedanceSegment(start * layerMetres, k * layerMetres, sum / count));
                start = k;
                sum = 0;
            }
            sum += z[k];
        }
        if (z.Length > 0)
            segments.Add(new ImpedanceSegment(start * layerMetres, z.Length * layerMetres, sum / (z.Length - start)));
        return segments;
    }

    static void RequirePositive(double x, string what, string unit)
    {
        if (!(x > 0) || double.IsInfinity(x))
            throw new InputException($"the {what} must be positive, got {x} {unit}");
    }
}
