using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Scenarios;

/// <summary>Segments given by an edge-coupled pair, driven in one mode.</summary>
public class CoupledSegmentTests
{
    const string Yaml = @"
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 100 ohm }
line:
  - segment:
      length: 50 mm
      geometry: { kind: coupled-stripline, width: 0.1 mm, gap: 0.15 mm, spacing: 0.3 mm, thickness: 17 um, er: 4.2 }
load: { r: 100 ohm }
simulation: { duration: 2 ns }
";

    static CoupledLineParameters Pair() => CrossSection.ComputePair(new CrossSectionSpec("coupled-stripline", new Dictionary<string, double>
        { ["width"] = 0.1e-3, ["gap"] = 0.15e-3, ["spacing"] = 0.3e-3, ["thickness"] = 17e-6, ["er"] = 4.2 }));

    [Fact]
    public void Differential_is_the_default_and_common_is_chosen_by_mode()
    {
        // Mode decomposition of a symmetric pair (Pozar, Microwave Engineering, 4th ed., Sec. 7.6): Zdiff = 2 Z0o, Zcomm = Z0e/2;
        // in stripline both modes travel at c/sqrt(er) (tpd = sqrt(ee)/c; ReferenceData/published-checks.md §12).
        var p = Pair();
        var diff = (Segment)TestScenarios.Parse(Yaml).Line[0];
        Assert.Equal(p.Zdiff, diff.Z0, 9);
        Assert.Equal(Math.Sqrt(4.2) / 299_792_458.0, Math.Sqrt(diff.L * diff.C), 15);
        Assert.Equal(2 * 1.7241e-8 / (0.1e-3 * 17e-6), diff.R, 6);
        var explicitDiff = (Segment)TestScenarios.Parse(Yaml.Replace("er: 4.2 }", "er: 4.2 }\n      mode: differential")).Line[0];
        Assert.Equal(diff.Z0, explicitDiff.Z0, 12);
        var common = (Segment)TestScenarios.Parse(Yaml.Replace("er: 4.2 }", "er: 4.2 }\n      mode: common")).Line[0];
        Assert.Equal(p.Zcomm, common.Z0, 9);
        Assert.Equal(1.7241e-8 / (0.1e-3 * 17e-6) / 2, common.R, 6);
    }

    [Fact]
    public void Mode_errors_name_the_key()
    {
        var bad = Assert.Throws<ScenarioException>(() => TestScenarios.Parse(Yaml.Replace("er: 4.2 }", "er: 4.2 }\n      mode: odd")));
        Assert.Contains("line[0].segment.mode", bad.Message);
        Assert.Contains("expected 'differential'", bad.Message);
        const string single = "{ kind: stripline, width: 0.1 mm, spacing: 0.3 mm, er: 4.2 }\n      mode: common";
        var onSingle = Assert.Throws<ScenarioException>(() => TestScenarios.Parse(Yaml.Replace(
            "{ kind: coupled-stripline, width: 0.1 mm, gap: 0.15 mm, spacing: 0.3 mm, thickness: 17 um, er: 4.2 }", single)));
        Assert.Contains("line[0].segment.mode", onSingle.Message);
        Assert.Contains("'stripline' is a single line", onSingle.Message);
        var noGeometry = Assert.Throws<ScenarioException>(() => TestScenarios.Parse(Yaml.Replace(
            "geometry: { kind: coupled-stripline, width: 0.1 mm, gap: 0.15 mm, spacing: 0.3 mm, thickness: 17 um, er: 4.2 }",
            "z0: 100 ohm\n      delay: 6.8 ns/m\n      mode: differential")));
        Assert.Contains("line[0].segment.mode", noGeometry.Message);
        var gap = Assert.ThrowsAny<WaveSim.Core.InputException>(() => TestScenarios.Parse(Yaml.Replace("gap: 0.15 mm", "gap: -0.15 mm")));
        Assert.Contains("gap must be > 0", gap.Message);
        Assert.Contains("test.yaml:", gap.Message);
    }
}
