using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using PuppeteerSharp;
using PuppeteerSharp.Input;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Reports;
using Xunit.Abstractions;

namespace WaveSim.Tests.Reports;

/// <summary>
/// Drives report.html in headless Chromium (PuppeteerSharp on the system's Chromium): zoom, crosshair readout against
/// probes.csv, cursors, probe toggles, the frame scrubber, the space-time readout and the table width at 1280 px, with no
/// request leaving the page and no console error. Skipped without Chromium unless WAVESIM_REQUIRE_BROWSER=1. Screenshots
/// are kept in the test output folder under browser-artifacts/.
/// </summary>
public class InteractivePageBrowserTests(BrowserSession session, ITestOutputHelper output) : IClassFixture<BrowserSession>
{
    static RunOutcome RunOf(string yaml) => Simulate.Run(TestScenarios.Parse(yaml), HtmlReport.RunOptions());

    static RunOutcome RunOfFile(string name)
    {
        string path = Repository.PathOf("scenarios", name);
        return Simulate.Run(TestScenarios.Parse(File.ReadAllText(path)), HtmlReport.RunOptions());
    }

    /// <summary>probes.csv of the run, as the run command writes it: time, then V and A per probe.</summary>
    static (double[] T, Dictionary<string, double[]> V) Csv(RunOutcome run)
    {
        var sw = new StringWriter();
        ProbesCsv.Write(run.Result, sw);
        var lines = sw.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var head = lines[0].Trim().Split(',');
        var rows = lines.Skip(1).Select(l => l.Trim().Split(',').Select(x => double.Parse(x, CultureInfo.InvariantCulture)).ToArray()).ToArray();
        var v = new Dictionary<string, double[]>();
        for (int c = 1; c < head.Length; c++)
            if (head[c].EndsWith("_V", StringComparison.Ordinal)) v[head[c][..^2]] = rows.Select(r => r[c]).ToArray();
        return (rows.Select(r => r[0]).ToArray(), v);
    }

    static async Task<T> Js<T>(IPage page, string expression) => await page.EvaluateExpressionAsync<T>(expression);

    /// <summary>The plot area of a chart in viewport pixels, scrolled into view: left, top, width, height.</summary>
    static async Task<double[]> Over(IPage page, string chart)
    {
        await page.EvaluateExpressionAsync($"wavesimPage.charts.{chart}.over.scrollIntoView({{ block: 'center' }})");
        return await Js<double[]>(page, $"(() => {{ const r = wavesimPage.charts.{chart}.over.getBoundingClientRect(); return [r.left, r.top, r.width, r.height]; }})()");
    }

    async Task<Dictionary<string, double>> ReadoutAt(IPage page, double x, double y)
    {
        await page.Mouse.MoveAsync((decimal)x, (decimal)y);
        await page.Mouse.MoveAsync((decimal)x, (decimal)y + 1);
        var json = await Js<string>(page, "JSON.stringify({ t: +document.getElementById('readout').dataset.t, " +
            "v: Object.fromEntries([...document.querySelectorAll('#readout .ro-probe')].map(e => [e.dataset.probe, +e.dataset.v])) })");
        using var doc = JsonDocument.Parse(json);
        var result = new Dictionary<string, double> { ["@t"] = doc.RootElement.GetProperty("t").GetDouble() };
        foreach (var p in doc.RootElement.GetProperty("v").EnumerateObject()) result[p.Name] = p.Value.GetDouble();
        output.WriteLine($"readout at x={x:F0}: " + string.Join(", ", result.Select(kv => $"{kv.Key}={kv.Value:G6}")));
        return result;
    }

    static int Nearest(double[] t, double x)
    {
        int i = Array.BinarySearch(t, x);
        if (i >= 0) return i;
        i = ~i;
        return i == 0 ? 0 : i >= t.Length ? t.Length - 1 : (x - t[i - 1] <= t[i] - x ? i - 1 : i);
    }

