using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;

namespace WaveSim.Core;

/// <summary>Options of <see cref="Simulate.Run"/>: how to run, and what to analyse.</summary>
public sealed record RunOptions
{
    /// <summary>What the analysis computes, and the snapshots the run records for it (default: <see cref="AnalysisOptions.Full"/>).</summary>
    public AnalysisOptions Analysis { get; init; } = AnalysisOptions.Full;

    /// <summary>Run even when the plan exceeds the memory or cell-update limits.</summary>
    public bool Force { get; init; }

    /// <summary>Receives the fraction of the time loop done, 0..1.</summary>
    public IProgress<double>? Progress { get; init; }

    /// <summary>The scenario's grid plan when the caller has made it already (for its warnings); null plans it here.</summary>
    public GridPlan? Plan { get; init; }

    /// <summary>Average every lumped branch's current and voltage over the record (for the power in terminations).</summary>
    internal bool TrackBranchAverages { get; init; }
}
