using WaveSim.Core.Solver;

namespace WaveSim.Core.Coupled;

/// <summary>Everything a coupled run produced.</summary>
public sealed record CoupledResult
{
    /// <summary>The scenario as run (source edges widened to the grid's shortest).</summary>
    public required CoupledScenario Scenario { get; init; }
    /// <summary>The grid used.</summary>
    public required CoupledPlan Plan { get; init; }
    /// <summary>Output instants, s, from 0 to the duration inclusive.</summary>
    public required double[] Time { get; init; }
    /// <summary>Instants of the figure record (every solver step), s.</summary>
    public required double[] FigureTime { get; init; }
    /// <summary>Probe waveforms in the scenario's order (current positive toward the far end).</summary>
    public required IReadOnlyList<ProbeTrace> Probes { get; init; }
    /// <summary>Wall-clock time of the time loop.</summary>
    public TimeSpan Elapsed { get; init; }
    /// <summary>Stored energy at every step (only when asked for), J.</summary>
    internal double[]? Energy { get; init; }
    /// <summary>Voltage along every conductor at the snapshot instants (only when asked for): [instant][conductor][node].</summary>
    public IReadOnlyList<(double Time, double[][] Volts)> Snapshots { get; init; } = [];
    /// <summary>Node positions along the conductors, m, for the snapshots.</summary>
    public double[] Positions { get; init; } = [];

    /// <summary>The probe named <paramref name="name"/>.</summary>
    public ProbeTrace Probe(string name) => Probes.FirstOrDefault(p => p.Name == name)
        ?? throw new InputException($"no probe named '{name}'; probes: {string.Join(", ", Probes.Select(p => p.Name))}");
}
