using WaveSim.Cli;

namespace WaveSim.Tests.Cli;

/// <summary>
/// Every command's <c>--help</c> is frozen in <c>Cli/Help/&lt;command&gt;.approved.txt</c>, so a changed, added or removed
/// option shows in review as a change of that file (approval testing; common practice, no source). On a mismatch the test
/// writes <c>&lt;command&gt;.received.txt</c> beside it and fails; compare the two, and if the new text is right, copy the
/// received file over the approved one.
/// </summary>
public class HelpApprovalTests
{
    /// <summary>The root ("wavesim") and every subcommand.</summary>
    public static TheoryData<string> Commands()
    {
        var data = new TheoryData<string> { "wavesim" };
        foreach (var c in Program.BuildRoot().Subcommands) data.Add(c.Name);
        return data;
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void Help_text_matches_the_approved_file(string command)
    {
        string[] args = command == "wavesim" ? ["--help"] : [command, "--help"];
        var (code, output, err) = CliRunner.Run(args);
        Assert.Equal(0, code);
        Assert.Equal("", err);
        string received = output.ReplaceLineEndings("\n");
        string folder = Repository.PathOf("tests", "WaveSim.Tests", "Cli", "Help");
        string approvedPath = Path.Combine(folder, command + ".approved.txt");
        string receivedPath = Path.Combine(folder, command + ".received.txt");
        string? approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath).ReplaceLineEndings("\n") : null;
        if (approved == received)
        {
            if (File.Exists(receivedPath)) File.Delete(receivedPath);
            return;
        }
        File.WriteAllText(receivedPath, received);
        Assert.Fail(approved is null
            ? $"no approved help for '{command}'; wrote {receivedPath}: check it and rename it to {Path.GetFileName(approvedPath)}"
            : $"'{command} --help' differs from {approvedPath}; wrote {receivedPath}: diff the two (e.g. git diff --no-index {approvedPath} {receivedPath}) and, if the new text is right, copy it over the approved file. First difference: {FirstDifference(approved, received)}");
    }

    static string FirstDifference(string approved, string received)
    {
        string[] a = approved.Split('\n'), r = received.Split('\n');
        for (int i = 0; i < Math.Max(a.Length, r.Length); i++)
        {
            string x = i < a.Length ? a[i] : "(end)", y = i < r.Length ? r[i] : "(end)";
            if (x != y) return $"line {i + 1}: approved '{x}', received '{y}'";
        }
        return "none";
    }
}
