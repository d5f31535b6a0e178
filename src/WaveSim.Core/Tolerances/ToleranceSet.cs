using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;

namespace WaveSim.Core.Tolerances;

/// <summary>How the variants of a tolerance run are chosen.</summary>
public sealed record ToleranceSetOptions
{
    /// <summary>Number of random samples (ignored for corners). Default 100.</summary>
    public int Samples { get; init; } = 100;
    /// <summary>The seed of every sample's generator (<see cref="SplitMix64.ForSample"/>). Default 1.</summary>
    public ulong Seed { get; init; } = 1;
    /// <summary>Every combination of the keys' ends plus nominal instead of random samples.</summary>
    public bool Corners { get; init; }
    /// <summary>The part of the run to build. Default the whole run.</summary>
    public Shard Shard { get; init; } = Shard.Whole;
    /// <summary>Accept variants beyond the plan limits.</summary>
    public bool Force { get; init; }
}

/// <summary>
/// The variants of a Monte Carlo or corner run: each sample's values drawn from its own generator seeded by (seed, sample
/// index) in key order, or every corner; each variant made by key path and checked before anything runs.
/// Sample 0 of a corner run is nominal (the scenario as written); corners 1.. combine the keys' ends, the first key fastest.
/// </summary>
public sealed class ToleranceSet
{
    /// <summary>Largest number of samples or corners.</summary>
    public const int MaxPoints = SweepGrid.MaxPoints;

    /// <summary>The varied keys with tolerances resolved against the scenario.</summary>
    public IReadOnlyList<ToleranceKey> Keys { get; }
    /// <summary>The scenario's own (nominal) value of each key, SI (the distribution's centre where the scenario has none).</summary>
    public IReadOnlyList<double> Nominal { get; }
    /// <summary>Samples (or corners) of the whole run.</summary>
    public int Total { get; }
    /// <summary>The variants of this shard, in index order.</summary>
    public IReadOnlyList<SweepPoint> Points { get; }
    /// <summary>The probe names.</summary>
    public IReadOnlyList<string> Probes { get; }
    /// <summary>How the set was chosen.</summary>
    public ToleranceSetOptions Options { get; }

    ToleranceSet(IReadOnlyList<ToleranceKey> keys, IReadOnlyList<double> nominal, int total, IReadOnlyList<SweepPoint> points, IReadOnlyList<string> probes, ToleranceSetOptions options)
    { Keys = keys; Nominal = nominal; Total = total; Points = points; Probes = probes; Options = options; }

