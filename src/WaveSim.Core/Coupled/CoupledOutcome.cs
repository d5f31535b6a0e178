using WaveSim.Core.Analysis;

namespace WaveSim.Core.Coupled;

/// <summary>A coupled run and its analysis: what <see cref="Simulate.RunCoupled"/> returns.</summary>
public sealed record CoupledOutcome
{
    /// <summary>The solver's result.</summary>
    public required CoupledResult Result { get; init; }
    /// <summary>Signal-quality figures for every probe, in the scenario's order.</summary>
    public required IReadOnlyList<ProbeFigures> Figures { get; init; }
    /// <summary>Crosstalk peaks of the probes on quiet conductors (not between probes).</summary>
    public required IReadOnlyList<CrosstalkPeak> Crosstalk { get; init; }
}
