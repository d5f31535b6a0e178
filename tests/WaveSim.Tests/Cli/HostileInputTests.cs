namespace WaveSim.Tests.Cli;

/// <summary>
/// Input that used to crash the process or end as a numerical failure (issue 14, "Crashes"): each is bad input, so
/// `run` exits 2 with exactly one stderr line "error: file:line:column: key: …" and writes no output folder
/// (the error contract of the README; common practice, no source).
/// </summary>
public class HostileInputTests
{
    const string Template = """
        title: hostile
        source: { waveform: step, low: 0 V, high: HIGH, rise: 200 ps, resistance: 25 ohm }
        line:
          - segment: { length: 50 mm, z0: Z0, delay: 6 ns/m }
        load: { r: 100 ohm, c: LOADC, receiver: { vih: VIH, vil: 0.8 V } }
        probes: [ { name: PROBE, at: load } ]
        simulation: { duration: DURATION }

        """;

    static string Scenario(string? high = null, string? z0 = null, string? loadC = null, string? vih = null, string? duration = null, string? probe = null) =>
        Template.Replace("HIGH", high ?? "3.3 V").Replace("Z0", z0 ?? "50 ohm").Replace("LOADC", loadC ?? "2 pF")
            .Replace("VIH", vih ?? "2 V").Replace("DURATION", duration ?? "2 ns").Replace("PROBE", probe ?? "rx");

