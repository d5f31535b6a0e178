using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Output;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim merge OUT PART_DIR…`: combines the partial folders of a sharded sweep or montecarlo run into the files an unsharded run writes.</summary>
public static class MergeCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var outDir = new Argument<string>("out") { Description = "The folder to write the merged files into" };
        var parts = new Argument<string[]>("parts") { Description = "The partial folders (written with --shard K/N), all N of them, in any order", Arity = ArgumentArity.OneOrMore };
        var cmd = new Command("merge", "Combine the partial folders of a sharded sweep or montecarlo run into the unsharded run's files") { outDir, parts };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string dir = pr.GetValue(outDir)!;
            var folders = pr.GetValue(parts) ?? [];
            var read = folders.Select(f =>
            {
                string file = Path.Combine(f, ShardManifest.FileName);
                if (!File.Exists(file)) throw new InputException($"{f}: no {ShardManifest.FileName}; expected a folder written with --shard K/N");
                return (f, ShardManifest.Parse(File.ReadAllText(file), file));
            }).ToArray();
            var ordered = LibraryErrors.Naming(() => ShardManifest.CheckComplete(read), ("parts", "PART_DIR"));
            var m = ordered[0].Manifest;
            if (!File.Exists(m.ScenarioPath) || ShardManifest.HashFile(m.ScenarioPath) != m.ScenarioHash)
                throw new InputException($"{ordered[0].Folder}: the scenario {m.ScenarioPath} is {(File.Exists(m.ScenarioPath) ? "no longer the one the shards ran (its SHA-256 differs)" : "missing")}; merge where the shards ran");
            var settings = m.Settings.ToDictionary(s => s.Key, s => s.Value);
            var scenario = CommonOptions.Load(m.ScenarioPath, TextWriter.Null);
            var probes = scenario.Probes.Select(p => p.Name).ToArray();
            var limits = Lines(settings["limits"]).Select(l => SweepLimit.Parse(l, probes)).ToArray();
            using var output = new OutputFolder(dir, "merge");
            var o = pr.InvocationConfiguration.Output;
            if (m.Kind == "montecarlo")
            {
                var (keys, nominal) = ToleranceSet.Resolve(scenario, Lines(settings["vary"]).Select(ToleranceKey.Parse).ToArray());
                var template = new ToleranceResult(keys, nominal, probes, [], settings["mode"] == "corners");
                var rows = ordered.SelectMany(p => ReadRows(p.Folder, "montecarlo.csv", (r, name) => MonteCarloCsv.Read(template, limits, r, name))).ToArray();
                var result = template with { Points = Complete(rows, m.Total) };
                ulong? seed = template.Corners ? null : ulong.Parse(settings["seed"], CultureInfo.InvariantCulture);
                var pictures = MonteCarloFiles.Write(output, result, limits, seed);
                output.Commit();
                MonteCarloCommand.Print(o, result, limits, dir, pictures);
            }
            else
            {
                var spacing = settings["spacing"].Split(',').Select(Enum.Parse<SweepSpacing>).ToArray();
                var axes = Lines(settings["vary"]).Select((t, k) => SweepAxis.Parse(t) with { Spacing = spacing[k] }).ToArray();
                var template = new SweepResult(axes, probes, []);
                var rows = ordered.SelectMany(p => ReadRows(p.Folder, "sweep.csv", (r, name) => SweepCsv.ReadPartial(template, r, name))).ToArray();
                var result = template with { Points = Complete(rows, m.Total) };
                var goal = settings["goal"] is { Length: > 0 } gt ? SweepGoal.Parse(gt, probes) : null;
                var figures = settings["figure"].Split(',');
                var (charted, _) = SweepCommand.WriteFiles(output, result, figures, goal, limits);
                output.Commit();
                o.WriteLine($"merged {ordered.Count} shards: {result.Points.Count} points; wrote {Path.Combine(dir, "sweep.csv")}" + string.Concat(charted.Select(f => ", " + f)));
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    static string[] Lines(string text) => text.Length == 0 ? [] : text.Split('\n');

    static IReadOnlyList<SweepPointResult> ReadRows(string folder, string file, Func<TextReader, string, IReadOnlyList<SweepPointResult>> read)
    {
        string path = Path.Combine(folder, file);
        if (!File.Exists(path)) throw new InputException($"{folder}: no {file}; the shard did not finish");
        using var reader = new StreamReader(path);
        return read(reader, path);
    }

    /// <summary>The rows in index order, checked to be every index 0..total − 1 exactly once.</summary>
    static SweepPointResult[] Complete(IEnumerable<SweepPointResult> rows, int total)
    {
        var sorted = rows.OrderBy(r => r.Index).ToArray();
        for (int i = 0; i < sorted.Length; i++)
            if (sorted[i].Index != i) throw new InputException($"the shards hold {(sorted[i].Index < i ? $"row {sorted[i].Index} twice" : $"no row {i}")}; merge the folders of one run, each once");
        if (sorted.Length != total) throw new InputException($"the shards hold {sorted.Length} rows of {total}; merge the folders of one run, each once");
        return sorted;
    }
}