    [SkippableFact]
    public async Task Zoom_readout_cursors_and_toggles_follow_the_record()
    {
        session.RequireBrowser();
        // A bit pattern: 8001 samples, more than the 2 × 1600 the thinned record keeps, so both the thinned and the full
        // record are exercised.
        var run = RunOfFile("bits-through-cable.yaml");
        var (t, v) = Csv(run);
        var html = HtmlReport.Build(ReportInput.For(run, "")).Html;
        await using var opened = await session.OpenAsync(html, "waveforms.html");
        var page = opened.Page;
        Assert.True(await Js<bool>(page, "wavesimPage.data.full !== null"), "the PRBS page should carry its full record (it is far below 10 MB)");
        await page.ScreenshotAsync(Path.Combine(session.Artifacts, "page-opened.png"), new ScreenshotOptions { FullPage = true });

        // 1. The readout on the whole record (thinned): each value is an extreme of the pixel column at that instant, so it
        // lies within the record's range over one column either side (the decimation error).
        var box = await Over(page, "v");
        double y = box[1] + box[3] / 2;
        double column = t[^1] / PageData.Columns;
        var ro = await ReadoutAt(page, box[0] + 0.37 * box[2], y);
        Assert.Equal(["rx", "tx"], ro.Keys.Where(k => k != "@t").Order());
        foreach (var probe in new[] { "tx", "rx" })
        {
            int a = Nearest(t, ro["@t"] - column), b = Nearest(t, ro["@t"] + column);
            double lo = v[probe][a..(b + 1)].Min(), hi = v[probe][a..(b + 1)].Max();
            Assert.InRange(ro[probe], lo - 1e-5, hi + 1e-5);
        }

        // 2. Drag to zoom: the axis becomes the dragged span (to a pixel).
        double x1 = box[0] + 0.30 * box[2], x2 = box[0] + 0.34 * box[2];
        double t1 = await Js<double>(page, $"wavesimPage.charts.v.posToVal({x1 - box[0]}, 'x')");
        double t2 = await Js<double>(page, $"wavesimPage.charts.v.posToVal({x2 - box[0]}, 'x')");
        double pixel = t[^1] / box[2];
        await page.Mouse.MoveAsync((decimal)x1, (decimal)y);
        await page.Mouse.DownAsync();
        await page.Mouse.MoveAsync((decimal)((x1 + x2) / 2), (decimal)y, new MoveOptions { Steps = 4 });
        await page.Mouse.MoveAsync((decimal)x2, (decimal)y, new MoveOptions { Steps = 4 });
        await page.Mouse.UpAsync();
        double min = await Js<double>(page, "wavesimPage.charts.v.scales.x.min"), max = await Js<double>(page, "wavesimPage.charts.v.scales.x.max");
        output.WriteLine($"dragged {t1:G6}..{t2:G6} s, axis now {min:G6}..{max:G6} s (one pixel {pixel:G3} s)");
        Assert.InRange(min, t1 - 1.5 * pixel, t1 + 1.5 * pixel);
        Assert.InRange(max, t2 - 1.5 * pixel, t2 + 1.5 * pixel);

        // 3. Zoomed, the chart draws every sample: the readout equals probes.csv at that instant (to the page's 6 digits).
        box = await Over(page, "v");
        ro = await ReadoutAt(page, box[0] + 0.55 * box[2], y);
        int k = Nearest(t, ro["@t"]);
        Assert.True(Math.Abs(t[k] - ro["@t"]) <= 1e-8 * t[^1], $"readout instant {ro["@t"]} is no recorded instant (nearest {t[k]})");
        foreach (var probe in new[] { "tx", "rx" })
            Assert.True(Math.Abs(ro[probe] - v[probe][k]) <= 1e-5 * Math.Abs(v[probe][k]) + 1e-9, $"{probe}: readout {ro[probe]}, probes.csv {v[probe][k]}");

        // 4. Two cursors by clicking: Δt is B − A, ΔV matches probes.csv interpolated at both.
        foreach (double f in new[] { 0.2, 0.7 })
        {
            double x = box[0] + f * box[2];
            await page.Mouse.MoveAsync((decimal)x, (decimal)y);
            await page.Mouse.DownAsync();
            await page.Mouse.UpAsync();
        }
        double[] cursors = await Js<double[]>(page, "wavesimPage.cursors");
        double dt = double.Parse(await Js<string>(page, "document.getElementById('cursor-readout').dataset.dt"), CultureInfo.InvariantCulture);
        Assert.Equal(cursors[1] - cursors[0], dt, 1e-15);
        double expectedA = await Js<double>(page, $"wavesimPage.charts.v.posToVal({0.2 * box[2]}, 'x')");
        Assert.InRange(cursors[0], expectedA - pixel, expectedA + pixel);
        double dv = double.Parse(await Js<string>(page, "document.querySelector('#cursor-readout tr[data-probe=rx] .dv').dataset.dv"), CultureInfo.InvariantCulture);
        double Interp(string p, double at) { int i = Nearest(t, at); int j = t[i] > at ? i - 1 : i; double fr = (at - t[j]) / (t[j + 1] - t[j]); return v[p][j] + fr * (v[p][j + 1] - v[p][j]); }
        Assert.Equal(Interp("rx", cursors[1]) - Interp("rx", cursors[0]), dv, 1e-4);
        Assert.Contains("1/Δt", await Js<string>(page, "document.getElementById('cursor-readout').textContent"));
        await page.ScreenshotAsync(Path.Combine(session.Artifacts, "page-zoomed-with-cursors.png"));

        // 5. Toggling a probe hides its series and drops it from the readout.
        await page.ClickAsync("#probe-toggles input[data-probe=tx]");
        Assert.False(await Js<bool>(page, "wavesimPage.charts.v.series[1].show"));
        Assert.True(await Js<bool>(page, "wavesimPage.charts.v.series[2].show"));
        box = await Over(page, "v");
        ro = await ReadoutAt(page, box[0] + 0.5 * box[2], y);
        Assert.DoesNotContain("tx", ro.Keys);
        Assert.Contains("rx", ro.Keys);

        // 6. Double-click shows the whole record again.
        await page.Mouse.ClickAsync((decimal)(box[0] + 0.5 * box[2]), (decimal)y, new ClickOptions { Count = 2 });
        await page.EvaluateExpressionAsync("new Promise(r => setTimeout(r, 100))");
        Assert.Equal(0, await Js<double>(page, "wavesimPage.charts.v.scales.x.min"), 1e-15);
        Assert.Equal(t[^1], await Js<double>(page, "wavesimPage.charts.v.scales.x.max"), 1e-15);
        output.WriteLine($"screenshots kept in {session.Artifacts}");
        opened.AssertClean();
    }

