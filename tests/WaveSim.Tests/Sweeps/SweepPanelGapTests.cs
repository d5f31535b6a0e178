using WaveSim.Core.Sweeps;

namespace WaveSim.Tests.Sweeps;

/// <summary>
/// Sweep charts draw no empty panel: a probe where the figure applies at no point is left out and the summary says why. The
/// figures that do appear are checked against the lattice diagram (Johnson and Graham, High-Speed Digital Design, 1993, ch. 4;
/// from memory) with Pozar, Microwave Engineering, 4th ed. 2012, eq. 2.35 (ReferenceData/published-checks.md §10).
/// </summary>
public class SweepPanelGapTests
{
    // A 10 ohm driver, then a series resistor that starts the line, 1 ns of 50 ohm line, an open end with receiver thresholds.
    const string Net = @"title: series resistor first
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 10 ohm }
line:
  - series: { r: 22 ohm }
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { receiver: { vih: 0.7 V, vil: 0.3 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 6 ns }
";

    static SweepResult Sweep() =>
        SweepRunner.Run(SweepGrid.Build(TestScenarios.Parse(Net), [SweepAxis.Parse("line[0].series.r=0,10,22,30 ohm")]), new SweepRunOptions());

    [Fact]
    public void The_driver_pin_before_a_series_resistor_gets_its_overshoot_panel_with_the_lattice_values()
    {
        var r = Sweep();
        var chart = SweepPictures.Chart(r, "overshoot_pct");
        Assert.Equal(2, chart.Panels.Count);
        Assert.Empty(SweepPanelGaps.LeftOut(r, "overshoot_pct"));
        foreach (var p in r.Points)
        {
            // After the open end's reflection (Γ = +1) returns, the line's input goes to a·(2 + Γs), a = Z0/(Rt + Z0),
            // Γs = (Rt − Z0)/(Rt + Z0), Rt = Rs + Rser; the pin is 1 V − Rs·(1 V − that)/Rt, its first and largest excursion.
            double rt = 10 + p.Values[0], a = 50 / (rt + 50), gs = (rt - 50) / (rt + 50);
            double pin = 1 - 10 * (1 - a * (2 + gs)) / rt;
            Assert.Equal((pin - 1) * 100, r.Value(p, new ProbeFigure("drv", "overshoot_pct"))!.Value, 0.05);
        }
    }

    [Fact]
    public void A_probe_without_thresholds_gets_no_noise_margin_panel_and_the_reason()
    {
        var r = Sweep();
        var chart = SweepPictures.Chart(r, "noise_margin_high_V");
        Assert.Equal(["rx noise margin high"], chart.Panels.Select(p => p.YLabel).ToArray());
        var why = Assert.Single(SweepPanelGaps.LeftOut(r, "noise_margin_high_V"));
        Assert.StartsWith("drv: ", why);
        Assert.Contains("no receiver thresholds", why);
    }

    [Fact]
    public void A_figure_that_applies_nowhere_writes_no_chart_and_says_why()
    {
        // A rising step has a rise time and no fall time at either probe.
        using var cli = new CliRunner();
        string file = cli.Write("net.yaml", Net);
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, stdout, err) = CliRunner.Run("sweep", file, "--vary", "line[0].series.r=0,22 ohm", "--figure", "overshoot,fall", "--out", outDir);
        Assert.True(code == 0, err);
        Assert.True(File.Exists(Path.Combine(outDir, "sweep_overshoot.png")));
        Assert.False(File.Exists(Path.Combine(outDir, "sweep_fall_90_10.png")));
        Assert.Contains("left out of sweep_fall_90_10.png: drv: fall 90 10 applies at no point (its first edge rises", stdout);
        Assert.Contains("left out of sweep_fall_90_10.png: rx: fall 90 10 applies at no point (its first edge rises", stdout);
        Assert.Contains("no chart written", stdout);
        Assert.DoesNotContain("sweep_fall_90_10.png", stdout.Split('\n').Single(l => l.StartsWith("wrote ")));
    }
}
