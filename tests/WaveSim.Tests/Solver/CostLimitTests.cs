using WaveSim.Core;
using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// What the plan's limits bound and what the solves cost, checked through counts (never wall time): the junction step's factor
/// grows linearly with the net, the estimates stay finite and refuse what would run for hours, and nets the dense solves could
/// not take (an extreme driver resistance, a very lossy R-G line) run, the latter to its closed-form DC level.
/// </summary>
public class CostLimitTests
{
    static string Chain(int segments, string sim = "{ duration: 1 ns, resolution: 10 }")
    {
        var sb = new System.Text.StringBuilder("title: chain\nsource: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 25 ohm }\nline:\n");
        for (int i = 0; i < segments; i++) sb.Append("  - segment: { length: 10 mm, z0: 50 ohm, delay: 6.6 ps/mm }\n");
        sb.Append("load: { r: 50 ohm }\nprobes:\n  - { name: rx, at: load }\nsimulation: ").Append(sim).Append('\n');
        return sb.ToString();
    }

    // 1,000 identical segments took 73 s and 234 MB with the dense inverse (10^6 entries, 10^6 multiply-adds per step).
    [Fact]
    public void The_junction_step_of_a_thousand_segments_factors_in_linear_size()
    {
        var s = TestScenarios.Parse(Chain(1000));
        var plan = Simulate.Plan(s);
        var net = NetworkBuilder.Build(s, plan);
        int unknowns = net.Junctions.Count + net.Branches.Count;
        Assert.Equal(unknowns, plan.StepUnknowns);
        var system = new JunctionSystem(net, plan.Dt);
        // A tree eliminated leaf-first: at most a few entries per unknown (a dense inverse has `unknowns` per unknown).
        Assert.True(system.FactorEntries <= 6L * unknowns, $"{system.FactorEntries} factor entries for {unknowns} unknowns");
    }

    // 1e200 ohm hung the run (the dense inverse's condition number did not return); 1e150 was called singular. The driver then
    // launches Vs·Z0/(Z0 + Rs) onto the line (Pozar, Microwave Engineering, 4th ed., section 2.3, the loaded line's voltage
    // divider at the source): 1 V · 50/(1e200) = 5e-199 V, zero for any tolerance.
    [Theory]
    [InlineData(1e150)]
    [InlineData(1e200)]
    [InlineData(1e300)]
    public void An_extreme_driver_resistance_runs_and_launches_nothing(double rs)
    {
        var s = TestScenarios.Parse(Chain(1, "{ duration: 0.3 ns, resolution: 10 }"));
        s = s with { Source = s.Source with { Resistance = rs } };
        var r = Simulate.Solve(s);
        double launch = 1 * 50 / (50 + rs);
        Assert.All(r.Probes[0].Volts, v => Assert.True(Math.Abs(v) <= 2 * launch, $"{v} V"));
    }

    // The issue's net: r 1 Mohm/m and g 1 MS/m over 100 mm (αl = 1e5) with a 25 ohm driver was refused as "a loop with no
    // resistance": the chain form of the DC ladder grew like e^(αl) past the range of a double. It is a plain resistive net.
    [Fact]
    public void A_very_lossy_resistive_line_runs()
    {
        var r = TestScenarios.Run("""
            title: rg
            source: { waveform: step, low: 1 V, high: 2 V, rise: 100 ps, resistance: 25 ohm }
            line:
              - segment: { length: 100 mm, z0: 50 ohm, delay: 6.6 ps/mm, r: 1 Mohm/m, g: 1 MS/m }
            load: { r: 50 ohm }
            probes:
              - { name: near, at: source }
            simulation: { duration: 1 ns, resolution: 10 }
            """);
        Assert.All(r.Probes[0].Volts, v => Assert.True(double.IsFinite(v) && v > 0 && v < 1, $"{v} V"));
    }

    // The same line over 40 µm (αl = 40, where the chain form's e^40 = 2e17 already failed its residual check) on 100,000 cells
    // (α·dz = 4e-4, so the ladder's O((α·dz)²) difference from the line is below 1e-7), open at the far end. The DC solution of the
    // telegrapher's equations (ω = 0: dV/dx = −R·I, dI/dx = −G·V): α = √(RG) = 1e6 /m, Z0 = √(R/G) = 1 ohm, Rin = Z0·coth(αl),
    // V(l) = V(0)/cosh(αl) (Pozar, Microwave Engineering, 4th ed., section 2.7, the lossy line's γ and Zin with ZL → ∞;
    // Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, the lossy line's chain parameters at ω = 0).
    [Fact]
    public void A_very_lossy_resistive_line_settles_at_its_closed_form_dc_level()
    {
        var r = TestScenarios.Run("""
            title: rg fine
            source: { waveform: step, low: 1 V, high: 2 V, rise: 100 ps, resistance: 25 ohm }
            line:
              - segment: { length: 40 um, z0: 50 ohm, delay: 5 ns/m, r: 1 Mohm/m, g: 1 MS/m }
            load: open
            probes:
              - { name: near, at: source }
              - { name: far, at: load }
            simulation: { duration: 1e-17 s, resolution: 100000 }
            """);
        double al = Math.Sqrt(1e6 * 1e6) * 40e-6, z0 = Math.Sqrt(1e6 / 1e6);
        double rin = z0 / Math.Tanh(al), vin = 1 * rin / (25 + rin), vfar = vin / Math.Cosh(al);
        Assert.Equal(0, r.Time[0]);
        Assert.True(Math.Abs(r.Probes[0].Volts[0] / vin - 1) < 1e-6, $"near {r.Probes[0].Volts[0]} V against {vin} V");
        Assert.True(Math.Abs(r.Probes[1].Volts[0] / vfar - 1) < 1e-6, $"far {r.Probes[1].Volts[0]} V against {vfar} V");
    }

