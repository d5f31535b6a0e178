using WaveSim.Core;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Tests.Tolerances;

/// <summary>Drawing, corners, shards and bad input of tolerance runs.</summary>
public class ToleranceSetTests
{
    // A resistive divider: a 1 V step through the driver's resistance into a resistor; settled level 1 V · R / (Rs + R).
    internal const string Divider = @"title: divider
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 0.2 ns, resistance: 50 ohm }
line:
  - segment: { length: 20 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: rx, at: load }
simulation: { duration: 4 ns, resolution: 10 }
";

    static ToleranceKey[] Keys(params string[] t) => t.Select(ToleranceKey.Parse).ToArray();

    [Fact]
    public void Tolerances_resolve_around_the_scenario_value()
    {
        var s = TestScenarios.Parse(Divider);
        var (keys, nominal) = ToleranceSet.Resolve(s, Keys("load.r=tol(10%)", "source.resistance=tol(6%, normal)"));
        Assert.Equal([50.0, 50.0], nominal);
        Assert.Equal(45, keys[0].Distribution.Parameters[0], 1e-12);
        Assert.Equal(55, keys[0].Distribution.Parameters[1], 1e-12);
        Assert.Equal(DistributionKind.Normal, keys[1].Distribution.Kind);
        Assert.Equal(1.0, keys[1].Distribution.Parameters[1], 1e-12);   // σ = 50 Ω · 6 % / 3 (common practice, no source)
    }

    [Fact]
    public void Samples_depend_only_on_seed_and_index_so_shards_hold_the_same_rows()
    {
        var s = TestScenarios.Parse(Divider);
        var keys = Keys("load.r=tol(10%)", "source.resistance=normal(50, 2 ohm)", "load.c=0.1,0.2,0.5 pF");
        var whole = ToleranceSet.Build(s, keys, new ToleranceSetOptions { Samples = 30, Seed = 5, Force = true });
        foreach (int n in new[] { 1, 3, 4 })
        {
            var parts = Enumerable.Range(1, n).Reverse()
                .SelectMany(k => ToleranceSet.Build(s, keys, new ToleranceSetOptions { Samples = 30, Seed = 5, Force = true, Shard = new Shard(k, n) }).Points)
                .OrderBy(p => p.Index).ToArray();
            Assert.Equal(whole.Points.Select(p => p.Index), parts.Select(p => p.Index));
            Assert.Equal(whole.Points.SelectMany(p => p.Values), parts.SelectMany(p => p.Values));
        }
        var other = ToleranceSet.Build(s, keys, new ToleranceSetOptions { Samples = 30, Seed = 6, Force = true });
        Assert.NotEqual(whole.Points[0].Values, other.Points[0].Values);
    }

    [Fact]
    public void Corners_are_nominal_then_every_combination_of_the_ends()
    {
        var s = TestScenarios.Parse(Divider);
        var set = ToleranceSet.Build(s, Keys("load.r=uniform(40..60 ohm)", "source.resistance=normal(50, 2 ohm)", "load.c=0.1,0.2,0.5 pF"),
            new ToleranceSetOptions { Corners = true, Force = true });
        Assert.Equal(1 + 2 * 2 * 3, set.Total);
        Assert.Equal(50, set.Points[0].Values[0]);
        var combos = set.Points.Skip(1).Select(p => string.Join("|", p.Values)).ToHashSet();
        Assert.Equal(12, combos.Count);
        Assert.Contains(string.Join("|", new[] { 60.0, 56.0, 0.5e-12 }), combos);   // 50 + 3σ = 56 Ω
        Assert.Contains(string.Join("|", new[] { 40.0, 44.0, 0.1e-12 }), combos);
    }

    [Fact]
    public void A_divider_ranks_its_keys_as_its_formula_says()
    {
        // Settled level V = R/(Rs + R): dV/dRs < 0, dV/dR > 0; with Rs spread 20 % and R only 2 %, Rs dominates
        // (|∂V/∂ln Rs| = |∂V/∂ln R| = 1/4 at Rs = R, so the spread decides the ranking).
        var s = TestScenarios.Parse(Divider);
        var set = ToleranceSet.Build(s, Keys("source.resistance=tol(20%)", "load.r=tol(2%)"), new ToleranceSetOptions { Samples = 40, Seed = 3 });
        var limit = SweepLimit.Parse("rx.high<0.51V", set.Probes);
        var r = ToleranceRunner.Run(set, [limit]);
        var ranked = ToleranceSummary.Sensitivity(r, new ProbeFigure("rx", "high_V"));
        Assert.Equal("source.resistance", ranked[0].Key);
        Assert.True(ranked[0].Rho < -0.9, $"rho {ranked[0].Rho}");
        Assert.True(ranked[1].Rho > 0, $"rho {ranked[1].Rho}");
        foreach (var p in r.Points)
            Assert.Equal(p.Values[1] / (p.Values[0] + p.Values[1]), p.Figures[0].HighV!.Value, 2e-3);
        // Serial and parallel runs give the very same rows.
        var serial = ToleranceRunner.Run(set, [limit], new SweepRunOptions { Serial = true });
        Assert.Equal(r.Points.Select(p => p.Figures[0].HighV), serial.Points.Select(p => p.Figures[0].HighV));
    }

    [Theory]
    [InlineData("load.r=normal(50, -1 ohm)", "negative")]
    [InlineData("load.r=uniform(60..40 ohm)", "above the maximum")]
    [InlineData("load.r=tol(0%)", "greater than 0")]
    [InlineData("load.r=gauss(1,2)", "unknown distribution")]
    [InlineData("load.r", "expected KEY=DIST")]
    public void Malformed_distributions_are_refused(string text, string why)
    {
        var ex = Assert.Throws<InputException>(() => ToleranceKey.Parse(text));
        Assert.Contains(why, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void Impossible_draws_are_refused_naming_the_sample()
    {
        var s = TestScenarios.Parse(Divider);
        var over = Assert.Throws<InputException>(() => ToleranceSet.Build(s, Keys("load.r=tol(150%)")));
        Assert.Contains("tolerance of 150 % reaches below zero", over.Message);
        var draw = Assert.Throws<InputException>(() => ToleranceSet.Build(s, Keys("load.r=normal(1, 5 ohm)"), new ToleranceSetOptions { Samples = 50 }));
        Assert.StartsWith("sample ", draw.Message);
        Assert.Contains("refused, not drawn again", draw.Message);
        Assert.Throws<InputException>(() => ToleranceSet.Build(s, Keys("load.r=tol(5%)"), new ToleranceSetOptions { Samples = 0 }));
        Assert.Throws<InputException>(() => ToleranceSet.Build(s, Keys("load.x=tol(5%)")));
    }

    [Theory]
    [InlineData("0/4")]
    [InlineData("5/4")]
    [InlineData("2")]
    [InlineData("a/b")]
    public void Shards_out_of_range_are_refused(string text) => Assert.Throws<InputException>(() => Shard.Parse(text));

    [Fact]
    public void Slurm_array_variables_give_the_shard()
    {
        Shard From(string id, string count, string? min) => Shard.FromSlurm(n => n switch
        {
            "SLURM_ARRAY_TASK_ID" => id, "SLURM_ARRAY_TASK_COUNT" => count, "SLURM_ARRAY_TASK_MIN" => min, _ => null,
        });
        Assert.Equal(new Shard(1, 4), From("0", "4", "0"));
        Assert.Equal(new Shard(4, 4), From("4", "4", "1"));
        Assert.Equal(new Shard(3, 4), From("12", "4", "10"));
        Assert.Throws<InputException>(() => From("5", "4", "1"));
        Assert.Throws<InputException>(() => Shard.FromSlurm(_ => null));
    }
}
