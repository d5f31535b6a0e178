using WaveSim.Core.Pictures;

namespace WaveSim.Tests.Reports;

/// <summary>The report's waveform picture uses run's default time window and says so when it is limited.</summary>
public class ReportWindowTests
{
    // A 1 ns clock for 40 ns: a rise and a fall per period, 80 source edges (more than RunPictures.MaxEdgesDrawnWhole = 50),
    // so the picture shows the start-up and the first RunPictures.EdgesShown = 10 of them.
    const string LongClock = @"title: long clock
source: { waveform: trapezoid, low: 0 V, high: 1 V, rise: 50 ps, fall: 50 ps, delay: 0.2 ns, width: 0.4375 ns, period: 1 ns, resistance: 50 ohm }
line:
  - segment: { length: 20 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: rx, at: load }
simulation: { duration: 40 ns, resolution: 10 }
";

    [Fact]
    public void A_long_clock_is_drawn_in_the_default_window_and_the_page_says_so()
    {
        var report = ReportScenarios.Build(LongClock);
        var doc = HtmlReportTests.Parse(report.Html);
        var note = doc.Descendants().Single(e => (string?)e.Attribute("id") == "waveform-window");
        Assert.Contains($"the first {RunPictures.EdgesShown} of 80 source edges", note.Value);
    }

    [Fact]
    public void A_short_record_is_drawn_whole_without_a_note()
    {
        var doc = HtmlReportTests.Parse(ReportScenarios.Build(ReportScenarios.Matched).Html);
        Assert.DoesNotContain(doc.Descendants(), e => (string?)e.Attribute("id") == "waveform-window");
    }
}
