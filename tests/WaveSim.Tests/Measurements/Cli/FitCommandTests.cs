using System.Globalization;
using System.Text;
using System.Text.Json;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>`wavesim fit` recovers the values a synthetic capture was made with.</summary>
public class FitCommandTests
{
    const string Truth = WaveSim.Tests.Fitting.FitScenarios.Truth;

    [Fact]
    public void Fit_recovers_z0_delay_and_load_capacitance_within_2_percent_from_30_percent_off()
    {
        // Known-answer test of an estimator: the capture is the simulation with z0 = 50 ohm, delay = 1 ns, C = 2 pF plus seeded
        // 5 mV noise and a 1.234 ns shift of the time axis; the start is 30 % off each (common practice for testing a fit,
        // no source). The budget bound is ours: 3 values and an offset need a few Jacobians of 4 runs each.
        using var run = new CliRunner();
        var sim = TestScenarios.Run(Truth);
        double[] v = sim.Probe("rx").Volts;
        double[] noise = SyntheticCapture.Noise(v.Length, 0.005, seed: 5);
        var text = new StringBuilder("# synthetic capture\ntime,volts\n");
        for (int k = 0; k < v.Length; k += 2)
            text.Append((sim.Time[k] + 1.234e-9).ToString("R", CultureInfo.InvariantCulture)).Append(',')
                .Append((v[k] + noise[k]).ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        string capture = run.Write("rx.csv", text.ToString());
        string start = Truth.Replace("z0: 50 ohm", "z0: 65 ohm").Replace("delay: 1 ns }", "delay: 0.7 ns }").Replace("c: 2 pF", "c: 2.6 pF");
        string scenario = run.Write("start.yaml", start);
        string outDir = run.PathOf("fit");

        var (code, output, err) = CliRunner.Run("fit", scenario, "--capture", capture, "--probe", "rx",
            "--free", "line[0].segment.z0", "--free", "line[0].segment.delay", "--free", "load.c", "--out", outDir, "--json");

        Assert.True(code == 0, err);
        var root = JsonDocument.Parse(output).RootElement;
        var p = root.GetProperty("parameters");
        double z0 = p.GetProperty("line[0].segment.z0").GetProperty("value").GetDouble();
        double delay = p.GetProperty("line[0].segment.delay").GetProperty("value").GetDouble();
        double c = p.GetProperty("load.c").GetProperty("value").GetDouble();
        Assert.InRange(z0, 49, 51);
        Assert.InRange(delay, 0.98e-9, 1.02e-9);
        Assert.InRange(c, 1.96e-12, 2.04e-12);
        Assert.Equal(65, p.GetProperty("line[0].segment.z0").GetProperty("start").GetDouble(), 1e-9);
        Assert.True(p.GetProperty("load.c").GetProperty("uncertainty").GetDouble() > 0);
        int sims = root.GetProperty("simulations").GetInt32();
        Assert.InRange(sims, 5, 120);
        // The noise is 5 mV RMS, so a fit at the right values leaves about that much.
        Assert.InRange(root.GetProperty("rms_V").GetDouble(), 0.004, 0.006);
        // The basis of the ± values: s = sqrt(SSR/(n - p)) is the same 5 mV, and the white noise barely widens them; n_eff and
        // the widening follow n(1 - rho)/(1 + rho) and sqrt((1 + rho)/(1 - rho)) with rho held to [0, 1) (Bartlett 1946, from memory).
        var basis = root.GetProperty("uncertainty_basis");
        int n = basis.GetProperty("samples").GetInt32();
        double rho = Math.Max(0, basis.GetProperty("lag1_autocorrelation").GetDouble());
        Assert.Equal(4, basis.GetProperty("fitted_values").GetInt32());
        Assert.InRange(basis.GetProperty("standard_error_V").GetDouble(), 0.004, 0.006);
        Assert.Equal(n * (1 - rho) / (1 + rho), basis.GetProperty("effective_samples").GetDouble(), 1e-9);
        Assert.Equal(Math.Sqrt((1 + rho) / (1 - rho)), basis.GetProperty("widening").GetDouble(), 1e-12);
        Assert.InRange(basis.GetProperty("widening").GetDouble(), 1.0, 1.15);

        // fitted.yaml keeps the comment and reads back with the fitted values.
        string fittedText = File.ReadAllText(Path.Combine(outDir, "fitted.yaml"));
        Assert.Contains("# the trace", fittedText);
        var fitted = ScenarioLoader.Parse(fittedText, "fitted.yaml");
        Assert.Equal(z0, ((Segment)fitted.Line[0]).Z0, 1e-9);
        Assert.Equal(delay, ((Segment)fitted.Line[0]).Delay, 1e-18);
        Assert.Equal(c, fitted.Load.C!.Value, 1e-21);
        Assert.True(File.Exists(Path.Combine(outDir, "fit.png")));
        Assert.True(File.Exists(Path.Combine(outDir, "fit.json")));
    }

    [Fact]
    public void Bounds_with_units_and_an_absent_key_start_at_the_geometric_mean()
    {
        // Parsing only (no fit): sqrt(0.5 pF x 5 pF) = 1.5811 pF; default bounds are [start/3, start*3].
        var s = TestScenarios.Document(Truth.Replace("load: { r: 150 ohm, c: 2 pF }", "load: { r: 150 ohm }"));
        var c = Core.Fitting.FreeParameter.Parse(s, "load.c=0.5pF..5pF");
        Assert.Equal(Math.Sqrt(0.5e-12 * 5e-12), c.Start, 1e-24);
        Assert.Equal("F", c.Unit);
        var z = Core.Fitting.FreeParameter.Parse(s, "line[0].segment.z0");
        Assert.Equal(50.0 / 3, z.Lower, 1e-12);
        Assert.Equal(150.0, z.Upper, 1e-12);
        Assert.Throws<Core.InputException>(() => Core.Fitting.FreeParameter.Parse(s, "load.c"));
        Assert.Throws<Core.InputException>(() => Core.Fitting.FreeParameter.Parse(s, "load.c=5pF..1pF"));
        Assert.ThrowsAny<Core.InputException>(() => Core.Fitting.FreeParameter.Parse(s, "load.c=1ns..2ns"));
    }
}
