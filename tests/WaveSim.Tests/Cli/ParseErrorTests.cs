using System.Text.RegularExpressions;

namespace WaveSim.Tests.Cli;

/// <summary>
/// Option values are read while the command line is parsed: a value an option cannot read is bad input (exit 2), a line
/// that is wrong as such (an unknown option, a missing argument) a usage error (exit 1); either is one "error:" line on
/// stderr, without the usage screen, before anything runs (the README's exit-code table; common practice, no source).
/// </summary>
public class ParseErrorTests
{
    const string Scenario = @"title: t
source: { waveform: step, high: 1 V, rise: 200 ps, resistance: 25 ohm }
line: [ { segment: { length: 50 mm, z0: 50 ohm, delay: 6 ns/m } } ]
load: { r: 100 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 2 ns, resolution: 10 }
";

    static void Refused(int expectedCode, string startOfLine, params string[] args)
    {
        using var cli = new CliRunner();
        string scenario = cli.Write("s.yaml", Scenario);
        string capture = cli.Write("c.csv", "t,v\n0,0\n1e-9,1\n2e-9,1\n");
        string outDir = cli.PathOf("out");
        string[] line = [.. args.Select(a => a.Replace("SCENARIO", scenario).Replace("CAPTURE", capture)), "--out", outDir];
        var (code, stdout, err) = CliRunner.Run(line);
        Assert.True(code == expectedCode, $"exit {code}; stdout: {stdout}; stderr: {err}");
        Assert.Equal("", stdout);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.StartsWith("error: " + startOfLine, err);
        Assert.False(Directory.Exists(outDir));
    }

    [Theory]
    [InlineData("--rise: '5' has no unit; expected a time", "tdr", "SCENARIO", "--rise", "5")]
    [InlineData("--source-resistance: expected a positive value, got '-50 ohm'", "tdr", "SCENARIO", "--source-resistance", "-50 ohm")]
    [InlineData("--frames: expected a whole number of 0 to 100000, got 'many'", "run", "SCENARIO", "--frames", "many")]
    [InlineData("--time-unit: expected s, ms, us, ns or ps, got 'min'", "compare", "SCENARIO", "--capture", "CAPTURE", "--probe", "rx", "--time-unit", "min")]
    [InlineData("--align: expected xcorr, edge or none, got 'peak'", "fit", "SCENARIO", "--capture", "CAPTURE", "--probe", "rx", "--free", "load.r", "--align", "peak")]
    [InlineData("--max-settling: expected a time greater than zero, got '0 ns'", "terminations", "SCENARIO", "--max-settling", "0 ns")]
    [InlineData("--figure: give at least one figure", "sweep", "SCENARIO", "--vary", "load.r=10,20 ohm", "--figure", ",")]
    [InlineData("--vary: 'load.r=1..2:1': ", "sweep", "SCENARIO", "--vary", "load.r=1..2:1")]
    public void A_value_an_option_cannot_read_is_bad_input(string start, params string[] args) => Refused(2, start, args);

    [Theory]
    [InlineData("unknown option or argument '--colour'", "run", "SCENARIO", "--colour")]
    [InlineData("Option '--probe' is required.", "compare", "SCENARIO", "--capture", "CAPTURE")]
    public void A_malformed_line_is_a_usage_error_in_one_line(string start, params string[] args) => Refused(1, start, args);

    [Theory]
    [InlineData("--max-sims: 3 is too few for 2 fitted value(s)", "fit", "SCENARIO", "--capture", "CAPTURE", "--probe", "rx", "--free", "load.r", "--max-sims", "3")]
    [InlineData("--probe: the scenario has no probe named 'tx'", "compare", "SCENARIO", "--capture", "CAPTURE", "--probe", "tx")]
    [InlineData("--free: load.q: ", "fit", "SCENARIO", "--capture", "CAPTURE", "--probe", "rx", "--free", "load.q=1..2")]
    [InlineData("--vary: load.q: ", "sweep", "SCENARIO", "--vary", "load.q=1,2 ohm")]
    public void A_library_error_about_a_parameter_is_shown_against_its_flag(string start, params string[] args) => Refused(2, start, args);

    [Fact]
    public void Values_and_help_defaults_read_the_same_under_a_decimal_comma_locale()
    {
        // Option values are now read while the line is parsed, outside the command's invariant-culture scope: they must
        // still read "1.5 ns" with a point, and help must show the defaults as written, not as "0,05".
        var saved = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            var comma = (System.Globalization.CultureInfo)System.Globalization.CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            comma.NumberFormat.NumberGroupSeparator = ".";
            System.Globalization.CultureInfo.CurrentCulture = comma;
            var root = WaveSim.Cli.Program.BuildRoot();
            var tdr = root.Subcommands.Single(c => c.Name == "tdr");
            var rise = tdr.Options.OfType<System.CommandLine.Option<double?>>().Single(o => o.Name == "--rise");
            var pr = root.Parse(["tdr", "x.yaml", "--rise", "1.5 ns"]);
            Assert.Empty(pr.Errors);
            Assert.Equal(1.5e-9, pr.GetValue(rise)!.Value, 1e-24);
            var (code, help, _) = CliRunner.Run("run", "--help");
            Assert.Equal(0, code);
            Assert.Contains("[default: 5 %]", help);
            Assert.DoesNotContain("0,05", help);
        }
        finally { System.Globalization.CultureInfo.CurrentCulture = saved; }
    }

    [Fact]
    public void The_library_names_no_command_line_flag()
    {
        // Issue 13: the library knows no command line. Any "--word" in its code, messages or comments is a flag.
        var flag = new Regex(@"(?<![\w-])--[a-z]");
        var found = Directory.EnumerateFiles(Repository.PathOf("src", "WaveSim.Core"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .SelectMany(f => File.ReadLines(f).Select((l, i) => (File: Path.GetFileName(f), Line: i + 1, Text: l)))
            .Where(x => flag.IsMatch(x.Text)).Select(x => $"{x.File}:{x.Line}: {x.Text.Trim()}").ToList();
        Assert.True(found.Count == 0, "flags in src/WaveSim.Core:\n" + string.Join("\n", found));
    }
}
