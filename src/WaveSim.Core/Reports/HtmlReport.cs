using System.Globalization;
using WaveSim.Core.Analysis;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Terminations;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>The result of building a report: the page and the per-probe verdicts it shows.</summary>
/// <param name="Html">The whole self-contained page (UTF-8 text).</param>
/// <param name="Checks">One verdict per probe, in probe order.</param>
public sealed record HtmlReportResult(string Html, IReadOnlyList<ReceiverCheck> Checks);

/// <summary>
/// Builds one self-contained HTML page for a run: the scenario, the plan and its problems, a signal-quality table with
/// pass/fail cells against the receiver thresholds, the pictures as PNG data URIs, eyes, terminations, limits and cautions.
/// The page loads nothing else (no scripts, fonts, style sheets or images from elsewhere), so it opens offline.
/// </summary>
public static class HtmlReport
{
    /// <summary>The largest page the report writes with the full record; above it the zoom draws the thinned record.</summary>
    public const long MaxPageBytes = 10_000_000;

    /// <summary>
    /// The options a run needs for its report: the full analysis with receivers judged at the default limits and
    /// <paramref name="settleBand"/> (the same as <c>terminations</c>), and the space-time map's snapshots.
    /// </summary>
    public static RunOptions RunOptions(double settleBand = SignalQualityOptions.DefaultSettleBand, bool force = false) => new()
    {
        Force = force,
        Analysis = new AnalysisOptions { SettleBand = settleBand, Limits = new VerdictLimits { SettleBand = settleBand } },
    };

    /// <summary>Builds the page. The run must hold snapshots (simulate with <see cref="RunOptions"/>); without them the frames and space-time map are left out with a note.</summary>
    public static HtmlReportResult Build(ReportInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var r = input.Result;
        var s = r.Scenario;
        var checks = ReceiverCheck.Of(input.Outcome);
        var n = new ReportNumbers(r.Plan.Dt);
        var w = new HtmlWriter();
        PageShell.Head(w, $"{s.Title} - WaveSim report");
        w.El("h1", s.Title);
        w.El("p", $"WaveSim report. Simulated {Quantity.Format(s.Simulation.Duration, "s", 4)} in {r.Plan.Steps} steps; scenario file {Path.GetFileName(s.FilePath ?? "")}.", ("class", "note"));

        w.El("h2", "Scenario");
        w.El("pre", input.ScenarioText, ("id", "scenario"));

        Plan(w, r, n);
        BufferSection.Write(w, s);
        Figures(w, input, checks, n);

        // The same window and probes as run's waveforms.png: a long clock or bit stream shows its start-up and first edges.
        var picture = RunPictures.Waveforms(input.Outcome, input.Waveforms);
        PageShell.Waveforms(w, picture);
        w.Raw("<details>\n<summary>Static picture (as waveforms.png)</summary>\n");
        w.Image("waveforms", XyChart.RenderPng(picture.Chart, ReportImages.WaveformWidth, ReportImages.WaveformHeight),
            ReportImages.WaveformWidth, ReportImages.WaveformHeight, "Probe voltages against time");
        w.Raw("</details>\n");
        if (r.Snapshots.Count < 2) w.El("p", "No snapshots were recorded in this run, so there are no frames and no space-time map.", ("class", "note"));
        else PageShell.FramesAndMap(w);

        if (input.Eyes.Count > 0) Eyes(w, s.Title, input.Eyes);
        if (input.Terminations is { } t) TerminationSection(w, t, n);
        Limits(w);
        long rest = w.Length + PageShell.ScriptBytes;
        string json = PageData.Json(input.Outcome, picture, input.Waveforms.Probes, MaxPageBytes - rest, input.Waveforms.Currents);
        PageShell.Scripts(w, json);
        w.Line("</body>").Line("</html>");
        return new HtmlReportResult(w.ToString(), checks);
    }

