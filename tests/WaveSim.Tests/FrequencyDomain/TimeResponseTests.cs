using WaveSim.Core;
using WaveSim.Core.FrequencyDomain;

namespace WaveSim.Tests.FrequencyDomain;

/// <summary>The time response by numerical Laplace transform against the lattice diagram and against the leapfrog.</summary>
public class TimeResponseTests
{
    [Fact]
    public void Bounce_diagram_of_an_open_line_behind_a_low_resistance_driver()
    {
        // ReferenceData/published-checks.md §10, case B1 (standard lattice-diagram method, Γ from Pozar eq. 2.35): 1 V step, RS = 10 ohm, Z0 = 50 ohm, open end,
        // TD = 5 ns. The step is band-limited (100 ps rise); values read mid-plateau, within 1 %.
        var s = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 10 ohm }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }
load: open
probes:
  - { name: src, at: source }
  - { name: rx, at: load }
simulation: { duration: 50 ns }
");
        double td = 5e-9, t0 = 1e-9 + 0.5 * 1.25 * 100e-12;
        double[] times = [0, t0 + 2 * td, t0 + 4 * td, t0 + 6 * td, t0 + 8 * td, t0 + td, t0 + 3 * td, t0 + 5 * td, t0 + 7 * td];
        var r = FrequencyDomainSolver.TimeResponse(s, times);
        double[] load = r.Probe("rx").Volts, src = r.Probe("src").Volts;
        Assert.Equal(0, load[0], 1e-4);
        double[] expectLoad = [1.66667, 0.55556, 1.29630, 0.80247];  // B1: load, (T-3T), (3T-5T), (5T-7T), (7T-9T)
        double[] expectSrc = [0.83333, 1.11111, 0.92593, 1.04938];   // B1: source node, (0-2T), then each round trip
        for (int k = 0; k < 4; k++)
        {
            Assert.True(Math.Abs(load[1 + k] - expectLoad[k]) <= 0.01 * expectLoad[k], $"load plateau {k}: {load[1 + k]} vs {expectLoad[k]}");
            Assert.True(Math.Abs(src[5 + k] - expectSrc[k]) <= 0.01 * expectSrc[k], $"source plateau {k}: {src[5 + k]} vs {expectSrc[k]}");
        }
    }

    [Fact]
    public void Dc_operating_point_includes_the_initial_level_and_the_load_return_voltage()
    {
        // Ohm's law and superposition on a resistive divider (capacitors open at DC): driver 0.4 V behind 20 ohm, line of
        // 10 ohm total series resistance, load 70 ohm to 1 V. Node currents I = (0.4 − 1)/(20 + 10 + 70).
        var s = TestScenarios.Parse(@"
source: { waveform: step, low: 0.4 V, high: 1.4 V, rise: 100 ps, resistance: 20 ohm }
line:
  - segment: { length: 0.5 m, z0: 50 ohm, delay: 5 ns/m, r: 20 ohm/m }
  - series: { c: 1 nF }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 5 ns/m }
load: { r: 70 ohm, to: 1 V, c: 1 pF }
probes:
  - { name: src, at: source }
  - { name: before, at: 0.5 m }
  - { name: rx, at: load }
simulation: { duration: 5 ns }
");
        var dc = FrequencyDomainSolver.DcOperatingPoint(s);
        // The series capacitor blocks DC: the driver side sits at 0.4 V with no current, the load side at 1 V.
        Assert.Equal(0.4, dc.Volts[0], 12);
        Assert.Equal(0.4, dc.Volts[1], 12);
        Assert.Equal(1.0, dc.Volts[2], 12);
        Assert.Equal(0, dc.Amps[0], 12);
        var without = TestScenarios.Parse(@"
source: { waveform: step, low: 0.4 V, high: 1.4 V, rise: 100 ps, resistance: 20 ohm }
line:
  - segment: { length: 0.5 m, z0: 50 ohm, delay: 5 ns/m, r: 20 ohm/m }
load: { r: 70 ohm, to: 1 V, c: 1 pF }
simulation: { duration: 5 ns }
");
        var d2 = FrequencyDomainSolver.DcOperatingPoint(without);
        double i = (0.4 - 1) / (20 + 10 + 70.0);
        Assert.Equal(i, d2.Amps[0], 12);
        Assert.Equal(i, d2.Amps[1], 12);
        Assert.Equal(0.4 - 20 * i, d2.Volts[0], 12);
        Assert.Equal(1 + 70 * i, d2.Volts[1], 12);
    }

    [Theory]
    [InlineData(@"
source: { waveform: step, low: 0.2 V, high: 1.2 V, rise: 200 ps, delay: 0.5 ns, resistance: 25 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 6.7 ns/m, r: 20 ohm/m }
  - shunt: { c: 2 pF }
  - segment: { length: 0.15 m, z0: 60 ohm, delay: 6.7 ns/m, r: 30 ohm/m, g: 10 mS/m }
load: { r: 100 ohm, to: 0.5 V, c: 3 pF }
probes:
  - { name: src, at: source }
  - { name: mid, at: 0.1 m }
  - { name: shunt, at: 0.2 m }
  - { name: rx, at: load }
simulation: { duration: 25 ns }
")]
    [InlineData(@"
source: { waveform: pulse, high: 1 V, rise: 150 ps, width: 1 ns, delay: 0.3 ns, resistance: 15 ohm }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 6 ns/m, r: 10 ohm/m }
  - branch:
      name: stub
      line:
        - segment: { length: 30 mm, z0: 40 ohm, delay: 6 ns/m }
      load: { c: 1 pF }
  - series: { r: 10 ohm, l: 2 nH }
  - segment: { length: 0.1 m, z0: 65 ohm, delay: 6 ns/m, r: 10 ohm/m }
  - shunt: { r: 200 ohm, c: 5 pF }
load: { r: 50 ohm, l: 40 nH }
probes:
  - { name: src, at: source }
  - { name: tap, at: stub/source }
  - { name: stubend, at: stub/load }
  - { name: mid, at: 0.15 m }
  - { name: rx, at: load }
simulation: { duration: 15 ns }
")]
    public void Frequency_domain_and_leapfrog_agree_within_one_percent_of_the_swing(string yaml)
    {
        // Independent cross-check: frequency-domain ABCD cascade (per-frequency nodal solve, numerical Laplace transform) vs
        // time-domain leapfrog. Tolerance 1 % of each probe's swing (common practice, no source).
        var td = Simulate.Solve(TestScenarios.Parse(yaml));
        var diffs = FrequencyDomainCheck.Compare(td);
        Assert.Equal(td.Probes.Count, diffs.Count);
        foreach (var d in diffs)
            Assert.True(d.MaxDiffPct < 1, $"{d.Probe}: {d.MaxDiffV:E3} V = {d.MaxDiffPct:F3} % of the swing");
    }
}
