using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// Source edges the grid cannot carry are widened to a few solver steps, and figures likely to be spoiled by the leapfrog's
/// numerical dispersion are warned about (Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2;
/// ReferenceData/published-checks.md §9).
/// </summary>
public class SourceEdgeTests
{
    /// <summary>
    /// A matched 50 ohm net of four segments whose delays no common step fits: two of them sit at Courant number 0.975.
    /// Driven through 50 ohm into a 50 ohm load, the far end steps to exactly V·Z0/(Z0 + Rs) = 0.5 V and stays there
    /// (Pozar, Microwave Engineering, 4th ed., eq. 2.35 with Γ = 0 at both ends).
    /// </summary>
    const string Matched = @"
source: { waveform: step, high: 1 V, rise: 0 s, resistance: 50 ohm }
line:
  - segment: { length: 58 mm, z0: 50 ohm, delay: 0.39 ns }
  - segment: { length: 60 mm, z0: 50 ohm, delay: 0.4 ns }
  - segment: { length: 127 mm, z0: 50 ohm, delay: 0.85 ns }
  - segment: { length: 74 mm, z0: 50 ohm, delay: 0.495 ns }
load: { r: 50 ohm }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 8 ns, resolution: 4 }
";

    [Fact]
    public void An_ideal_step_on_a_matched_net_below_Courant_1_peaks_within_1_percent_of_the_exact_half_volt()
    {
        var s = TestScenarios.Parse(Matched);
        var plan = Simulate.Plan(s);
        Assert.Contains(plan.Segments, p => p.Courant < 0.98);   // the grid does disperse here
        var r = Simulate.Solve(s);
        double peak = r.Probe("rx").Volts.Max();
        Assert.True(Math.Abs(peak - 0.5) <= 0.01 * 0.5, $"peak {peak} V, exact 0.5 V");
        Assert.Equal(0.5, r.Probe("rx").Volts[^1], 1e-3);
    }

    [Fact]
    public void The_widened_edge_is_a_Gaussian_filtered_step_of_the_minimum_10_90_time()
    {
        // The driver's node behind a matched line is VS/2 while nothing returns, so its 10-90 time is the source edge's own.
        // A Gaussian-filtered step's 10-90 time is 2√2·erf⁻¹(0.8)·σ (the normal distribution's 10 % and 90 % points are ∓1.2816σ,
        // Abramowitz and Stegun, Handbook of Mathematical Functions, Table 26.5, from memory); it is set to 6 time steps.
        var s = TestScenarios.Parse(Matched);
        var plan = Simulate.Plan(s);
        var r = Simulate.Solve(s);
        double t10 = r.FirstCrossing("drv", 0.05), t90 = r.FirstCrossing("drv", 0.45);
        Assert.Equal(2 * 1.2815515655446004, SourceWaveform.GaussianTenNinetyOverSigma, 1e-9);
        Assert.Equal(GridPlan.MinimumEdgeSteps * plan.Dt, t90 - t10, 0.25 * plan.Dt);
        // Its 50 % instant is the middle of the edge, 4σ after the edge starts; the delay figure uses it.
        Assert.Equal(4 * plan.MinimumEdge / SourceWaveform.GaussianTenNinetyOverSigma, r.Scenario.Source.FirstEdgeMidpoint, 1e-15);
    }

    [Fact]
    public void At_Courant_number_1_an_ideal_step_is_carried_exactly_and_not_widened()
    {
        // ReferenceData/published-checks.md §9: at S = 1 any waveform moves exactly one cell per step ("magic time step",
        // Taflove and Hagness 2005, ch. 2). One matched segment: the far end is 0 V, then exactly 0.5 V after the 1 ns delay
        // (Pozar eq. 2.35, Γ = 0), with no ringing.
        var s = TestScenarios.Parse(Matched.Replace(@"  - segment: { length: 60 mm, z0: 50 ohm, delay: 0.4 ns }
  - segment: { length: 127 mm, z0: 50 ohm, delay: 0.85 ns }
  - segment: { length: 74 mm, z0: 50 ohm, delay: 0.495 ns }
", ""));
        var plan = Simulate.Plan(s);
        Assert.True(plan.CarriesAnyEdge);
        Assert.Empty(EdgeLimit.WidenedEdges(s.Source, plan));
        var r = Simulate.Solve(s);
        var v = r.Probe("rx").Volts;
        Assert.Equal(0.5, v.Max(), 1e-12);
        Assert.Equal(0.5, r.At("rx", 0.39e-9 + 2 * plan.Dt), 1e-12);
        Assert.Equal(0, r.At("rx", 0.39e-9 - 2 * plan.Dt), 1e-12);
    }

    [Fact]
    public void A_rise_the_grid_carries_is_run_unchanged_as_a_linear_ramp()
    {
        // A 10-90 % time of 1 ns is far above 6 steps: the edge stays the documented linear ramp of 1.25 × rise, so the driver's
        // node (VS/2 behind the matched line) is exactly 0.25 V half way up the ramp.
        var s = TestScenarios.Parse(Matched.Replace("rise: 0 s", "rise: 1 ns"));
        Assert.Empty(EdgeLimit.WidenedEdges(s.Source, Simulate.Plan(s)));
        var r = Simulate.Solve(s);
        Assert.Equal(0.25, r.At("drv", 0.625e-9), 1e-3);
    }

    [Theory]
    // ReferenceData/published-checks.md §9 (Taflove and Hagness 2005, ch. 2; derived, tol 1e-5): v~/v at S and N_lambda cells per wavelength.
    [InlineData(0.5, 10, 0.98726)]
    [InlineData(0.5, 20, 0.99689)]
    [InlineData(0.5, 40, 0.99923)]
    [InlineData(0.9, 10, 0.99675)]
    [InlineData(0.9, 20, 0.99921)]
    [InlineData(0.99, 10, 0.99966)]
    public void The_phase_lag_follows_the_leapfrog_dispersion_relation(double courant, double cellsPerWavelength, double ratio)
    {
        // k·dz = 2π/N_lambda; ω·dt = S·k·dz; v~/v = k/k~ = k·dz/(k·dz + lag).
        double kdz = 2 * Math.PI / cellsPerWavelength;
        double lag = DispersionBound.PhaseLagPerCell(courant, courant * kdz);
        Assert.Equal(ratio, kdz / (kdz + lag), 1e-5);
        Assert.Equal(0, DispersionBound.PhaseLagPerCell(1, 1.0), 1e-12);   // the magic time step: no dispersion at S = 1
    }

    /// <summary>The matched net with a long third segment and a 300 ps linear edge: the grid's dispersion grows with the distance.</summary>
    static readonly string Long = Matched.Replace("rise: 0 s", "rise: 300 ps").Replace("length: 127 mm, z0: 50 ohm, delay: 0.85 ns", "length: 2540 mm, z0: 50 ohm, delay: 17 ns")
        .Replace("duration: 8 ns", "duration: 22 ns");

    [Fact]
    public void A_net_whose_figures_dispersion_can_spoil_is_warned_about_and_the_bound_holds()
    {
        var s = TestScenarios.Parse(Long);
        var plan = Simulate.Plan(s);
        var w = Assert.Single(ScenarioWarnings.For(s, plan));
        Assert.StartsWith("line[", w.Key);
        Assert.Contains("numerical dispersion", w.Message);

        // The bound is an upper bound: the run's largest departure from the exact 0.5 V (Pozar eq. 2.35, Γ = 0) stays below it.
        var (_, path) = Assert.Single(DispersionBound.Paths(s, plan));
        double bound = DispersionBound.OnePass(DispersionBound.LinearRamp(1.25 * 300e-12), path, plan.Dt);
        Assert.True(bound > ScenarioWarnings.DispersionLimit);
        var r = Simulate.Solve(s);
        double overshoot = (r.Probe("rx").Volts.Max() - 0.5) / 0.5;
        Assert.True(overshoot > 0.002, $"overshoot {overshoot:P2}: the net should show some dispersion");
        Assert.True(overshoot <= bound, $"overshoot {overshoot:P2}, bound {bound:P2}");

        // The net as first given (ideal edge, widened to a Gaussian-filtered step) is not warned about.
        var quiet = TestScenarios.Parse(Matched);
        Assert.DoesNotContain(ScenarioWarnings.For(quiet, Simulate.Plan(quiet)), x => x.Message.Contains("dispersion"));
    }
}