    static void Plan(HtmlWriter w, SimulationResult r, ReportNumbers n)
    {
        var p = r.Plan;
        w.El("h2", "Plan");
        w.Raw("<table id=\"plan\">\n").HeaderRow(["item", "value"]);
        w.Row([("time step", null), (Quantity.Format(p.Dt, "s", 4), null)]);
        w.Row([("stability limit of the step", null), (Quantity.Format(p.DtLimit, "s", 4), null)]);
        w.Row([("steps", null), (p.Steps.ToString(CultureInfo.InvariantCulture), null)]);
        w.Row([("cells", null), (p.TotalCells.ToString(CultureInfo.InvariantCulture), null)]);
        w.Row([("cell updates", null), (p.CellUpdates.ToString("N0", CultureInfo.InvariantCulture), null)]);
        w.Raw("</table>\n");
        w.Raw("<table id=\"segments\">\n").HeaderRow(["segment", "length", "Z0", "delay", "cells", "Courant number"]);
        foreach (var sp in p.Segments)
            w.Row([(sp.Where, null), (Quantity.Format(sp.Segment.Length, "m", 4), null), (Quantity.Format(sp.Segment.Z0, "Ω", 4), null),
                (n.S(sp.Segment.Delay), null), (sp.Cells.ToString(CultureInfo.InvariantCulture), null),
                (sp.Courant.ToString("F3", CultureInfo.InvariantCulture), null)]);
        w.Raw("</table>\n");
        var problems = PlanAdvisor.Problems(r.Scenario, p);
        w.El("h2", "Problems found");
        if (problems.Count == 0) w.El("p", "None found in the plan.");
        else
        {
            w.Raw("<ul id=\"problems\">\n");
            foreach (var x in problems) w.El("li", x);
            w.Raw("</ul>\n");
        }
    }

