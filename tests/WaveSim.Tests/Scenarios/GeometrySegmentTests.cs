using WaveSim.Core;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Scenarios;

/// <summary>Segments given by cross-section geometry.</summary>
public class GeometrySegmentTests
{
    const string Yaml = @"
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment:
      length: 100 mm
      geometry: { kind: microstrip, width: 3.0 mm, height: 1.6 mm, thickness: 35 um, er: 4.4 }
load: { r: 50 ohm }
simulation: { duration: 3 ns }
";

    [Fact]
    public void A_microstrip_segment_takes_L_and_C_from_Hammerstad_Jensen()
    {
        // ReferenceData/published-checks.md §1, case M3 (derived from Hammerstad and Jensen 1980, with thickness):
        // er = 4.4, h = 1.6 mm, w = 3.0 mm, t = 35 um → 50.17 ohm, eps_eff 3.301, L = 304.0 nH/m, C = 120.8 pF/m.
        var seg = (Segment)TestScenarios.Parse(Yaml).Line[0];
        Assert.Equal(50.17, seg.Z0, 0.05);
        Assert.Equal(304.0e-9, seg.L, 0.5e-9);
        Assert.Equal(120.8e-12, seg.C, 0.2e-12);
        // DC resistance of a 3 mm × 35 um copper strip: ρ/(w·t) with annealed copper 1.7241e-8 ohm·m (IACS; ReferenceData/published-checks.md §4).
        Assert.Equal(1.7241e-8 / (3e-3 * 35e-6), seg.R, 1e-6);
    }

    [Fact]
    public void Geometry_together_with_z0_is_an_error_naming_the_key()
    {
        var ex = Assert.Throws<WaveSim.Core.Scenarios.ScenarioException>(() => TestScenarios.Parse(Yaml.Replace("length: 100 mm", "length: 100 mm\n      z0: 50 ohm")));
        Assert.Contains("line[0].segment.z0", ex.Message);
    }

    [Fact]
    public void An_impossible_geometry_is_a_clear_error()
    {
        var ex = Assert.ThrowsAny<InputException>(() => TestScenarios.Parse(Yaml.Replace("er: 4.4", "er: 0.5")));
        Assert.Contains("er", ex.Message);
        Assert.Contains("test.yaml:", ex.Message);
    }
}
