using WaveSim.Core;
using WaveSim.Core.Coupled;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Scenarios;

/// <summary>The coupled form of a scenario: what it reads, and one-line errors with file, line and key for bad input.</summary>
public class CoupledLoaderTests
{
    const string Good = """
conductors: [aggr, quiet]
coupled:
  - section:
      length: 10 in
      l: [[9.9 nH/in, 1.5 nH/in], [1.5 nH/in, 9.9 nH/in]]
      c: [[3.6 pF/in, -0.4 pF/in], [-0.4 pF/in, 3.6 pF/in]]
      r: [5 ohm/m, 5 ohm/m]
near:
  - { at: aggr, source: { waveform: step, high: 1 V, rise: 200 ps, delay: 0.5 ns, resistance: 50 ohm } }
  - { at: quiet, r: 50 ohm }
far:
  - { at: aggr, r: 50 ohm }
  - { at: quiet, r: 50 ohm }
  - { at: aggr, to: quiet, r: 100 ohm }
probes:
  - { name: drv,  at: aggr/near }
  - { name: next, at: quiet/near }
  - { name: mid,  at: quiet/5 in }
  - { name: rxd,  at: far, between: [aggr, quiet] }
simulation:
  duration: 10 ns
""";

    static CoupledScenario Parse(string yaml) => CoupledLoader.Parse(yaml, "pair.yaml");

    static string Error(string yaml) => Assert.Throws<ScenarioException>(() => Parse(yaml)).Message;

    [Fact]
    public void The_issue_example_reads_into_SI_matrices_branches_and_probes()
    {
        var s = Parse(Good);
        Assert.Equal(["aggr", "quiet"], s.Conductors);
        Assert.Equal(0.254, s.Sections[0].Length, 1e-12);
        Assert.Equal(9.9e-9 / 0.0254, s.Sections[0].L[0, 0], 1e-15);
        Assert.Equal(-0.4e-12 / 0.0254, s.Sections[0].C[0, 1], 1e-20);
        Assert.Equal(5, s.Sections[0].R[1, 1]);
        Assert.Equal(0, s.Sections[0].R[0, 1]);
        Assert.Equal(1, s.Far[2].To);
        Assert.NotNull(s.Near[0].Source);
        Assert.Equal(50, s.Near[0].R);
        Assert.Equal(new CoupledProbe("rxd", 0, 1, CoupledAnchor.Far, 0.254), s.Probes[3]);
        Assert.Equal(0.127, s.Probes[2].Distance, 1e-12);
        Assert.Equal("in", s.LengthUnit);
        Assert.True(CoupledLoader.IsCoupledText(Good));
    }

    [Theory]
    [InlineData("[[1.5 nH/in, 2 nH/in], [2 nH/in, 1.5 nH/in]]", "positive definite")]
    [InlineData("[[9.9 nH/in, 1.5 nH/in], [1.4 nH/in, 9.9 nH/in]]", "not symmetric")]
    [InlineData("[[9.9 nH/in, 0], [0 nH/in, 9.9 nH/in]]", "has no unit")]
    [InlineData("[[9.9 nH/in, 1.5 nH/in]]", "2 rows of 2")]
    public void Bad_inductance_matrices_are_refused_on_one_line_naming_the_key(string l, string fault)
    {
        string msg = Error(Good.Replace("[[9.9 nH/in, 1.5 nH/in], [1.5 nH/in, 9.9 nH/in]]", l));
        Assert.StartsWith("pair.yaml:5:", msg);
        Assert.Contains("coupled[0].section.l", msg);
        Assert.Contains(fault, msg);
        Assert.DoesNotContain("\n", msg);
    }

    [Fact]
    public void A_positive_mutual_capacitance_is_named_as_the_maxwell_sign_mistake()
    {
        string msg = Error(Good.Replace("-0.4 pF/in", "0.4 pF/in"));
        Assert.Contains("coupled[0].section.c", msg);
        Assert.Contains("Maxwell", msg);
    }

