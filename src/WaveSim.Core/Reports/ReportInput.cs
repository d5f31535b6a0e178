using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Solver;
using WaveSim.Core.Terminations;

namespace WaveSim.Core.Reports;

/// <summary>Everything the HTML report shows.</summary>
/// <param name="Result">The simulated run.</param>
/// <param name="ScenarioText">The scenario file's text, shown verbatim (escaped).</param>
/// <param name="Figures">Signal figures per probe (<see cref="RunSummary.Figures"/>).</param>
/// <param name="Eyes">Eye diagrams (<see cref="RunEyes.Compute"/>); empty unless the source is a bit pattern.</param>
/// <param name="Terminations">The termination comparison, or null to leave that section out.</param>
public sealed record ReportInput(SimulationResult Result, string ScenarioText, IReadOnlyList<(ProbeTrace Probe, SignalFigures Figures)> Figures,
    IReadOnlyList<ProbeEye> Eyes, TerminationStudyResult? Terminations)
{
    /// <summary>The limits the receivers are judged against (the defaults of <c>terminations</c> unless given).</summary>
    public VerdictLimits Limits { get; init; } = new();

    /// <summary>Computes the figures and eyes of <paramref name="result"/> with the given settling band.</summary>
    public static ReportInput For(SimulationResult result, string scenarioText, double settleBand = SignalQualityOptions.DefaultSettleBand,
        TerminationStudyResult? terminations = null) =>
        new(result, scenarioText, RunSummary.Figures(result, settleBand), RunEyes.Compute(result), terminations)
        {
            Limits = terminations?.Options.Limits ?? new VerdictLimits { SettleBand = settleBand },
        };
}
