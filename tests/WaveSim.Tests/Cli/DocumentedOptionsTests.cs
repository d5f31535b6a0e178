using System.CommandLine;
using System.CommandLine.Help;
using System.Text.RegularExpressions;
using WaveSim.Cli;

namespace WaveSim.Tests.Cli;

/// <summary>
/// The command line and its documentation agree: every option a command offers is named in the README or in that command's
/// docs page, and every <c>--option</c> the docs write as code exists on some command.
/// </summary>
public partial class DocumentedOptionsTests
{
    /// <summary>Where each command is documented, besides the README, which counts for every command.</summary>
    static readonly Dictionary<string, string[]> Pages = new()
    {
        ["run"] = ["docs/run.md"],
        ["check"] = ["docs/run.md"],
        ["sweep"] = ["docs/sweep.md", "docs/montecarlo.md"],
        ["montecarlo"] = ["docs/montecarlo.md"],
        ["merge"] = ["docs/montecarlo.md"],
        ["terminations"] = ["docs/terminations.md"],
        ["compare"] = ["docs/measurements.md"],
        ["fit"] = ["docs/measurements.md"],
        ["tdr"] = ["docs/measurements.md"],
        ["report"] = ["docs/report.md"],
        ["overlay"] = ["docs/report.md"],
        ["xsection"] = ["docs/xsection.md"],
        ["buffers"] = ["docs/buffers.md"],
        ["bench"] = ["docs/PERFORMANCE.md"],
        ["about"] = [],
    };

    /// <summary>Options of other programs shown in the docs' command lines (dotnet, the shell), not of wavesim.</summary>
    static readonly HashSet<string> OtherPrograms = ["--project", "--filter", "--job", "--no-build", "--configuration",
        "--tool-path", "--add-source", "--global", "--iterationTime", "--array", "--dependency", "--parsable", "--export", "--chdir", "--wrap", "--rm"];

    static string Text(string page) => File.ReadAllText(Path.Combine(Repository.Root, page));

    static IEnumerable<(string Command, string Option)> Offered()
    {
        RootCommand root = Program.BuildRoot();
        foreach (Option o in root.Options)
            if (o is not HelpOption) yield return ("", o.Name);
        foreach (Command c in root.Subcommands)
            foreach (Option o in c.Options)
                if (o is not HelpOption) yield return (c.Name, o.Name);
    }

    [Fact]
    public void Every_command_has_a_docs_page_listed()
    {
        var names = Program.BuildRoot().Subcommands.Select(c => c.Name).Order().ToArray();
        Assert.Equal(names, Pages.Keys.Order().ToArray());
    }

    [Fact]
    public void Every_option_offered_is_documented()
    {
        string readme = Text("README.md");
        var missing = new List<string>();
        foreach (var (command, option) in Offered())
        {
            string[] pages = command == "" ? [] : Pages[command];
            bool found = Mentions(readme, option) || pages.Any(p => Mentions(Text(p), option));
            if (!found) missing.Add($"{(command == "" ? "wavesim" : command)} {option} (looked in README.md{string.Concat(pages.Select(p => ", " + p))})");
        }
        Assert.True(missing.Count == 0, "options not documented:\n" + string.Join("\n", missing));
    }

    [Fact]
    public void Every_option_documented_exists()
    {
        var offered = Offered().Select(x => x.Option).ToHashSet();
        foreach (Command c in Program.BuildRoot().Subcommands)
            foreach (Option o in c.Options)
                foreach (string alias in o.Aliases) offered.Add(alias);
        offered.Add("--help");
        var unknown = new List<string>();
        foreach (string page in Pages.Values.SelectMany(p => p).Append("README.md").Distinct())
            foreach (string option in CodeOptions(Text(page)).Distinct())
                if (!offered.Contains(option) && !OtherPrograms.Contains(option)) unknown.Add($"{page}: {option}");
        Assert.True(unknown.Count == 0, "documented options that no command has:\n" + string.Join("\n", unknown));
    }

    [Fact]
    public void The_scanner_finds_options_in_spans_and_blocks_only()
    {
        const string md = "Use `--out DIR` here; --plain is prose.\n\n```sh\nwavesim run a.yaml --force\n```\n";
        Assert.Equal(["--out", "--force"], CodeOptions(md).ToArray());
        Assert.True(Mentions("see --out-dir", "--out-dir"));
        Assert.False(Mentions("see --out-dir", "--out"));
    }

    /// <summary>True when the text names the option as a whole word (so <c>--out</c> is not found in <c>--out-dir</c>).</summary>
    static bool Mentions(string text, string option) =>
        Regex.IsMatch(text, $@"(?<![\w-]){Regex.Escape(option)}(?![\w-])");

    /// <summary>The <c>--options</c> written inside fenced code blocks and inline code spans of a Markdown text.</summary>
    static IEnumerable<string> CodeOptions(string markdown)
    {
        var code = new List<string>();
        bool inBlock = false;
        foreach (string line in markdown.Split('\n'))
        {
            if (line.TrimStart().StartsWith("```", StringComparison.Ordinal)) { inBlock = !inBlock; continue; }
            if (inBlock) code.Add(line);
            else code.AddRange(Span().Matches(line).Select(m => m.Groups[1].Value));
        }
        return code.SelectMany(c => Flag().Matches(c).Select(m => m.Value));
    }

    [GeneratedRegex(@"`([^`]+)`")]
    private static partial Regex Span();

    [GeneratedRegex(@"(?<![\w-])--[a-zA-Z][a-zA-Z0-9-]*")]
    private static partial Regex Flag();
}
