using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Core.Reports;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim sweep SCENARIO --vary KEY=RANGE ...`: runs a grid of variants and writes sweep.csv and one chart per chosen figure.</summary>
public static class SweepCommand
{
    /// <summary>Tables longer than this are left to sweep.csv.</summary>
    const int MaxPrintedRows = 40;

    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var vary = OptionValue.Repeated("--vary", "KEY=RANGE: start..stop:count, start..stop:count:log or a,b,c, each value with its unit or the unit once at the end (load.r=10..200 ohm:20); repeat for a grid", SweepAxis.Parse, "KEY=RANGE");
        vary.Required = true;
        var figure = OptionValue.Create("--figure", "Figures to chart, comma-separated (e.g. overshoot,settling)", Figures, "overshoot,settling", "FIGURES");
        var goal = new Option<string?>("--goal") { Description = "Pick the best point: min:PROBE.FIGURE or max:PROBE.FIGURE (e.g. min:rx.settling)", HelpName = "min|max:PROBE.FIGURE" };
        var limit = new Option<string[]>("--limit") { Description = "A bound the best point must meet, e.g. rx.overshoot<10% (repeatable)", HelpName = "PROBE.FIGURE<VALUE" };
        var serial = new Option<bool>("--serial") { Description = "Run the points one at a time on one core (same results)" };
        var settle = CommonOptions.SettleBand();
        var outDir = CommonOptions.Out();
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var html = new Option<bool>("--html") { Description = "Also write sweep.html: a chart per figure, the best point and limits marked; a click shows a point's waveforms" };
        var shard = ShardOption.Create();
        var cmd = new Command("sweep", "Run a grid of scenario variants and tabulate the signal figures")
        { scenario, vary, figure, goal, limit, serial, settle, outDir, json, force, html, shard };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            // Everything is read and checked before the first point runs.
            var axes = pr.GetValue(vary) ?? [];
            var figures = pr.GetValue(figure)!;
            double band = pr.GetValue(settle);
            var s = CommonOptions.Load(path, pr.InvocationConfiguration.Error);
            var probes = s.Probes.Select(p => p.Name).ToArray();
            var g = pr.GetValue(goal) is { } gt ? LibraryErrors.Naming(() => SweepGoal.Parse(gt, probes), ("text", "--goal")) : null;
            var limits = (pr.GetValue(limit) ?? []).Select(l => LibraryErrors.Naming(() => SweepLimit.Parse(l, probes), ("text", "--limit"))).ToArray();
            if (limits.Length > 0 && g is null) throw new InputException("--limit: give --goal too (the limits choose among points for the goal)");
            var grid = LibraryErrors.Naming(() => SweepGrid.Build(s, axes, pr.GetValue(force)), ("axes", "--vary"));
            var part = pr.GetValue(shard);
            if (part is not null && pr.GetValue(html))
                throw new InputException("--html: not with --shard (a shard keeps no waveforms; run the sweep whole for its page)");
            string dir = MonteCarloCommand.ShardFolder(CommonOptions.OutputDir(pr.GetValue(outDir), path), part);
            using var output = new OutputFolder(dir, "sweep"); // held from before the work starts, so a second run into it is refused at once
            if (part is not null)
            {
                var runOptions = new SweepRunOptions { Serial = pr.GetValue(serial), SettleBand = band, Force = pr.GetValue(force) };
                SweepShards.RunPartial(output, grid, part, path, Settings(figures, pr.GetValue(goal), pr.GetValue(limit) ?? [], axes, band, pr.GetValue(force)), runOptions, ct);
                pr.InvocationConfiguration.Output.WriteLine($"shard {part}: {grid.Points.Count(p => part.Contains(p.Index))} of {grid.Points.Count} points; wrote {dir} (combine the shards with wavesim merge)");
                return ExitCodes.Ok;
            }

            SweepResult result;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, $"sweep of {grid.Points.Count} points"))
                result = SweepRunner.Run(grid, new SweepRunOptions
                {
                    Serial = pr.GetValue(serial), SettleBand = band, Force = pr.GetValue(force), Progress = bar,
                    WaveformColumns = pr.GetValue(html) ? StudyPages.ColumnsFor(grid.Points.Count, grid.Probes.Count) : 0,
                }, ct);

            var (charted, leftOut) = WriteFiles(output, result, figures, g, limits);
            if (pr.GetValue(html))
            {
                output.WriteText("sweep.html", VariantPage.Html(StudyPages.Sweep($"{s.Title}: sweep", result, figures, g, limits)));
                charted.Add("sweep.html");
            }
            output.Commit();
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json))
            {
                var report = SweepReport.Json(result, g, limits, dir);
                report["panels_left_out"] = new System.Text.Json.Nodes.JsonArray(leftOut.Select(l => (System.Text.Json.Nodes.JsonNode)System.Text.Json.Nodes.JsonValue.Create(l)).ToArray());
                o.WriteLine(RunSummary.Text(report));
            }
            else Print(o, result, figures, g, limits, dir, charted, leftOut);
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>Writes sweep.csv and the charts (not committed); returns the charts written and the panels left out. A merge of shards writes through here too.</summary>
    internal static (List<string> Charted, List<string> LeftOut) WriteFiles(OutputFolder output, SweepResult result, IReadOnlyList<string> figures, SweepGoal? g, IReadOnlyList<SweepLimit> limits)
    {
        var best = g is null ? null : result.Best(g, limits);
        var charted = new List<string>();
        var leftOut = new List<string>();   // panels (or whole charts) with no data, and why
        output.WriteText("sweep.csv", w => SweepCsv.Write(result, w));
        foreach (string f in figures)
        {
            var chart = SweepPictures.Chart(result, f, best, g);
            string file = $"sweep_{FigureSelector.Stem(f)}.png";
            leftOut.AddRange(SweepPanelGaps.LeftOut(result, f).Select(l => $"{file}: {l}" + (chart.Panels.Count == 0 ? "; no chart written" : "")));
            if (chart.Panels.Count == 0) continue;
            var size = PictureSizes.Sweep(chart.Panels.Count);
            output.Write(file, XyChart.RenderPng(chart, size.Width, size.Height));
            charted.Add(file);
        }
        return (charted, leftOut);
    }

    /// <summary>The settings a sweep shard's manifest records (everything that shapes the merged files).</summary>
    static KeyValuePair<string, string>[] Settings(string[] figures, string? goal, string[] limits, IReadOnlyList<SweepAxis> axes, double band, bool force) =>
    [
        new("vary", string.Join("\n", axes.Select(a => a.KeyPath + "=" + string.Join(",", a.Values.Select((_, i) => a.Text(i)))))),
        new("spacing", string.Join(",", axes.Select(a => a.Spacing.ToString()))),
        new("figure", string.Join(",", figures)),
        new("goal", goal ?? ""),
        new("limits", string.Join("\n", limits)),
        new("settle_band", band.ToString("R", CultureInfo.InvariantCulture)),
        new("force", force ? "yes" : "no"),
    ];

    /// <summary>Reads "overshoot,settling" into the figures' own names, each once.</summary>
    static string[] Figures(string text)
    {
        var figures = text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Select(FigureSelector.Resolve).Distinct().ToArray();
        return figures.Length > 0 ? figures : throw new OptionValueException("give at least one figure, e.g. overshoot,settling");
    }

    static void Print(TextWriter o, SweepResult r, string[] figures, SweepGoal? goal, IReadOnlyList<SweepLimit> limits, string dir,
        IReadOnlyList<string> charted, IReadOnlyList<string> leftOut)
    {
        var cols = r.Probes.SelectMany(p => figures.Select(f => new ProbeFigure(p, f))).ToArray();
        o.WriteLine($"{r.Points.Count} points over {string.Join(" x ", r.Axes.Select(a => $"{a.KeyPath} ({a.Values.Count})"))}");
        if (r.Points.Count <= MaxPrintedRows)
        {
            o.WriteLine("  " + string.Join(" ", r.Axes.Select(a => $"{a.KeyPath,14}").Concat(cols.Select(c => $"{Short(c),16}"))));
            foreach (var p in r.Points)
                o.WriteLine("  " + string.Join(" ", p.Values.Select((v, k) => $"{r.Axes[k].Show(v),14}")
                    .Concat(cols.Select(c => $"{Show(r.Value(p, c), c.Figure),16}"))));
        }
        if (goal is not null)
        {
            string within = limits.Count == 0 ? "" : " within " + string.Join(", ", limits.Select(l => l.ToString()));
            if (r.Best(goal, limits) is { } b)
            {
                string at = string.Join(", ", r.Axes.Select((a, k) => $"{a.KeyPath} = {a.Show(b.Values[k])}"));
                o.WriteLine($"best by {goal}{within}: point {b.Index}: {at}: {Short(goal.Target)} {Show(r.Value(b, goal.Target), goal.Target.Figure)}"
                    + string.Concat(limits.Select(l => $", {Short(l.Target)} {Show(r.Value(b, l.Target), l.Target.Figure)}")));
            }
            else o.WriteLine($"no point meets {goal}{within}");
        }
        foreach (string l in leftOut) o.WriteLine($"left out of {l}");
        o.WriteLine($"wrote {Path.Combine(dir, "sweep.csv")}" + string.Concat(charted.Select(f => ", " + f)));
    }

    static string Short(ProbeFigure c) => c.Probe + "." + FigureSelector.Stem(c.Figure);

    static string Show(double? v, string figure) => v is not { } x ? "-" : FigureSelector.Unit(figure) switch
    {
        "%" => x.ToString("F2", CultureInfo.InvariantCulture) + " %",
        "" => x.ToString("G4", CultureInfo.InvariantCulture),
        var u => Quantity.Format(x, u, 4),
    };
}
