using PuppeteerSharp;

namespace WaveSim.Tests.Reports;

/// <summary>
/// One headless Chromium (the system's package, never a downloaded build) shared by the page's browser tests, and the
/// pages opened in it with every request watched. Null <see cref="Browser"/> when Chromium is not installed.
/// </summary>
public sealed class BrowserSession : IAsyncLifetime
{
    /// <summary>The browser, or null when none is installed.</summary>
    public IBrowser? Browser { get; private set; }

    /// <summary>Where Chromium was found.</summary>
    public string? Executable { get; } = FindChromium();

    /// <summary>Folder of the pages written for the tests and the screenshots kept (under the test output folder).</summary>
    public string Artifacts { get; } = Path.Combine(AppContext.BaseDirectory, "browser-artifacts");

    internal static string? FindChromium()
    {
        if (File.Exists("/usr/bin/chromium")) return "/usr/bin/chromium";
        foreach (string dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator))
            foreach (string name in new[] { "chromium", "chromium-browser" })
                if (dir.Length > 0 && File.Exists(Path.Combine(dir, name))) return Path.Combine(dir, name);
        return null;
    }

    /// <summary>Skips (or, with WAVESIM_REQUIRE_BROWSER=1, fails) a test when there is no browser.</summary>
    public void RequireBrowser()
    {
        bool required = Environment.GetEnvironmentVariable("WAVESIM_REQUIRE_BROWSER") == "1";
        Assert.False(Executable is null && required, "WAVESIM_REQUIRE_BROWSER=1 but chromium was not found (looked at /usr/bin/chromium and PATH)");
        Skip.If(Executable is null, "chromium is not installed, so the page was not driven in a browser (apt-get install chromium; WAVESIM_REQUIRE_BROWSER=1 makes this a failure)");
        Assert.NotNull(Browser);
    }

    public async Task InitializeAsync()
    {
        Directory.CreateDirectory(Artifacts);
        if (Executable is null) return;
        Browser = await Puppeteer.LaunchAsync(new LaunchOptions
        {
            Headless = true,
            ExecutablePath = Executable,
            UserDataDir = Path.Combine(Path.GetTempPath(), "wavesim-puppeteer-" + Guid.NewGuid().ToString("N")),
            Args = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--no-first-run", "--disable-dev-shm-usage"],
            Timeout = 60_000,
        });
    }

    public async Task DisposeAsync()
    {
        if (Browser is not null) await Browser.CloseAsync();
    }

    /// <summary>
    /// Opens <paramref name="html"/> (written to <paramref name="name"/> in <see cref="Artifacts"/>) at 1280 × 900 px and
    /// waits for the page's script. Every request other than the page's own file is recorded and refused, every console
    /// error and page error recorded.
    /// </summary>
    public async Task<OpenedPage> OpenAsync(string html, string name)
    {
        string file = Path.Combine(Artifacts, name);
        await File.WriteAllTextAsync(file, html);
        string url = new Uri(file).AbsoluteUri;
        var page = await Browser!.NewPageAsync();
        var opened = new OpenedPage(page, url);
        await page.SetViewportAsync(new ViewPortOptions { Width = 1280, Height = 900 });
        await page.SetRequestInterceptionAsync(true);
        page.Request += async (_, e) =>
        {
            // data: pictures are part of the page itself; anything else would leave it.
            if (e.Request.Url == url || e.Request.Url.StartsWith("data:", StringComparison.Ordinal)) await e.Request.ContinueAsync();
            else { lock (opened.Requests) opened.Requests.Add(e.Request.Url); await e.Request.AbortAsync(); }
        };
        page.Console += (_, e) => { if (e.Message.Type == ConsoleType.Error) lock (opened.Errors) opened.Errors.Add("console: " + e.Message.Text); };
        page.PageError += (_, e) => { lock (opened.Errors) opened.Errors.Add("page error: " + e.Message); };
        await page.GoToAsync(url, new NavigationOptions { WaitUntil = [WaitUntilNavigation.Load], Timeout = 30_000 });
        await page.WaitForFunctionAsync("() => window.wavesimPage && window.wavesimPage.ready === true", new WaitForFunctionOptions { Timeout = 15_000 });
        return opened;
    }
}

/// <summary>A page open in the browser, with the requests it tried and the errors it logged.</summary>
public sealed record OpenedPage(IPage Page, string Url) : IAsyncDisposable
{
    /// <summary>Requests to anything but the page's own file (refused).</summary>
    public List<string> Requests { get; } = [];

    /// <summary>Console errors and uncaught exceptions.</summary>
    public List<string> Errors { get; } = [];

    /// <summary>Fails unless the page made no request and logged no error.</summary>
    public void AssertClean()
    {
        Assert.True(Requests.Count == 0, "the page made requests: " + string.Join(", ", Requests));
        Assert.True(Errors.Count == 0, "the page logged errors: " + string.Join(" | ", Errors));
    }

    public async ValueTask DisposeAsync() => await Page.CloseAsync();
}