    [SkippableFact]
    public async Task Scrubber_at_frame_k_shows_that_frames_voltage_along_the_line()
    {
        session.RequireBrowser();
        var run = RunOf(ReportScenarios.Matched);
        var r = run.Result;
        await using var opened = await session.OpenAsync(HtmlReport.Build(ReportInput.For(run, ReportScenarios.Matched)).Html, "frames.html");
        var page = opened.Page;
        var z = r.Lines[0].Positions;
        Assert.True(z.Length <= PageData.FramePositions, "the test net should keep every node along the line");
        Assert.Equal(z.Length, await Js<int>(page, "wavesimPage.data.frames.z.length"));
        foreach (int k in new[] { 0, 97, r.Snapshots.Count - 1 })
        {
            await page.EvaluateExpressionAsync($"(() => {{ const s = document.getElementById('scrubber'); s.value = '{k}'; s.dispatchEvent(new Event('input')); }})()");
            double[] shown = await Js<double[]>(page, "Array.from(wavesimPage.charts.frame.data[1])");
            double[] expected = r.Snapshots[k].Volts[0];
            Assert.Equal(expected.Length, shown.Length);
            for (int i = 0; i < expected.Length; i++)
                Assert.True(Math.Abs(shown[i] - expected[i]) <= 1e-5 * Math.Abs(expected[i]) + 1e-9, $"frame {k}, node {i}: shown {shown[i]}, run {expected[i]}");
            Assert.Equal(k, await Js<int>(page, "+document.getElementById('frame-label').dataset.frame"));
            Assert.Equal(r.Snapshots[k].Time, await Js<double>(page, "+document.getElementById('frame-label').dataset.t"), 1e-8 * r.Time[^1]);
        }

        // The space-time map reads z, t and V under the pointer: the snapshot row and node under it.
        await page.EvaluateExpressionAsync("document.getElementById('spacetime-map').scrollIntoView({ block: 'center' })");
        double[] map = await Js<double[]>(page, "(() => { const b = document.getElementById('spacetime-map').getBoundingClientRect(); const c = document.getElementById('spacetime-map'); return [b.left + c.clientLeft, b.top + c.clientTop, c.clientWidth, c.clientHeight]; })()");
        int row = (int)(0.4 * r.Snapshots.Count), col = (int)(0.6 * z.Length);
        // The whole pixel nearest the middle of that row's and node's cell (a row is over a pixel tall; the browser takes
        // whole pixels).
        await page.Mouse.MoveAsync(Math.Round((decimal)(map[0] + (col + 0.5) / z.Length * map[2])), Math.Round((decimal)(map[1] + (row + 0.5) / r.Snapshots.Count * map[3])));
        var data = await Js<double[]>(page, "(() => { const d = document.getElementById('spacetime-readout').dataset; return [+d.z, +d.t, +d.v, +d.row, +d.column]; })()");
        output.WriteLine($"space-time readout z={data[0]:G4} m t={data[1]:G4} s V={data[2]:G4} V at row {data[3]}, node {data[4]} (expected row {row}, node {col}; map {string.Join(", ", map)})");
        Assert.Equal(z[col], data[0], 1e-9);
        Assert.Equal(r.Snapshots[row].Time, data[1], 1e-8 * r.Time[^1]);
        Assert.Equal(r.Snapshots[row].Volts[0][col], data[2], 1e-5);
        opened.AssertClean();
    }

