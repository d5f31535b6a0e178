namespace WaveSim.Core.FrequencyDomain;

/// <summary>One probe's waveforms from the frequency-domain solution.</summary>
/// <param name="Name">The probe's name.</param>
/// <param name="Volts">Voltage at each instant, V.</param>
/// <param name="Amps">Current at each instant, A, positive away from the driver.</param>
public sealed record ProbeResponse(string Name, double[] Volts, double[] Amps);

/// <summary>The time response computed through the frequency domain.</summary>
/// <param name="Time">The instants asked for, s.</param>
/// <param name="Probes">Per-probe waveforms, in the order asked for.</param>
/// <param name="Step">Sample interval of the transform grid, s.</param>
/// <param name="Points">Number of transform samples (a power of two).</param>
/// <param name="Damping">The damping rate σ of the numerical Laplace transform, 1/s.</param>
public sealed record TimeResponseResult(double[] Time, IReadOnlyList<ProbeResponse> Probes, double Step, int Points, double Damping)
{
    /// <summary>The probe named <paramref name="name"/>.</summary>
    /// <exception cref="InputException">There is no such probe.</exception>
    public ProbeResponse Probe(string name) => Probes.FirstOrDefault(p => p.Name == name)
        ?? throw new InputException($"no probe named '{name}'; probes: {string.Join(", ", Probes.Select(p => p.Name))}");
}
