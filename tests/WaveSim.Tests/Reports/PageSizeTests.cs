using System.Text;
using System.Text.RegularExpressions;
using WaveSim.Core;
using WaveSim.Core.Rendering;
using WaveSim.Core.Reports;

namespace WaveSim.Tests.Reports;

/// <summary>
/// The page's size: the thinned record always, the full record only while the page stays under 10 MB; the PRBS example's
/// page under 5 MB. The limits are the product's own (no outside source); the thinning keeps every column's extremes, checked
/// against the record itself.
/// </summary>
public class PageSizeTests
{
    static long Bytes(string html) => Encoding.UTF8.GetByteCount(html);

    [Fact]
    public void The_PRBS_example_page_is_under_5_MB_and_carries_its_full_record()
    {
        var s = TestScenarios.Parse(File.ReadAllText(Repository.PathOf("scenarios", "bits-through-cable.yaml")));
        string html = HtmlReport.Build(ReportInput.For(Simulate.Run(s, HtmlReport.RunOptions()), "")).Html;
        Assert.True(Bytes(html) < 5_000_000, $"the PRBS page is {Bytes(html)} bytes");
        Assert.DoesNotContain("\"full\":null", html);
    }

    [Fact]
    public void A_record_too_long_for_the_budget_is_carried_thinned_and_the_page_stays_under_10_MB()
    {
        // 400,000 steps of four probes: far more than 10 MB as full JSON, so only the thinned record fits.
        const string yaml = @"title: long record
source: { waveform: trapezoid, low: 0 V, high: 1 V, rise: 200 ps, fall: 200 ps, width: 9.8 ns, period: 20 ns, resistance: 50 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m }
  - segment: { length: 100 mm, z0: 60 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: a, at: source }
  - { name: b, at: 50 mm }
  - { name: c, at: 150 mm }
  - { name: d, at: load }
simulation: { duration: 6 us, resolution: 10 }
";
        var run = Simulate.Run(TestScenarios.Parse(yaml), HtmlReport.RunOptions());
        string html = HtmlReport.Build(ReportInput.For(run, yaml)).Html;
        Assert.True(run.Result.Time.Length * 9L * 9 > HtmlReport.MaxPageBytes, $"the test needs a record too long for the budget ({run.Result.Time.Length} samples)");
        Assert.True(Bytes(html) < HtmlReport.MaxPageBytes, $"the page is {Bytes(html)} bytes");
        Assert.Contains("\"full\":null", html);
        Assert.Contains("\"fullLeftOut\":true", html);
    }

    [Fact]
    public void Thinning_keeps_each_columns_extremes_in_the_order_they_occur()
    {
        // A record with a one-sample spike in every 100 samples: the thinned record must keep every spike.
        int n = 100_000;
        var t = Enumerable.Range(0, n).Select(i => i * 1e-12).ToArray();
        var x = Enumerable.Range(0, n).Select(i => i % 100 == 37 ? 1.0 : i % 100 == 81 ? -1.0 : 0.001 * Math.Sin(i)).ToArray();
        var (tt, vv) = MinMaxColumns.Thin(t, [x], 1000);
        Assert.True(tt.Length <= 2000);
        Assert.Equal(1000, vv[0].Count(v => v == 1.0));
        Assert.Equal(1000, vv[0].Count(v => v == -1.0));
        // Per column (100 samples: one spike up at 37, one down at 81) the maximum comes first.
        for (int c = 0; c < 1000; c++) Assert.Equal((1.0, -1.0), (vv[0][2 * c], vv[0][2 * c + 1]));
        Assert.True(tt.Zip(tt.Skip(1)).All(p => p.Second > p.First), "instants must rise");
    }
}
