using System.Diagnostics;
using System.Text.RegularExpressions;
using SkiaSharp;
using Xunit.Abstractions;

namespace WaveSim.Tests.Reports;

/// <summary>
/// Opens report.html in a real headless browser (Chromium) and checks what it rendered. When Chromium is not installed the
/// check does not run and is reported as Skipped (never as Passed), unless WAVESIM_REQUIRE_BROWSER=1, in which case a
/// missing browser is a failure. .ci/run installs Chromium and sets the variable.
/// </summary>
public class ReportBrowserTests(ITestOutputHelper output)
{
    static readonly TimeSpan Timeout = TimeSpan.FromSeconds(60);

    static string? FindChromium()
    {
        if (File.Exists("/usr/bin/chromium")) return "/usr/bin/chromium";
        foreach (string dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator))
            foreach (string name in new[] { "chromium", "chromium-browser" })
                if (dir.Length > 0 && File.Exists(Path.Combine(dir, name))) return Path.Combine(dir, name);
        return null;
    }

    [SkippableFact]
    public void Chromium_renders_the_report_with_its_table_and_pictures()
    {
        bool required = Environment.GetEnvironmentVariable("WAVESIM_REQUIRE_BROWSER") == "1";
        string? chromium = FindChromium();
        Assert.False(chromium is null && required, "WAVESIM_REQUIRE_BROWSER=1 but chromium was not found (looked at /usr/bin/chromium and PATH)");
        Skip.If(chromium is null, "chromium is not installed, so the report was not rendered in a browser (apt-get install chromium; WAVESIM_REQUIRE_BROWSER=1 makes this a failure)");
        string dir = Path.Combine(Path.GetTempPath(), "wavesim-browser-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string page = Path.Combine(dir, "report.html");
            File.WriteAllText(page, ReportScenarios.Build(ReportScenarios.Matched).Html);
            string url = new Uri(page).AbsoluteUri;
            string shot = Path.Combine(dir, "shot.png");
            Browser(chromium, dir, [$"--screenshot={shot}", "--window-size=1200,2000", url]);
            string dom = Browser(chromium, dir, ["--dump-dom", url]);

            // The DOM as the browser built it: the figures table with one row per probe, and both pictures.
            var table = Regex.Match(dom, "<table id=\"figures\">(.*?)</table>", RegexOptions.Singleline);
            Assert.True(table.Success, "figures table missing from the DOM dump");
            Assert.Equal(2, Regex.Count(table.Value, "<td>(drv|rx)</td>"));
            Assert.Matches("<img id=\"waveforms\" src=\"data:image/png;base64,", dom);
            Assert.Matches("<canvas id=\"spacetime-map\" width=\"\\d+\" height=\"\\d+\"", dom);

            using var bitmap = SKBitmap.Decode(shot);
            Assert.NotNull(bitmap);
            Assert.Equal(1200, bitmap.Width);
            int dark = 0;
            for (int y = 0; y < bitmap.Height; y += 4)
                for (int x = 0; x < bitmap.Width; x += 4)
                {
                    var c = bitmap.GetPixel(x, y);
                    if (c.Red < 200 || c.Green < 200 || c.Blue < 200) dark++;
                }
            output.WriteLine($"rendered with {chromium}: {dark} sampled non-white pixels");
            Assert.True(dark > 1000, $"the screenshot is (nearly) blank: {dark} sampled non-white pixels");
        }
        finally { try { Directory.Delete(dir, recursive: true); } catch (IOException) { } }
    }

    /// <summary>Runs headless Chromium with a fresh profile; kills it (and its children) on timeout. Returns stdout.</summary>
    static string Browser(string chromium, string dir, string[] args)
    {
        var psi = new ProcessStartInfo(chromium) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in new[] { "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
                     "--disable-sync", "--no-first-run", $"--user-data-dir={Path.Combine(dir, "profile-" + Guid.NewGuid().ToString("N"))}" })
            psi.ArgumentList.Add(a);
        foreach (string a in args) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(Timeout))
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail($"chromium did not finish within {Timeout.TotalSeconds} s");
        }
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"chromium exited with {p.ExitCode}: {stderr.Result}");
        return stdout.Result;
    }
}
