namespace WaveSim.Tests.Tolerances;

/// <summary>`montecarlo --html`: the page beside the other files, and its refusal with `--shard`.</summary>
public class MonteCarloHtmlTests
{
    static readonly string[] Args = ["--vary", "load.r=tol(20%)", "--samples", "6", "--seed", "3", "--limit", "rx.high>0.45V"];

    [Fact]
    public void Html_writes_montecarlo_html_with_every_samples_waveforms_and_the_yield()
    {
        using var t = new CliRunner();
        string file = t.Write("divider.yaml", ToleranceSetTests.Divider);
        var r = CliRunner.Run(["montecarlo", file, .. Args, "--html", "--out", t.PathOf("mc")]);
        Assert.True(r.Code == 0, r.Err);
        string html = File.ReadAllText(t.PathOf("mc/montecarlo.html"));
        Assert.Contains("id=\"outcome\">Yield: ", html);
        Assert.Contains("Wilson interval", html);
        // Six samples, each with its thinned waveforms (no null entry in the waves list).
        int waves = html.IndexOf("\"waves\":[", StringComparison.Ordinal);
        Assert.True(waves > 0);
        Assert.Equal(6, System.Text.RegularExpressions.Regex.Count(html[waves..], "\\{\"t\":\\["));
        Assert.Contains("montecarlo.html", r.Out);
    }

    [Fact]
    public void Html_with_a_shard_is_refused_in_one_line_and_nothing_is_written()
    {
        using var t = new CliRunner();
        string file = t.Write("divider.yaml", ToleranceSetTests.Divider);
        var r = CliRunner.Run(["montecarlo", file, .. Args, "--html", "--shard", "1/2", "--out", t.PathOf("mc")]);
        Assert.Equal(2, r.Code);
        Assert.StartsWith("error: --html: not with --shard", r.Err.Trim());
        Assert.Single(r.Err.Trim().Split('\n'));
        Assert.False(Directory.Exists(t.PathOf("mc")));
    }
}
