using System.Collections.Immutable;

namespace WaveSim.Core.Model;

/// <summary>
/// One net to simulate: a driver, a tree of line elements, a far-end load, probes and run settings. All values SI. Immutable: the
/// lists are copied into immutable arrays when set, so a variant (<c>with</c>, or ScenarioValues) never
/// changes the scenario it was made from.
/// </summary>
public sealed record Scenario
{
    /// <summary>Free text shown on outputs.</summary>
    public string Title { get; init; } = "";
    /// <summary>The Thevenin driver at the near end.</summary>
    public required SourceSpec Source { get; init; }
    /// <summary>The main line, ordered from the source end to the load end.</summary>
    public required IReadOnlyList<LineElement> Line { get; init => field = value.ToImmutableArray(); }
    /// <summary>The far-end termination of the main line.</summary>
    public LoadSpec Load { get; init; } = LoadSpec.Open;
    /// <summary>The points where voltage and current are recorded.</summary>
    public required IReadOnlyList<ProbeSpec> Probes { get; init => field = value.ToImmutableArray(); }
    /// <summary>Run length and resolution.</summary>
    public required SimulationSpec Simulation { get; init; }
    /// <summary>The length unit the scenario's author used (e.g. "mm"), for pictures.</summary>
    public string LengthUnit { get; init; } = "m";
    /// <summary>Metres per <see cref="LengthUnit"/>.</summary>
    public double LengthFactor { get; init; } = 1;
    /// <summary>The file the scenario was read from, if any (used to name outputs and resolve relative paths).</summary>
    public string? FilePath { get; init; }
}

/// <summary>Run settings.</summary>
/// <param name="Duration">Simulated time, s (&gt; 0).</param>
/// <param name="OutputStep">Sample interval of the probe outputs, s; null means the solver's step.</param>
/// <param name="Resolution">Solver steps per shortest edge time and per shortest segment delay (default 20, at least 1).</param>
public sealed record SimulationSpec(double Duration, double? OutputStep = null, double Resolution = 20);
