using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Units;

namespace WaveSim.Core.Terminations;

/// <summary>
/// Compares the termination strategies on a net: sizes each (<see cref="TerminationPlanner"/>), runs every variant through
/// <see cref="Simulate.Run"/> (in parallel), measures the receiver, the static power and the mean simulated power, and judges
/// every receiver on every edge by <see cref="RunVerdicts"/> through <see cref="Simulate.Run"/> (the same rules as the report): probes at a load with receiver
/// thresholds, or the chosen receiver probe at the mid level when no load has thresholds.
/// </summary>
public static class TerminationStudy
{
    /// <summary>Name of the probe added when the scenario has none at the main line's load.</summary>
    public const string AddedProbe = "load";

    /// <summary>Runs the study.</summary>
    /// <exception cref="InputException">The net cannot be terminated (shorted load) or an option is out of range.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    public static TerminationStudyResult Run(Scenario scenario, TerminationOptions? options = null, IProgress<double>? progress = null, CancellationToken ct = default)
    {
        options ??= new TerminationOptions();
        if (!(options.SettleBand > 0 && options.SettleBand < 0.5)) throw new InputException($"settle band {options.SettleBand} must lie between 0 and 0.5");
        var (s, receiver) = WithReceiverProbe(scenario);
        var designs = TerminationPlanner.Design(s, options);
        // Every variant is planned (and checked against the limits) before any runs; its run reuses the plan.
        var plans = designs.Select(d => d.Variant is null ? null : Simulate.Plan(d.Variant)).ToArray();
        if (!options.Force)
            for (int i = 0; i < designs.Count; i++) if (plans[i] is { } plan) Simulate.CheckLimits(designs[i].Variant!, plan);
        var outcomes = new TerminationOutcome[designs.Count];
        int done = 0;
        var gate = new object();
        SweepRunner.ParallelFor(designs.Count, options.Serial, ct, i =>
        {
            outcomes[i] = Evaluate(designs[i], plans[i], receiver, options, ct);
            int n = Interlocked.Increment(ref done);
            if (progress is not null) lock (gate) progress.Report((double)n / designs.Count);
        });
        return new TerminationStudyResult(designs[0].Variant!.Line.OfType<Segment>().First().Z0, TerminationPlanner.LineDelay(s),
            s.Probes[receiver].Name, s.Probes.Select(p => p.Name).ToArray(), options, outcomes);
    }

    /// <summary>The scenario with a probe at the main line's load (the first such probe, else the first at any load, else one added) and its index.</summary>
    public static (Scenario Scenario, int Receiver) WithReceiverProbe(Scenario s)
    {
        int i = s.Probes.ToList().FindIndex(p => p.Anchor == ProbeAnchor.Load && p.BranchPath.Count == 0);
        if (i < 0) i = s.Probes.ToList().FindIndex(p => p.Anchor == ProbeAnchor.Load);
        if (i >= 0) return (s, i);
        string name = AddedProbe;
        while (s.Probes.Any(p => p.Name == name)) name += "_";
        return (s with { Probes = [.. s.Probes, new ProbeSpec(name, [], ProbeAnchor.Load)] }, s.Probes.Count);
    }

    static TerminationOutcome Evaluate(TerminationDesign d, GridPlan? plan, int receiver, TerminationOptions o, CancellationToken ct)
    {
        if (d.Variant is null) return new TerminationOutcome(d, null, [], null, null, null, []);
        // Every receiver is judged; when no load has thresholds, the chosen receiver probe is judged at the mid level.
        bool anyThresholds = d.Variant.Probes.Any(p => NetPaths.ReceiverAt(d.Variant, p) is not null);
        var analysis = new AnalysisOptions
        {
            SettleBand = o.SettleBand,
            Limits = o.Limits,
            JudgeAtMidLevel = anyThresholds ? null : receiver,
            SpaceTime = false,
        };
        var run = Simulate.Run(d.Variant, new RunOptions { Analysis = analysis, Force = o.Force, Plan = plan, TrackBranchAverages = true }, ct);
        var figures = run.Figures.Select(f => f.Figures).ToArray();
        var (low, high) = SourceEdgeFinder.Levels(d.Variant.Source);
        var (lo, hi) = (TerminationPower.At(d, low), TerminationPower.At(d, high));
        return new TerminationOutcome(d, run.Result, figures, figures[receiver], lo, hi, run.Verdicts)
        {
            ReceiverEye = run.Eyes.Count > 0 ? run.Eyes[receiver] : null,
            PowerAverageW = TerminationPower.Average(d, run.Result),
        };
    }
}