    /// <summary>Runs the scenario text and asserts the bad-input contract; returns the one error line.</summary>
    static string RunRefused(string yaml, params string[] mustContain)
    {
        using var cli = new CliRunner();
        string file = cli.Write("s.yaml", yaml);
        string outDir = cli.PathOf("out");
        var (code, _, err) = CliRunner.Run("run", file, "--out", outDir);
        var lines = err.Split('\n', StringSplitOptions.RemoveEmptyEntries).Where(l => l.StartsWith("error:", StringComparison.Ordinal)).ToArray();
        Assert.True(code == 2, $"exit {code}, stderr: {err}");
        Assert.Single(lines);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(outDir), "no output folder after bad input");
        Assert.Contains(file, lines[0], StringComparison.Ordinal);
        foreach (string s in mustContain) Assert.Contains(s, lines[0], StringComparison.Ordinal);
        return lines[0];
    }

    [Fact]
    public void The_template_itself_runs()
    {
        using var cli = new CliRunner();
        var (code, _, err) = CliRunner.Run("run", cli.Write("s.yaml", Scenario()), "--out", cli.PathOf("out"));
        Assert.True(code == 0, err);
    }

    // Arabic-Indic three (U+0663) and full-width three (U+FF13): .NET's \d matched them, double.Parse then threw (exit 1).
    [Theory]
    [InlineData("\"\u0663 V\"")]
    [InlineData("\"\uff13 V\"")]
    [InlineData("\"3\u0663 V\"")]
    public void Non_ascii_digits_are_a_located_error(string high) =>
        RunRefused(Scenario(high: high), ":2:", "source.high", "expected a voltage");

    // Values far outside any physical use crashed the axis code, the maths library or the picture layout (exit 1, 3 or a hang).
    [Theory]
    [InlineData("duration", ":7:", "simulation.duration", "1e-18 s to 1000 s")]
    [InlineData("high-tiny", ":2:", "source.high", "1e-12 V to 1e6 V")]
    [InlineData("high-huge", ":2:", "source.high", "1e-12 V to 1e6 V")]
    [InlineData("z0", ":4:", "line[0].segment.z0", "1e-6 ohm to 1e12 ohm")]
    [InlineData("load.c", ":5:", "load.c", "1e-18 F to 1 F")]
    [InlineData("vih", ":5:", "load.receiver.vih", "1e-12 V to 1e6 V")]
    public void A_value_outside_its_sensible_range_is_refused_with_the_range(string which, string line, string key, string range)
    {
        string yaml = which switch
        {
            "duration" => Scenario(duration: "1e-308 ns"),
            "high-tiny" => Scenario(high: "1e-308 V"),
            "high-huge" => Scenario(high: "1e300 V"),
            "z0" => Scenario(z0: "1e-308 ohm"),
            "load.c" => Scenario(loadC: "1e-300 F"),
            _ => Scenario(vih: "1e308 V"),
        };
        RunRefused(yaml, line, key, range, "outside the range");
    }

    [Fact]
    public void A_command_line_quantity_outside_its_range_is_refused_with_the_range()
    {
        // tdr --source-resistance "1e300 ohm" ended as a numerical failure (exit 3).
        using var cli = new CliRunner();
        var (code, _, err) = CliRunner.Run("tdr", cli.Write("s.yaml", Scenario()), "--source-resistance", "1e300 ohm", "--out", cli.PathOf("out"));
        Assert.True(code == 2, $"exit {code}: {err}");
        Assert.StartsWith("error:", err, StringComparison.Ordinal);
        Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("--source-resistance", err, StringComparison.Ordinal);
        Assert.Contains("1e-6 ohm to 1e12 ohm", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(cli.PathOf("out")));
    }

    // "$" matched before a final newline, so "rx\n" passed the name check and became eye_rx<LF>.png.
    [Fact]
    public void A_name_with_a_trailing_newline_is_refused() =>
        RunRefused(Scenario(probe: "\"rx\\n\""), ":6:", "probes[0].name", "'rx\\n' is not a name");

    // Each of these overflowed the stack inside the YAML library (exit 134, nothing can catch it).
    [Fact]
    public void Deep_nesting_is_refused_before_the_yaml_tree_is_built() =>
        RunRefused("title: " + new string('[', 100_000) + "\n", ":1:", "nested more than 64 deep");

    [Fact]
    public void Deep_block_nesting_is_refused_too() =>
        RunRefused("title: x\nline:\n  " + string.Concat(Enumerable.Repeat("- ", 10_000)) + "x\n", ":3:", "nested more than 64 deep");

    [Fact]
    public void An_alias_used_as_a_key_before_its_anchor_is_refused() =>
        RunRefused("? *a\n: 1\nx: &a [1]\n", ":1:", "alias ('*name') used as a key");

    [Fact]
    public void A_recursive_complex_key_is_refused() =>
        RunRefused("&a [ *a ]: 1\n", ":1:", "list or mapping used as a key");

    [Fact]
    public void An_alias_inside_its_own_anchor_is_refused() =>
        RunRefused("title: x\nline: &a [ { segment: *a } ]\n", ":2:", "refers to the list or mapping that holds it");

    // 50,000 segment+shunt pairs: the dense DC operating-point matrix (200,001 rows) overflowed its index (IndexOutOfRange, exit 1).
    // The solves are sparse now and the limit is 100,000 items: one pair more than that is refused.
    [Fact]
    public void Too_many_line_items_are_refused_with_the_limit()
    {
        var sb = new System.Text.StringBuilder("title: many\nsource: { waveform: step, high: 1 V, rise: 1 ns }\nline:\n");
        for (int i = 0; i < 50_001; i++) sb.Append("  - segment: { length: 1 mm, z0: 50 ohm, delay: 6 ns/m }\n  - shunt: { c: 1 fF }\n");
        sb.Append("load: open\nsimulation: { duration: 1 ns }\n");
        RunRefused(sb.ToString(), ":4:", "line: 100002 items", "at most 100000");
    }

    // Each dimension in range but their ratio absurd (a 100 km strip 1 nm above its plane): the solver called the step
    // singular, a numerical-looking failure. The L and C the cross-section gives are checked against the same ranges.
    [Fact]
    public void An_absurd_cross_section_is_refused_at_its_geometry_key() =>
        RunRefused("""
            title: g
            source: { waveform: step, high: 1 V, rise: 100 ps }
            line:
              - segment: { length: 50 mm, geometry: { kind: microstrip, width: 1e5 m, height: 1e-9 m, thickness: 35 um, er: 4.3 } }
            simulation: { duration: 1 ns }

            """, ":4:", "line[0].segment.geometry", "1e-12 H/m to 0.01 H/m");

    // A capture with values near 1e308 overflowed the comparison's arithmetic (exit 3).
    [Fact]
    public void A_capture_with_huge_values_is_refused_naming_its_line()
    {
        using var cli = new CliRunner();
        string capture = cli.Write("big.csv", "time_s,volts_V\n0,0\n1e-9,1e308\n2e-9,1.5e308\n3e-9,1e308\n");
        var (code, _, err) = CliRunner.Run("compare", cli.Write("s.yaml", Scenario()), "--capture", capture, "--probe", "rx", "--out", cli.PathOf("out"));
        Assert.True(code == 2, $"exit {code}: {err}");
        Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("error:", err, StringComparison.Ordinal);
        Assert.Contains("big.csv line 3: voltage", err, StringComparison.Ordinal);
        Assert.Contains("1e6 V", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(cli.PathOf("out")));
    }

    // An ANSI escape in the title reached the terminal raw (here: red text, then a clear-screen); the title is printed clean.
    [Fact]
    public void Control_characters_in_the_title_never_reach_the_terminal()
    {
        using var cli = new CliRunner();
        string yaml = Scenario().Replace("title: hostile", "title: \"\\e[31mred\\e[2J\\u202eevil\"", StringComparison.Ordinal);
        var (code, stdout, err) = CliRunner.Run("check", cli.Write("s.yaml", yaml));
        Assert.True(code == 0, err);
        Assert.Contains("[31mred[2Jevil", stdout, StringComparison.Ordinal);
        Assert.DoesNotContain('\u001b', stdout);
        Assert.DoesNotContain('\u202e', stdout);
    }

    // A waveform table naming /dev/zero was read until memory ran out (2.7 GB resident).
    [SkippableFact]
    public void A_table_naming_a_device_is_refused_at_its_key()
    {
        Skip.IfNot(OperatingSystem.IsLinux() && File.Exists("/dev/zero"), "needs Linux and /dev/zero");
        RunRefused(TableScenario("/dev/zero"), ":2:", "source.file", "'/dev/zero': not a regular file but a character device");
    }

    // An error quoted the whole offending line of whatever file a table named (`file: /etc/shadow`): now a short, clean excerpt.
    [Fact]
    public void A_table_line_is_quoted_as_a_short_excerpt()
    {
        using var cli = new CliRunner();
        string secret = "root:$6$saltsalt$" + new string('h', 86) + ":19000:0:99999:7:::";
        cli.Write("shadow", "daemon:*:19000:0:99999:7:::\n" + secret + "\n");
        string file = cli.Write("s.yaml", TableScenario("shadow"));
        var (code, _, err) = CliRunner.Run("check", file);
        Assert.True(code == 2, $"exit {code}: {err}");
        Assert.Contains("shadow:2: expected 'time_s,volts_V' numbers, found 'root:$6$saltsalt$hhhhhhhhhhhhhhhhhhhhhhh…'", err, StringComparison.Ordinal);
        Assert.DoesNotContain(secret[..50], err, StringComparison.Ordinal);
    }

    static string TableScenario(string table) => Scenario().Replace(
        "source: { waveform: step, low: 0 V, high: 3.3 V, rise: 200 ps, resistance: 25 ohm }",
        $"source: {{ waveform: table, high: 1 V, file: {table}, resistance: 25 ohm }}", StringComparison.Ordinal);

    // The comparison grid's limit advised "give a coarser step", an option no command has; the advice names what sets the step.
    [Theory]
    [InlineData(true, "set a coarser simulation.output_step")]
    [InlineData(false, "compare a capture sampled less finely (every k-th row) or a shorter one")]
    public void The_comparison_grid_limit_advises_what_the_user_can_change(bool fineSimulation, string advice)
    {
        static (double[] T, double[] V) Ramp(int n) =>
            (Enumerable.Range(0, n).Select(i => i / (double)(n - 1)).ToArray(), Enumerable.Range(0, n).Select(i => i / (double)(n - 1)).ToArray());
        var fine = Ramp(Core.Measurements.WaveformComparison.MaxGridPoints + 10);
        var coarse = Ramp(11);
        var (sim, cap) = fineSimulation ? (fine, coarse) : (coarse, fine);
        var ex = Assert.Throws<Core.InputException>(() =>
            Core.Measurements.WaveformComparison.Compare(sim.T, sim.V, cap.T, cap.V, Core.Measurements.AlignMode.None));
        Assert.Contains("more than the 4000000 it may hold", ex.Message, StringComparison.Ordinal);
        Assert.EndsWith(advice, ex.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("give a coarser step", ex.Message, StringComparison.Ordinal);
    }

    // A 100 MB title took 2.7 GB resident: a scenario file over its limit is refused before it is parsed.
    [Fact]
    public void A_scenario_file_over_its_size_limit_is_refused_unread()
    {
        string yaml = Scenario().Replace("title: hostile", "title: " + new string('t', (int)Core.Io.InputLimits.ScenarioBytes), StringComparison.Ordinal);
        RunRefusedWith("check", yaml, "larger than 16 MiB, the most a scenario may be");
    }

    static void RunRefusedWith(string command, string yaml, string fragment)
    {
        using var cli = new CliRunner();
        string file = cli.Write("s.yaml", yaml);
        var (code, _, err) = CliRunner.Run(command, file);
        Assert.True(code == 2, $"exit {code}: {(err.Length > 500 ? err[..500] : err)}");
        Assert.StartsWith("error: " + file + ": ", err, StringComparison.Ordinal);
        Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains(fragment, err, StringComparison.Ordinal);
    }
}
