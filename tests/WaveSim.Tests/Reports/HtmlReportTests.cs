using System.Text.RegularExpressions;
using System.Xml;
using System.Xml.Linq;
using SkiaSharp;
using WaveSim.Core.Reports;

namespace WaveSim.Tests.Reports;

/// <summary>The HTML report: well-formed, self-contained, one figures row per probe, pictures that decode, pass/fail cells.</summary>
public class HtmlReportTests
{
    /// <summary>Parses the page as XML (the report emits XHTML-compatible markup); the HTML5 doctype is skipped.</summary>
    internal static XDocument Parse(string html)
    {
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore };
        using var reader = XmlReader.Create(new StringReader(html), settings);
        return XDocument.Load(reader);
    }

    static XElement ById(XDocument doc, string id) => doc.Descendants().Single(e => (string?)e.Attribute("id") == id);

    static List<List<XElement>> DataRows(XElement table) =>
        table.Elements("tr").Where(tr => tr.Elements("td").Any()).Select(tr => tr.Elements("td").ToList()).ToList();

    static int Column(XElement table, string header) =>
        table.Elements("tr").First().Elements("th").Select(th => th.Value).ToList().IndexOf(header);

    [Fact]
    public void The_page_is_well_formed_and_holds_one_figures_row_per_probe_a_decodable_picture_and_its_inlined_scripts()
    {
        var report = ReportScenarios.Build(ReportScenarios.Matched);
        var doc = Parse(report.Html);
        var rows = DataRows(ById(doc, "figures"));
        Assert.Equal(["drv", "rx"], rows.Select(r => r[0].Value));
        foreach (var (id, w, h) in new[] { ("waveforms", ReportImages.WaveformWidth, ReportImages.WaveformHeight) })
        {
            var img = ById(doc, id);
            Assert.Equal("img", img.Name.LocalName);
            string src = (string)img.Attribute("src")!;
            Assert.StartsWith("data:image/png;base64,", src);
            using var bitmap = SKBitmap.Decode(Convert.FromBase64String(src["data:image/png;base64,".Length..]));
            Assert.NotNull(bitmap);
            Assert.Equal((w, h), (bitmap.Width, bitmap.Height));
        }
        // The scenario text is shown verbatim: its markup is escaped, not live.
        Assert.Contains("<script>alert(1)</script>", ById(doc, "scenario").Value);
        // The page's own scripts: the data, the vendored chart library and the page's script, all inline.
        var scripts = doc.Descendants("script").ToList();
        Assert.Equal(3, scripts.Count);
        Assert.All(scripts, x => Assert.Null(x.Attribute("src")));
        Assert.Equal("canvas", ById(doc, "spacetime-map").Name.LocalName);
        Assert.Equal("input", ById(doc, "scrubber").Name.LocalName);
    }

    [Fact]
    public void The_page_refers_to_nothing_outside_itself_except_as_escaped_scenario_text()
    {
        string html = ReportScenarios.Build(ReportScenarios.Matched).Html;
        Assert.Contains("https://example.invalid", html);   // inside the escaped scenario text
        // The inlined library is the vendored file unchanged (its own comment names its home page); the page's script
        // opens no connection.
        Assert.Contains(PageAssets.ChartScript, html);
        Assert.DoesNotMatch(new Regex(@"fetch\(|XMLHttpRequest|WebSocket|sendBeacon|import\(|EventSource"), PageAssets.ChartScript + PageAssets.PageScript);
        string outside = Regex.Replace(html.Replace(PageAssets.ChartScript, "", StringComparison.Ordinal).Replace(PageAssets.ChartLicence, "", StringComparison.Ordinal),
            "<pre id=\"scenario\">.*?</pre>", "", RegexOptions.Singleline);
        Assert.Equal(3, Regex.Count(outside, @"<script\b"));
        Assert.DoesNotMatch(new Regex(@"<script[^>]*\bsrc=", RegexOptions.IgnoreCase), outside);
        outside = Regex.Replace(outside, @"<script\b[^>]*>", "");
        Assert.DoesNotContain("http://", outside, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("https://", outside, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotMatch(new Regex(@"<link\b|@import|url\(", RegexOptions.IgnoreCase), outside);
        Assert.DoesNotMatch(new Regex("src=\"(?!data:image/png;base64,)", RegexOptions.IgnoreCase), outside);
    }

    [Fact]
    public void A_matched_net_whose_receiver_thresholds_are_met_passes()
    {
        // Pass rule: common practice, no source (docs/verdicts.md: margins ≥ 0, one clean crossing per edge, limits met).
        // Values: Pozar eq. 2.35 (H), launch 0.5 V on a matched line; margins 0.5 - 0.35 = 0.15 V and 0.15 - 0 = 0.15 V.
        var report = ReportScenarios.Build(ReportScenarios.Matched);
        var table = ById(Parse(report.Html), "figures");
        var rx = DataRows(table).Single(r => r[0].Value == "rx");
        Assert.Equal("pass", (string?)rx[Column(table, "first-edge crossings")].Attribute("class"));
        Assert.Equal("pass", (string?)rx[Column(table, "noise margin high")].Attribute("class"));
        Assert.Equal("pass", (string?)rx[Column(table, "noise margin low")].Attribute("class"));
        Assert.Equal("pass", (string?)rx[Column(table, "verdict")].Attribute("class"));
        Assert.Equal("150 mV", rx[Column(table, "noise margin high")].Value);
        // The source probe has no receiver: nothing is judged there.
        var drv = DataRows(table).Single(r => r[0].Value == "drv");
        Assert.Equal("not judged", drv[Column(table, "verdict")].Value);
        Assert.Null(drv[Column(table, "verdict")].Attribute("class"));
        Assert.Equal([null, true], report.Checks.Select(c => c.Pass));   // drv, rx
    }

    [Fact]
    public void A_ringing_net_that_recrosses_the_thresholds_fails_on_the_crossing_count()
    {
        // ReferenceData/published-checks.md §10, case B1 (H, derived; standard lattice-diagram method, Γ from Pozar eq. 2.35): the load falls back to 0.556 V <= Vil 0.6 V after the
        // first arrival at 1.667 V, then rises to 1.296 V >= Vih 0.75 V: 3 crossings for one edge. Rule: common practice, no source.
        var report = ReportScenarios.Build(ReportScenarios.Ringing);
        var table = ById(Parse(report.Html), "figures");
        var rx = DataRows(table).Single(r => r[0].Value == "rx");
        var crossings = rx[Column(table, "first-edge crossings")];
        Assert.Equal("fail", (string?)crossings.Attribute("class"));
        Assert.Equal("3 (1 expected)", crossings.Value);
        // The same lattice: the first arrival of 1.667 V is the worst excursion, 0.667 V above the settled 1 V.
        Assert.Equal("667 mV", rx[Column(table, "above high")].Value);
        Assert.Equal("pass", (string?)rx[Column(table, "noise margin high")].Attribute("class"));
        Assert.Equal("pass", (string?)rx[Column(table, "noise margin low")].Attribute("class"));
        Assert.Equal("fail", (string?)rx[Column(table, "verdict")].Attribute("class"));
        Assert.False(report.Checks.Single(c => c.Probe == "rx").Pass);
    }

    [Fact]
    public void The_page_states_the_pass_rule_the_limits_and_the_cautions()
    {
        var doc = Parse(ReportScenarios.Build(ReportScenarios.Matched).Html);
        Assert.Contains("clear Vih and Vil with a margin of zero or more", ById(doc, "rule").Value);
        Assert.Contains("on every edge of the record", ById(doc, "rule").Value);
        string limits = ById(doc, "limits").Value, cautions = ById(doc, "cautions").Value;
        Assert.Contains("One conductor pair", limits);
        Assert.Contains("Quasi-TEM", limits);
        Assert.Contains("Linear parts", limits);
        Assert.Contains("estimate", cautions);
        Assert.Contains("Never connect instruments to energized or high-voltage lines", cautions);
        Assert.Contains("local codes and licensed practice", cautions);
        Assert.Contains("Courant", ById(doc, "segments").Value);
    }
}
