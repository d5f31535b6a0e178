using System.Globalization;
using System.Text;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>
/// Unit slips in a capture's time axis do not pass silently: every capture command warns on stderr, and compare and fit refuse a
/// capture that cannot mostly overlap the simulation (before, a capture in ns read as seconds was "compared", shifted by seconds).
/// </summary>
public class CaptureTimeSpanCliTests
{
    /// <summary>The fit tests' small net (a 50 Ω, 1 ns trace from a 25 Ω driver into 150 Ω ∥ 2 pF).</summary>
    const string Scenario = WaveSim.Tests.Fitting.FitScenarios.Truth;

    /// <summary>The probe's own waveform written with its time in ns (header time_ns), samples first..last, clock shifted.</summary>
    static string CaptureInNs(int first, int last, double shiftNs)
    {
        var sim = TestScenarios.Run(Scenario);
        double[] v = sim.Probe("rx").Volts;
        var text = new StringBuilder("time_ns,ch1_V\n");
        for (int k = first; k < last; k++)
            text.Append((sim.Time[k] * 1e9 + shiftNs).ToString("R", CultureInfo.InvariantCulture)).Append(',')
                .Append(v[k].ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        return text.ToString();
    }

    [Theory]
    [InlineData("compare")]
    [InlineData("fit")]
    public void A_capture_in_ns_read_as_seconds_is_warned_about_then_refused_with_no_output(string command)
    {
        // The file spans 8.7 (ns) read as 8.7 s: 8.7e8 times the 10 ns simulation, so at most 10 ns of it can overlap.
        using var run = new CliRunner();
        string scenario = run.Write("board.yaml", Scenario);
        string capture = run.Write("scope.csv", CaptureInNs(50, 921, 1.3));
        string outDir = run.PathOf("out");
        string[] args = command == "fit"
            ? ["fit", scenario, "--capture", capture, "--probe", "rx", "--free", "load.c", "--out", outDir]
            : ["compare", scenario, "--capture", capture, "--probe", "rx", "--align", "edge", "--out", outDir];

        var (code, output, err) = CliRunner.Run(args);

        Assert.Equal(2, code);
        Assert.Equal("", output);
        string[] lines = err.TrimEnd('\n', '\r').Split('\n');
        Assert.Equal(2, lines.Length);
        Assert.StartsWith("warning: scope.csv time column 'time_ns': the capture spans 8.7 s, 8.7e8 times the simulated duration", lines[0]);
        Assert.StartsWith("error: scope.csv time column 'time_ns': the capture spans 8.7 s but the simulation only 10 ns", lines[1]);
        Assert.False(Directory.Exists(outDir));
    }

    [Fact]
    public void The_same_capture_with_its_time_unit_given_is_compared_without_a_warning()
    {
        using var run = new CliRunner();
        string scenario = run.Write("board.yaml", Scenario);
        string capture = run.Write("scope.csv", CaptureInNs(50, 921, 1.3));

        var (code, _, err) = CliRunner.Run("compare", scenario, "--capture", capture, "--probe", "rx", "--time-unit", "ns", "--out", run.PathOf("out"));

        Assert.True(code == 0, err);
        Assert.DoesNotContain("warning", err);
    }

    [Fact]
    public void The_reflectometer_command_warns_too()
    {
        // tdr does not align the capture to a simulation, so it only warns; whatever the analysis makes of the trace after that.
        using var run = new CliRunner();
        string scenario = run.Write("board.yaml", Scenario);
        string capture = run.Write("scope.csv", CaptureInNs(50, 921, 1.3));

        var (_, _, err) = CliRunner.Run("tdr", scenario, "--capture", capture, "--out", run.PathOf("out"));

        Assert.StartsWith("warning: scope.csv time column 'time_ns': the capture spans 8.7 s, 8.7e8 times", err);
    }

    [Fact]
    public void Compare_refuses_a_capture_only_a_third_of_which_overlaps_the_record()
    {
        // --align none trusts the file: samples 0..600 (0 to 6 ns) moved to 8..14 ns overlap the 0..10 ns record by 2 of 6 ns.
        using var run = new CliRunner();
        string scenario = run.Write("board.yaml", Scenario);
        string capture = run.Write("scope.csv", CaptureInNs(0, 601, 8));
        string outDir = run.PathOf("out");

        var (code, _, err) = CliRunner.Run("compare", scenario, "--capture", capture, "--probe", "rx", "--time-unit", "ns", "--align", "none", "--out", outDir);

        Assert.Equal(2, code);
        Assert.Contains("only 33.3 % of the capture", err);
        Assert.False(Directory.Exists(outDir));
    }
}
