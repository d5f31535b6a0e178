using System.Text.Json;
using System.Xml.Linq;
using WaveSim.Tests.Reports;

namespace WaveSim.Tests.Cli;

/// <summary>`wavesim report`: writes report.html, prints the JSON summary, adds terminations and eyes when asked or applicable.</summary>
public class ReportCommandTests
{
    // PRBS7 (ITU-T O.150) through a matched lossless line; the eye at the load opens to the 0.5 V swing
    // (Pozar eq. 2.35 with Gamma = 0 at both ends), so against Vih 0.35 V / Vil 0.15 V it is open: pass.
    const string Bits = @"title: bits net
source: { waveform: bits, prbs: 7, bit_time: 200 ps, low: 0 V, high: 1 V, rise: 40 ps, resistance: 50 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm, receiver: { vih: 0.35 V, vil: 0.15 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 27 ns, resolution: 10 }
";

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
            Assert.Equal(["report.html"], Directory.GetFiles(outDir).Select(Path.GetFileName));
            var json = JsonDocument.Parse(stdout).RootElement;
            Assert.Equal(Path.Combine(outDir, "report.html"), json.GetProperty("report").GetString());
            // CHECKS.md B1 with Vih 0.75 V / Vil 0.6 V: rx recrosses (fail); drv has no receiver (not judged).
            Assert.Equal(0, json.GetProperty("pass").GetInt32());
            Assert.Equal(1, json.GetProperty("fail").GetInt32());
            Assert.Equal(1, json.GetProperty("not_judged").GetInt32());
            var doc = HtmlReportTests.Parse(File.ReadAllText(Path.Combine(outDir, "report.html")));
            var table = doc.Descendants("table").Single(t => (string?)t.Attribute("id") == "terminations");
            Assert.Equal(5, table.Elements("tr").Count(tr => tr.Elements("td").Any()));   // none, series, parallel, Thevenin, RC
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
            File.WriteAllText(file, Bits);
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
