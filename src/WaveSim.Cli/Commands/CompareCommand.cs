using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Measurements;
using WaveSim.Core.Output;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim compare SCENARIO --capture FILE --probe NAME`: simulate, align the capture, report the differences.</summary>
public static class CompareCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var capture = new CaptureArguments(required: true);
        var probe = CaptureArguments.ProbeOption();
        var align = AlignOption();
        var outDir = new Option<string?>("--out", "-o") { Description = "Output folder (default: out/<scenario>-compare)" };
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var cmd = new Command("compare", "Compare a simulated probe with a measured capture: RMS and peak difference, figure differences, overlay")
        { scenario, probe, align, outDir, json, force };
        capture.AddTo(cmd);
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            var (s, plan) = CommonOptions.LoadPlanned(path, pr.InvocationConfiguration.Error);
            string probeName = pr.GetValue(probe)!;
            LibraryErrors.Naming(() => CaptureComparison.RequireProbe(s, probeName), ("probe", "--probe"));
            Capture cap = capture.Read(pr)!;
            CaptureArguments.Warn(cap, s.Simulation.Duration, pr.InvocationConfiguration.Error);
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path, "-compare");
            using var output = new OutputFolder(dir, "compare"); // held from before the work starts, so a second run into it is refused at once
            CaptureComparisonResult result;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "simulating"))
                result = CaptureComparison.Run(s, cap, probeName, pr.GetValue(align),
                    new RunOptions { Force = pr.GetValue(force), Plan = plan, Progress = bar }, ct);

            var summary = CompareOutputs.Json(result);
            output.WriteText("compare.json", RunSummary.Text(summary));
            output.WriteText("compare.csv", w => CompareOutputs.WriteCsv(result, w));
            output.Write("compare.png", XyChart.RenderPng(CompareOutputs.Chart(result, $"{s.Title}: {probeName} against {Path.GetFileName(cap.Source)}"),
                PictureSizes.Overlay.Width, PictureSizes.Overlay.Height));
            output.Commit();
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json)) o.WriteLine(RunSummary.Text(summary));
            else Print(o, result, dir);
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>--align: xcorr (the default), edge or none, read into the library's mode.</summary>
    internal static Option<AlignMode> AlignOption() => ChoiceOption.Create("--align",
        "Time alignment of the capture: xcorr (cross-correlation), edge (first 50 % crossings) or none",
        [("xcorr", AlignMode.CrossCorrelation), ("edge", AlignMode.Edge50), ("none", AlignMode.None)], "xcorr");

    static void Print(TextWriter o, CaptureComparisonResult r, string dir)
    {
        var c = r.Comparison;
        o.WriteLine($"{r.Probe}: capture shifted by {Quantity.Format(c.OffsetS, "s")}, {c.Time.Length} points compared");
        o.WriteLine($"  RMS difference  {Quantity.Format(c.RmsV, "V", 3)} ({Pct(c.RmsPct)} of swing)");
        o.WriteLine($"  peak difference {Quantity.Format(c.PeakV, "V", 3)} ({Pct(c.PeakPct)} of swing)");
        o.WriteLine($"  {"figure",-20} {"simulated",12} {"captured",12} {"difference",12}");
        foreach (var f in r.Figures)
            o.WriteLine($"  {f.Name,-20} {Show(f.Name, f.Simulated),12} {Show(f.Name, f.Captured),12} {Show(f.Name, f.Difference),12}");
        o.WriteLine($"wrote {Path.Combine(dir, "compare.json")}, compare.csv, compare.png");
    }

    static string Pct(double p) => double.IsFinite(p) ? p.ToString("F2", CultureInfo.InvariantCulture) + " %" : "-";

    static string Show(string name, double? x) => x is not { } v ? "-" : Core.Sweeps.FigureSelector.Unit(name) switch
    {
        "%" => v.ToString("F1", CultureInfo.InvariantCulture) + " %",
        "" => v.ToString("G4", CultureInfo.InvariantCulture),
        var unit => Quantity.Format(v, unit, 3),
    };
}
