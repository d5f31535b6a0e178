using WaveSim.Core.Model;
using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Solver;

/// <summary>One limit a plan goes beyond: what it needs, what is allowed, and a one-line message that says what would help.</summary>
/// <param name="Limit">"memory", "cell updates" or "run time".</param>
/// <param name="Needed">The plan's estimate (bytes, cell updates, or seconds).</param>
/// <param name="Allowed">The limit (<see cref="GridPlan.MemoryLimitBytes"/>, <see cref="GridPlan.CellUpdateLimit"/> or <see cref="GridPlan.RunTimeLimitSeconds"/>).</param>
/// <param name="Message">The estimate, the limit and the scenario keys that would bring it down; names no command-line option.</param>
public sealed record PlanLimitExcess(string Limit, double Needed, double Allowed, string Message);

/// <summary>
/// The limits a run accepts unless forced: memory, cell updates and the estimated run time. The advice names only changes that shrink the estimate for
/// this plan: simulation.output_step thins the output record, but not the grid or the figure record (which keeps at most
/// <see cref="GridPlan.FigureRecordBudgetBytes"/>), so it is suggested only when a coarser step would bring the run under the limit.
/// </summary>
public static class PlanLimits
{
    /// <summary>The limits <paramref name="plan"/> (planned for <paramref name="scenario"/>) goes beyond, memory first; empty when it fits.</summary>
    public static IReadOnlyList<PlanLimitExcess> Exceeded(Scenario scenario, GridPlan plan)
    {
        var list = new List<PlanLimitExcess>();
        string cost = $"about {Duration(plan.EstimatedSeconds)} and {Bytes(plan.EstimatedBytes)}";
        if (plan.EstimatedBytes > GridPlan.MemoryLimitBytes)
        {
            var advice = new List<string> { "lower simulation.resolution" };
            // With the coarsest output record (two rows) the output step has done all it can: suggest it only if that fits.
            double d = scenario.Simulation.Duration;
            var coarse = GridPlan.For(scenario with { Simulation = scenario.Simulation with { OutputStep = d } });
            if (coarse.EstimatedBytes <= GridPlan.MemoryLimitBytes)
                advice.Add($"make simulation.output_step coarser (the output record takes most of it; about {Quantity.Format(coarse.EstimatedBytes, "B", 3)} at one row per duration)");
            list.Add(new("memory", plan.EstimatedBytes, GridPlan.MemoryLimitBytes,
                $"the run needs about {Bytes(plan.EstimatedBytes)} of memory (limit 2 GB) and about {Duration(plan.EstimatedSeconds)} to run; {string.Join(", or ", advice)}"));
        }
        if (plan.CellUpdates > GridPlan.CellUpdateLimit)
            list.Add(new("cell updates", plan.CellUpdates, GridPlan.CellUpdateLimit,
                $"the run needs {plan.CellUpdates.ToString("G3", System.Globalization.CultureInfo.InvariantCulture)} cell updates (limit 1e11; {cost}); shorten simulation.duration or lower simulation.resolution"));
        if (plan.EstimatedSeconds > GridPlan.RunTimeLimitSeconds)
        {
            // Steps, not cells, dominate a small net run for long: say which part of the estimate it is.
            double perStep = GridPlan.StepSeconds + plan.StepUnknowns * GridPlan.UnknownSeconds;
            string parts = $"{G3(plan.Steps)} steps of {Quantity.Format(perStep, "s", 2)} each beyond the cells, {G3(plan.CellUpdates)} cell updates, {plan.StepUnknowns} junction unknowns";
            list.Add(new("run time", plan.EstimatedSeconds, GridPlan.RunTimeLimitSeconds,
                $"the run would take {cost} ({parts}; limit 10 min); shorten simulation.duration or lower simulation.resolution"));
        }
        return list;
    }

    /// <summary>A size in bytes with a prefix up to petabytes, in powers of ten beyond.</summary>
    static string Bytes(double b) => b < 1e16 ? Quantity.Format(b, "B", 3) : G3(b) + " B";

    static string G3(double x) => x.ToString("G3", CultureInfo.InvariantCulture);

    /// <summary>A run time as a person reads it: seconds below a minute, then minutes, hours, days.</summary>
    internal static string Duration(double seconds) => seconds switch
    {
        < 60 => Quantity.Format(seconds, "s", 2),
        < 3600 => G3(Math.Round(seconds / 60, 1)) + " min",
        < 86400 => G3(Math.Round(seconds / 3600, 1)) + " h",
        _ => G3(seconds / 86400) + " days",
    };
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