    static void Figures(HtmlWriter w, ReportInput input, IReadOnlyList<ReceiverCheck> checks, ReportNumbers n)
    {
        bool bits = input.Eyes.Count > 0;
        w.El("h2", "Signal quality");
        var head = new List<string> { "probe", "at", "final", "min", "max", "overshoot", "undershoot", "above high", "below low", "ringback",
            "rise 10-90", "fall 90-10",
            "delay 50 %", "settling", "first-edge crossings", "noise margin high", "noise margin low" };
        if (bits) head.AddRange(["eye height vs thresholds", "eye width vs thresholds"]);
        head.Add("verdict");
        var rules = new CellRules(input.Limits);
        w.Raw("<div class=\"table-box\" id=\"figures-box\">\n<table id=\"figures\">\n").HeaderRow(head);
        for (int i = 0; i < input.Figures.Count; i++)
        {
            var (p, f) = input.Figures[i];
            var c = checks[i];
            // Judged: the first edge's crossings of the band with any level failure beside them; else the record's 50 % crossings.
            string crossings = c.Verdict.Judged && c.Verdict.Edges.Count > 0
                ? c.Verdict.FirstEdgeCrossingsText() : f.ThresholdCrossings.ToString(CultureInfo.InvariantCulture);
            string? Judged(string rule) => c.Thresholds is null ? CellRules.NotJudged : rule;
            var cells = new List<(string, string?, string?)>
            {
                (p.Name, null, null), (p.Location, null, null), (V(p.FigureVolts[^1]), null, null), (V(p.FigureVolts.Min()), null, null),
                (V(p.FigureVolts.Max()), null, null),
                (Pct(f.OvershootPct), Cls(c.OvershootOk), Judged(rules.Overshoot)), (Pct(f.UndershootPct), null, null), (V(f.AboveHighV), null, null),
                (V(f.BelowLowV), null, null), (V(f.RingbackV), Cls(c.RingbackOk), Judged(CellRules.Ringback)), (n.S(f.Rise1090S), null, null),
                (n.S(f.Fall9010S), null, null), (n.S(f.Delay50S), null, null), (Settling(f, n), Cls(c.SettlingOk), Judged(rules.Settling)),
                (crossings, Cls(c.CrossingsOk), Judged(CellRules.Crossings)),
                // A bit stream has no single settled level: its margins are in the eye columns.
                (bits ? "-" : V(f.NoiseMarginHighV), Cls(c.MarginHighOk), Judged(CellRules.MarginHigh)),
                (bits ? "-" : V(f.NoiseMarginLowV), Cls(c.MarginLowOk), Judged(CellRules.MarginLow)),
            };
            if (bits)
            {
                var ef = input.Eyes.FirstOrDefault(x => x.Probe.Name == p.Name)?.Diagram?.Figures;
                cells.Add((V(ef?.EyeHeightThresholdsV), Cls(c.EyeOk), Judged(CellRules.Eye)));
                cells.Add((n.S(ef?.EyeWidthThresholdsS), Cls(c.EyeOk), Judged(CellRules.Eye)));
            }
            cells.Add((c.Pass switch { true => "pass", false => "fail", null => "not judged" }, Cls(c.Pass), Judged(CellRules.Verdict)));
            w.Row(cells);
        }
        w.Raw("</table>\n</div>\n");
        var withRx = checks.Where(c => c.Thresholds is not null).ToList();
        foreach (var c in withRx)
            w.El("p", $"{c.Probe}: receiver thresholds Vih {V(c.Thresholds!.Vih)}, Vil {V(c.Thresholds.Vil)}; settled low {V(c.Verdict.LowV)}, " +
                $"settled high {V(c.Verdict.HighV)}; {c.Verdict.Edges.Count} edge(s) judged.", ("class", "note"));
        var failures = checks.SelectMany(c => c.Verdict.Failures).ToList();
        if (failures.Count > 0)
        {
            w.Raw("<ul id=\"verdicts\">\n");
            foreach (var f in failures) w.El("li", f.ToString());
            w.Raw("</ul>\n");
        }
        foreach (var c in checks.Where(c => c.Verdict.Note is not null)) w.El("p", $"{c.Probe}: {c.Verdict.Note}.", ("class", "note"));
        var lim = input.Limits;
        w.El("p", "Pass/fail rule: " + ReceiverCheck.Rule + $" Limits: overshoot {lim.MaxOvershootPct.ToString("G3", CultureInfo.InvariantCulture)} %, " +
            $"settling {Quantity.Format(lim.MaxSettlingS, "s", 3)} within ±{(lim.SettleBand * 100).ToString("G3", CultureInfo.InvariantCulture)} % of the swing.", ("id", "rule"));
        w.El("p", "Figures refer to the first edge and the level it settles to, measured up to the next source edge at the probe, " +
            "except above high and below low, the worst excursions beyond those levels over the whole record; a dash means the " +
            "figure does not apply. Settling counts from the edge's arrival at the probe (the source edge's 50 % instant plus the line " +
            "delay), delay from the source edge's 50 % instant. First-edge crossings counts the first edge's crossings of the threshold band (1 is right) and " +
            "names a settled level that misses its threshold beside the count. " +
            "Noise margin high = settled high level − Vih; noise margin low = Vil − settled low level.", ("class", "note"));
    }

    static void Eyes(HtmlWriter w, string title, IReadOnlyList<ProbeEye> eyes)
    {
        w.El("h2", "Eye diagrams");
        foreach (var e in eyes)
        {
            if (EyePng(title, e) is { } png)
                w.Image("eye-" + e.Probe.Name, png, ReportImages.EyeWidth, ReportImages.EyeHeight, $"Eye diagram at {e.Probe.Name}");
            else w.El("p", $"{e.Probe.Name}: no eye ({e.Note}).");
        }
    }

    static byte[]? EyePng(string title, ProbeEye e) => EyePicture.RenderPng(title, e, ReportImages.EyeWidth, ReportImages.EyeHeight);

