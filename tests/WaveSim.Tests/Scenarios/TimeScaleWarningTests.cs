using WaveSim.Core;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Scenarios;

/// <summary>
/// Times wildly out of scale with the net or the record are warned about, naming the key. The thresholds (docs/warnings.md) are
/// common practice, no source; the one formula behind them is the line rule "a trace acts as a line when its delay exceeds
/// about rise/6" (Johnson and Graham, High-Speed Digital Design, 1993, from memory; ReferenceData/published-checks.md §10).
/// </summary>
public class TimeScaleWarningTests
{
    /// <summary>A 150 mm line at 6 ns/m (0.9 ns) into 5 pF, recorded for 20 ns; the source is filled in per test.</summary>
    static string Net(string source, string simulation = "duration: 20 ns") => $@"
source: {{ {source}, resistance: 25 ohm }}
line:
  - segment: {{ length: 150 mm, z0: 50 ohm, delay: 6 ns/m }}
load: {{ c: 5 pF }}
simulation: {{ {simulation} }}
";

    static IReadOnlyList<ScenarioWarning> Warnings(string yaml)
    {
        var s = TestScenarios.Parse(yaml);
        return ScenarioWarnings.For(s, Simulate.Plan(s));
    }

    [Fact]
    public void A_millisecond_rise_on_a_nanosecond_net_is_warned_about_by_key()
    {
        var w = Assert.Single(Warnings(Net("waveform: step, high: 3.3 V, rise: 0.8 ms")));
        Assert.Equal("source.rise", w.Key);
        Assert.Contains("longer than the whole duration", w.Message);
    }

    [Fact]
    public void An_edge_a_thousand_times_the_net_delay_is_warned_about_even_inside_the_record()
    {
        // 2 µs against 0.9 ns of line: 2200 times the delay, some 370 times past the rise/6 line rule.
        var w = Assert.Single(Warnings(Net("waveform: step, high: 3.3 V, rise: 2 us", "duration: 5 us")));
        Assert.Equal("source.rise", w.Key);
        Assert.Contains("1000 times the net's total delay", w.Message);
        // 500 ns is 550 times: no warning (a slow edge on a short net is ordinary).
        Assert.Empty(Warnings(Net("waveform: step, high: 3.3 V, rise: 500 ns", "duration: 2 us")));
    }

    [Theory]
    [InlineData("waveform: step, high: 3.3 V, rise: 200 ps, delay: 30 ns", "duration: 20 ns", "source.delay")]
    [InlineData("waveform: pulse, high: 3.3 V, rise: 200 ps, width: 50 ns", "duration: 20 ns", "source.width")]
    [InlineData("waveform: sine, high: 3.3 V, period: 40 ns", "duration: 20 ns", "source.period")]
    [InlineData("waveform: bits, high: 3.3 V, rise: 200 ps, bit_time: 25 ns, pattern: \"10\"", "duration: 20 ns", "source.bit_time")]
    [InlineData("waveform: pulse, high: 3.3 V, rise: 200 ps, fall: 0.5 fs, width: 5 ns", "duration: 20 ns", "source.fall")]
    [InlineData("waveform: step, high: 3.3 V, rise: 200 ps", "duration: 20 ns, output_step: 5 ns", "simulation.output_step")]
    [InlineData("waveform: step, high: 3.3 V, rise: 200 ps", "duration: 20 us", "simulation.duration")]
    public void Each_time_key_out_of_scale_is_named(string source, string simulation, string key)
    {
        var list = Warnings(Net(source, simulation));
        Assert.Contains(list, w => w.Key == key);
    }

    [Fact]
    public void The_example_scenarios_have_no_warnings()
    {
        // The shipped examples are sane nets: a warning there would be noise that teaches users to ignore warnings.
        foreach (string f in Directory.GetFiles(Path.Combine(Repository.Root, "scenarios"), "*.yaml"))
        {
            var s = WaveSim.Core.Scenarios.ScenarioLoader.Load(f);
            Assert.True(ScenarioWarnings.For(s, Simulate.Plan(s)).Count == 0, $"{Path.GetFileName(f)}: {string.Join("; ", ScenarioWarnings.For(s, Simulate.Plan(s)))}");
        }
    }

    [Fact]
    public void Every_command_prints_the_same_warning_line_on_stderr()
    {
        using var cli = new CliRunner();
        string path = cli.Write("slip.yaml", Net("waveform: step, high: 3.3 V, rise: 0.8 ms") + "probes: [ { name: rx, at: load } ]\n");
        const string line = "warning: source.rise: 800 µs is longer than the whole duration 20 ns";
        foreach (var args in new[]
        {
            new[] { "check", path },
            new[] { "run", path, "--out", cli.PathOf("run") },
            new[] { "report", path, "--out", cli.PathOf("report") },
            new[] { "terminations", path, "--out", cli.PathOf("terms"), "--serial" },
            new[] { "sweep", path, "--vary", "load.c=1,2 pF", "--out", cli.PathOf("sweep"), "--serial" },
        })
        {
            var (code, stdout, err) = CliRunner.Run(args);
            Assert.True(code == 0, $"{args[0]}: {err}");
            Assert.Equal(1, err.Split('\n').Count(l => l.StartsWith(line)));
            Assert.DoesNotContain("warning:", stdout);
        }
    }
}