    /// <summary>The keys of <paramref name="keys"/> resolved against <paramref name="scenario"/> (tolerances applied to its values) and their nominal values.</summary>
    /// <exception cref="InputException">A key the scenario lacks, a unit the key does not take, a tolerance reaching zero on a positive key (naming <c>keys</c>).</exception>
    public static (IReadOnlyList<ToleranceKey> Keys, IReadOnlyList<double> Nominal) Resolve(Scenario scenario, IReadOnlyList<ToleranceKey> keys)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(keys);
        if (keys.Count == 0) throw new InputException("a tolerance run needs at least one varied key (KEY=DIST)") { Parameter = "keys" };
        var dup = keys.GroupBy(k => k.KeyPath).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new InputException($"{dup.Key}: the key is varied twice") { Parameter = "keys" };
        var resolved = new ToleranceKey[keys.Count];
        var nominal = new double[keys.Count];
        for (int i = 0; i < keys.Count; i++)
        {
            var k = keys[i];
            try
            {
                if (k.Distribution.Choices is not null)
                {
                    // A named key (a buffer's corner): its nominal is the scenario's own corner; a path without a buffer is refused here.
                    nominal[i] = BufferCorners.Read(scenario, k.KeyPath);
                    resolved[i] = k;
                    continue;
                }
                var key = ScenarioValues.KeyAt(scenario, k.KeyPath);
                var dim = k.Distribution.ToleranceFraction is null ? k.Distribution.Dimension : key.Preferred;
                // A key the scenario leaves unset (a load's c) has the distribution's centre as nominal; a tolerance needs a value.
                double? read = ScenarioValues.Read(scenario, k.KeyPath, key.Dimensions.Contains(dim) ? dim : null);
                if (read is null && k.Distribution.ToleranceFraction is not null)
                    throw new InputException($"{k.KeyPath}: the scenario has no value there for a tolerance to apply to; give the value in the scenario or a distribution such as uniform(MIN..MAX)");
                var d = k.Distribution.Resolve(read ?? 0, dim, key.Sign, k.KeyPath);
                double value = read ?? d.Centre;
                // A value of the wrong unit is reported against the key, before any sample is drawn.
                ScenarioValues.With(scenario, k.KeyPath, d.Centre, d.Dimension);
                resolved[i] = k with { Distribution = d };
                nominal[i] = value;
            }
            catch (InputException ex) when (ex.Parameter is null) { throw new InputException(ex.Message) { Parameter = "keys" }; }
        }
        return (resolved, nominal);
    }

    /// <summary>Draws (or enumerates) and checks the variants of this shard.</summary>
    /// <exception cref="InputException">See <see cref="Resolve"/>; a sample count out of range; a draw the key refuses (e.g. a non-positive resistance: refused, not drawn again, naming the sample); a plan over the limits.</exception>
    public static ToleranceSet Build(Scenario scenario, IReadOnlyList<ToleranceKey> keys, ToleranceSetOptions? options = null)
    {
        options ??= new ToleranceSetOptions();
        var (resolved, nominal) = Resolve(scenario, keys);
        int total;
        if (options.Corners)
        {
            long combos = resolved.Aggregate(1L, (n, k) => n * k.Distribution.Ends().Count);
            if (combos + 1 > MaxPoints) throw new InputException($"the corners number {combos + 1} (limit {MaxPoints}); vary fewer keys") { Parameter = "keys" };
            total = (int)combos + 1;
        }
        else
        {
            if (options.Samples is < 1 or > MaxPoints) throw new InputException($"{options.Samples} samples: expected 1 to {MaxPoints}") { Parameter = "samples" };
            total = options.Samples;
        }
        var points = new List<SweepPoint>();
        for (int i = 0; i < total; i++)
        {
            if (!options.Shard.Contains(i)) continue;
            var values = options.Corners ? Corner(resolved, nominal, i) : Sample(resolved, options.Seed, i);
            var changes = resolved.Select((k, j) => new KeyChange(k.KeyPath, values[j], k.Distribution.Dimension)).ToArray();
            string what = options.Corners ? "corner" : "sample";
            Scenario v;
            try { v = ScenarioValues.With(scenario, changes); }
            catch (InputException ex)
            { throw new InputException($"{what} {i} ({string.Join(", ", changes.Select((c, j) => c.KeyPath + "=" + (resolved[j].Distribution.Name(c.Value) ?? ScenarioKeys.Format(c.Value, c.Dimension))))}): {ex.Message} (draws are refused, not drawn again: narrow the distribution)"); }
            Solver.GridPlan? plan = null;
            if (!options.Force)
            {
                try { plan = Simulate.Plan(v); Simulate.CheckLimits(v, plan); }
                catch (Solver.PlanLimitException ex) { throw new Solver.PlanLimitException(ex.Exceeded, $"{what} {i}: "); }
                catch (InputException ex) { throw new InputException($"{what} {i}: {ex.Message}"); }
            }
            points.Add(new SweepPoint(i, values, v) { Plan = plan });
        }
        return new ToleranceSet(resolved, nominal, total, points, scenario.Probes.Select(p => p.Name).ToArray(), options);
    }

    /// <summary>Sample <paramref name="index"/>'s values: one draw per key, in key order, from the sample's own generator.</summary>
    public static double[] Sample(IReadOnlyList<ToleranceKey> keys, ulong seed, int index)
    {
        var rng = SplitMix64.ForSample(seed, index);
        var values = new double[keys.Count];
        for (int j = 0; j < keys.Count; j++) values[j] = keys[j].Distribution.Draw(ref rng);
        return values;
    }

    /// <summary>Corner <paramref name="index"/>'s values: 0 is nominal; corner c ≥ 1 takes end ((c − 1) / Π earlier counts) mod count of each key.</summary>
    public static double[] Corner(IReadOnlyList<ToleranceKey> keys, IReadOnlyList<double> nominal, int index)
    {
        if (index == 0) return [.. nominal];
        int rest = index - 1;
        var values = new double[keys.Count];
        for (int j = 0; j < keys.Count; j++)
        {
            var ends = keys[j].Distribution.Ends();
            values[j] = ends[rest % ends.Count];
            rest /= ends.Count;
        }
        return values;
    }
}
