using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Figures at probes whose node no line segment ends at: the driver's pin when a series part starts the line, a load behind a
/// series part and a shunt, a branch's load behind a series part. Expected values come from the lattice diagram (Johnson and
/// Graham, High-Speed Digital Design, 1993, ch. 4; from memory), the launch divider and reflection coefficient of Pozar,
/// Microwave Engineering, 4th ed. 2012, eq. 2.35 (ReferenceData/published-checks.md §10), and Ohm's law for the DC levels.
/// </summary>
public class SeriesPartFiguresTests
{
    const double Rs = 10, Rser = 33, Z0 = 50, Td = 1e-9, Rise = 100e-12, Delay = 0.5e-9;
    const double Ramp = 1.25 * Rise;   // the source's 0-100 % ramp (docs/scenario-format.md: edges ramp over 1.25 × the 10-90 % time)

    static string SeriesFirst(string low, string high) => $@"
source: {{ waveform: step, low: {low}, high: {high}, rise: 100 ps, delay: 0.5 ns, resistance: 10 ohm }}
line:
  - series: {{ r: 33 ohm }}
  - segment: {{ length: 0.2 m, z0: 50 ohm, delay: 5 ns/m }}
probes:
  - {{ name: drv, at: source }}
  - {{ name: rx, at: load }}
simulation: {{ duration: 8 ns }}
";

    [Theory]
    [InlineData("0 V", "1 V", true)]
    [InlineData("1 V", "0 V", false)]
    public void The_driver_pin_before_a_series_part_has_its_edge_figures(string low, string high, bool rising)
    {
        var r = TestScenarios.Run(SeriesFirst(low, high));
        var f = RunAnalysis.Figures(r).Single(x => x.Probe.Name == "drv").Figures;

        // Open far end: no DC current, so the pin settles at the source's level (Ohm's law); it starts at the other one.
        Assert.Equal(0, f.LowV!.Value, 1e-9);
        Assert.Equal(1, f.HighV!.Value, 1e-9);
        Assert.Equal(rising, f.Rising);

        // Lattice diagram, first round trip: the pin sits on the divider (Rser + Z0)/(Rs + Rser + Z0) of the source ramp, so it
        // crosses half the swing when the source is at 0.5/shelf of its ramp; the delay is measured from the source's 50 % instant.
        double shelf = (Rser + Z0) / (Rs + Rser + Z0);
        double expectedDelay = Ramp * (0.5 / shelf - 0.5);
        Assert.Equal(expectedDelay, f.Delay50S!.Value, 1e-12);

        // After 2·Td the open end's reflection (Γ = +1) meets the driver side Rt = Rs + Rser, whose node goes to
        // VB = a·(2 + Γs) with a = Z0/(Rt + Z0) and Γs = (Rt − Z0)/(Rt + Z0); the pin is then Vs − Rs·(Vs − VB)/Rt.
        double rt = Rs + Rser, a = Z0 / (rt + Z0), gs = (rt - Z0) / (rt + Z0);
        double vb = a * (2 + gs), pin = 1 - Rs * (1 - vb) / rt;
        Assert.Equal((pin - 1) * 100, f.OvershootPct!.Value, 0.05);

        // 10 % on the first ramp, 90 % on the ramp of the returning wave (shelf below 90 %): the shelf counts in the transition.
        double t10 = Ramp * 0.1 / shelf, t90 = 2 * Td + Ramp * (0.9 - shelf) / (pin - shelf);
        double? duration = rising ? f.Rise1090S : f.Fall9010S;
        Assert.Equal(t90 - t10, duration!.Value, 2e-12);
    }

    [Fact]
    public void A_load_behind_a_series_part_and_a_shunt_has_its_edge_figures()
    {
        // 10 ohm in series, then 200 ohm ∥ 50 ohm = 40 ohm: the line end sees 50 ohm, matched (Γ = 0, Pozar eq. 2.35).
        const string yaml = @"
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 50 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 5 ns/m }
  - series: { r: 10 ohm }
  - shunt: { r: 200 ohm }
load: { r: 50 ohm }
probes:
  - { name: rx, at: load }
simulation: { duration: 4 ns }
";
        var f = RunAnalysis.Figures(TestScenarios.Run(yaml)).Single().Figures;
        // The incident half swing divides 40/(10 + 40) across the load; DC divider 50 + 10 + 40 ohm gives the same 0.4 V.
        Assert.Equal(0, f.LowV!.Value, 1e-9);
        Assert.Equal(0.4, f.HighV!.Value, 1e-9);
        // No reflection: the load is the source ramp scaled and delayed by Td, so delay = Td, 10-90 % = the source's, no overshoot.
        Assert.Equal(Td, f.Delay50S!.Value, 1e-12);
        Assert.Equal(Rise, f.Rise1090S!.Value, 1e-12);
        Assert.Equal(0, f.OvershootPct!.Value, 1e-6);
    }

    [Fact]
    public void A_branch_load_behind_a_series_part_has_its_edge_figures()
    {
        // Two 100 ohm arms in parallel (50 ohm) continue the 50 ohm line; each ends matched: 100 ohm, and 10 + 90 ohm on the stub.
        const string yaml = @"
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 50 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 5 ns/m }
  - branch:
      name: stub
      line:
        - segment: { length: 0.1 m, z0: 100 ohm, delay: 5 ns/m }
        - series: { r: 10 ohm }
      load: { r: 90 ohm }
  - segment: { length: 0.1 m, z0: 100 ohm, delay: 5 ns/m }
load: { r: 100 ohm }
probes:
  - { name: rx1, at: stub/load }
simulation: { duration: 4 ns }
";
        var f = RunAnalysis.Figures(TestScenarios.Run(yaml)).Single().Figures;
        // No reflection anywhere: the tap sees 0.5 V, the stub's load 0.5 · 90/100 after Td + Td/2; DC: 50 ohm into 100 ∥ 100 ohm.
        Assert.Equal(0.45, f.HighV!.Value, 1e-9);
        Assert.Equal(1.5 * Td, f.Delay50S!.Value, 1e-12);
        Assert.Equal(Rise, f.Rise1090S!.Value, 1e-12);
        Assert.Equal(0, f.OvershootPct!.Value, 1e-6);
    }
}
