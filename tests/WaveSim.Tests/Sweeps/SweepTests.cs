using System.Globalization;
using System.Text.Json;
using WaveSim.Core;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Units;

namespace WaveSim.Tests.Sweeps;

/// <summary>The sweep engine and the `sweep` command.</summary>
public class SweepTests
{
    // A 10 ohm driver on 1 ns of 50 ohm line: every load but Z0 reflects and bounces off the strong driver.
    internal const string Net = @"title: sweep test
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 10 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 100 ohm }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 15 ns, resolution: 10 }
";

    [Theory]
    [InlineData("load.r=10ohm..200ohm:20", 20, 10.0, 200.0, 20.0)]
    [InlineData("load.r=10..200 ohm:20", 20, 10.0, 200.0, 20.0)]
    [InlineData("load.c=1pF,2pF,5pF", 3, 1e-12, 5e-12, 2e-12)]
    [InlineData("load.c=1,2,5 pF", 3, 1e-12, 5e-12, 2e-12)]
    [InlineData("load.r=10..1000 ohm:3:log", 3, 10.0, 1000.0, 100.0)]
    public void Ranges_and_lists_read_into_SI_values(string text, int count, double first, double last, double second)
    {
        // Arithmetic of the range syntax itself (no outside source needed): linear steps (stop − start)/(count − 1), log steps by equal ratios.
        var a = SweepAxis.Parse(text);
        Assert.Equal(count, a.Values.Count);
        Assert.Equal(first, a.Values[0], first * 1e-12);
        Assert.Equal(last, a.Values[^1], last * 1e-12);
        Assert.Equal(second, a.Values[1], second * 1e-9);
    }

    [Theory]
    [InlineData("load.r", "expected KEY=RANGE")]
    [InlineData("load.r=10ohm..2pF:5", "capacitance")]
    [InlineData("load.r=10..200 ohm:1", "count")]
    [InlineData("load.r=0..200 ohm:5:log", "greater than zero")]
    public void Malformed_ranges_are_one_line_errors(string text, string fragment)
    {
        var ex = Assert.ThrowsAny<InputException>(() => SweepAxis.Parse(text));
        Assert.Contains(fragment, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void Sweep_of_the_load_resistor_finds_the_shortest_settling_at_Z0()
    {
        // Pozar, Microwave Engineering, 4th ed., eq. 2.35: Γ = (ZL − Z0)/(ZL + Z0) vanishes at ZL = Z0, so the matched
        // load takes the first arrival and nothing bounces back off the 10 ohm driver; any other load rings.
        using var cli = new CliRunner();
        string file = cli.Write("net.yaml", Net);
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, stdout, err) = CliRunner.Run("sweep", file, "--vary", "load.r=10..200 ohm:20", "--goal", "min:rx.settling",
            "--limit", "rx.overshoot<10%", "--out", outDir, "--json");
        Assert.True(code == 0, err);
        var lines = File.ReadAllLines(Path.Combine(outDir, "sweep.csv"));
        Assert.Equal(21, lines.Length); // header + one row per point
        var header = lines[0].Split(',');
        Assert.Equal("load.r", header[0]);
        int col = Array.IndexOf(header, "rx.settling_s");
        Assert.True(col > 0);
        var rows = lines.Skip(1).Select(l => l.Split(',')).ToArray();
        var best = rows.MinBy(r => double.Parse(r[col], CultureInfo.InvariantCulture))!;
        double bestR = double.Parse(best[0], CultureInfo.InvariantCulture);
        Assert.InRange(bestR, 40 - 1e-9, 60 + 1e-9); // within one grid point (10 ohm) of Z0 = 50 ohm
        var json = JsonDocument.Parse(stdout).RootElement;
        Assert.InRange(json.GetProperty("best").GetProperty("values").GetProperty("load.r").GetDouble(), 40 - 1e-9, 60 + 1e-9);
        Assert.True(File.Exists(Path.Combine(outDir, "sweep_overshoot.png")));
        Assert.True(File.Exists(Path.Combine(outDir, "sweep_settling.png")));
    }

    [Theory]
    [InlineData("loud.r=10..200 ohm:20", "loud")]
    [InlineData("load.r=1pF..5pF:3", "capacitance")]
    [InlineData("line[3].segment.z0=40..60 ohm:3", "no item [3]")]
    public void A_missing_key_or_a_wrong_unit_fails_before_anything_runs(string vary, string fragment)
    {
        using var cli = new CliRunner();
        string file = cli.Write("net.yaml", Net);
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, stdout, err) = CliRunner.Run("sweep", file, "--vary", vary, "--out", outDir);
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.StartsWith("error: ", err);
        Assert.Contains(fragment, err);
        Assert.Equal([file], Directory.GetFileSystemEntries(cli.Dir)); // no output folder, no staging folder
    }

    [Fact]
    public void Limits_and_goals_read_their_units()
    {
        // Unit reading only (SI conversions, no outside source needed).
        string[] probes = ["drv", "rx"];
        var l = SweepLimit.Parse("rx.overshoot<10%", probes);
        Assert.Equal("overshoot_pct", l.Target.Figure);
        Assert.Equal(10, l.Bound, 1e-12);
        Assert.True(l.IsMet(9.9));
        Assert.False(l.IsMet(null));
        Assert.Equal(5e-9, SweepLimit.Parse("rx.settling<=5ns", probes).Bound, 1e-21);
        Assert.True(SweepGoal.Parse("max:drv.noise_margin_high", probes).Maximise);
        Assert.Throws<InputException>(() => SweepGoal.Parse("min:tx.settling", probes));
        Assert.Throws<InputException>(() => SweepLimit.Parse("rx.settling<5V", probes));
    }
}
