using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Core;

/// <summary>The front door of the library: plan and run a scenario.</summary>
public static class Simulate
{
    /// <summary>Plans the grid for a scenario without running it.</summary>
    public static GridPlan Plan(Scenario scenario) => GridPlan.For(scenario);

    /// <summary>
    /// Runs <paramref name="scenario"/> and analyses the run (<see cref="RunAnalysis.Analyse"/>): the one call every command
    /// that simulates goes through. The run records the snapshots the analysis asks for (space-time rows, frames).
    /// </summary>
    /// <exception cref="PlanLimitException">The plan exceeds the memory or cell-update limits (unless forced).</exception>
    /// <exception cref="InputException">The network is singular.</exception>
    /// <exception cref="NumericalException">The solution became NaN or infinite.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    public static RunOutcome Run(Scenario scenario, RunOptions? options = null, CancellationToken ct = default)
    {
        options ??= new RunOptions();
        GridPlan? plan = options.Plan;
        // The frequency-domain check can cost more than the run; it is refused before the run starts, not after.
        if (options.Analysis.FrequencyCheck && !options.Force)
            FrequencyDomain.FrequencyDomainCheck.CheckLimits(scenario, plan ??= Plan(scenario));
        var sim = new SimulationOptions
        {
            Force = options.Force,
            Progress = options.Progress,
            SnapshotTimes = RunAnalysis.SnapshotTimes(scenario, options.Analysis),
            TrackBranchAverages = options.TrackBranchAverages,
        };
        var result = Solve(scenario, sim, ct, plan);
        return RunAnalysis.Analyse(result, options.Analysis);
    }

    /// <summary>
    /// Runs <paramref name="scenario"/> on the solver alone and returns the probe waveforms, with no analysis: for what simulates
    /// a set-up of its own (the reflectometer) and for tests of the solver. Source edges shorter than the grid's
    /// <see cref="GridPlan.MinimumEdge"/> are widened to it (<see cref="SourceSpec.MinimumEdge"/>); the result's scenario carries
    /// the source as run.
    /// </summary>
    /// <exception cref="PlanLimitException">The plan exceeds the memory or cell-update limits (unless forced).</exception>
    /// <exception cref="InputException">The network is singular.</exception>
    /// <exception cref="NumericalException">The solution became NaN or infinite.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    public static SimulationResult Solve(Scenario scenario, SimulationOptions? options = null, CancellationToken ct = default) =>
        Solve(scenario, options ?? new SimulationOptions(), ct, null);

    static SimulationResult Solve(Scenario scenario, SimulationOptions options, CancellationToken ct, GridPlan? plan)
    {
        plan ??= GridPlan.For(scenario);
        if (!options.Force) CheckLimits(scenario, plan);
        var run = scenario with { Source = scenario.Source with { MinimumEdge = plan.MinimumEdge } };
        return new LeapfrogSolver(run, plan).Run(options, ct);
    }

    /// <summary>
    /// The pole-residue fits a run of <paramref name="scenario"/> on <paramref name="plan"/> uses for its segments with
    /// frequency-dependent loss, with their place ("line[0]") and their largest errors over the band.
    /// </summary>
    public static IReadOnlyList<(string Where, Lines.RationalLoss Fit)> LossFits(Scenario scenario, GridPlan plan) =>
        plan.Segments.Where(s => s.Segment.Loss is not null)
            .Select(s => (s.Where, DispersiveKernel.FitFor(s.Segment, scenario, plan.Dt))).ToList();

    /// <summary>
    /// Runs a coupled scenario (several conductors over a common reference, docs/coupled.md) and analyses it: the one call
    /// every command that simulates a coupled net goes through.
    /// </summary>
    /// <exception cref="InputException">The run is beyond the limits (unless forced), or the end networks are singular.</exception>
    /// <exception cref="NumericalException">The solution became NaN or infinite.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    public static Coupled.CoupledOutcome RunCoupled(Coupled.CoupledScenario scenario, Coupled.CoupledRunOptions? options = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        options ??= new Coupled.CoupledRunOptions();
        return Coupled.CoupledAnalysis.Analyse(Coupled.CoupledRun.Solve(scenario, options, ct), options.SettleBand);
    }

    /// <summary>Throws when the plan is beyond the limits a run accepts unless forced (<see cref="PlanLimits"/>).</summary>
    /// <exception cref="PlanLimitException">The plan needs more memory or cell updates than the limits.</exception>
    public static void CheckLimits(Scenario scenario, GridPlan plan)
    {
        var exceeded = PlanLimits.Exceeded(scenario, plan);
        if (exceeded.Count > 0) throw new PlanLimitException(exceeded);
    }
}
