using System.CommandLine;
using System.Diagnostics;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Output;
using WaveSim.Core.Reports;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim montecarlo SCENARIO --vary KEY=DIST …`: random samples (or corners) of tolerances, their figures, statistics, yield and sensitivity.</summary>
public static class MonteCarloCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var vary = OptionValue.Repeated("--vary",
            "KEY=DIST: normal(MEAN, SIGMA), uniform(MIN..MAX), tol(10%) (uniform around the scenario's value), tol(10%, normal) (sigma = tolerance/3) or a list a,b,c; units as in sweep (load.r=tol(5%)); repeat per key",
            t => { ToleranceKey.Parse(t); return t; }, "KEY=DIST");
        vary.Required = true;
        var samples = IntegerOption.Create("--samples", "Number of random samples", 1, ToleranceSet.MaxPoints, 100, "N");
        var seed = OptionValue.Create("--seed", "Seed of the samples' generators (the same seed gives the same rows on any threads or shards)",
            t => ulong.TryParse(t, NumberStyles.None, CultureInfo.InvariantCulture, out ulong s) ? s : throw new OptionValueException($"expected a whole number from 0 to {ulong.MaxValue}, got '{t}'"), "1", "S");
        var limit = new Option<string[]>("--limit") { Description = "A bound every sample should meet, e.g. rx.overshoot<10% (repeatable); the yield is the share meeting all", HelpName = "PROBE.FIGURE<VALUE" };
        var corners = new Option<bool>("--corners") { Description = "Instead of sampling, run nominal and every combination of each key's ends (min/max, mean +-3 sigma, every listed value)" };
        var serial = new Option<bool>("--serial") { Description = "Run the samples one at a time on one core (same results)" };
        var html = new Option<bool>("--html") { Description = "Also write montecarlo.html: per limited figure the samples against its most influential key, the limits and yield shown; a click shows a sample's waveforms" };
        var shard = ShardOption.Create();
        var settle = CommonOptions.SettleBand();
        var outDir = CommonOptions.Out();
        var force = CommonOptions.Force();
        var cmd = new Command("montecarlo", "Run random samples or corners of tolerances: figures, statistics, yield and sensitivity")
        { scenario, vary, samples, seed, limit, corners, serial, shard, settle, outDir, force, html };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            var varyTexts = pr.GetValue(vary) ?? [];
            var limitTexts = pr.GetValue(limit) ?? [];
            bool isCorners = pr.GetValue(corners);
            var part = pr.GetValue(shard);
            bool page = pr.GetValue(html);
            if (part is not null && page)
                throw new InputException("--html: not with --shard (a shard keeps no waveforms; run the samples whole for their page)");
            var s = CommonOptions.Load(path, pr.InvocationConfiguration.Error);
            var probes = s.Probes.Select(p => p.Name).ToArray();
            var limits = limitTexts.Select(l => LibraryErrors.Naming(() => SweepLimit.Parse(l, probes), ("text", "--limit"))).ToArray();
            var options = new ToleranceSetOptions
            {
                Samples = pr.GetValue(samples), Seed = pr.GetValue(seed), Corners = isCorners, Shard = part ?? Shard.Whole, Force = pr.GetValue(force),
            };
            var set = LibraryErrors.Naming(() => ToleranceSet.Build(s, varyTexts.Select(ToleranceKey.Parse).ToArray(), options), ("keys", "--vary"), ("samples", "--samples"));
            string dir = ShardFolder(CommonOptions.OutputDir(pr.GetValue(outDir), path, "_montecarlo"), part);
            using var output = new OutputFolder(dir, "montecarlo");

            ToleranceResult result;
            var clock = Stopwatch.StartNew();
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, $"{(isCorners ? "corners" : "montecarlo")}: {set.Points.Count} runs"))
                result = ToleranceRunner.Run(set, limits, new SweepRunOptions
                {
                    Serial = pr.GetValue(serial), SettleBand = pr.GetValue(settle), Force = pr.GetValue(force),
                    WaveformColumns = page ? StudyPages.ColumnsFor(set.Points.Count, probes.Length) : 0,
                },
                    new Progress(bar, clock, limits.Length > 0), ct);

            var o = pr.InvocationConfiguration.Output;
            if (part is not null)
            {
                var manifest = new ShardManifest("montecarlo", path, ShardManifest.HashFile(path),
                    Settings(varyTexts, limitTexts, options, pr.GetValue(settle)), part, set.Total);
                MonteCarloFiles.WritePartial(output, result, limits, manifest);
                output.Commit();
                o.WriteLine($"shard {part}: {result.Points.Count} of {set.Total} {(isCorners ? "corners" : "samples")}; wrote {dir} (combine the shards with wavesim merge)");
                return ExitCodes.Ok;
            }
            var pictures = MonteCarloFiles.Write(output, result, limits, isCorners ? null : options.Seed).ToList();
            if (page)
            {
                output.WriteText("montecarlo.html", VariantPage.Html(TolerancePages.Set($"{s.Title}: {(isCorners ? "corners" : "Monte Carlo")}", result, limits)));
                pictures.Add("montecarlo.html");
            }
            output.Commit();
            Print(o, result, limits, dir, pictures);
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>A shard writes into part-K-of-N inside the output folder, so every task of an array has its own.</summary>
    internal static string ShardFolder(string dir, Shard? part) =>
        part is null ? dir : Path.Combine(dir, string.Create(CultureInfo.InvariantCulture, $"part-{part.Number}-of-{part.Count}"));

    /// <summary>The settings a shard's manifest records: everything that shapes the merged files.</summary>
    internal static KeyValuePair<string, string>[] Settings(IReadOnlyList<string> vary, IReadOnlyList<string> limits, ToleranceSetOptions o, double settle) =>
    [
        new("vary", string.Join("\n", vary)),
        new("limits", string.Join("\n", limits)),
        new("mode", o.Corners ? "corners" : "samples"),
        new("samples", o.Corners ? "" : o.Samples.ToString(CultureInfo.InvariantCulture)),
        new("seed", o.Corners ? "" : o.Seed.ToString(CultureInfo.InvariantCulture)),
        new("settle_band", settle.ToString("R", CultureInfo.InvariantCulture)),
        new("force", o.Force ? "yes" : "no"),
    ];

    internal static void Print(TextWriter o, ToleranceResult r, IReadOnlyList<SweepLimit> limits, string dir, IReadOnlyList<string> pictures)
    {
        string what = r.Corners ? "corners (nominal first)" : "samples";
        o.WriteLine($"{r.Points.Count} {what} over {string.Join(", ", r.Keys.Select(k => k.KeyPath + "=" + k.Distribution.Describe()))}");
        if (limits.Count > 0)
        {
            int passes = r.Points.Count(p => r.Passes(p, limits));
            string interval = "";
            if (!r.Corners)
            {
                var w = ToleranceStatistics.Wilson(passes, r.Points.Count);
                interval = string.Create(CultureInfo.InvariantCulture, $" (95 % Wilson interval {w.Low * 100:F1} to {w.High * 100:F1} %)");
            }
            o.WriteLine(string.Create(CultureInfo.InvariantCulture, $"yield: {passes} of {r.Points.Count} meet {string.Join(", ", limits)}: {100.0 * passes / r.Points.Count:F1} %{interval}"));
            foreach (var l in limits.DistinctBy(l => l.Target))
            {
                var values = r.Points.Select(p => r.Value(p, l.Target)).OfType<double>().ToArray();
                if (ToleranceStatistics.Describe(values) is not { } st) { o.WriteLine($"  {l.Target.Column}: does not apply in any sample"); continue; }
                var ranked = ToleranceSummary.Sensitivity(r, l.Target);
                string most = ranked.Count > 0 ? string.Create(CultureInfo.InvariantCulture, $"; most influential {ranked[0].Key} (rho {ranked[0].Rho:F2})") : "";
                bool upper = l.Operator.StartsWith('<');
                var worst = r.Points.Where(p => r.Value(p, l.Target) == (upper ? st.Max : st.Min)).First();
                o.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"  {l.Target.Column}: mean {st.Mean:G4}, sd {st.StandardDeviation:G4}, p1 {st.P1:G4}, p50 {st.P50:G4}, p99 {st.P99:G4}; worst {(upper ? st.Max : st.Min):G4} at {(r.Corners ? "corner" : "sample")} {worst.Index}{most}"));
            }
        }
        o.WriteLine($"wrote {Path.Combine(dir, "montecarlo.csv")}, summary.json" + string.Concat(pictures.Select(f => ", " + f)));
    }

    /// <summary>Draws the bar with the rate, the time left and the running yield.</summary>
    sealed class Progress(ProgressBar bar, Stopwatch clock, bool yield) : IProgress<ToleranceProgress>
    {
        public void Report(ToleranceProgress p)
        {
            double s = clock.Elapsed.TotalSeconds, rate = s > 0 ? p.Done / s : 0;
            double left = rate > 0 ? (p.Total - p.Done) / rate : 0;
            string note = string.Create(CultureInfo.InvariantCulture, $"{p.Done}/{p.Total}, {rate:F1}/s, {left:F0} s left")
                + (yield ? string.Create(CultureInfo.InvariantCulture, $", yield {100.0 * p.Passed / Math.Max(p.Done, 1):F1} %") : "");
            bar.Report((double)p.Done / Math.Max(p.Total, 1), note);
        }
    }
}
