using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Solver;

/// <summary>One limit a plan goes beyond: what it needs, what is allowed, and a one-line message that says what would help.</summary>
/// <param name="Limit">"memory" or "cell updates".</param>
/// <param name="Needed">The plan's estimate (bytes, or cell updates).</param>
/// <param name="Allowed">The limit (<see cref="GridPlan.MemoryLimitBytes"/> or <see cref="GridPlan.CellUpdateLimit"/>).</param>
/// <param name="Message">The estimate, the limit and the scenario keys that would bring it down; names no command-line option.</param>
public sealed record PlanLimitExcess(string Limit, double Needed, double Allowed, string Message);

/// <summary>
/// The limits a run accepts unless forced: memory and cell updates. The advice names only changes that shrink the estimate for
/// this plan: simulation.output_step thins the output record, but not the grid or the figure record (which keeps at most
/// <see cref="GridPlan.FigureRecordBudgetBytes"/>), so it is suggested only when a coarser step would bring the run under the limit.
/// </summary>
public static class PlanLimits
{
    /// <summary>The limits <paramref name="plan"/> (planned for <paramref name="scenario"/>) goes beyond, memory first; empty when it fits.</summary>
    public static IReadOnlyList<PlanLimitExcess> Exceeded(Scenario scenario, GridPlan plan)
    {
        var list = new List<PlanLimitExcess>();
        if (plan.MemoryBytes > GridPlan.MemoryLimitBytes)
        {
            var advice = new List<string> { "lower simulation.resolution" };
            // With the coarsest output record (two rows) the output step has done all it can: suggest it only if that fits.
            double d = scenario.Simulation.Duration;
            var coarse = GridPlan.For(scenario with { Simulation = scenario.Simulation with { OutputStep = d } });
            if (coarse.MemoryBytes <= GridPlan.MemoryLimitBytes)
                advice.Add($"make simulation.output_step coarser (the output record takes most of it; about {Quantity.Format(coarse.MemoryBytes, "B", 3)} at one row per duration)");
            list.Add(new("memory", plan.MemoryBytes, GridPlan.MemoryLimitBytes,
                $"the run needs about {Quantity.Format(plan.MemoryBytes, "B", 3)} of memory (limit 2 GB); {string.Join(", or ", advice)}"));
        }
        if (plan.CellUpdates > GridPlan.CellUpdateLimit)
            list.Add(new("cell updates", plan.CellUpdates, GridPlan.CellUpdateLimit,
                $"the run needs {plan.CellUpdates.ToString("G3", System.Globalization.CultureInfo.InvariantCulture)} cell updates (limit 1e11); shorten simulation.duration or lower simulation.resolution"));
        return list;
    }
}

/// <summary>
/// A plan beyond a limit a run accepts unless forced (<see cref="SimulationOptions.Force"/>). A kind of <see cref="InputException"/>,
/// so it is a one-line input error; a command line adds how to force the run.
/// </summary>
public sealed class PlanLimitException : InputException
{
    /// <summary>The limits exceeded, the first one in the message.</summary>
    public IReadOnlyList<PlanLimitExcess> Exceeded { get; }

    /// <summary>Creates the exception; <paramref name="context"/> goes before the first limit's message (e.g. "sweep point 3: ").</summary>
    public PlanLimitException(IReadOnlyList<PlanLimitExcess> exceeded, string context = "") : base(context + exceeded[0].Message) =>
        Exceeded = exceeded;
}
