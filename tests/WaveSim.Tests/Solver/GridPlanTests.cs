using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// The grid rules. Source: the Courant-Friedrichs-Lewy condition for the 1-D leapfrog, S = v·dt/dz ≤ 1
/// (Courant, Friedrichs and Lewy 1928; Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2;
/// Taflove and Hagness 2005, ch. 2; ReferenceData/published-checks.md §9: above S = 1 the worst mode grows by 2S² − 1 + 2S√(S² − 1) per step).
/// </summary>
public class GridPlanTests
{
    [Fact]
    public void A_delay_that_is_a_whole_number_of_steps_gets_exactly_that_many_cells()
    {
        // 80 mm at 7.5 ns/m = 600 ps over 20 ps: 30 cells, not 31 (floating-point 600e-12/20e-12 is not exactly 30).
        Assert.Equal(30, GridPlan.CellsFor(0.080 * 7.5e-9, 20e-12));
        Assert.Equal(3, GridPlan.CellsFor(0.3e-9, 0.1e-9));
    }

    [Fact]
    public void Every_segment_has_a_Courant_number_at_most_one()
    {
        var plan = WaveSim.Core.Simulate.Plan(TestScenarios.Parse(Scenario("6.1 ns/m", "7 ns/m")));
        Assert.All(plan.Segments, s => Assert.True(s.Courant <= 1 + 1e-12, $"{s.Where}: S = {s.Courant}"));
        Assert.All(plan.Segments, s => Assert.True(s.Courant > 0.9, $"{s.Where}: S = {s.Courant} is needlessly low"));
    }

    [Fact]
    public void Two_segments_with_unrelated_delays_stay_bounded_over_a_long_run()
    {
        // With S ≤ 1 on every segment the leapfrog cannot grow; a step into a matched load settles at the divider value.
        var r = TestScenarios.Run(Scenario("6.1 ns/m", "7 ns/m"));
        foreach (var p in r.Probes) Assert.All(p.Volts, v => Assert.InRange(v, -0.1, 3.5));
        Assert.Equal(3.3 * 50 / 65, r.Probe("load").Volts[^1], 1e-6);
    }

    [Fact]
    public void Commensurate_delays_get_a_step_that_makes_every_Courant_number_exactly_one()
    {
        // 150 mm at 6 ns/m (900 ps) and 10 mm at 6 ns/m (60 ps): a common step exists.
        var plan = WaveSim.Core.Simulate.Plan(TestScenarios.Parse(Scenario("6 ns/m", "6 ns/m", "10 mm")));
        Assert.All(plan.Segments, s => Assert.Equal(1.0, s.Courant, 1e-9));
    }

    static string Scenario(string d1, string d2, string len2 = "8 mm") => $@"
source: {{ waveform: step, high: 3.3 V, rise: 500 ps, delay: 1 ns, resistance: 15 ohm }}
line:
  - segment: {{ length: 150 mm, z0: 50 ohm, delay: {d1} }}
  - segment: {{ length: {len2}, z0: 50 ohm, delay: {d2} }}
load: {{ r: 50 ohm }}
simulation: {{ duration: 30 ns }}
";
}