    [Theory]
    [InlineData("{ at: quiet, r: 50 ohm }", "{ at: victim, r: 50 ohm }", "'victim' is not a conductor")]
    [InlineData("{ at: aggr, to: quiet, r: 100 ohm }", "{ at: aggr, to: quit, r: 100 ohm }", "'quit' is not a conductor")]
    [InlineData("between: [aggr, quiet]", "between: [aggr, qu]", "'qu' is not a conductor")]
    [InlineData("at: quiet/near", "at: calm/near", "'calm' is not a conductor")]
    [InlineData("delay: 0.5 ns, resistance: 50 ohm } }", "delay: 0.5 ns, resistance: 50 ohm }, r: 5 ohm }", "a source item has only 'at' and 'source'")]
    public void Unknown_conductors_and_mixed_source_items_are_refused(string from, string to, string fault)
    {
        string msg = Error(Good.Replace(from, to));
        Assert.StartsWith("pair.yaml:", msg);
        Assert.Contains(fault, msg);
    }

    [Fact]
    public void Line_together_with_conductors_is_refused_and_single_line_readers_refuse_a_coupled_file()
    {
        Assert.Contains("either 'line:'", Error(Good + "\nline:\n  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }\n"));
        var ex = Assert.Throws<CoupledFormRefused>(() => ScenarioLoader.Parse(Good, "pair.yaml"));
        Assert.StartsWith("pair.yaml:1:1: conductors:", ex.Message);
    }

    [Fact]
    public void Uncoupled_section_by_impedance_and_delay_gives_per_conductor_skew()
    {
        var s = Parse(Good.Replace("""
      l: [[9.9 nH/in, 1.5 nH/in], [1.5 nH/in, 9.9 nH/in]]
      c: [[3.6 pF/in, -0.4 pF/in], [-0.4 pF/in, 3.6 pF/in]]
""", """
      z0: [50 ohm, 50 ohm]
      delay: [1.5 ns, 1.6 ns]
"""));
        var modes = SectionModes.Of(s.Sections[0]);
        Assert.Equal(0.254 / 1.5e-9, modes.Velocities[0], 1e-3);
        Assert.Equal(0.254 / 1.6e-9, modes.Velocities[1], 1e-3);
        Assert.Equal(50, Math.Sqrt(s.Sections[0].L[1, 1] / s.Sections[0].C[1, 1]), 1e-9);
    }

    [Fact]
    public void A_geometry_section_takes_its_matrices_from_the_even_and_odd_modes()
    {
        var s = Parse(Good.Replace("""
      l: [[9.9 nH/in, 1.5 nH/in], [1.5 nH/in, 9.9 nH/in]]
      c: [[3.6 pF/in, -0.4 pF/in], [-0.4 pF/in, 3.6 pF/in]]
      r: [5 ohm/m, 5 ohm/m]
""", """
      geometry: { kind: coupled-stripline, width: 5 mil, gap: 5 mil, spacing: 20 mil, thickness: 0.7 mil, er: 4 }
"""));
        var eo = SectionModes.Pair(s.Sections[0])!;
        var pair = WaveSim.Core.Lines.CrossSection.ComputePair(WaveSim.Core.Lines.CrossSection.FromDictionary(
            new Dictionary<string, string> { ["kind"] = "coupled-stripline", ["width"] = "5 mil", ["gap"] = "5 mil", ["spacing"] = "20 mil", ["thickness"] = "0.7 mil", ["er"] = "4" }, "t"));
        Assert.Equal(pair.Z0Even, eo.Z0e, 1e-9);
        Assert.Equal(pair.Z0Odd, eo.Z0o, 1e-9);
        // A stripline is homogeneous: both modes at c/√er (Cohn's coupled stripline shares one dielectric).
        Assert.Equal(eo.Ve, eo.Vo, 1e-6 * eo.Ve);
        Assert.True(s.Sections[0].R[0, 0] > 0, "R from the strips");
    }

    [Fact]
    public void Demo_scenarios_load_and_run()
    {
        foreach (string f in Directory.GetFiles(Repository.PathOf("scenarios", "coupled"), "*.yaml"))
        {
            var s = CoupledLoader.Load(f);
            var run = Simulate.RunCoupled(s);
            Assert.Equal(s.Probes.Count, run.Figures.Count);
            Assert.All(run.Result.Probes, p => Assert.All(p.Volts, v => Assert.True(double.IsFinite(v))));
        }
    }
}
