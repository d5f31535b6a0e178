using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Core.Reports;
using WaveSim.Core.Terminations;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim terminations SCENARIO`: compares the net as drawn with none, series, parallel, Thevenin and RC terminations on it.</summary>
public static class TerminationsCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var outDir = CommonOptions.Out();
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var series = ChoiceOption.Create("--series", "Resistor series to simulate with (both are printed)", [("E24", PreferredSeries.E24), ("E96", PreferredSeries.E96)], "E96");
        var maxOvershoot = OptionValue.Create("--max-overshoot", "Largest acceptable overshoot at the receiver", ParseOvershoot, "10 %", "PERCENT");
        var maxSettling = QuantityOption.Create("--max-settling", Dimension.Time, "Largest acceptable settling time at the receiver", "5 ns", t => t > 0 ? null : "expected a time greater than zero", "TIME");
        var level = QuantityOption.Optional("--thevenin-level", Dimension.Voltage, "Thevenin termination level (default: halfway between the source's low and high)", helpName: "VOLTS");
        var settle = CommonOptions.SettleBand();
        var serial = new Option<bool>("--serial") { Description = "Run the strategies one at a time" };
        var html = new Option<bool>("--html") { Description = "Also write terminations.html: a chart per figure over the strategies with the limits marked; a click shows a strategy's waveforms" };
        var cmd = new Command("terminations", "Compare termination strategies on the scenario's net and recommend part values")
        { scenario, outDir, json, series, maxOvershoot, maxSettling, level, settle, serial, force, html };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            var options = new TerminationOptions
            {
                Series = pr.GetValue(series),
                MaxOvershootPct = pr.GetValue(maxOvershoot),
                MaxSettlingS = pr.GetValue(maxSettling),
                TheveninLevelV = pr.GetValue(level),
                SettleBand = pr.GetValue(settle),
                Serial = pr.GetValue(serial),
                Force = pr.GetValue(force),
            };
            var s = CommonOptions.Load(path, pr.InvocationConfiguration.Error);
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path);
            using var output = new OutputFolder(dir, "terminations"); // held from before the work starts, so a second run into it is refused at once
            TerminationStudyResult result;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "terminations"))
                result = LibraryErrors.Naming(() => TerminationStudy.Run(s, options, bar, ct), (nameof(TerminationOptions.TheveninLevelV), "--thevenin-level"));
            output.WriteText("terminations.csv", w => TerminationsCsv.Write(result, w));
            output.Write("terminations.png", XyChart.RenderPng(TerminationPictures.Receiver(result), PictureSizes.Terminations.Width, PictureSizes.Terminations.Height));
            if (pr.GetValue(html)) output.WriteText("terminations.html", VariantPage.Html(StudyPages.Terminations($"{s.Title}: terminations", result)));
            output.Commit();
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json)) o.WriteLine(RunSummary.Text(TerminationReport.Json(result, dir)));
            else Print(o, result, dir, pr.GetValue(html));
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>Reads "10 %" (or a bare 10) as a percentage of the swing.</summary>
    static double ParseOvershoot(string text)
    {
        var (v, dim) = Quantity.ParseAny(text, Dimension.Percent, Dimension.Number);
        double pct = dim == Dimension.Percent ? v * 100 : v;
        if (!(pct >= 0)) throw new OptionValueException($"expected a percentage of the swing such as 10 %, got '{text}'");
        return pct;
    }

    static void Print(TextWriter o, TerminationStudyResult r, string dir, bool html)
    {
        o.WriteLine($"Z0 {Quantity.Format(r.Z0, "Ω", 3)} (first segment), line delay {Quantity.Format(r.LineDelayS, "s", 3)}, receiver '{r.ReceiverProbe}'; limits: overshoot {r.Options.MaxOvershootPct:G3} %, settling {Quantity.Format(r.Options.MaxSettlingS, "s", 3)}");
        bool eyes = r.Outcomes.Any(x => x.ReceiverEye is not null);
        string eyeHead = eyes ? $" {"eye height",10} {"eye width",9}" : "";
        o.WriteLine($"  {"strategy",-9} {"overshoot",9} {"undershoot",10} {"settling",9} {"edge-1 crossings",16} {"delay",9}{eyeHead} {"P high",9} {"P low",9} {"P avg",9}  verdict");
        foreach (var x in r.Outcomes)
        {
            if (x.Receiver is not { } f) { o.WriteLine($"  {x.Design.Name,-9} not applicable: {x.Design.Note}"); continue; }
            var e = x.ReceiverEye?.Diagram?.Figures;
            string eye = !eyes ? "" : e is null ? $" {"-",10} {"-",9}"
                : e.HasThresholds ? $" {V(e.EyeHeightThresholdsV),10} {T(e.EyeWidthThresholdsS),9}" : $" {V(e.EyeHeightV),10} {T(e.EyeWidthS),9}";
            o.WriteLine($"  {x.Design.Name,-9} {Pct(f.OvershootPct),9} {Pct(f.UndershootPct),10} {Settling(f),9} {x.VerdictAt(r.ReceiverProbe)?.FirstEdgeCrossingsText() ?? "-",16} {T(f.Delay50S),9}{eye} {W(x.PowerHighW),9} {W(x.PowerLowW),9} {W(x.PowerAverageW),9}  {x.BriefVerdict}");
            if (x.Design.Note is { } change) o.WriteLine($"  {"",-9} ({change})");
        }
        var judged = r.Outcomes.SelectMany(x => x.Verdicts).Where(v => v.Judged).Select(v => v.Thresholds is null ? $"{v.Probe} (at the mid level)" : v.Probe).Distinct();
        o.WriteLine($"  receivers judged: {string.Join(", ", judged)}; P high and P low are static (DC), P avg the simulated mean over the record; rules: docs/verdicts.md");
        o.WriteLine("  figures are the receiver's first edge, up to the next source edge (\"unsettled\": not settled before the next edge), settling counted from the edge's arrival at the receiver; edge-1 crossings: of the threshold band, 1 expected, with a settled level that misses its threshold beside it");
        if (eyes) o.WriteLine("  (bit pattern: the verdict is judged on the receiver's eye" + (r.Outcomes.Any(x => x.ReceiverEye?.Thresholds is not null) ? ", measured against the receiver thresholds)" : ")"));
        // The table cell names the rules; the account of each (probe, edge, what was measured) follows, one receiver a line.
        var explained = r.Outcomes.Where(x => x.Result is not null && x.Verdicts.Any(v => v.Failures.Count > 0 || v.Note is not null)).ToArray();
        if (explained.Length > 0) o.WriteLine("why (each rule missed, at its first failing edge; receivers that could not be judged):");
        foreach (var x in explained)
            foreach (var v in x.Verdicts.Where(v => v.Failures.Count > 0 || v.Note is not null))
                o.WriteLine($"  {x.Design.Name,-9} {(v.Judged ? v.Summary() : $"{v.Probe}: {v.Note}")}");
        o.WriteLine($"parts (simulated with {r.Options.Series}; computed value, nearest E24, nearest E96; capacitors: next E24 value up):");
        foreach (var x in r.Outcomes.Where(x => x.Design.Parts.Count > 0))
        {
            string parts = string.Join("; ", x.Design.Parts.Select(p => p.E96 is { } e96
                ? $"{p.Label} {Quantity.Format(p.Ideal, p.Unit, 4)} -> E24 {Quantity.Format(p.E24, p.Unit, 3)}, E96 {Quantity.Format(e96, p.Unit, 3)}"
                : $"{p.Label} {Quantity.Format(p.Ideal, p.Unit, 4)} -> {Quantity.Format(p.E24, p.Unit, 3)}"));
            if (TerminationReport.TheveninLevel(x.Design) is { } level)
                parts += $"; level asked {Quantity.Format(x.Design.TargetTheveninV, "V", 3)}, the {r.Options.Series} pair gives {Quantity.Format(level, "V", 3)}";
            o.WriteLine($"  {x.Design.Name,-9} {parts}");
        }
        o.WriteLine($"wrote {Path.Combine(dir, "terminations.csv")}, terminations.png" + (html ? ", terminations.html" : ""));
    }

    static string T(double? t) => t is { } x ? Quantity.Format(x, "s", 3) : "-";
    static string Settling(Core.Analysis.SignalFigures f) => f.UnsettledAtNextEdge ? "unsettled" : T(f.SettlingS);
    static string V(double? v) => v is { } x ? Quantity.Format(x, "V", 3) : "-";
    static string W(double? w) => w is { } x ? Quantity.Format(x, "W", 3) : "-";
    static string Pct(double? p) => p is { } x ? x.ToString("F1", CultureInfo.InvariantCulture) + " %" : "-";
}
