using System.Text.Json.Nodes;

namespace WaveSim.Tests.Cli;

/// <summary>`run` and `check` on a coupled scenario; the other commands refuse it on one line with exit code 2.</summary>
public class CoupledCommandTests
{
    static string Demo => Repository.PathOf("scenarios", "coupled", "crosstalk-pair.yaml");

    [Fact]
    public void Run_writes_probes_csv_in_the_single_line_form_and_crosstalk_peaks_in_the_summary()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        var (code, stdout, err) = CliRunner.Run("run", Demo, "--out", outDir);
        Assert.True(code == 0, err);
        Assert.Contains("fext", stdout);
        string header = File.ReadLines(Path.Combine(outDir, "probes.csv")).First();
        Assert.Equal("time_s,drv_V,drv_A,rx_V,rx_A,next_V,next_A,fext_V,fext_A,mid_V,mid_A", header);
        var summary = JsonNode.Parse(File.ReadAllText(Path.Combine(outDir, "summary.json")))!;
        // The quiet line's near end: Kb·V_incident, Kb = 0.0657 (ReferenceData/published-checks.md §13 example), V_incident about 0.5 V.
        double next = summary["probes"]!["next"]!["crosstalk_peak_V"]!.GetValue<double>();
        Assert.InRange(next, 0.9 * 0.0657 * 0.5, 1.1 * 0.0657 * 0.5);
        Assert.True(summary["probes"]!["fext"]!["crosstalk_peak_V"]!.GetValue<double>() < 0, "negative far-end pulse (Lm/L > Cm/C)");
        Assert.Null(summary["probes"]!["drv"]!["crosstalk_peak_V"]);
        Assert.True(File.Exists(Path.Combine(outDir, "waveforms.png")));
        Assert.True(File.Exists(Path.Combine(outDir, "spacetime_aggr.png")) && File.Exists(Path.Combine(outDir, "spacetime_quiet.png")));
    }

    [Fact]
    public void Check_prints_the_modes_courant_numbers_and_coupling()
    {
        var (code, stdout, err) = CliRunner.Run("check", Demo);
        Assert.True(code == 0, err);
        Assert.Contains("Z0e 59.69 Ω, Z0o 45.83 Ω", stdout);
        Assert.Contains("Kb 0.0657", stdout);
        Assert.Contains("Courant number 1.0000", stdout);
    }

    [Theory]
    [InlineData("sweep")]
    [InlineData("report")]
    [InlineData("terminations")]
    public void Commands_that_take_single_line_scenarios_refuse_a_coupled_one_on_one_line(string command)
    {
        using var cli = new CliRunner();
        var (code, _, err) = command == "sweep"
            ? CliRunner.Run(command, Demo, "--vary", "simulation.duration=4ns,8ns", "--out", cli.PathOf("o"))
            : CliRunner.Run(command, Demo, "--out", cli.PathOf("o"));
        Assert.Equal(2, code);
        Assert.Contains("conductors: a coupled scenario", err);
        Assert.Contains($"; {command}: this command takes single-line scenarios (line:) only so far", err);
        Assert.Single(err.Trim().Split('\n'));
        Assert.False(Directory.Exists(cli.PathOf("o")));
    }

    [Fact]
    public void Run_options_a_coupled_run_cannot_take_are_refused_by_name()
    {
        using var cli = new CliRunner();
        var (code, _, err) = CliRunner.Run("run", Demo, "--frames", "10", "--out", cli.PathOf("o"));
        Assert.Equal(2, code);
        Assert.Contains("--frames: not available for a coupled scenario", err);
    }
}
