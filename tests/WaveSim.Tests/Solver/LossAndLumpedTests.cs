namespace WaveSim.Tests.Solver;

/// <summary>Per-length parameters, losses, lumped parts and conservation, each against a closed form named beside it.</summary>
public class LossAndLumpedTests
{
    [Fact]
    public void Per_length_L_and_C_give_velocity_one_over_root_LC_and_impedance_root_L_over_C()
    {
        // ReferenceData/published-checks.md §6, case L1 (Pozar ch. 2; Paul 2008): L = 250 nH/m, C = 100 pF/m → Z0 = 50 ohm, v = 2e8 m/s.
        var r = TestScenarios.Run(@"
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 100 ohm }
line: [ { segment: { length: 2 m, l: 250 nH/m, c: 100 pF/m } } ]
load: { r: 50 ohm }
probes: [ { name: src, at: source }, { name: rx, at: load } ]
simulation: { duration: 20 ns }
");
        // Arrival: 50 % point at t_mid + 2 m / 2e8 m/s = t_mid + 10 ns.
        double tMid = 1e-9 + 0.5 * 1.25 * 100e-12;
        Assert.Equal(tMid + 10e-9, r.FirstCrossing("rx", 0.5 * r.At("rx", 19e-9)), 1e-12);
        // Impedance seen at the source before any reflection: V = Vs Z0/(Z0 + Rs) → Z0 = Rs V/(Vs − V).
        double v = r.At("src", 5e-9);
        Assert.Equal(50.0, 100 * v / (1 - v), 1e-6);
    }

