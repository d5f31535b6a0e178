using WaveSim.Core;
using WaveSim.Core.Output;

namespace WaveSim.Tests.Output;

/// <summary>
/// The output folder's own rules (docs/outputs.md): a failed commit is undone, the manifest never acts outside the folder or
/// on another command's files, one process at a time, and an uncommitted folder leaves no trace. The rules are the project's own
/// contract (common practice, no source).
/// </summary>
public sealed class OutputFolderTests : IDisposable
{
    readonly string _dir = Directory.CreateTempSubdirectory("wavesim-outputfolder-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    string In(params string[] parts) => Path.Combine([_dir, .. parts]);

    static string[] Names(string folder) =>
        [.. Directory.GetFileSystemEntries(folder, "*", SearchOption.AllDirectories).Select(p => Path.GetRelativePath(folder, p).Replace('\\', '/')).Order(StringComparer.Ordinal)];

    [Fact]
    public void A_move_that_fails_during_the_commit_undoes_every_earlier_one()
    {
        string target = Directory.CreateDirectory(In("out")).FullName;
        File.WriteAllText(Path.Combine(target, "a.txt"), "old a");
        File.WriteAllText(Path.Combine(target, "b.txt"), "old b");
        string scenario = In("found.yaml");
        File.WriteAllText(scenario, "old scenario");
        using (var output = new OutputFolder(target, "run"))
        {
            output.WriteText("a.txt", "new a");
            output.WriteText("b.txt", "new b");
            output.WriteText("sub/c.txt", "new c");
            output.WriteBeside(scenario, "new scenario");
            // Fails at the last file moved in, after the others (and the manifest) are already in place.
            output.BeforeMove = dest => { if (dest == scenario && File.Exists(Path.Combine(target, OutputFolder.ManifestName))) throw new IOException("disk gone"); };
            Assert.Throws<IOException>(output.Commit);
        }
        Assert.Equal(["a.txt", "b.txt"], Names(target));
        Assert.Equal("old a", File.ReadAllText(Path.Combine(target, "a.txt")));
        Assert.Equal("old b", File.ReadAllText(Path.Combine(target, "b.txt")));
        Assert.Equal(["found.yaml", "out", "out/a.txt", "out/b.txt"], Names(_dir));
        Assert.Equal("old scenario", File.ReadAllText(scenario));
    }

    [Fact]
    public void The_scenario_beside_the_folder_replaces_the_old_one_in_the_same_commit()
    {
        string scenario = In("found", "line.yaml");
        Directory.CreateDirectory(In("found"));
        File.WriteAllText(scenario, "old");
        using (var output = new OutputFolder(In("out"), "tdr"))
        {
            output.WriteText("tdr.csv", "x");
            output.WriteBeside(scenario, "new");
            Assert.Equal("old", File.ReadAllText(scenario));
            output.Commit();
        }
        Assert.Equal("new", File.ReadAllText(scenario));
        Assert.Equal(["line.yaml"], Names(In("found")));
    }

    [Fact]
    public void A_file_named_beside_but_inside_the_folder_is_one_of_its_files()
    {
        using (var output = new OutputFolder(In("out"), "tdr"))
        {
            output.WriteBeside(In("out", "found.yaml"), "line");
            output.Commit();
        }
        Assert.Equal("line", File.ReadAllText(In("out", "found.yaml")));
        Assert.Contains("tdr\tfound.yaml", File.ReadAllLines(In("out", OutputFolder.ManifestName)));
    }

    [Fact]
    public void Manifest_lines_that_point_outside_the_folder_or_through_a_link_are_never_acted_on()
    {
        string target = Directory.CreateDirectory(In("out")).FullName;
        string victim = In("victim.txt");
        File.WriteAllText(victim, "keep");
        string outside = Directory.CreateDirectory(In("outside")).FullName;
        File.WriteAllText(Path.Combine(outside, "x.png"), "keep");
        Directory.CreateSymbolicLink(Path.Combine(target, "link"), outside);
        File.WriteAllText(Path.Combine(target, OutputFolder.ManifestName),
            $"run\t../victim.txt\nrun\t{victim}\nrun\tlink/x.png\nrun\t./victim.txt\n");
        using (var output = new OutputFolder(target, "run"))
        {
            output.WriteText("probes.csv", "t");
            output.Commit();
        }
        Assert.Equal("keep", File.ReadAllText(victim));
        Assert.Equal("keep", File.ReadAllText(Path.Combine(outside, "x.png")));
        Assert.True(Directory.Exists(Path.Combine(target, "link")));
    }

    [Fact]
    public void A_rerun_of_one_command_leaves_the_files_of_another_command()
    {
        string target = In("out");
        void Run(string producer, params string[] files)
        {
            using var output = new OutputFolder(target, producer);
            foreach (string f in files) output.WriteText(f, producer);
            output.Commit();
        }
        Run("run", "probes.csv", "eye_rx.png");
        Run("report", "report.html");
        Run("run", "probes.csv");
        Assert.Equal([OutputFolder.ManifestName, "probes.csv", "report.html"], Names(target));
        Assert.Equal(["report\treport.html", "run\tprobes.csv"], File.ReadAllLines(Path.Combine(target, OutputFolder.ManifestName)).Where(l => l[0] != '#'));
    }

    [Fact]
    public void A_listed_file_the_user_replaced_by_a_folder_is_left_alone()
    {
        string target = In("out");
        using (var output = new OutputFolder(target, "run"))
        {
            output.WriteText("eye_rx.png", "eye");
            output.Commit();
        }
        File.Delete(Path.Combine(target, "eye_rx.png"));
        Directory.CreateDirectory(Path.Combine(target, "eye_rx.png"));
        File.WriteAllText(Path.Combine(target, "eye_rx.png", "mine.txt"), "mine");
        using (var output = new OutputFolder(target, "run"))
        {
            output.WriteText("probes.csv", "t");
            output.Commit();
        }
        Assert.Equal("mine", File.ReadAllText(Path.Combine(target, "eye_rx.png", "mine.txt")));
    }

    [Fact]
    public void A_second_hold_on_the_same_folder_is_refused_naming_the_holder_until_the_first_lets_go()
    {
        string target = In("out");
        using (var first = new OutputFolder(target, "run"))
        {
            var ex = Assert.Throws<InputException>(() => new OutputFolder(target, "run"));
            Assert.Equal($"{target}: in use by process {Environment.ProcessId}", ex.Message);
            Assert.True(File.Exists(Path.Combine(target, OutputFolder.LockName)));
            first.WriteText("a.txt", "a");
            first.Commit();
        }
        Assert.False(File.Exists(Path.Combine(target, OutputFolder.LockName)), "the lock file goes with the lock");
        using var again = new OutputFolder(target, "run");
    }

    [Fact]
    public void Without_a_commit_the_new_folders_go_and_an_existing_folder_is_as_it_was()
    {
        using (var output = new OutputFolder(In("a", "b", "out")))
            output.WriteText("x.txt", "x");
        Assert.Empty(Directory.GetFileSystemEntries(_dir));

        string existing = Directory.CreateDirectory(In("keep")).FullName;
        File.WriteAllText(Path.Combine(existing, "x.txt"), "old");
        using (var output = new OutputFolder(existing))
            output.WriteText("x.txt", "new");
        Assert.Equal(["keep", "keep/x.txt"], Names(_dir));
        Assert.Equal("old", File.ReadAllText(Path.Combine(existing, "x.txt")));
    }

    [Theory]
    [InlineData("../x.txt")]
    [InlineData("/tmp/x.txt")]
    [InlineData("a//b.txt")]
    [InlineData("a/./b.txt")]
    [InlineData(".wavesim-outputs")]
    [InlineData(".wavesim-lock")]
    [InlineData("x\ny.txt")]
    public void A_name_that_is_not_a_plain_path_inside_the_folder_is_refused(string name)
    {
        using var output = new OutputFolder(In("out"));
        Assert.Throws<InputException>(() => output.WriteText(name, "x"));
    }

    [Fact]
    public void A_lock_file_that_is_a_link_is_refused_and_its_target_untouched()
    {
        string target = Directory.CreateDirectory(In("out")).FullName;
        string victim = In("victim.txt");
        File.WriteAllText(victim, "keep");
        File.CreateSymbolicLink(Path.Combine(target, OutputFolder.LockName), victim);
        var ex = Assert.Throws<InputException>(() => new OutputFolder(target));
        Assert.Contains("symbolic link", ex.Message);
        Assert.Equal("keep", File.ReadAllText(victim));
    }
}