    // An output step of 1e-18 s over 1000 s: 1e21 rows. The row count wrapped to negative and the memory estimate to 184 B, so
    // only the cell updates refused it. Estimates by hand (GridPlan.MemoryBytes: 8 bytes per value of each row, one time column
    // and two per probe): about 1e21 × 3 × 8 B.
    [Fact]
    public void An_absurdly_fine_output_step_is_refused_by_memory_with_its_estimate()
    {
        var s = TestScenarios.Parse(Chain(1, "{ duration: 1000 s, output_step: 1e-18 s, resolution: 10 }"));
        var plan = Simulate.Plan(s);
        Assert.True(plan.OutputRows > 0);
        Assert.InRange(plan.EstimatedBytes, 0.9 * 1e21 * 3 * 8, 1.1 * 1e21 * 3 * 8);
        var ex = Assert.Throws<PlanLimitException>(() => Simulate.CheckLimits(s, plan));
        Assert.Equal("memory", ex.Exceeded[0].Limit);
        Assert.Contains("simulation.output_step", ex.Message);
        Assert.Contains("2.4E+22 B", ex.Message);
        Assert.DoesNotContain("--", ex.Message);
    }

    // One 6.6 ps cell for 66 ms: 1e10 steps, 1e10 cell updates (under 1e11) and a thin output record, so neither the memory
    // nor the cell-update limit stopped it; at about 0.5 µs a step (docs/PERFORMANCE.md) it runs for 1.4 h.
    [Fact]
    public void Ten_billion_steps_on_one_cell_are_refused_by_their_run_time()
    {
        var s = TestScenarios.Parse("""
            title: one cell
            source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 25 ohm }
            line:
              - segment: { length: 1 mm, z0: 50 ohm, delay: 6.6 ps/mm }
            load: { r: 50 ohm }
            probes:
              - { name: rx, at: load }
            simulation: { duration: 66 ms, output_step: 66 ms, resolution: 1 }
            """);
        var plan = Simulate.Plan(s);
        Assert.Equal(1, plan.TotalCells);
        Assert.True(plan.CellUpdates < GridPlan.CellUpdateLimit && plan.EstimatedBytes < GridPlan.MemoryLimitBytes);
        var ex = Assert.Throws<PlanLimitException>(() => Simulate.CheckLimits(s, plan));
        Assert.Equal(["run time"], ex.Exceeded.Select(x => x.Limit));
        Assert.True(ex.Exceeded[0].Needed > 3600, $"{ex.Exceeded[0].Needed} s");
        Assert.Contains(" h and ", ex.Message);
        Assert.DoesNotContain("--", ex.Message);
    }

    // 100,000 distinct delays: the candidate search checked up to 2000 candidates per delay against every delay (over a minute).
    [Fact]
    public void Choosing_the_step_for_a_hundred_thousand_distinct_delays_stays_within_its_budget()
    {
        var delays = Enumerable.Range(0, 100_000).Select(i => 66e-12 * (1 + i * 1e-5)).ToArray();
        double dt = GridPlan.ChooseDt(delays, 6.6e-12, out long visits);
        Assert.True(dt > 0 && dt <= 6.6e-12);
        Assert.True(visits <= GridPlan.ChooseDtBudget + delays.Length, $"{visits} visits");
    }

    // 300 segments took over 120 s in the frequency-domain check with no estimate; a net 100 times longer over a long record
    // is refused before anything runs, with its estimate, and the library names no option.
    [Fact]
    public void The_frequency_domain_check_is_estimated_and_bounded()
    {
        var s = TestScenarios.Parse(Chain(300, "{ duration: 10 ns, resolution: 10 }"));
        var (seconds, _) = FrequencyDomainCheck.Estimate(s, Simulate.Plan(s));
        Assert.True(seconds < GridPlan.RunTimeLimitSeconds);
        FrequencyDomainCheck.CheckLimits(s, Simulate.Plan(s));
        var big = TestScenarios.Parse(Chain(30_000, "{ duration: 1 us, resolution: 10 }"));
        var ex = Assert.Throws<PlanLimitException>(() => FrequencyDomainCheck.CheckLimits(big, Simulate.Plan(big)));
        Assert.StartsWith("the frequency-domain check would take about", ex.Message);
        Assert.DoesNotContain("--", ex.Message);
    }
}
