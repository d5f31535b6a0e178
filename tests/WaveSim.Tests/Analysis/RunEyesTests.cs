using System.Text.Json;
using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>Eye diagrams of bit-pattern runs.</summary>
public class RunEyesTests
{
    [Fact]
    public void A_matched_lossless_line_delivers_an_eye_as_tall_as_the_swing()
    {
        // By construction: a matched lossless line only delays and halves the waveform (Pozar, Microwave Engineering,
        // 4th ed., eq. 2.35 with Γ = 0 at both ends), so every bit centre sits at 0 or 0.5 V: eye height = swing = 0.5 V.
        var r = TestScenarios.Run(TestScenarios.MatchedBits);
        var eyes = RunEyes.Compute(r);
        Assert.Equal(2, eyes.Count);
        var rx = eyes.Single(e => e.Probe.Name == "rx");
        // 200 mm at 5 ns/m, then centred on the crossings, which lie half a 0-100 % ramp (1.25 × 40 ps) after the bit boundary.
        Assert.Equal(1e-9 + 0.5 * 1.25 * 40e-12, rx.FirstBitStartS, 2e-12);
        Assert.Equal(2e-9, rx.SkipS, 1e-18);                            // max(2 bit times, 2 × 1 ns)
        var f = rx.Diagram!.Figures;
        Assert.Equal(0.5, f.EyeHeightV!.Value, 0.005);
        // Thresholds: min(lowest 1 − VIH, VIL − highest 0) = min(0.5 − 0.35, 0.15 − 0) = 0.15 V (EyeAnalysis definition).
        Assert.Equal(0.15, f.EyeHeightThresholdsV!.Value, 0.0015);
        Assert.Null(eyes.Single(e => e.Probe.Name == "drv").Thresholds);
    }

    [Fact]
    public void Run_writes_an_eye_picture_per_probe_and_an_eye_object_in_the_summary()
    {
        using var cli = new CliRunner();
        string file = cli.Write("eye.yaml", TestScenarios.MatchedBits);
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, _, err) = CliRunner.Run("run", file, "--out", outDir);
        Assert.True(code == 0, err);
        Assert.True(File.Exists(Path.Combine(outDir, "eye_rx.png")));
        Assert.True(File.Exists(Path.Combine(outDir, "eye_drv.png")));
        var probes = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "summary.json"))).RootElement.GetProperty("probes");
        var eye = probes.GetProperty("rx").GetProperty("eye");
        Assert.Equal(0.5, eye.GetProperty("eye_height_V").GetDouble(), 0.005);
        Assert.True(eye.TryGetProperty("eye_width_thresholds_s", out _));
        Assert.False(probes.GetProperty("drv").GetProperty("eye").TryGetProperty("eye_height_thresholds_V", out _));
    }
}
