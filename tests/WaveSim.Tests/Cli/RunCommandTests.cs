using System.Text.Json.Nodes;

namespace WaveSim.Tests.Cli;

/// <summary>The run and check commands end to end, and their one-line errors on bad scenarios (common practice, no source).</summary>
public class RunCommandTests
{
    const string Good = @"
title: matched line
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 50 ohm }
line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm }
probes: [ { name: near, at: source }, { name: far, at: load } ]
simulation: { duration: 3 ns, output_step: 10 ps }
";

    [Fact]
    public void Run_writes_probes_csv_summary_and_pictures()
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        string scenario = cli.Write("s.yaml", Good);
        string outDir = Path.Combine(dir, "out");
        var (code, stdout, err) = CliRunner.Run("run", scenario, "--out", outDir, "--frames", "3", "--frame-size", "320x240", "--svg");
        Assert.True(code == 0, err);
        string[] lines = File.ReadAllLines(Path.Combine(outDir, "probes.csv"));
        Assert.Equal("time_s,near_V,near_A,far_V,far_A", lines[0]);
        Assert.Equal(301 + 1, lines.Length); // 0 to 3 ns inclusive at 10 ps, plus the header
        var summary = JsonNode.Parse(File.ReadAllText(Path.Combine(outDir, "summary.json")))!;
        // Matched line: the far end settles at half the source step (voltage divider, Pozar eq. 2.35 with Γ = 0).
        Assert.Equal(0.5, summary["probes"]!["far"]!["final_V"]!.GetValue<double>(), 1e-9);
        Assert.NotNull(summary["plan"]!["segments"]![0]!["courant"]);
        foreach (string f in new[] { "waveforms.png", "waveforms.svg", "spacetime.png", "frames/frame_00001.png", "frames/frame_00003.png" })
            Assert.True(File.Exists(Path.Combine(outDir, f)), f);
        Assert.False(File.Exists(Path.Combine(outDir, "frames/frame_00004.png")));
        Assert.Empty(Directory.GetDirectories(dir, ".*partial*"));
        Assert.Contains("far", stdout);
    }

    [Fact]
    public void Frequency_domain_check_agrees_within_one_percent_and_writes_the_frequency_outputs()
    {
        // Independent cross-check: frequency-domain ABCD cascade vs time-domain leapfrog (two methods, one scenario).
        using var cli = new CliRunner();
        string dir = cli.Dir;
        string outDir = Path.Combine(dir, "out");
        var (code, _, err) = CliRunner.Run("run", cli.Write("s.yaml", Good.Replace("{ r: 50 ohm }", "{ r: 75 ohm, c: 1 pF }")), "--out", outDir, "--check-frequency-domain");
        Assert.True(code == 0, err);
        var summary = JsonNode.Parse(File.ReadAllText(Path.Combine(outDir, "summary.json")))!;
        foreach (var p in new[] { "near", "far" })
            Assert.True(summary["frequency_domain_check"]![p]!["max_diff_pct"]!.GetValue<double>() < 1.0, p);
        Assert.True(File.Exists(Path.Combine(outDir, "frequency.csv")));
        Assert.True(File.Exists(Path.Combine(outDir, "frequency.png")));
    }

    [Fact]
    public void Check_prints_cells_and_Courant_numbers_without_running()
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        var (code, stdout, _) = CliRunner.Run("check", cli.Write("s.yaml", Good), "--json");
        Assert.Equal(0, code);
        var plan = JsonNode.Parse(stdout)!;
        // 0.5 ns delay at resolution 20 over a 100 ps rise: dt = 5 ps → 100 cells, Courant 1 (whole steps).
        Assert.Equal(100, plan["segments"]![0]!["cells"]!.GetValue<int>());
        Assert.Equal(1.0, plan["segments"]![0]!["courant"]!.GetValue<double>(), 1e-9);
        Assert.Empty(Directory.GetDirectories(dir));
    }

    [Theory]
    [InlineData("output_step: 10 ps }", "output_step: 10 ps, speed: 2 }", "unknown key 'speed'")]
    [InlineData("high: 1 V, ", "", "missing required key 'source.high'")]
    [InlineData("length: 100 mm", "length: -100 mm", "must be greater than zero")]
    [InlineData("z0: 50 ohm", "z0: 0 ohm", "line[0].segment.z0")]
    [InlineData("duration: 3 ns", "duration: 0 ns", "simulation.duration")]
    [InlineData("at: load }", "at: 2 m }", "outside the line")]
    [InlineData("name: far", "name: ../../etc", "is not a name")]
    [InlineData("z0: 50 ohm", "z0: 50 pF", "is a capacitance, not a resistance")]
    [InlineData("z0: 50 ohm", "z0: 50", "has no unit")]
    [InlineData("rise: 100 ps", "rise: 100 parsecs", "unknown unit")]
    [InlineData("waveform: step", "waveform: stepp", "is not a waveform")]
    [InlineData("line: [", "lines: [", "unknown key 'lines'")]
    [InlineData("{ name: near, at: source }, ", "{ name: far, at: source }, ", "used twice")]
    public void A_bad_scenario_gets_one_line_naming_file_line_and_key_and_writes_nothing(string find, string replace, string fragment)
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        string scenario = cli.Write("bad.yaml", Good.Replace(find, replace));
        string outDir = Path.Combine(dir, "out");
        var (code, stdout, err) = CliRunner.Run("run", scenario, "--out", outDir);
        Assert.Equal(2, code);
        string[] errLines = err.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Single(errLines);
        Assert.StartsWith("error: ", errLines[0]);
        Assert.Contains(fragment, errLines[0]);
        Assert.Matches(@"bad\.yaml:\d+:\d+: ", errLines[0]);
        Assert.False(Directory.Exists(outDir));
        Assert.Empty(Directory.GetDirectories(dir));
        Assert.Equal("", stdout);
    }

    [Fact]
    public void A_plan_beyond_the_limits_is_refused_with_its_estimate_and_writes_nothing()
    {
        // 100 cells at 5 ps for 10 s: 2e12 steps, 2e14 cell updates and 1e12 output rows, over the 2 GB and 1e11 limits (docs/run.md, --force).
        using var cli = new CliRunner();
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, _, err) = CliRunner.Run("run", cli.Write("big.yaml", Good.Replace("duration: 3 ns", "duration: 10 s")), "--out", outDir);
        Assert.Equal(2, code);
        Assert.Matches(@"the run needs about [\d.]+ [kMGTP]?B of memory \(limit 2 GB\)", err);
        Assert.Contains("--force", err);
        Assert.False(Directory.Exists(outDir));
    }

    [Fact]
    public void A_missing_scenario_file_is_a_one_line_error()
    {
        var (code, _, err) = CliRunner.Run("run", "/nonexistent/x.yaml");
        Assert.Equal(2, code);
        Assert.StartsWith("error: /nonexistent/x.yaml: no such scenario file", err);
    }

    [Fact]
    public void A_branch_name_that_is_not_an_identifier_is_refused()
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        string yaml = Good.Replace("line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } } ]",
            "line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } }, { branch: { name: 'a/b', line: [ { segment: { length: 1 mm, z0: 50 ohm, delay: 5 ns/m } } ] } } ]");
        var (code, _, err) = CliRunner.Run("run", cli.Write("b.yaml", yaml), "--out", Path.Combine(dir, "o"));
        Assert.Equal(2, code);
        Assert.Contains("'a/b' is not a name", err);
    }
}
