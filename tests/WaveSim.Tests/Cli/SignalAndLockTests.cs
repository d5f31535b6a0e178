namespace WaveSim.Tests.Cli;

/// <summary>
/// The built tool as a child process, interrupted while it writes frames: SIGINT and SIGTERM cancel it with `error: cancelled`
/// and exit 130 or 143 (128 + the signal number, the shells' convention; common practice, no source), leaving neither a staging
/// folder nor new parent folders; a run killed outright is cleared up by the next run; a second run into a folder in use is
/// refused at once, naming the process that holds it (docs/outputs.md).
/// </summary>
public class SignalAndLockTests
{
    static readonly TimeSpan Patience = TimeSpan.FromSeconds(120);

    /// <summary>Enough large frames that the child is still writing them when the signal comes.</summary>
    static string[] LongRun(string scenario, string outDir) =>
        ["run", scenario, "--out", outDir, "--frames", "4000", "--frame-size", "1280x720"];

    /// <summary>True once a staging folder beside <paramref name="target"/> holds a frame.</summary>
    static bool WritingFrames(string target) =>
        OutputFolderGuaranteeTests.Leftovers(target).Any(d => Directory.Exists(d) && Directory.EnumerateFiles(d, "frame_*.png", SearchOption.AllDirectories).Any());

    [SkippableTheory]
    [InlineData(ChildCli.SigInt, 130)]
    [InlineData(ChildCli.SigTerm, 143)]
    public void A_signal_while_writing_frames_cancels_and_leaves_nothing(int signal, int expectedCode)
    {
        string? why = ChildCli.WhyNot();
        Skip.If(why is not null, why);
        using var cli = new CliRunner();
        string outDir = cli.PathOf(Path.Combine("new", "out"));
        using var child = ChildCli.Start(LongRun(cli.Write("s.yaml", OutputFolderGuaranteeTests.Matched), outDir));
        Assert.True(child.WaitUntil(() => WritingFrames(outDir), Patience), "the child never started writing frames: " + child.Err);
        child.Signal(signal);
        int code = child.WaitForExit(Patience);
        Assert.True(code == expectedCode, $"exit {code}, stderr: {child.Err}");
        Assert.Contains("error: cancelled", child.Err);
        Assert.False(Directory.Exists(cli.PathOf("new")), "no staging folder and no new parent folders are left");
    }

    [SkippableFact]
    public void A_staging_folder_left_by_a_killed_run_is_removed_by_the_next_run()
    {
        string? why = ChildCli.WhyNot();
        Skip.If(why is not null, why);
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        string scenario = cli.Write("s.yaml", OutputFolderGuaranteeTests.Matched);
        using (var child = ChildCli.Start(LongRun(scenario, outDir)))
        {
            Assert.True(child.WaitUntil(() => WritingFrames(outDir), Patience), "the child never started writing frames: " + child.Err);
            child.Signal(ChildCli.SigKill);
            child.WaitForExit(Patience);
        }
        Assert.NotEmpty(OutputFolderGuaranteeTests.Leftovers(outDir)); // what SIGKILL leaves
        var (code, _, err) = CliRunner.Run("run", scenario, "--out", outDir);
        Assert.True(code == 0, err);
        Assert.Empty(OutputFolderGuaranteeTests.Leftovers(outDir));
        Assert.False(Directory.Exists(Path.Combine(outDir, "frames")));
    }

    [SkippableFact]
    public void A_second_run_into_a_folder_in_use_is_refused_at_once_naming_the_process()
    {
        string? why = ChildCli.WhyNot();
        Skip.If(why is not null, why);
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        string scenario = cli.Write("s.yaml", OutputFolderGuaranteeTests.Matched);
        using var child = ChildCli.Start(LongRun(scenario, outDir));
        Assert.True(child.WaitUntil(() => WritingFrames(outDir), Patience), "the child never started writing frames: " + child.Err);
        var (code, stdout, err) = CliRunner.Run("run", scenario, "--out", outDir);
        Assert.Equal(2, code);
        Assert.Equal($"error: {outDir}: in use by process {child.Pid}", err.Trim());
        Assert.Equal("", stdout);
        child.Signal(ChildCli.SigTerm);
        Assert.Equal(143, child.WaitForExit(Patience));
    }
}
