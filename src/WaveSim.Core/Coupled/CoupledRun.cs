using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Coupled;

/// <summary>Options of a coupled run beyond the scenario.</summary>
public sealed record CoupledRunOptions
{
    /// <summary>Run even beyond the cell-update and memory limits.</summary>
    public bool Force { get; init; }
    /// <summary>Receives the fraction done, 0..1.</summary>
    public IProgress<double>? Progress { get; init; }
    /// <summary>Settling band of the signal figures, fraction of the swing.</summary>
    public double SettleBand { get; init; } = SignalQualityOptions.DefaultSettleBand;
    /// <summary>Instants at which to keep the voltage along every conductor, s.</summary>
    public IReadOnlyList<double> SnapshotTimes { get; init; } = [];
    /// <summary>Record the stored energy at every step (tests of passivity).</summary>
    internal bool TrackEnergy { get; init; }
}

/// <summary>Plans, checks and runs a coupled scenario: the work behind <see cref="Simulate.RunCoupled"/>.</summary>
public static class CoupledRun
{
    /// <summary>Bytes per recorded probe value: the per-step record of V and I and the figure copy.</summary>
    const double BytesPerSample = 4 * sizeof(double);

    internal static CoupledResult Solve(CoupledScenario s, CoupledRunOptions o, CancellationToken ct)
    {
        var plan = CoupledPlan.For(s);
        if (!o.Force) CheckLimits(s, plan);
        double edge = plan.MinimumEdge;
        EndBranch Widen(EndBranch b) => b.Source is { } src ? b with { Source = src with { Spec = src.Spec with { MinimumEdge = edge } } } : b;
        var run = s with { Near = s.Near.Select(Widen).ToList(), Far = s.Far.Select(Widen).ToList() };
        return new CoupledSolver(run, plan).Run(o.TrackEnergy, o.SnapshotTimes, o.Progress, ct);
    }

    /// <summary>Throws when the run is beyond the cell-update limit or its probe record beyond the memory limit (<see cref="GridPlan"/>'s).</summary>
    /// <exception cref="InputException">The run exceeds a limit; the message says which and what to change.</exception>
    public static void CheckLimits(CoupledScenario s, CoupledPlan plan)
    {
        if (plan.CellUpdates > GridPlan.CellUpdateLimit)
            throw new InputException($"the coupled run needs {plan.CellUpdates:G3} conductor-cell updates, more than the limit of {GridPlan.CellUpdateLimit:G3}; shorten simulation.duration or lower simulation.resolution");
        double bytes = (plan.Steps + 1.0) * Math.Max(1, s.Probes.Count) * BytesPerSample;
        if (bytes > GridPlan.MemoryLimitBytes)
            throw new InputException($"the coupled run's probe record needs {bytes / (1 << 20):F0} MiB, more than the limit of {GridPlan.MemoryLimitBytes >> 20} MiB; shorten simulation.duration or use fewer probes");
    }
}
