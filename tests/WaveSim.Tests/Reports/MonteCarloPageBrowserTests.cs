using System.Globalization;
using PuppeteerSharp;
using WaveSim.Core.Reports;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Tests.Reports;

/// <summary>
/// Drives montecarlo.html in headless Chromium: the limited figure charted against its most influential key, the yield
/// with its Wilson interval, a click on a sample showing that sample's waveforms; no request leaves the page and no
/// console error. Skipped without Chromium unless WAVESIM_REQUIRE_BROWSER=1.
/// </summary>
public class MonteCarloPageBrowserTests(BrowserSession session) : IClassFixture<BrowserSession>
{
    static async Task<T> Js<T>(IPage page, string expression) => await page.EvaluateExpressionAsync<T>(expression);

    /// <summary>Wilson's score interval (E. B. Wilson, "Probable inference, the law of succession, and statistical inference", JASA 22, 1927), written out here.</summary>
    static (double Low, double High) Wilson(int k, int n, double z)
    {
        double p = (double)k / n, d = 1 + z * z / n, c = p + z * z / (2 * n), h = z * Math.Sqrt(p * (1 - p) / n + z * z / (4.0 * n * n));
        return ((c - h) / d, (c + h) / d);
    }

    [SkippableFact]
    public async Task The_page_charts_the_limited_figure_against_its_key_shows_the_yield_and_a_click_shows_a_samples_waveforms()
    {
        session.RequireBrowser();
        // The matched net (50 ohm driver and line) with its load drawn from 25 to 200 ohm: the load settles at the divider
        // VS·R/(R + RS) (Ohm's law; the line's reflections die at the matched source, Pozar eq. 2.35), so the limit
        // rx.high < 0.7 V holds for R < 0.7·50/0.3 = 116.7 ohm and the load's resistance is the most influential key.
        var s = TestScenarios.Parse(ReportScenarios.Matched);
        var keys = new[] { ToleranceKey.Parse("load.r=uniform(25..200 ohm)"), ToleranceKey.Parse("line[0].segment.z0=tol(2%)") };
        var set = ToleranceSet.Build(s, keys, new ToleranceSetOptions { Samples = 12, Seed = 5 });
        var limits = new[] { SweepLimit.Parse("rx.high<0.7V", set.Probes) };
        var result = ToleranceRunner.Run(set, limits, new SweepRunOptions { Serial = true, WaveformColumns = StudyPages.WaveformColumns });
        var loads = result.Points.Select(p => p.Values[0]).ToArray();
        Assert.DoesNotContain(loads, r => Math.Abs(r - 116.67) < 2); // no sample so near the bound that the figure's settling decides it
        int passes = loads.Count(r => r / (r + 50) < 0.7);
        var vs = TolerancePages.Set("matched net: Monte Carlo", result, limits);

        await using var opened = await session.OpenAsync(VariantPage.Html(vs), "montecarlo.html");
        var page = opened.Page;
        Assert.Equal(1, await Js<int>(page, "wavesimPage.charts.length"));
        Assert.Equal("load.r", await Js<string>(page, "wavesimPage.data.figures[0].axis.label"));
        // One series only (the limited probe's), drawn over the samples in ascending load.r.
        Assert.Equal(2, await Js<int>(page, "wavesimPage.charts[0].data.length"));
        double[] xs = await Js<double[]>(page, "Array.from(wavesimPage.charts[0].data[0])");
        Assert.Equal(loads.OrderBy(r => r).ToArray(), xs, (a, b) => Math.Abs(a - b) < 1e-6 * a);

        var w = Wilson(passes, loads.Length, 1.959963984540054);
        string outcome = await Js<string>(page, "document.getElementById('outcome').textContent");
        Assert.Contains(string.Create(CultureInfo.InvariantCulture, $"Yield: {passes} of {loads.Length} meet"), outcome);
        Assert.Contains(string.Create(CultureInfo.InvariantCulture, $"95 % Wilson interval {w.Low * 100:F1} to {w.High * 100:F1} %"), outcome);

        // A click on the sample of the second-largest load (the largest sits on the plot's edge).
        int drawn = xs.Length - 2, sample = Array.IndexOf(loads, loads.OrderBy(r => r).ElementAt(drawn));
        await page.EvaluateExpressionAsync("wavesimPage.charts[0].over.scrollIntoView({ block: 'center' })");
        double[] box = await Js<double[]>(page, $"(() => {{ const u = wavesimPage.charts[0], r = u.over.getBoundingClientRect(); return [r.left, r.top, u.valToPos(u.data[0][{drawn}], 'x'), r.height]; }})()");
        await page.Mouse.MoveAsync((decimal)(box[0] + box[2]), (decimal)(box[1] + box[3] / 2));
        await page.Mouse.DownAsync();
        await page.Mouse.UpAsync();
        Assert.Equal(sample, await Js<int>(page, "wavesimPage.selected"));
        Assert.StartsWith($"sample {sample}: load.r = ", await Js<string>(page, "document.getElementById('variant-title').textContent"));
        double[] shown = await Js<double[]>(page, "Array.from(wavesimPage.wave.data[2])");
        var expected = result.Points[sample].Waveforms!.Volts[1];
        Assert.Equal(expected.Length, shown.Length);
        for (int i = 0; i < shown.Length; i++) Assert.Equal(expected[i], shown[i], 1e-5);
        double r0 = loads[sample];
        Assert.Equal(r0 / (r0 + 50), shown[^1], 2e-3);
        await page.ScreenshotAsync(Path.Combine(session.Artifacts, "montecarlo-clicked.png"));
        opened.AssertClean();
    }
}
