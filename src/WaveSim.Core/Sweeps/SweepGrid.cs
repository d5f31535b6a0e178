using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Core.Sweeps;

/// <summary>One point of a sweep: its index, the values of the varied keys and the variant scenario.</summary>
/// <param name="Index">Position in sweep order (the first axis changes fastest).</param>
/// <param name="Values">One SI value per axis, in axis order.</param>
/// <param name="Scenario">The scenario with those values in, checked as a file would be.</param>
public sealed record SweepPoint(int Index, IReadOnlyList<double> Values, Scenario Scenario)
{
    /// <summary>The variant's grid plan, made when the point was checked against the limits (null when forced); its run reuses it.</summary>
    public Solver.GridPlan? Plan { get; init; }
}

/// <summary>
/// The grid of variants of a sweep: every combination of the axes' values, made by key path
/// (<see cref="ScenarioValues.With(Scenario, IEnumerable{KeyChange})"/>) and checked (keys, units, ranges, plan limits) before
/// anything is run. Messages name the keys; the command line adds its option.
/// </summary>
public sealed class SweepGrid
{
    /// <summary>Largest number of points a sweep may hold.</summary>
    public const int MaxPoints = 100_000;

    /// <summary>The varied keys, in the order given; the first changes fastest.</summary>
    public IReadOnlyList<SweepAxis> Axes { get; }
    /// <summary>Every point, in sweep order.</summary>
    public IReadOnlyList<SweepPoint> Points { get; }
    /// <summary>The probe names (the same in every variant).</summary>
    public IReadOnlyList<string> Probes { get; }

    SweepGrid(IReadOnlyList<SweepAxis> axes, IReadOnlyList<SweepPoint> points)
    {
        Axes = axes; Points = points;
        Probes = points[0].Scenario.Probes.Select(p => p.Name).ToArray();
    }

    /// <summary>Builds and validates every variant of <paramref name="scenario"/>.</summary>
    /// <param name="scenario">The scenario to vary (left unchanged).</param>
    /// <param name="axes">One or more axes with distinct keys.</param>
    /// <param name="force">Accept points whose plan exceeds the memory or cell-update limits.</param>
    /// <exception cref="InputException">A key does not exist, a value has the wrong unit or is out of range, or a plan is too large.</exception>
    public static SweepGrid Build(Scenario scenario, IReadOnlyList<SweepAxis> axes, bool force = false)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(axes);
        if (axes.Count == 0) throw new InputException("a sweep needs at least one varied key (KEY=RANGE)") { Parameter = "axes" };
        var dup = axes.GroupBy(a => a.KeyPath).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new InputException($"{dup.Key}: the key is varied twice") { Parameter = "axes" };
        long total = axes.Aggregate(1L, (n, a) => n * a.Values.Count);
        if (total > MaxPoints) throw new InputException($"the grid has {total} points (limit {MaxPoints}); use fewer values") { Parameter = "axes" };

        // Each key alone at its first value: a missing key or a wrong unit is reported against the key that caused it.
        foreach (var a in axes)
        {
            try { ScenarioValues.With(scenario, a.KeyPath, a.Values[0], a.Dimension); }
            catch (InputException ex) when (ex.Parameter is null) { throw new InputException(ex.Message) { Parameter = "axes" }; }
        }
        var points = new SweepPoint[total];
        for (int i = 0; i < total; i++)
        {
            var idx = Indices(axes, i);
            var changes = axes.Select((a, k) => new KeyChange(a.KeyPath, a.Values[idx[k]], a.Dimension)).ToArray();
            Scenario v;
            try { v = ScenarioValues.With(scenario, changes); }
            catch (InputException ex)
            { throw new InputException($"sweep point {i} ({string.Join(", ", changes.Select(c => c.KeyPath + "=" + ScenarioKeys.Format(c.Value, c.Dimension)))}): {ex.Message}"); }
            Solver.GridPlan? plan = null;
            if (!force)
            {
                try { plan = Simulate.Plan(v); Simulate.CheckLimits(v, plan); }
                catch (Solver.PlanLimitException ex) { throw new Solver.PlanLimitException(ex.Exceeded, $"sweep point {i}: "); }
                catch (InputException ex) { throw new InputException($"sweep point {i}: {ex.Message}"); }
            }
            points[i] = new SweepPoint(i, axes.Select((a, k) => a.Values[idx[k]]).ToArray(), v) { Plan = plan };
        }
        return new SweepGrid(axes, points);
    }

    /// <summary>The value index on each axis of point <paramref name="index"/> (first axis fastest).</summary>
    public static int[] Indices(IReadOnlyList<SweepAxis> axes, int index)
    {
        var idx = new int[axes.Count];
        for (int k = 0; k < axes.Count; k++)
        {
            idx[k] = index % axes[k].Values.Count;
            index /= axes[k].Values.Count;
        }
        return idx;
    }
}
