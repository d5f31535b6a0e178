using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;
using WaveSim.Core.Terminations;

namespace WaveSim.Core.Reports;

/// <summary>Everything the HTML report shows: one analysed run (<see cref="Simulate.Run"/> with <see cref="HtmlReport.RunOptions"/>).</summary>
/// <param name="Outcome">The run and its analysis: figures, eyes and verdicts.</param>
/// <param name="ScenarioText">The scenario file's text, shown verbatim (escaped).</param>
/// <param name="Terminations">The termination comparison, or null to leave that section out.</param>
public sealed record ReportInput(RunOutcome Outcome, string ScenarioText, TerminationStudyResult? Terminations)
{
    /// <summary>
    /// The window first shown and the probes first drawn, by the page and its static picture alike (the choices of
    /// <c>run</c>'s waveform picture); currents add the current panel to the static picture.
    /// </summary>
    public Pictures.WaveformOptions Waveforms { get; init; } = new();

    /// <summary>The simulated run.</summary>
    public SimulationResult Result => Outcome.Result;

    /// <summary>Signal figures per probe.</summary>
    public IReadOnlyList<ProbeFigures> Figures => Outcome.Figures;

    /// <summary>Eye diagrams; empty unless the source is a bit pattern.</summary>
    public IReadOnlyList<ProbeEye> Eyes => Outcome.Eyes;

    /// <summary>The limits the receivers were judged against.</summary>
    public VerdictLimits Limits => Outcome.Options.Limits ?? new VerdictLimits();

    /// <summary>The report of <paramref name="outcome"/>, which must hold figures and verdicts (run with <see cref="HtmlReport.RunOptions"/>).</summary>
    /// <exception cref="ArgumentException">The outcome was analysed without figures or verdicts.</exception>
    public static ReportInput For(RunOutcome outcome, string scenarioText, TerminationStudyResult? terminations = null)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        if (!outcome.Options.Figures || outcome.Options.Limits is null)
            throw new ArgumentException("the report needs a run analysed with figures and verdicts (HtmlReport.RunOptions)", nameof(outcome));
        return new(outcome, scenarioText, terminations);
    }
}
