using System.Globalization;
using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Terminations;

/// <summary>A Thevenin pair rounded to preferred values sets its own level; every output gives it beside the level asked for.</summary>
public class TheveninLevelTests
{
    // A 55 Ω line driven 0 → 3.3 V, as in the reviewer's case (`--thevenin-level 1.2V --series E24`).
    const string Net = @"title: thevenin level
source: { waveform: step, low: 0 V, high: 3.3 V, rise: 500 ps, delay: 1 ns, resistance: 15 ohm }
line:
  - segment: { length: 100 mm, z0: 55 ohm, delay: 6.8 ns/m }
load: { c: 2 pF }
probes:
  - { name: rx, at: load }
simulation: { duration: 10 ns, resolution: 10 }
";

    // ReferenceData/readable-outputs.md §2 (voltage divider; IEC 60063:2015 E24 and E96): R1 = 55·3.3/1.2 → 150 Ω,
    // R2 = 55·3.3/2.1 → 91 Ω (E24) or 86.6 Ω (E96); the pair's level is Vcc·R2/(R1 + R2).
    const double Vcc = 3.3, Asked = 1.2;
    static readonly double E24Level = Vcc * 91 / (150 + 91.0);   // 1.24606 V
    static readonly double E96Level = Vcc * 86.6 / (150 + 86.6); // 1.20786 V

    [Theory]
    [InlineData(PreferredSeries.E24, 91.0)]
    [InlineData(PreferredSeries.E96, 86.6)]
    public void The_design_keeps_the_level_asked_for_and_the_level_of_the_rounded_pair(PreferredSeries series, double r2)
    {
        var d = TerminationPlanner.Design(TestScenarios.Parse(Net), new TerminationOptions { TheveninLevelV = Asked, Series = series })
            .Single(x => x.Kind == TerminationKind.Thevenin);
        Assert.Equal(150, d.Parts[0].Used, 1e-9);
        Assert.Equal(r2, d.Parts[1].Used, 1e-9);
        Assert.Equal(Asked, d.TargetTheveninV, 1e-15);
        Assert.Equal(series == PreferredSeries.E24 ? E24Level : E96Level, d.TheveninV, 1e-12);
        // The variant simulates the pair's own level (its Thevenin equivalent), not the one asked for.
        Assert.Equal(d.TheveninV, d.Variant!.Load.To, 1e-12);
    }

    [Fact]
    public void Text_csv_and_json_give_both_levels()
    {
        using var cli = new CliRunner();
        string file = cli.Write("net.yaml", Net);
        string outDir = cli.PathOf("out");
        var (code, stdout, err) = CliRunner.Run("terminations", file, "--thevenin-level", "1.2V", "--series", "E24", "--out", outDir);
        Assert.True(code == 0, err);
        // Three significant figures, as every level of the table: 1.2 V asked, 1.24606 V → "1.25 V".
        string parts = stdout.Split('\n').Single(l => l.TrimStart().StartsWith("thevenin ") && l.Contains("R1 to supply"));
        Assert.Contains("level asked 1.2 V, the E24 pair gives 1.25 V", parts);

        var csv = File.ReadAllLines(Path.Combine(outDir, "terminations.csv"));
        var head = csv[0].Split(',').ToList();
        var row = csv.Single(l => l.StartsWith("thevenin,")).Split(',');
        Assert.Equal(Asked, double.Parse(row[head.IndexOf("thevenin_target_V")], CultureInfo.InvariantCulture), 1e-15);
        Assert.Equal(E24Level, double.Parse(row[head.IndexOf("thevenin_level_V")], CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal("", csv.Single(l => l.StartsWith("series,")).Split(',')[head.IndexOf("thevenin_level_V")]);

        var (jcode, json, jerr) = CliRunner.Run("terminations", file, "--thevenin-level", "1.2V", "--series", "E24", "--out", outDir, "--json");
        Assert.True(jcode == 0, jerr);
        var th = JsonNode.Parse(json)!["strategies"]!.AsArray().Single(s => (string?)s!["strategy"] == "thevenin")!;
        Assert.Equal(Asked, th["thevenin_target_V"]!.GetValue<double>(), 1e-15);
        Assert.Equal(E24Level, th["thevenin_level_V"]!.GetValue<double>(), 1e-12);
    }
}
