namespace WaveSim.Tests.Cli;

/// <summary>`run --window` and `--plot`: bad values are one-line errors before anything runs (common practice, no source).</summary>
public class RunPictureOptionsTests
{
    const string Scenario = @"
title: bits
source: { waveform: bits, pattern: '10', high: 1 V, rise: 100 ps, bit_time: 1 ns, resistance: 50 ohm }
line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm, receiver: { vih: 0.35 V, vil: 0.15 V } }
probes: [ { name: tx, at: source }, { name: rx, at: load } ]
simulation: { duration: 60 ns, output_step: 20 ps, resolution: 10 }
";

    [Theory]
    [InlineData("--window", "20ns..10ns", "--window: expected START..STOP")]
    [InlineData("--window", "10..20", "--window: expected START..STOP")]
    [InlineData("--window", "70ns..80ns", "--window: the window 70 ns to 80 ns lies outside the record")]
    [InlineData("--plot", "rx,nowhere", "--plot: unknown probe 'nowhere'; expected one of tx, rx")]
    [InlineData("--plot", ",", "--plot: expected one or more probe names")]
    public void Bad_window_or_probe_list_is_a_one_line_error_and_writes_nothing(string option, string value, string start)
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        var (code, stdout, err) = CliRunner.Run("run", cli.Write("s.yaml", Scenario), "--out", outDir, option, value);
        Assert.Equal(2, code);
        Assert.StartsWith("error: " + start, err);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.Equal("", stdout);
        Assert.False(Directory.Exists(outDir));
    }

    [Fact]
    public void A_long_record_says_which_part_the_picture_shows_and_how_to_see_all_of_it()
    {
        using var cli = new CliRunner();
        string scenario = cli.Write("s.yaml", Scenario);
        var (code, stdout, err) = CliRunner.Run("run", scenario, "--out", cli.PathOf("a"));
        Assert.True(code == 0, err);
        // 60 edges (one per 1 ns bit) are more than 50: the picture is limited and the summary says so.
        Assert.Contains("waveforms.png shows 0 s to", stdout);
        Assert.Contains("first 10 of 60 source edges; --window all draws the whole record", stdout);

        (code, stdout, err) = CliRunner.Run("run", scenario, "--out", cli.PathOf("b"), "--window", "all", "--plot", "rx");
        Assert.True(code == 0, err);
        Assert.DoesNotContain("waveforms.png shows", stdout);
        Assert.True(File.Exists(Path.Combine(cli.PathOf("b"), "waveforms.png")));

        (code, _, err) = CliRunner.Run("run", scenario, "--out", cli.PathOf("c"), "--window", "10ns..20ns", "--svg");
        Assert.True(code == 0, err);
        string svg = File.ReadAllText(Path.Combine(cli.PathOf("c"), "waveforms.svg"));
        Assert.Contains("VIH 350 mV", svg.Replace("&#xA0;", " "));
    }
}