    [Fact]
    public void Distortionless_line_carries_the_step_undistorted_attenuated_by_exp_minus_R_z_over_Z0()
    {
        // ReferenceData/published-checks.md §7 (Pozar section 2.7, Heaviside's condition R/L = G/C): L = 250 nH/m, C = 100 pF/m, R = 5 ohm/m,
        // G = 2 mS/m, 10 m, both ends matched, 1 V via 50 ohm: far end 0.5·e^-1 = 0.18394 V from 50 ns on, flat. Tolerance 0.5 %.
        var r = TestScenarios.Run(@"
source: { waveform: step, high: 1 V, rise: 1 ns, delay: 0 ns, resistance: 50 ohm }
line: [ { segment: { length: 10 m, l: 250 nH/m, c: 100 pF/m, r: 5 ohm/m, g: 2 mS/m } } ]
load: { r: 50 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 80 ns, resolution: 10 }
");
        double expected = 0.5 * Math.Exp(-1);
        Assert.Equal(expected, r.At("rx", 55e-9), expected * 0.005);
        Assert.Equal(expected, r.At("rx", 79e-9), expected * 0.005);
        Assert.True(Math.Abs(r.At("rx", 45e-9)) < 1e-6, "nothing arrives before the line's delay");
    }

    [Fact]
    public void Shunt_capacitance_on_a_matched_line_reflects_a_dip_with_time_constant_Z0_C_over_2()
    {
        // ReferenceData/published-checks.md §11 (Laplace transform, as in Bogatin's TDR chapter): shunt C on a matched line, Γ(s) = −sτ/(1 + sτ), τ = Z0·C/2; for a fast edge the reflected
        // dip at the source decays as exp(−t/τ). 1 pF in 50 ohm: τ = 25 ps; the dip's area is −Z0·C/2 per volt incident.
        var r = TestScenarios.Run(@"
source: { waveform: step, high: 1 V, rise: 5 ps, delay: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 1 ns }
  - shunt: { c: 10 pF }
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 1 ns }
load: { r: 50 ohm }
probes: [ { name: src, at: source } ]
simulation: { duration: 4 ns, resolution: 10 }
");
        // 10 pF: τ = 250 ps. Reflected wave at the source (incident 0.5 V): v_r(t) = −0.5 exp(−(t − t_arrival)/τ).
        double tau = 50 * 10e-12 / 2, tArr = 100e-12 + 1.25 * 5e-12 / 2 + 2e-9;
        foreach (double dtAfter in new[] { 1.0, 2.0, 3.0 })
        {
            double vr = r.At("src", tArr + dtAfter * tau) - 0.5;
            Assert.Equal(-0.5 * Math.Exp(-dtAfter), vr, 0.01);
        }
        // Area of the dip: ∫ v_r dt = −V_inc·Z0·C/2.
        double area = 0;
        for (int k = 1; k < r.Time.Length; k++)
            if (r.Time[k] > 1.5e-9) area += (r.Probe("src").Volts[k] - 0.5) * (r.Time[k] - r.Time[k - 1]);
        Assert.Equal(-0.5 * tau, area, 0.5 * tau * 0.01);
    }

    [Fact]
    public void RC_dominated_line_reaches_half_at_the_open_end_after_0_38_RC()
    {
        // ReferenceData/published-checks.md §8, grid case: L = 250 nH/m, C = 100 pF/m, r = 5 kohm/m, l = 1 m (R = 100·Z0, RC = 500 ns):
        // t50 = 0.3787 RC = 189.4 ns (slab-diffusion series, Carslaw and Jaeger 1959, from memory). Tolerance 1 %.
        var r = TestScenarios.Run(@"
source: { waveform: step, high: 1 V, rise: 1 ns, delay: 0 ns }
line: [ { segment: { length: 1 m, l: 250 nH/m, c: 100 pF/m, r: 5 kohm/m } } ]
probes: [ { name: rx, at: load } ]
simulation: { duration: 400 ns, resolution: 5 }
");
        double t50 = r.FirstCrossing("rx", 0.5);
        Assert.Equal(189.4e-9, t50, 189.4e-9 * 0.01);
    }

    [Theory]
    [InlineData("open")]
    [InlineData("short")]
    public void Lossless_line_keeps_its_stored_energy_once_the_ideal_source_is_back_at_zero(string load)
    {
        // Conservation of energy on the staggered grid: E^n = ½ Σ C dz (V^n)² + ½ Σ L dz I^{n−1/2} I^{n+1/2}
        // (the discrete energy the leapfrog conserves; Taflove and Hagness 2005, ch. 2, from memory). An ideal (0 ohm)
        // source at 0 V and an open or shorted far end absorb nothing, so E is constant to rounding.
        var r = TestScenarios.Run($@"
source: {{ waveform: pulse, high: 1 V, rise: 100 ps, width: 1 ns, delay: 0 ns }}
line: [ {{ segment: {{ length: 1 m, z0: 50 ohm, delay: 5 ns }} }} ]
load: {load}
probes: [ {{ name: rx, at: load }} ]
simulation: {{ duration: 40 ns, resolution: 10 }}
", new WaveSim.Core.Solver.SimulationOptions { TrackEnergy = true });
        var e = r.Energy!;
        int from = (int)(2e-9 / r.Plan.Dt);
        double e0 = e[from];
        Assert.True(e0 > 1e-12, "energy was put on the line");
        for (int n = from; n < e.Length; n++)
            Assert.True(Math.Abs(e[n] - e0) < 1e-12 * e0 + 1e-24, $"step {n}: {e[n]:E6} vs {e0:E6}");
    }

    [Fact]
    public void Terminated_to_a_voltage_starts_from_its_DC_operating_point_without_ringing()
    {
        // DC divider (Ohm's law): 0 V source through 25 ohm, lossless line, 50 ohm to 1.5 V → every node at 1.5·25/75 = 0.5 V.
        var r = TestScenarios.Run(@"
source: { waveform: step, low: 0 V, high: 0 V, rise: 1 ns, delay: 5 ns, resistance: 25 ohm }
line: [ { segment: { length: 0.3 m, z0: 50 ohm, delay: 2 ns } }, { shunt: { c: 2 pF } }, { series: { r: 10 ohm, l: 1 nH } }, { segment: { length: 0.1 m, z0: 60 ohm, delay: 0.5 ns } } ]
load: { r: 50 ohm, to: 1.5 V, c: 1 pF }
probes: [ { name: src, at: source }, { name: rx, at: load } ]
simulation: { duration: 10 ns }
");
        double iDc = 1.5 / (25 + 10 + 50);
        foreach (var p in r.Probes)
            for (int k = 0; k < r.Time.Length; k++)
            {
                Assert.Equal(0, p.Amps[k] + iDc, 1e-12);
                Assert.Equal(p.Name == "src" ? 25 * -iDc * -1 : 1.5 - 50 * iDc, p.Volts[k], 1e-12);
            }
    }
}
