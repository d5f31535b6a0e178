namespace WaveSim.Tests.Measurements.Cli;

/// <summary>Malformed captures give one "error: ..." line and exit code 2 from every capture command, and no output folder.</summary>
public class CaptureErrorCliTests
{
    const string Scenario = @"source: { waveform: step, high: 1 V, rise: 200 ps }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 1 ns } } ]
load: { r: 50 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 4 ns, resolution: 5 }
";

    // Error wording checked against the reader's documented rules (CaptureReader remarks); no outside source needed.
    [Theory]
    [InlineData("compare", "time;volts\n0,0;0,1\n1,0;0,5\n2,0;1,0\n", "decimal comma")]
    [InlineData("fit", "time;volts\n0,0;0,1\n1,0;0,5\n2,0;1,0\n", "decimal comma")]
    [InlineData("tdr", "time;volts\n0,0;0,1\n1,0;0,5\n2,0;1,0\n", "decimal comma")]
    [InlineData("compare", "t,v\n0,0.1\n1e-9,0.2\n2e-9,0.3\n3e-9\n4e-9,0.5\n", "column 2 is needed")]
    [InlineData("compare", "t,v\n0,0.1\n1e-9,0.2\n2e-9,0.3\n3e-9,abc\n", "'abc' is not a number")]
    [InlineData("compare", "t,v\n0,0.1\n", "fewer than two samples")]
    public void A_bad_capture_is_one_error_line_with_exit_code_2_and_no_output(string command, string content, string fragment)
    {
        using var run = new CliRunner();
        string scenario = run.Write("s.yaml", Scenario);
        string capture = run.Write("bad.csv", content);
        string outDir = run.PathOf("out");
        string[] args = command switch
        {
            "fit" => ["fit", scenario, "--capture", capture, "--probe", "rx", "--free", "line[0].segment.z0", "--out", outDir],
            "tdr" => ["tdr", scenario, "--capture", capture, "--out", outDir],
            _ => ["compare", scenario, "--capture", capture, "--probe", "rx", "--out", outDir],
        };

        var (code, output, err) = CliRunner.Run(args);

        Assert.Equal(2, code);
        Assert.Equal("", output);
        string[] lines = err.TrimEnd('\n', '\r').Split('\n');
        Assert.Single(lines);
        Assert.StartsWith("error: ", lines[0]);
        Assert.Contains("bad.csv", lines[0]);
        Assert.Contains(fragment, lines[0]);
        Assert.False(Directory.Exists(outDir));
        Assert.Empty(Directory.GetDirectories(run.Dir));   // no staging folder left behind either
    }
}
