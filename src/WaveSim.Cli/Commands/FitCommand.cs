using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Fitting;
using WaveSim.Core.Measurements;
using WaveSim.Core.Output;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim fit SCENARIO --capture FILE --probe NAME --free KEY[=MIN..MAX] ...`: least-squares values for chosen keys.</summary>
public static class FitCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var capture = new CaptureArguments(required: true);
        var probe = CaptureArguments.ProbeOption();
        var free = new Option<string[]>("--free")
        {
            Description = "A key path to fit, with optional bounds: line[0].segment.z0, load.c=0.5pF..5pF (repeat for each)",
            Required = true, HelpName = "KEY[=MIN..MAX]", AllowMultipleArgumentsPerToken = false,
        };
        var align = CompareCommand.AlignOption();
        align.Description = "Capture time axis: xcorr or edge (aligned once with the start, searched over the window, then the offset is fitted too) or none (taken as it is)";
        var maxSims = IntegerOption.Create("--max-sims", "Budget of simulations", 1, 1_000_000, ScenarioFitOptions.DefaultMaxSimulations, "N");
        var outDir = new Option<string?>("--out", "-o") { Description = "Output folder (default: out/<scenario>-fit)" };
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var cmd = new Command("fit", "Fit scenario values so a simulated probe matches a capture in least squares")
        { scenario, probe, free, align, maxSims, outDir, json, force };
        capture.AddTo(cmd);
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            var document = CommonOptions.LoadDocument(path, pr.InvocationConfiguration.Error);
            var s = document.Scenario;
            string probeName = pr.GetValue(probe)!;
            LibraryErrors.Naming(() => CaptureComparison.RequireProbe(s, probeName), ("probe", "--probe"));
            var parameters = pr.GetValue(free)!.Select(f => LibraryErrors.Naming(() => FreeParameter.Parse(document, f), ("spec", "--free"))).ToList();
            Capture cap = capture.Read(pr)!;
            CaptureArguments.Warn(cap, s.Simulation.Duration, pr.InvocationConfiguration.Error);
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path, "-fit");
            using var output = new OutputFolder(dir, "fit"); // held from before the work starts, so a second run into it is refused at once
            ScenarioFitResult result;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "fitting"))
                result = LibraryErrors.Naming(() => ScenarioFit.Run(s, cap, probeName, parameters, new ScenarioFitOptions
                {
                    Align = pr.GetValue(align),
                    MaxSimulations = pr.GetValue(maxSims),
                    Progress = bar,
                    Force = pr.GetValue(force),
                }, ct), ("parameters", "--free"), (nameof(ScenarioFitOptions.MaxSimulations), "--max-sims"));

            var summary = FitOutputs.Json(result);
            // The author's text with the fitted values spliced in, comments kept.
            output.WriteText("fitted.yaml", document.Edited(ScenarioFit.Changes(parameters, result.Parameters.Select(p => p.Value).ToArray())));
            output.WriteText("fit.json", RunSummary.Text(summary));
            output.Write("fit.png", XyChart.RenderPng(FitOutputs.Chart(result, $"{s.Title}: fit of {probeName} to {Path.GetFileName(cap.Source)}"),
                PictureSizes.Overlay.Width, PictureSizes.Overlay.Height));
            output.Commit();
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json)) o.WriteLine(RunSummary.Text(summary));
            else Print(o, result, dir);
            if (!result.Converged)
                pr.InvocationConfiguration.Error.WriteLine($"warning: the fit used its budget of {pr.GetValue(maxSims)} simulations before it stopped improving; raise --max-sims");
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    static void Print(TextWriter o, ScenarioFitResult r, string dir)
    {
        o.WriteLine($"fitted {r.Parameters.Count} value(s) in {r.Simulations} simulations{(r.Converged ? "" : " (budget used up)")}");
        int width = Math.Max(24, r.Parameters.Max(p => p.Parameter.KeyPath.Length) + 2);
        foreach (var p in r.Parameters)
        {
            string unit = Symbol(p.Parameter.Unit);
            string sigma = double.IsFinite(p.Uncertainty) ? Quantity.Format(p.Uncertainty, unit, 3) : "undetermined";
            o.WriteLine($"  {p.Parameter.KeyPath.PadRight(width)} {Quantity.Format(p.Value, unit),12} ± {sigma,-12} (start {Quantity.Format(p.Parameter.Start, unit)})");
        }
        if (r.OffsetFitted)
        {
            string sigma = double.IsFinite(r.OffsetUncertaintyS) ? Quantity.Format(r.OffsetUncertaintyS, "s", 3) : "undetermined";
            o.WriteLine($"  {"capture time offset".PadRight(width)} {Quantity.Format(r.OffsetS, "s"),12} ± {sigma}");
        }
        o.WriteLine($"RMS error {Quantity.Format(r.RmsV, "V", 3)} (start {Quantity.Format(r.StartRmsV, "V", 3)})");
        var b = r.Basis;
        o.WriteLine($"± is one standard deviation: residual standard error {Quantity.Format(b.StandardErrorV, "V", 3)} over {b.Samples} samples, " +
            $"widened ×{b.Widening.ToString("G3", CultureInfo.InvariantCulture)} for their correlation (lag-1 {b.Lag1.ToString("F3", CultureInfo.InvariantCulture)}, " +
            $"about {b.EffectiveSamples.ToString("F0", CultureInfo.InvariantCulture)} independent)");
        o.WriteLine($"wrote {Path.Combine(dir, "fitted.yaml")}, fit.json, fit.png");
    }

    static string Symbol(string unit) => unit.Replace("ohm", "Ω", StringComparison.Ordinal);
}