    [SkippableFact]
    public async Task Multidrop_tables_fit_the_page_at_1280_px_or_scroll_in_their_box_with_the_probe_column_held()
    {
        session.RequireBrowser();
        var run = RunOfFile("multidrop-vtt.yaml");
        await using var opened = await session.OpenAsync(HtmlReport.Build(ReportInput.For(run, "")).Html, "multidrop.html");
        var page = opened.Page;
        double pageWidth = await Js<double>(page, "document.documentElement.scrollWidth");
        Assert.True(pageWidth <= 1280, $"the page is {pageWidth} px wide at a 1280 px window");
        var (right, tableWidth, boxWidth) = (await Js<double[]>(page,
            "(() => { const b = document.getElementById('figures-box'), t = document.getElementById('figures'); return [b.getBoundingClientRect().right, t.scrollWidth, b.clientWidth]; })()")) switch
        { var a => (a[0], a[1], a[2]) };
        output.WriteLine($"figures table {tableWidth} px in a box of {boxWidth} px ending at {right} px");
        Assert.True(right <= 1280, $"the table's box ends at {right} px");
        if (tableWidth > boxWidth)
        {
            Assert.Equal("auto", await Js<string>(page, "getComputedStyle(document.getElementById('figures-box')).overflowX"));
            Assert.Equal("sticky", await Js<string>(page, "getComputedStyle(document.querySelector('#figures td')).position"));
        }
        // Every number as the page shows it: no exponent anywhere in the tables.
        string cells = await Js<string>(page, "[...document.querySelectorAll('td')].map(e => e.textContent).join('\\n')");
        Assert.DoesNotMatch(new Regex(@"\d[eE][+-]?\d"), cells);
        opened.AssertClean();
    }

    [SkippableFact]
    public async Task The_overlay_page_and_a_report_opened_with_currents_draw_without_errors()
    {
        session.RequireBrowser();
        var a = RunOf(ReportScenarios.Matched).Result;
        var b = RunOf(ReportScenarios.Ringing).Result;
        var traces = new[] { a, b }.Select(r => new OverlayTrace(r.Scenario.Title, "folder", r.Time, r.Probe("rx").Volts)).ToList();
        await using (var opened = await session.OpenAsync(OverlayPage.Html("rx", "rx", traces, null), "overlay.html"))
        {
            var page = opened.Page;
            Assert.Equal(3, await Js<int>(page, "wavesimPage.charts.v.series.length"));
            Assert.True(await Js<bool>(page, "document.getElementById('show-currents').parentNode.hidden"), "an overlay has no currents");
            // The matched run is 10 ns long, the ringing one 40 ns: past 10 ns the first trace is a gap.
            Assert.Null(await Js<double?>(page, "wavesimPage.valueAt(0, 20e-9)"));
            Assert.Equal(b.Probe("rx").Volts[^1], await Js<double>(page, "wavesimPage.valueAt(1, 40e-9)"), 1e-5);
            opened.AssertClean();
        }
        var run = RunOf(ReportScenarios.Matched);
        var input = ReportInput.For(run, "") with { Waveforms = new Core.Pictures.WaveformOptions { Currents = true } };
        await using (var opened = await session.OpenAsync(HtmlReport.Build(input).Html, "currents.html"))
        {
            Assert.True(await Js<bool>(opened.Page, "!!wavesimPage.charts.a && !document.getElementById('chart-a-box').hidden"));
            opened.AssertClean();
        }
    }

