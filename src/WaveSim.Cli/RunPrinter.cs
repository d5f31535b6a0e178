using System.Globalization;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Units;

namespace WaveSim.Cli;

/// <summary>Prints what <c>run</c> found: the summary table, the eyes and the checks, or the summary JSON; every number from the outcome.</summary>
public static class RunPrinter
{
    /// <summary>Prints the outcome of a run whose files <paramref name="written"/> went to <paramref name="dir"/>.</summary>
    public static void Print(TextWriter o, RunOutcome run, RunFilesWritten written, string dir, bool json)
    {
        if (json) { o.WriteLine(written.Summary); return; }
        var r = run.Result;
        o.WriteLine($"{r.Scenario.Title}: {r.Plan.Steps} steps of {Quantity.Format(r.Plan.Dt, "s")} on {r.Plan.TotalCells} cells in {r.Elapsed.TotalSeconds:F2} s");
        o.WriteLine($"  {"probe",-12} {"final",10} {"min",10} {"max",10} {"overshoot",10} {"delay",10} {"rise",10} {"settling",10}");
        foreach (var (p, f) in run.Figures)
            o.WriteLine($"  {p.Name,-12} {V(p.Volts[^1]),10} {V(p.FigureVolts.Min()),10} {V(p.FigureVolts.Max()),10} {Pct(f.OvershootPct),10} {T(f.Delay50S),10} {T(f.Rise1090S ?? f.Fall9010S),10} {(f.UnsettledAtNextEdge ? "unsettled" : T(f.SettlingS)),10}");
        foreach (var (p, f) in run.Figures.Where(x => x.Figures.UnsettledAtNextEdge))
            o.WriteLine($"  {p.Name}: not settled before next edge (its first-edge figures end where the next source edge reaches it, at {T(f.FirstEdgeWindowEndS)})");
        foreach (var e in run.Eyes)
        {
            var f = e.Diagram?.Figures;
            o.WriteLine(f is null ? $"  eye {e.Probe.Name}: {e.Note}"
                : $"  eye {e.Probe.Name}: height {V(f.EyeHeightV)}, width {T(f.EyeWidthS)}" + (f.HasThresholds ? $", against thresholds {V(f.EyeHeightThresholdsV)} x {T(f.EyeWidthThresholdsS)}" : "") + $" ({f.TraceCount} bits)");
        }
        string eyeFiles = string.Concat(run.Eyes.Where(e => e.Diagram is not null).Select(e => $", eye_{e.Probe.Name}.png"));
        o.WriteLine($"wrote {Path.Combine(dir, "probes.csv")}, summary.json, waveforms.png, spacetime.png{eyeFiles}");
        var picture = written.Waveforms;
        if (picture.Limited)
            o.WriteLine($"  waveforms.png shows {picture.Shown.Describe()}: the start-up and the first {picture.EdgesShown} of {picture.SourceEdges} source edges; --window all draws the whole record, --window START..STOP another part");
        foreach (var d in run.FrequencyCheck ?? [])
            o.WriteLine($"  frequency-domain check {d.Probe}: largest difference {Quantity.Format(d.MaxDiffV, "V", 3)} ({d.MaxDiffPct:F3} % of the swing)");
    }

    static string V(double v) => Quantity.Format(v, "V", 3);
    static string V(double? v) => v is { } x ? V(x) : "-";
    static string T(double? t) => t is { } x ? Quantity.Format(x, "s", 3) : "-";
    static string Pct(double? p) => p is { } x ? x.ToString("F1", CultureInfo.InvariantCulture) + " %" : "-";
}
