using System.Diagnostics;

namespace WaveSim.Tests.Cli;

/// <summary>
/// What a command may do to its output folder (issue 14, "Output that is not all-or-nothing"; docs/outputs.md): never write
/// through a link, leave exactly this run's files and the user's own, change nothing when it fails, and clear up what an
/// earlier, killed run left beside it. The rules are the project's own contract (common practice, no source).
/// </summary>
public class OutputFolderGuaranteeTests
{
    internal const string Matched = @"
title: matched line
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 0.5 ns, resistance: 50 ohm }
line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm }
probes: [ { name: near, at: source }, { name: far, at: load } ]
simulation: { duration: 3 ns, output_step: 10 ps }
";

    /// <summary>Folders beside <paramref name="target"/> whose names start with its own and a dot: staging left behind.</summary>
    internal static string[] Leftovers(string target) =>
        Directory.Exists(Path.GetDirectoryName(target)) ? Directory.GetFileSystemEntries(Path.GetDirectoryName(target)!, "." + Path.GetFileName(target) + ".*") : [];

    [Fact]
    public void A_frames_folder_that_is_a_symbolic_link_is_refused_and_nothing_is_written_through_it()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        string elsewhere = Directory.CreateDirectory(cli.PathOf("elsewhere")).FullName;
        Directory.CreateDirectory(outDir);
        Directory.CreateSymbolicLink(Path.Combine(outDir, "frames"), elsewhere);
        var (code, _, err) = CliRunner.Run("run", cli.Write("s.yaml", Matched), "--out", outDir, "--frames", "3", "--frame-size", "320x240");
        Assert.Equal(2, code);
        Assert.Contains("symbolic link", err);
        Assert.Contains(Path.Combine(outDir, "frames"), err);
        Assert.Empty(Directory.GetFileSystemEntries(elsewhere));
        Assert.False(File.Exists(Path.Combine(outDir, "probes.csv")), "nothing committed");
        Assert.Empty(Leftovers(outDir));
    }

    [Fact]
    public void A_rerun_removes_the_files_the_earlier_run_wrote_and_keeps_the_users_own()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        var (code, _, err) = CliRunner.Run("run", cli.Write("bits.yaml", TestScenarios.MatchedBits), "--out", outDir, "--frames", "4", "--frame-size", "320x240");
        Assert.True(code == 0, err);
        Assert.NotEmpty(Directory.GetFiles(outDir, "eye_*.png"));
        File.WriteAllText(Path.Combine(outDir, "notes.txt"), "mine");
        File.WriteAllText(Path.Combine(outDir, "frames", "keep.txt"), "mine too");

        (code, _, err) = CliRunner.Run("run", cli.Write("step.yaml", Matched), "--out", outDir, "--frames", "2", "--frame-size", "320x240");
        Assert.True(code == 0, err);
        Assert.Empty(Directory.GetFiles(outDir, "eye_*.png"));
        Assert.Equal(["frame_00001.png", "frame_00002.png", "keep.txt"],
            Directory.GetFiles(Path.Combine(outDir, "frames")).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Equal("mine", File.ReadAllText(Path.Combine(outDir, "notes.txt")));
        Assert.Equal("time_s,near_V,near_A,far_V,far_A", File.ReadLines(Path.Combine(outDir, "probes.csv")).First());
    }

    [Fact]
    public void A_run_without_frames_removes_the_earlier_frames_folder_it_emptied()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        string scenario = cli.Write("s.yaml", Matched);
        Assert.Equal(0, CliRunner.Run("run", scenario, "--out", outDir, "--frames", "2", "--frame-size", "320x240").Code);
        Assert.Equal(0, CliRunner.Run("run", scenario, "--out", outDir).Code);
        Assert.False(Directory.Exists(Path.Combine(outDir, "frames")));
    }

    [Fact]
    public void A_run_that_fails_at_the_commit_leaves_the_folder_as_it_was()
    {
        using var cli = new CliRunner();
        string outDir = Directory.CreateDirectory(cli.PathOf("out")).FullName;
        File.WriteAllText(Path.Combine(outDir, "probes.csv"), "old");
        File.WriteAllText(Path.Combine(outDir, "summary.json"), "old");
        // Each destination the run writes last in some order is a folder in the way: whichever it reaches first, nothing moves.
        foreach (string d in new[] { "waveforms.png", "spacetime.png", "eye_rx.png" }) Directory.CreateDirectory(Path.Combine(outDir, d));
        var (code, _, err) = CliRunner.Run("run", cli.Write("bits.yaml", TestScenarios.MatchedBits), "--out", outDir);
        Assert.Equal(2, code);
        Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries), l => l.StartsWith("error: ", StringComparison.Ordinal));
        Assert.Contains(outDir, err);
        Assert.Equal("old", File.ReadAllText(Path.Combine(outDir, "probes.csv")));
        Assert.Equal("old", File.ReadAllText(Path.Combine(outDir, "summary.json")));
        Assert.Equal(["eye_rx.png", "probes.csv", "spacetime.png", "summary.json", "waveforms.png"],
            Directory.GetFileSystemEntries(outDir).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Empty(Leftovers(outDir));
    }

    [Fact]
    public void Tdr_with_a_scenario_file_that_cannot_be_written_writes_nothing_and_leaves_no_new_parent_folders()
    {
        using var cli = new CliRunner();
        string blocked = Directory.CreateDirectory(cli.PathOf("a-folder")).FullName; // --to-scenario names a folder
        string outDir = cli.PathOf(Path.Combine("new1", "new2", "out"));
        var (code, _, err) = CliRunner.Run("tdr", cli.Write("s.yaml", Matched), "--out", outDir, "--to-scenario", blocked);
        Assert.Equal(2, code);
        Assert.Contains(blocked, err);
        Assert.False(Directory.Exists(cli.PathOf("new1")), "no new parent folders");
        Assert.Empty(Directory.GetFileSystemEntries(blocked));
    }

    [Fact]
    public void Tdr_with_a_scenario_file_that_cannot_be_written_leaves_the_existing_folder_untouched()
    {
        using var cli = new CliRunner();
        string blocked = Directory.CreateDirectory(cli.PathOf("a-folder")).FullName;
        string outDir = Directory.CreateDirectory(cli.PathOf("out")).FullName;
        File.WriteAllText(Path.Combine(outDir, "tdr.csv"), "old");
        var (code, _, _) = CliRunner.Run("tdr", cli.Write("s.yaml", Matched), "--out", outDir, "--to-scenario", blocked);
        Assert.Equal(2, code);
        Assert.Equal(["tdr.csv"], Directory.GetFileSystemEntries(outDir).Select(Path.GetFileName));
        Assert.Equal("old", File.ReadAllText(Path.Combine(outDir, "tdr.csv")));
        Assert.Empty(Leftovers(outDir));
    }

    [Fact]
    public void Tdr_with_a_scenario_file_below_a_plain_file_is_refused_at_the_commit_and_writes_nothing()
    {
        // Found only when the commit checks the destinations (after the analysis): the folder must not be committed either.
        using var cli = new CliRunner();
        string plain = cli.Write("plain.txt", "x");
        string outDir = cli.PathOf(Path.Combine("new1", "out"));
        var (code, _, err) = CliRunner.Run("tdr", cli.Write("s.yaml", Matched), "--out", outDir, "--to-scenario", Path.Combine(plain, "line.yaml"));
        Assert.Equal(2, code);
        Assert.Contains(plain, err);
        Assert.False(Directory.Exists(cli.PathOf("new1")), "no output folder and no new parent folders");
        Assert.Equal("x", File.ReadAllText(plain));
    }

    [Fact]
    public void Tdr_writes_the_scenario_file_together_with_the_folder()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        string yaml = cli.PathOf(Path.Combine("found", "line.yaml"));
        var (code, _, err) = CliRunner.Run("tdr", cli.Write("s.yaml", Matched), "--out", outDir, "--to-scenario", yaml);
        Assert.True(code == 0, err);
        Assert.True(File.Exists(Path.Combine(outDir, "tdr.csv")));
        Assert.Contains("segment", File.ReadAllText(yaml));
        Assert.Equal(["line.yaml"], Directory.GetFileSystemEntries(cli.PathOf("found")).Select(Path.GetFileName));
    }

    [Fact]
    public void A_staging_folder_left_by_a_process_that_is_gone_is_removed_by_the_next_run()
    {
        using var cli = new CliRunner();
        string outDir = cli.PathOf("out");
        int gone = ExitedProcessId();
        string stale = Directory.CreateDirectory(cli.PathOf($".out.wavesim-staging-{gone}-0123456789abcdef")).FullName;
        File.WriteAllText(Path.Combine(stale, "probes.csv"), "half");
        var (code, _, err) = CliRunner.Run("run", cli.Write("s.yaml", Matched), "--out", outDir);
        Assert.True(code == 0, err);
        Assert.False(Directory.Exists(stale));
        Assert.Empty(Leftovers(outDir));
    }

    /// <summary>The id of a process that has exited (a short-lived `true`).</summary>
    internal static int ExitedProcessId()
    {
        using var p = Process.Start(new ProcessStartInfo("true") { UseShellExecute = false })!;
        p.WaitForExit();
        return p.Id;
    }
}
