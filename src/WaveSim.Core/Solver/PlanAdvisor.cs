using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Solver;

/// <summary>Finds the things in a plan a user should know before running: dispersion, limits, coarse sampling.</summary>
public static class PlanAdvisor
{
    /// <summary>One line per problem; empty when the plan is clean.</summary>
    public static IReadOnlyList<string> Problems(Scenario s, GridPlan plan)
    {
        var list = new List<string>();
        foreach (var sp in plan.Segments.Where(p => p.Courant < 0.98))
            list.Add($"{sp.Where}: Courant number {sp.Courant:F3} < 1: the grid adds some numerical dispersion there (a delay that is a whole number of steps avoids it)");
        foreach (var sp in plan.Segments)
            if (sp.Segment.Derived is { } d)
                foreach (var w in d.Warnings) list.Add($"{sp.Where}.geometry: {w}");
        list.AddRange(PlanLimits.Exceeded(s, plan).Select(x => x.Message));
        if (s.Simulation.OutputStep is { } h && h < plan.Dt)
            list.Add($"simulation.output_step {Quantity.Format(h, "s")} is finer than the solver's step {Quantity.Format(plan.Dt, "s")}: rows between steps are interpolated");
        foreach (var e in EdgeLimit.WidenedEdges(s.Source, plan))
            list.Add($"{e.Key}: {EdgeLimit.Describe(e.TenNinety)} is shorter than the shortest edge the grid carries ({GridPlan.MinimumEdgeSteps.ToString(System.Globalization.CultureInfo.InvariantCulture)} time steps): it is run as a Gaussian-filtered step with a 10-90 % time of {Quantity.Format(plan.MinimumEdge, "s")}");
        return list;
    }
}