    static void TerminationSection(HtmlWriter w, TerminationStudyResult t, ReportNumbers n)
    {
        w.El("h2", "Terminations");
        w.El("p", $"Z0 {Quantity.Format(t.Z0, "Ω", 3)} (first segment), line delay {Quantity.Format(t.LineDelayS, "s", 3)}, receiver '{t.ReceiverProbe}'; " +
            $"limits: overshoot {t.Options.MaxOvershootPct.ToString("G3", CultureInfo.InvariantCulture)} %, settling {Quantity.Format(t.Options.MaxSettlingS, "s", 3)}; " +
            $"parts simulated with {t.Options.Series} values; power avg is the mean over the record of the simulated v·i in the termination's resistors.");
        w.Raw("<div class=\"table-box\">\n<table id=\"terminations\">\n").HeaderRow(["strategy", "change to the net as drawn", "parts", "overshoot", "undershoot", "settling", "first-edge crossings", "delay 50 %", "power avg", "verdict"]);
        foreach (var o in t.Outcomes)
        {
            string parts = o.Design.Parts.Count == 0 ? "-" : string.Join("; ", o.Design.Parts.Select(p => $"{p.Label} {Quantity.Format(p.Used, p.Unit, 3)}"));
            var f = o.Receiver;
            string change = o.Design.Kind == TerminationKind.AsDrawn ? o.Design.Note ?? "none: the scenario unchanged" : o.Result is null ? "-" : o.Design.Note ?? "-";
            w.Row([(o.Design.Name, null), (change, null), (parts, null), (Pct(f?.OvershootPct), null), (Pct(f?.UndershootPct), null), (f is null ? "-" : Settling(f, n), null),
                (o.VerdictAt(t.ReceiverProbe)?.FirstEdgeCrossingsText() ?? "-", null), (n.S(f?.Delay50S), null),
                (o.PowerAverageW is { } pw ? Quantity.Format(pw, "W", 3) : "-", null),
                (o.Result is null ? "n/a: " + o.Design.Note : o.Verdict, o.Result is null ? null : Cls(o.MeetsLimits))]);
        }
        w.Raw("</table>\n</div>\n");
        w.Image("terminations-overlay", XyChart.RenderPng(TerminationPictures.Receiver(t), ReportImages.TerminationsWidth, ReportImages.TerminationsHeight),
            ReportImages.TerminationsWidth, ReportImages.TerminationsHeight, "Receiver voltage for every termination strategy");
    }

    static void Limits(HtmlWriter w)
    {
        w.El("h2", "Limits of the model");
        w.Raw("<ul id=\"limits\">\n");
        w.El("li", "One conductor pair: a single signal path and its return; no crosstalk between neighbouring lines.");
        w.El("li", "Quasi-TEM propagation: per-unit-length R, L, G, C; no higher-order modes or radiation.");
        w.El("li", "Linear parts: resistors, capacitors and inductors with fixed values; drivers are a waveform behind a fixed resistance; no diodes, clamps or non-linear receivers.");
        w.Raw("</ul>\n");
        w.El("h2", "Cautions");
        w.Raw("<ul id=\"cautions\">\n");
        w.El("li", "This simulation is an estimate. Verify every result on the real hardware before relying on it.");
        w.El("li", "Never connect instruments to energized or high-voltage lines.");
        w.El("li", "Where cables carry mains or high voltage, follow your local codes and licensed practice; this report does not replace them.");
        w.Raw("</ul>\n");
    }

    static string? Cls(bool? ok) => ok switch { true => "pass", false => "fail", null => null };
    static string V(double? v) => ReportNumbers.V(v);
    static string Settling(SignalFigures f, ReportNumbers n) => f.UnsettledAtNextEdge ? "not settled before next edge" : n.S(f.SettlingS);
    static string Pct(double? p) => ReportNumbers.Pct(p);
}
