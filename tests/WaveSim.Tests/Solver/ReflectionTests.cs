namespace WaveSim.Tests.Solver;

/// <summary>
/// Reflections on lossless lines against closed forms. Sources: Pozar, Microwave Engineering, 4th ed. 2012, eq. 2.35
/// (Γ = (ZL − Z0)/(ZL + Z0)) and the lattice-diagram method (e.g. Johnson and Graham, High-Speed Digital Design, 1993, ch. 4;
/// from memory); the launch voltage VS·Z0/(Z0 + RS) is the voltage divider at the source.
/// </summary>
public class ReflectionTests
{
    static string Net(string sourceR, string load, string rise = "100 ps", string extraLine = "", string duration = "20 ns") => $@"
source: {{ waveform: step, low: 0 V, high: 1 V, rise: {rise}, delay: 1 ns, resistance: {sourceR} }}
line:
  - segment: {{ length: 1 m, z0: 50 ohm, delay: 5 ns }}
{extraLine}
load: {load}
probes:
  - {{ name: src, at: source }}
  - {{ name: mid, at: 0.5 m }}
  - {{ name: rx, at: load }}
simulation: {{ duration: {duration} }}
";

    [Fact]
    public void Matched_line_delivers_the_source_waveform_halved_and_delayed_with_no_reflection()
    {
        // Rs = Z0 = RL: far end = Vs(t − T)/2 exactly (no reflection); Pozar eq. 2.35 with Γ = 0 at both ends.
        var r = TestScenarios.Run(Net("50 ohm", "{ r: 50 ohm }"));
        var src = r.Scenario.Source;
        double worst = 0;
        for (int k = 0; k < r.Time.Length; k++)
        {
            double t = r.Time[k];
            worst = Math.Max(worst, Math.Abs(r.Probe("rx").Volts[k] - 0.5 * src.Value(t - 5e-9)));
            worst = Math.Max(worst, Math.Abs(r.Probe("src").Volts[k] - 0.5 * src.Value(t)));
        }
        Assert.True(worst < 1e-9, $"largest deviation {worst:E3} V");
    }

    [Theory]
    [InlineData("open", 1.0)]
    [InlineData("short", -1.0)]
    [InlineData("{ r: 75 ohm }", 0.2)]
    [InlineData("{ r: 25 ohm }", -1.0 / 3)]
    [InlineData("{ r: 100 ohm }", 1.0 / 3)]
    [InlineData("{ r: 150 ohm }", 0.5)]
    public void Load_reflects_gamma_of_the_incident_step(string load, double gamma)
    {
        // Matched source: incident 0.5 V; at the load v = 0.5(1 + Γ) after the edge (Pozar eq. 2.35; ReferenceData/published-checks.md §10).
        var r = TestScenarios.Run(Net("50 ohm", load));
        double settled = r.At("rx", 1e-9 + 5e-9 + 2e-9);
        Assert.Equal(0.5 * (1 + gamma), settled, 1e-9);
        // The reflection reaches the source after the round trip and stays (matched source absorbs it).
        Assert.Equal(0.5 * (1 + gamma), r.At("src", 1e-9 + 10e-9 + 2e-9), 1e-9);
        Assert.Equal(0.5, r.At("src", 1e-9 + 5e-9), 1e-9);
    }

    [Fact]
    public void Bounce_diagram_follows_the_geometric_series_of_the_two_reflection_coefficients()
    {
        // ReferenceData/published-checks.md §10, case B1 (standard lattice-diagram method, Γ from Pozar eq. 2.35): 1 V step, RS = 10 ohm, Z0 = 50 ohm, open end, TD = 5 ns.
        // Expected values computed here from the lattice formula, not from the solver:
        // V_load(k-th arrival) = V_launch (1 + ΓL) Σ_{m<k} (ΓS ΓL)^m, settling at the DC divider value (open end: 1 V).
        var r = TestScenarios.Run(Net("10 ohm", "open", rise: "100 ps", duration: "200 ns"));
        double z0 = 50, rs = 10, gs = (rs - z0) / (rs + z0), gl = 1, launch = z0 / (z0 + rs), td = 5e-9, t0 = 1e-9 + 0.5 * 1.25 * 100e-12;
        double sum = 0;
        for (int k = 0; k < 5; k++)
        {
            sum += launch * (1 + gl) * Math.Pow(gs * gl, k);
            double t = t0 + (2 * k + 1) * td + td; // mid-plateau between arrivals
            Assert.Equal(sum, r.At("rx", t), 1e-9);
        }
        Assert.Equal(1.66667, r.At("rx", t0 + 2 * td), 1e-5);   // B1 table values
        Assert.Equal(0.55556, r.At("rx", t0 + 4 * td), 1e-5);
        Assert.Equal(1.29630, r.At("rx", t0 + 6 * td), 1e-5);
        Assert.Equal(0.83333, r.At("src", t0 + td), 1e-5);
        Assert.Equal(1.11111, r.At("src", t0 + 3 * td), 1e-5);
        Assert.Equal(1.0, r.At("rx", 200e-9), 1e-3);            // DC divider: open end, 1 V
    }

    [Theory]
    [InlineData(50, 75)]
    [InlineData(50, 25)]
    [InlineData(75, 50)]
    public void Step_into_a_second_impedance_transmits_two_z2_over_z1_plus_z2(double z1, double z2)
    {
        // Transmission coefficient τ = 1 + Γ = 2 Z2/(Z1 + Z2) (Pozar, section 2.3). Both ends matched to their own line.
        var r = TestScenarios.Run($@"
source: {{ waveform: step, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: {z1} ohm }}
line:
  - segment: {{ length: 0.5 m, z0: {z1} ohm, delay: 2.5 ns }}
  - segment: {{ length: 0.5 m, z0: {z2} ohm, delay: 2.5 ns }}
load: {{ r: {z2} ohm }}
probes: [ {{ name: rx, at: load }}, {{ name: src, at: source }} ]
simulation: {{ duration: 12 ns }}
");
        double tau = 2 * z2 / (z1 + z2);
        Assert.Equal(0.5 * tau, r.At("rx", 8e-9), 1e-9);
        Assert.Equal(0.5 * (1 + (z2 - z1) / (z2 + z1)), r.At("src", 8e-9), 1e-9);
    }

    [Fact]
    public void A_junction_into_two_matched_lines_transmits_two_thirds()
    {
        // A Z0 line splitting into two matched Z0 lines sees Z0/2: Γ = −1/3, τ = 2/3 (textbook junction rule, Pozar section 2.3).
        var r = TestScenarios.Run(@"
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 50 ohm }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }
  - branch:
      name: stub
      line: [ { segment: { length: 1 m, z0: 50 ohm, delay: 5 ns } } ]
      load: { r: 50 ohm }
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }
load: { r: 50 ohm }
probes: [ { name: rx, at: load }, { name: stub_end, at: stub/load }, { name: src, at: source } ]
simulation: { duration: 20 ns }
");
        Assert.Equal(0.5 * 2.0 / 3, r.At("rx", 13e-9), 1e-9);
        Assert.Equal(0.5 * 2.0 / 3, r.At("stub_end", 13e-9), 1e-9);
        Assert.Equal(0.5 * 2.0 / 3, r.At("src", 13e-9), 1e-9);
    }
}
