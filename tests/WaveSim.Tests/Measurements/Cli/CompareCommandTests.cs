using System.Globalization;
using System.Text;
using System.Text.Json;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>`wavesim compare` on a capture made from the simulation itself, shifted in time and with seeded noise.</summary>
public class CompareCommandTests
{
    /// <summary>The fit tests' small net (a 50 Ω, 1 ns trace from a 25 Ω driver into 150 Ω ∥ 2 pF).</summary>
    const string Scenario = WaveSim.Tests.Fitting.FitScenarios.Truth;

    [Fact]
    public void A_shifted_noisy_copy_aligns_within_one_sample_and_its_RMS_difference_is_the_noise_RMS()
    {
        // Known answer: a copy of the simulation shifted by 3.217 ns plus seeded Gaussian noise. Once aligned, the
        // residual is the noise itself, so its RMS must equal the noise's RMS (definition of RMS); 10 % allows for the
        // alignment error and interpolation (tolerance: common practice, no source). One sample = 10 ps.
        using var run = new CliRunner();
        string scenario = run.Write("board.yaml", Scenario);
        var sim = TestScenarios.Run(Scenario);
        double[] v = sim.Probe("rx").Volts;
        const double shift = 3.217e-9, sigma = 0.005;
        int first = 50, last = v.Length - 50;   // the capture starts and ends inside the simulated record
        double[] noise = SyntheticCapture.Noise(last - first, sigma, seed: 11);
        var text = new StringBuilder("Model;demo scope\nRecord length;").Append(last - first).Append("\ntime_ns;ch1_V\n");
        for (int k = first; k < last; k++)
            text.Append(((sim.Time[k] + shift) * 1e9).ToString("R", CultureInfo.InvariantCulture)).Append(';')
                .Append((v[k] + noise[k - first]).ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        string capture = run.Write("scope.csv", text.ToString());
        string outDir = run.PathOf("cmp");

        var (code, output, err) = CliRunner.Run("compare", scenario, "--capture", capture, "--probe", "rx",
            "--time-col", "time_ns", "--volt-col", "ch1_V", "--time-unit", "ns", "--out", outDir, "--json");

        Assert.True(code == 0, err);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.InRange(root.GetProperty("offset_s").GetDouble(), -shift - 10e-12, -shift + 10e-12);
        double noiseRms = SyntheticCapture.Rms(noise);
        Assert.InRange(root.GetProperty("rms_V").GetDouble(), 0.9 * noiseRms, 1.1 * noiseRms);
        Assert.True(root.GetProperty("peak_V").GetDouble() >= root.GetProperty("rms_V").GetDouble());
        // The figures of both are reported with capture minus simulation; the noise hardly moves the 10-90 % rise.
        var rise = root.GetProperty("figures").GetProperty("rise_10_90_s");
        double diff = rise.GetProperty("difference").GetDouble();
        Assert.Equal(rise.GetProperty("captured").GetDouble() - rise.GetProperty("simulated").GetDouble(), diff, 1e-18);
        Assert.InRange(Math.Abs(diff), 0, 20e-12);
        foreach (string f in new[] { "compare.json", "compare.csv", "compare.png" })
            Assert.True(File.Exists(Path.Combine(outDir, f)), f);
        string header = File.ReadLines(Path.Combine(outDir, "compare.csv")).First();
        Assert.Equal("time_s,simulated_V,captured_V,residual_V", header);
    }
}