    [SkippableFact]
    public async Task A_sweep_page_marks_the_best_point_and_a_click_shows_that_points_waveforms()
    {
        session.RequireBrowser();
        // The matched net with the load varied: at 50 ohm the line is matched and the load sees 0.5 V (Pozar eq. 2.35).
        var s = TestScenarios.Parse(ReportScenarios.Matched);
        var grid = Core.Sweeps.SweepGrid.Build(s, [Core.Sweeps.SweepAxis.Parse("load.r=25,50,100,200 ohm")]);
        var result = Core.Sweeps.SweepRunner.Run(grid, new Core.Sweeps.SweepRunOptions { Serial = true, WaveformColumns = StudyPages.WaveformColumns });
        var goal = Core.Sweeps.SweepGoal.Parse("min:rx.overshoot", result.Probes);
        var set = StudyPages.Sweep("matched net: sweep", result, ["overshoot_pct", "settling_s"], goal, []);
        await using var opened = await session.OpenAsync(VariantPage.Html(set), "sweep.html");
        var page = opened.Page;
        Assert.Equal(2, await Js<int>(page, "wavesimPage.charts.length"));
        int best = set.Best!.Value;
        Assert.Equal(best, await Js<int>(page, "wavesimPage.selected"));
        // A click on the point of 100 ohm (index 2) of the first chart (inside the plot; the last point sits on its edge).
        await page.EvaluateExpressionAsync("wavesimPage.charts[0].over.scrollIntoView({ block: 'center' })");
        double[] box = await Js<double[]>(page, "(() => { const u = wavesimPage.charts[0], r = u.over.getBoundingClientRect(); return [r.left, r.top, u.valToPos(u.data[0][2], 'x'), r.height]; })()");
        await page.Mouse.MoveAsync((decimal)(box[0] + box[2]), (decimal)(box[1] + box[3] / 2));
        await page.Mouse.DownAsync();
        await page.Mouse.UpAsync();
        Assert.Equal(2, await Js<int>(page, "wavesimPage.selected"));
        double[] shown = await Js<double[]>(page, "Array.from(wavesimPage.wave.data[2])");
        var expected = result.Points[2].Waveforms!.Volts[1];
        Assert.Equal(expected.Length, shown.Length);
        for (int i = 0; i < shown.Length; i++) Assert.Equal(expected[i], shown[i], 1e-5);
        // The load of 100 ohm on the matched 50 ohm line and driver: launch 0.5 V, Γ = (100 − 50)/(100 + 50) = 1/3 (Pozar
        // eq. 2.35), so the load settles at 0.5 × (1 + 1/3) = 2/3 V once the reflection is absorbed at the matched source.
        Assert.Equal(2.0 / 3, shown[^1], 2e-3);
        Assert.Contains("load.r = 100 Ω", await Js<string>(page, "document.getElementById('variant-title').textContent"));
        opened.AssertClean();

        var study = Core.Terminations.TerminationStudy.Run(TestScenarios.Parse(ReportScenarios.Ringing), new Core.Terminations.TerminationOptions { Serial = true });
        await using var terms = await session.OpenAsync(VariantPage.Html(StudyPages.Terminations("ringing net: terminations", study)), "terminations.html");
        Assert.Equal(4, await Js<int>(terms.Page, "wavesimPage.charts.length"));
        terms.AssertClean();
    }
}
