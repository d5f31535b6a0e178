using System.Globalization;
using System.Text.Json;
using System.Xml.Linq;
using SkiaSharp;
using WaveSim.Tests.Reports;

namespace WaveSim.Tests.Cli;

/// <summary>`wavesim overlay`: one probe from several run folders on one chart and one page; folders without it refused.</summary>
public class OverlayCommandTests
{
    [Fact]
    public void Two_runs_and_a_capture_are_drawn_labelled_by_title_on_one_page_and_one_picture()
    {
        using var cli = new CliRunner();
        string matched = cli.Write("matched.yaml", ReportScenarios.Matched), ringing = cli.Write("ringing.yaml", ReportScenarios.Ringing);
        Assert.Equal(0, CliRunner.Run("run", matched, "--out", cli.PathOf("a")).Code);
        Assert.Equal(0, CliRunner.Run("run", ringing, "--out", cli.PathOf("b")).Code);
        // A capture of our own making: the matched net's load level 0.5 V (Pozar eq. 2.35, divider RS = Z0 = RL) after 1 ns.
        string capture = cli.Write("scope.csv", "t,v\n" + string.Join("\n", Enumerable.Range(0, 101).Select(i =>
            string.Create(CultureInfo.InvariantCulture, $"{i * 1e-10},{(i * 1e-10 < 1e-9 ? 0 : 0.5)}"))));
        var (code, stdout, err) = CliRunner.Run("overlay", cli.PathOf("a"), cli.PathOf("b"), "--probe", "rx", "--capture", capture,
            "--out", cli.PathOf("o"), "--window", "0ns..8ns", "--json");
        Assert.True(code == 0, err);
        var json = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal(["matched net", "ringing net", "scope.csv"], json.GetProperty("traces").EnumerateArray().Select(t => t.GetProperty("label").GetString()));
        using var png = SKBitmap.Decode(cli.PathOf("o/overlay.png"));
        Assert.NotNull(png);
        string html = File.ReadAllText(cli.PathOf("o/overlay.html"));
        var doc = HtmlReportTests.Parse(html);
        var rows = doc.Descendants("table").Single(t => (string?)t.Attribute("id") == "overlay-sources").Elements("tr").Skip(1).ToList();
        Assert.Equal(["matched net", "ringing net", "scope.csv"], rows.Select(r => r.Elements("td").First().Value));
        // The page first shows the window asked for.
        Assert.Contains("\"window\":[0,8E-09]", html);
    }

    [Fact]
    public void A_folder_without_the_probe_is_refused_with_one_line_naming_it_and_nothing_is_written()
    {
        using var cli = new CliRunner();
        string matched = cli.Write("matched.yaml", ReportScenarios.Matched);
        Assert.Equal(0, CliRunner.Run("run", matched, "--out", cli.PathOf("a")).Code);
        Directory.CreateDirectory(cli.PathOf("empty"));
        var (code, _, err) = CliRunner.Run("overlay", cli.PathOf("a"), cli.PathOf("a"), "--probe", "tap", "--out", cli.PathOf("o"));
        Assert.Equal(2, code);
        Assert.Equal($"error: {cli.PathOf("a")}: no probe 'tap' in probes.csv; it has drv, rx", err.Trim());
        (code, _, err) = CliRunner.Run("overlay", cli.PathOf("a"), cli.PathOf("empty"), "--probe", "rx", "--out", cli.PathOf("o"));
        Assert.Equal(2, code);
        Assert.Equal($"error: {cli.PathOf("empty")}: no probes.csv; expected the output folder of a run", err.Trim());
        Assert.False(Directory.Exists(cli.PathOf("o")));
    }
}
