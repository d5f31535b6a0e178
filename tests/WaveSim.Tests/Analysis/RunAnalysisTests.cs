using WaveSim.Core;
using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>What one <see cref="Simulate.Run"/> computes under each <see cref="AnalysisOptions"/>.</summary>
public class RunAnalysisTests
{
    [Fact]
    public void The_full_analysis_of_a_bit_pattern_holds_figures_eyes_and_the_receiver_verdict()
    {
        var outcome = Simulate.Run(TestScenarios.Parse(TestScenarios.MatchedBits));
        Assert.Equal(["drv", "rx"], outcome.Figures.Select(f => f.Probe.Name));
        Assert.Equal(["drv", "rx"], outcome.Eyes.Select(e => e.Probe.Name));
        Assert.Equal(RunAnalysis.SpaceTimeRows, outcome.Result.Snapshots.Count);
        var rx = Assert.Single(outcome.Verdicts, v => v.Judged);
        Assert.Equal("rx", rx.Probe);
        // The matched line halves the driver's levels: 0 V and 1 V × 50/(50 + 50) (Pozar, Microwave Engineering, 4th ed.,
        // eq. 2.35 with Γ = 0; ReferenceData/published-checks.md §10); the eye opens past Vih 0.35 V and Vil 0.15 V.
        Assert.Equal(0.0, rx.LowV!.Value, 1e-9);
        Assert.Equal(0.5, rx.HighV!.Value, 1e-9);
        Assert.True(rx.Pass);
    }

    [Fact]
    public void A_sweep_point_keeps_only_its_figures_and_a_fit_evaluation_only_the_waveforms()
    {
        var s = TestScenarios.Parse(TestScenarios.MatchedBits);
        var point = Simulate.Run(s, new RunOptions { Analysis = AnalysisOptions.FiguresOnly(0.02) });
        Assert.Equal(2, point.Figures.Count);
        Assert.Empty(point.Eyes);
        Assert.Empty(point.Verdicts);
        Assert.Empty(point.Result.Snapshots);
        Assert.Equal(0.02, point.Options.SettleBand);

        var evaluation = Simulate.Run(s, new RunOptions { Analysis = AnalysisOptions.WaveformsOnly });
        Assert.Empty(evaluation.Figures);
        Assert.Empty(evaluation.Eyes);
        Assert.Empty(evaluation.Verdicts);
        // The source's edges are found either way, the same as with the full analysis.
        Assert.Equal(point.SourceEdges, evaluation.SourceEdges);
    }
}
