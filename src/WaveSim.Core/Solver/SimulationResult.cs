using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>One probe's recorded waveforms at the output instants.</summary>
/// <param name="Name">The probe's name.</param>
/// <param name="Location">Where it sits, as written in the scenario.</param>
/// <param name="Position">Its position along its line after snapping to the nearest grid node, m.</param>
/// <param name="Volts">Voltage at each output instant, V.</param>
/// <param name="Amps">Current at each output instant, A, positive from source toward load.</param>
public sealed record ProbeTrace(string Name, string Location, double Position, double[] Volts, double[] Amps)
{
    /// <summary>
    /// The probe's DC level with the driver held at the level of its first edge (<see cref="SourceSpec.FirstEdgeLevel"/>), V:
    /// where the edge settles however short the record or the pulse. Null for sources without such a level.
    /// </summary>
    public double? SettledVolts { get; init; }

    /// <summary>
    /// The voltage at the instants of <see cref="SimulationResult.FigureTime"/>, V: the record the signal figures are computed
    /// from. The same array as <see cref="Volts"/> unless simulation.output_step is coarser than the figures need.
    /// </summary>
    public double[] FigureVolts { get => _figureVolts ?? Volts; init => _figureVolts = value; }

    readonly double[]? _figureVolts;
}

/// <summary>The node positions of one line (the main line or a branch), for pictures of the whole line.</summary>
/// <param name="Path">"" for the main line, else the branch names joined by '/'.</param>
/// <param name="Positions">Node positions from the line's start, m, ascending (a series part repeats a position).</param>
public sealed record LineProfile(string Path, double[] Positions);

/// <summary>The voltage along every line at one instant.</summary>
/// <param name="Time">The instant, s.</param>
/// <param name="Volts">One array per <see cref="LineProfile"/>, in the same order, matching its positions.</param>
public sealed record ProfileSnapshot(double Time, double[][] Volts);

/// <summary>Everything a run produced.</summary>
public sealed record SimulationResult
{
    /// <summary>The scenario that was run.</summary>
    public required Scenario Scenario { get; init; }
    /// <summary>The grid used.</summary>
    public required GridPlan Plan { get; init; }
    /// <summary>Output instants, s, from 0 to the duration inclusive.</summary>
    public required double[] Time { get; init; }
    /// <summary>
    /// Instants of the figure record (<see cref="ProbeTrace.FigureVolts"/>), s, from 0 to the duration: every k-th solver step
    /// (<see cref="GridPlan.FigureStep"/>) when the output step is coarser, else the same array as <see cref="Time"/>.
    /// output_step thins only <see cref="Time"/> and the CSV; figures, peaks and crossings come from this record.
    /// </summary>
    public double[] FigureTime { get => _figureTime ?? Time; init => _figureTime = value; }

    readonly double[]? _figureTime;

    /// <summary>Probe waveforms, in the scenario's order.</summary>
    public required IReadOnlyList<ProbeTrace> Probes { get; init; }
    /// <summary>Node positions of every line, main line first.</summary>
    public required IReadOnlyList<LineProfile> Lines { get; init; }
    /// <summary>Snapshots of the lines at the requested instants (empty unless asked for).</summary>
    public required IReadOnlyList<ProfileSnapshot> Snapshots { get; init; }
    /// <summary>Wall-clock time of the time loop.</summary>
    public TimeSpan Elapsed { get; init; }
    /// <summary>The grid's stored energy at each step (only when asked for), J.</summary>
    internal double[]? Energy { get; init; }

    /// <summary>Time averages over the record of every lumped branch's current and voltage (only when asked for), in the network's branch order.</summary>
    internal IReadOnlyList<BranchAverage>? BranchAverages { get; init; }

    /// <summary>The probe named <paramref name="name"/>.</summary>
    public ProbeTrace Probe(string name) => Probes.FirstOrDefault(p => p.Name == name)
        ?? throw new InputException($"no probe named '{name}'; probes: {string.Join(", ", Probes.Select(p => p.Name))}");
}

/// <summary>Options of a run beyond the scenario.</summary>
public sealed record SimulationOptions
{
    /// <summary>Instants at which to record the voltage along every line (for frames and the space-time map), s.</summary>
    public IReadOnlyList<double> SnapshotTimes { get; init; } = [];
    /// <summary>Receives the fraction done, 0..1, a few hundred times per run.</summary>
    public IProgress<double>? Progress { get; init; }
    /// <summary>Run even when the plan exceeds the memory or cell-update limits.</summary>
    public bool Force { get; init; }
    /// <summary>Record the stored energy at every step (for tests of conservation).</summary>
    internal bool TrackEnergy { get; init; }
    /// <summary>Average every lumped branch's current and voltage over the record (for the power in terminations).</summary>
    internal bool TrackBranchAverages { get; init; }
}

/// <summary>
/// One lumped branch's averages over the record [0, duration], from the solver's own values at every step (trapezoidal rule):
/// enough for the mean power in its resistor, R·⟨i²⟩, and in resistors that return its A node to fixed voltages.
/// </summary>
/// <param name="Label">The branch's label in the network ("load R", "line[0] series", "line[3] shunt", ...).</param>
/// <param name="R">Its resistance, ohm.</param>
/// <param name="MeanSquareCurrent">⟨i²⟩, A².</param>
/// <param name="MeanVoltageA">⟨v⟩ at its A node, V.</param>
/// <param name="MeanSquareVoltageA">⟨v²⟩ at its A node, V².</param>
internal sealed record BranchAverage(string Label, double R, double MeanSquareCurrent, double MeanVoltageA, double MeanSquareVoltageA);
