using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>
/// A run and its analysis, as <see cref="Simulate.Run"/> returns it: the solver's result, the source's edges, each probe's
/// figures, the eyes of a bit pattern, every receiver's verdict and the optional frequency-domain check. What was left out
/// by <see cref="Options"/> is empty (or null).
/// </summary>
public sealed record RunOutcome
{
    /// <summary>The solver's result (probe records, snapshots, the plan and the scenario as run).</summary>
    public required SimulationResult Result { get; init; }

    /// <summary>The scenario as run (its source carries the grid's minimum edge).</summary>
    public Scenario Scenario => Result.Scenario;

    /// <summary>The grid the run used.</summary>
    public GridPlan Plan => Result.Plan;

    /// <summary>What was computed.</summary>
    public required AnalysisOptions Options { get; init; }

    /// <summary>The source's edges on the figure record as they leave the driver (<see cref="SourceEdgeFinder.Find"/>), found once per run.</summary>
    public required IReadOnlyList<SourceEdge> SourceEdges { get; init; }

    /// <summary>Every probe's figures, in probe order (empty unless <see cref="AnalysisOptions.Figures"/>).</summary>
    public required IReadOnlyList<ProbeFigures> Figures { get; init; }

    /// <summary>Every probe's eye, in probe order (empty unless the source is a bit pattern and <see cref="AnalysisOptions.Eyes"/>).</summary>
    public required IReadOnlyList<ProbeEye> Eyes { get; init; }

    /// <summary>Every probe's verdict, in probe order (empty when <see cref="AnalysisOptions.Limits"/> is null).</summary>
    public required IReadOnlyList<ProbeVerdict> Verdicts { get; init; }

    /// <summary>The frames' instants, s (<see cref="AnalysisOptions.Frames"/>; empty for none).</summary>
    public required IReadOnlyList<double> FrameTimes { get; init; }

    /// <summary>Per probe, the largest difference from the frequency-domain solution; null unless <see cref="AnalysisOptions.FrequencyCheck"/>.</summary>
    public IReadOnlyList<ProbeDifference>? FrequencyCheck { get; init; }

    /// <summary>The frequency response over <see cref="FrequencyBand"/>; null unless <see cref="AnalysisOptions.FrequencyCheck"/>.</summary>
    public FrequencyResponse? FrequencyResponse { get; init; }
}
