using System.Text.Json;
using System.Xml.Linq;
using WaveSim.Tests.Reports;

namespace WaveSim.Tests.Cli;

/// <summary>`wavesim report`: writes report.html, prints the JSON summary, adds terminations and eyes when asked or applicable.</summary>
public class ReportCommandTests
{

    [Fact]
    public void Report_with_terminations_writes_one_page_and_prints_the_verdict_counts()
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        try
        {
            string file = Path.Combine(dir, "ringing.yaml");
            File.WriteAllText(file, ReportScenarios.Ringing);
            string outDir = Path.Combine(dir, "out");
            var (code, stdout, err) = CliRunner.Run("report", file, "--out", outDir, "--terminations", "--json");
            Assert.True(code == 0, err);
            // One page, beside only the folder's list of what WaveSim wrote there (docs/outputs.md).
            Assert.Equal([".wavesim-outputs", "report.html"], Directory.GetFiles(outDir).Select(Path.GetFileName).Order(StringComparer.Ordinal));
            var json = JsonDocument.Parse(stdout).RootElement;
            Assert.Equal(Path.Combine(outDir, "report.html"), json.GetProperty("report").GetString());
            // ReferenceData/published-checks.md §10, case B1 (lattice-diagram method, Γ from Pozar eq. 2.35) with Vih 0.75 V / Vil 0.6 V: rx recrosses (fail); drv has no receiver (not judged).
            Assert.Equal(0, json.GetProperty("pass").GetInt32());
            Assert.Equal(1, json.GetProperty("fail").GetInt32());
            Assert.Equal(1, json.GetProperty("not_judged").GetInt32());
            var doc = HtmlReportTests.Parse(File.ReadAllText(Path.Combine(outDir, "report.html")));
            var table = doc.Descendants("table").Single(t => (string?)t.Attribute("id") == "terminations");
            Assert.Equal(6, table.Elements("tr").Count(tr => tr.Elements("td").Any()));   // as drawn, none, series, parallel, Thevenin, RC
            Assert.Contains(doc.Descendants("img"), i => (string?)i.Attribute("id") == "terminations-overlay");
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    [Fact]
    public void Report_of_a_bit_pattern_shows_eyes_and_judges_the_receiver_on_its_eye()
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        try
        {
            string file = Path.Combine(dir, "bits.yaml");
            File.WriteAllText(file, TestScenarios.MatchedBits);
            var (code, stdout, err) = CliRunner.Run("report", file, "--out", Path.Combine(dir, "out"));
            Assert.True(code == 0, err);
            Assert.Contains("1 probe(s) pass, 0 fail", stdout);
            var doc = HtmlReportTests.Parse(File.ReadAllText(Path.Combine(dir, "out", "report.html")));
            Assert.Contains(doc.Descendants("img"), i => (string?)i.Attribute("id") == "eye-rx");
            Assert.Contains(doc.Descendants("img"), i => (string?)i.Attribute("id") == "eye-drv");
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    [Fact]
    public void Report_of_a_missing_file_is_a_one_line_error()
    {
        var (code, _, err) = CliRunner.Run("report", "no-such-scenario.yaml");
        Assert.NotEqual(0, code);
        Assert.Equal("error: no-such-scenario.yaml: no such scenario file", err.Trim());
    }
}
