namespace WaveSim.Tests.Fuzz;

/// <summary>
/// Issue 14's fuzz test: mutants of every input family (<see cref="InputMutants"/>) must meet the bad-input contract of the
/// README: exit 0 or 2; on stderr at most one <c>error:</c> line and otherwise only one-line <c>warning:</c> lines (so "at most
/// one stderr line" is read as at most one error line, with warnings allowed); no stack trace and no internal error; no control
/// character in anything printed; and, for the mutants run as child processes, bounded memory and time. A mutant that times out
/// or passes the memory bound fails with the mutant printed; it is never retried.
/// </summary>
/// <remarks>
/// Every run replays fixed seeds: most mutants in-process (the same command-line entry, faster), a subset as child processes
/// whose peak resident size is checked. WAVESIM_SOAK=N draws fresh seeds instead: at least 250 in-process and 25 child mutants
/// per family (more for a larger N), printing family and seed on failure so the case can be added to the fixed rows.
/// </remarks>
public class InputFuzzTests
{
    /// <summary>Per-mutant timeout: generous, a hang detector, not a speed check.</summary>
    static readonly TimeSpan Timeout = TimeSpan.FromSeconds(120);

    /// <summary>Peak resident size allowed to one child run, bytes (a run takes 40 to 200 MiB; the runtime alone about 30).</summary>
    const long MemoryBound = 1L << 30;

    const int InProcessSeeds = 6;

    public static TheoryData<string, int> InProcessRows()
    {
        var rows = new TheoryData<string, int>();
        foreach (string f in InputMutants.ScenarioFamilies)
            for (int s = 1; s <= InProcessSeeds; s++) rows.Add(f, s);
        return rows;
    }

    public static TheoryData<string, int> ChildRows()
    {
        var rows = new TheoryData<string, int>();
        foreach (string f in InputMutants.ScenarioFamilies) rows.Add(f, 101);
        foreach (int s in new[] { 0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11 })
            rows.Add(InputMutants.CaptureFamily, FirstSeedOfKind(s));
        return rows;
    }

    /// <summary>A seed whose capture mutant is of kind <paramref name="kind"/>, so the fixed rows cover every kind.</summary>
    static int FirstSeedOfKind(int kind)
    {
        for (int seed = 1; ; seed++)
            if (new Random(seed).Next(12) == kind) return seed;
    }

    [Theory]
    [MemberData(nameof(InProcessRows))]
    public void A_mutant_meets_the_bad_input_contract_in_process(string family, int seed) => InProcess(InputMutants.Make(family, seed));

    [Theory]
    [MemberData(nameof(ChildRows))]
    public void A_mutant_meets_the_bad_input_contract_with_bounded_memory_and_time(string family, int seed) =>
        AsChild(InputMutants.Make(family, seed));

    [SkippableFact]
    public void Soak_fresh_mutants_of_every_family()
    {
        int n = Properties.PropertySeeds.Soak;
        Skip.If(n == 0, "fresh mutants run only with WAVESIM_SOAK=N; every run replays the fixed seeds");
        var random = new Random();
        foreach (string family in InputMutants.ScenarioFamilies.Append(InputMutants.CaptureFamily))
        {
            for (int i = 0; i < Math.Max(n, 250); i++)
                InProcess(InputMutants.Make(family, random.Next()));
            for (int i = 0; i < Math.Max(n / 10, 25); i++)
                AsChild(InputMutants.Make(family, random.Next()));
        }
    }

    static void InProcess(Mutant m)
    {
        using var cli = new CliRunner();
        string[] args = Arguments(m, cli);
        var run = Task.Run(() => CliRunner.Run(args));
        Assert.True(run.Wait(Timeout), $"no answer within {Timeout.TotalSeconds} s\n{m}");
        var (code, stdout, stderr) = run.Result;
        AssertContract(m, code, stdout, stderr);
    }

    static void AsChild(Mutant m)
    {
        using var cli = new CliRunner();
        string[] args = Arguments(m, cli);
        var o = ChildCli.Run(cli.Dir, Timeout, MemoryBound, args);
        Assert.False(o.TimedOut, $"no answer within {Timeout.TotalSeconds} s\n{m}");
        Assert.False(o.OverMemory, $"peak resident size passed {MemoryBound >> 20} MiB\n{m}");
        Assert.True(o.PeakBytes <= MemoryBound, $"peak resident size {o.PeakBytes >> 20} MiB\n{m}");
        AssertContract(m, o.Code, o.Out, o.Err);
    }

    /// <summary>Writes the mutant's files and returns the command line: <c>check</c> for a scenario, <c>compare</c> for a capture.</summary>
    static string[] Arguments(Mutant m, CliRunner cli)
    {
        string scenario = cli.Write("s.yaml", m.Scenario);
        if (m.Table is not null) File.WriteAllBytes(cli.PathOf("table.csv"), m.Table);
        if (m.Capture is null) return ["check", scenario];
        return ["compare", scenario, "--capture", cli.Write("capture.csv", m.Capture), "--probe", "rx", "--out", cli.PathOf("out")];
    }

    /// <summary>The README's contract for bad input (exit codes, one error line, warnings one line each); common practice, no source.</summary>
    static void AssertContract(Mutant m, int code, string stdout, string stderr)
    {
        string[] lines = stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        int errors = lines.Count(l => l.StartsWith("error: ", StringComparison.Ordinal));
        string context = $"exit {code}\n--- stderr ---\n{Head(stderr)}\n{m}";
        Assert.True(code is 0 or 2, "exit code must be 0 or 2: " + context);
        Assert.DoesNotContain("   at ", stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", stderr, StringComparison.Ordinal);
        Assert.True(lines.All(l => l.StartsWith("error: ", StringComparison.Ordinal) || l.StartsWith("warning: ", StringComparison.Ordinal)),
            "every stderr line is an error or a warning: " + context);
        Assert.True(code == 2 ? errors == 1 : errors == 0, "exit 2 has exactly one error line, exit 0 none: " + context);
        Assert.True(!HasControl(stderr) && !HasControl(stdout), "a control character reached the output: " + context);
    }

    static bool HasControl(string s) => s.Any(ch => char.IsControl(ch) && ch != '\n' || ch is >= '\u202a' and <= '\u202e');

    static string Head(string s) => s.Length <= 2000 ? s : s[..2000] + "…";
}
