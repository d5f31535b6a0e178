using System.Text.RegularExpressions;

namespace WaveSim.Tests.Cli;

/// <summary>
/// docs/architecture.md draws the parts as they are: for every library folder its table row lists exactly the other parts the
/// folder's code names (no outside source: the document's own claim, checked against the code).
/// </summary>
public partial class ArchitectureDocTests
{
    [GeneratedRegex(@"WaveSim\.Core\.([A-Za-z]+)")]
    private static partial Regex CoreName();

    static Dictionary<string, string> Rows()
    {
        var rows = new Dictionary<string, string>();
        foreach (string line in File.ReadAllLines(Repository.PathOf("docs", "architecture.md")))
        {
            var cells = line.Split('|', StringSplitOptions.TrimEntries);
            if (cells.Length == 5 && cells[1].Length > 0 && !cells[1].StartsWith('-') && cells[1] != "Part")
                rows[cells[1]] = cells[3];
        }
        return rows;
    }

    [GeneratedRegex(@"(?<![\w.])([A-Z][A-Za-z]+)\.[A-Z]")]
    private static partial Regex RelativeName();

    // A part is used when its namespace is named in full (using WaveSim.Core.Solver) or relative to WaveSim.Core (Solver.GridPlan).
    static SortedSet<string> Used(IEnumerable<string> files, string self, ISet<string> parts) =>
        new(files.SelectMany(f =>
            {
                string text = File.ReadAllText(f);
                return CoreName().Matches(text).Concat(RelativeName().Matches(text)).Select(m => m.Groups[1].Value);
            })
            .Where(n => n != self && parts.Contains(n)), StringComparer.Ordinal);

    [Fact]
    public void Every_library_folder_has_a_row_listing_exactly_the_parts_it_uses()
    {
        var rows = Rows();
        string core = Repository.PathOf("src", "WaveSim.Core");
        var folders = Directory.GetDirectories(core).Select(Path.GetFileName).OfType<string>()
            .Where(n => n is not ("bin" or "obj") && Directory.GetFiles(Path.Combine(core, n), "*.cs").Length > 0).ToHashSet();
        var problems = new List<string>();
        foreach (string part in folders)
        {
            if (!rows.TryGetValue(part, out string? uses)) { problems.Add($"{part}: no row"); continue; }
            if (part == "Output") continue; // documented as "any part above": a sink
            var documented = new SortedSet<string>(uses.Split(',', StringSplitOptions.TrimEntries)
                .Select(u => u.Split(' ')[0]).Where(folders.Contains), StringComparer.Ordinal);
            var actual = Used(Directory.GetFiles(Path.Combine(core, part), "*.cs", SearchOption.AllDirectories), part, folders);
            if (!documented.SetEquals(actual))
                problems.Add($"{part}: documented [{string.Join(", ", documented)}], code uses [{string.Join(", ", actual)}]");
        }
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    [Fact]
    public void Only_the_command_line_and_output_itself_use_output()
    {
        // The rule "Output is a sink" of docs/architecture.md, as the grep it gives.
        var offenders = Directory.GetFiles(Repository.PathOf("src", "WaveSim.Core"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}Output{Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                        && !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                        && File.ReadAllText(f).Contains("WaveSim.Core.Output", StringComparison.Ordinal))
            .Select(f => Path.GetRelativePath(Repository.Root, f)).ToList();
        Assert.True(offenders.Count == 0, string.Join("\n", offenders));
    }

    [Fact]
    public void The_capture_row_limit_is_twice_the_comparison_grid()
    {
        // Io names the number itself so that it need not use Measurements; the reason it gives must stay true.
        Assert.Equal(2 * WaveSim.Core.Measurements.WaveformComparison.MaxGridPoints, WaveSim.Core.Io.InputLimits.CaptureRows);
    }
}
