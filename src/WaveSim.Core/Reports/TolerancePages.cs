using System.Globalization;
using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>
/// A Monte Carlo (or corner) run as a <see cref="VariantSet"/> for its page: per limited figure, the samples' values against
/// the figure's most influential key (Spearman's ρ, <see cref="ToleranceSummary.Sensitivity"/>) with the limit drawn, and
/// the yield with its Wilson 95 % interval in the heading. Each sample's thinned waveforms are a click away.
/// </summary>
public static class TolerancePages
{
    /// <summary>The set of <paramref name="r"/> held to <paramref name="limits"/>; without limits every probe's overshoot is charted against sample index.</summary>
    /// <param name="title">The page's heading.</param>
    /// <param name="r">A whole run, its points' waveforms kept (<see cref="SweepRunOptions.WaveformColumns"/>) for the click to show them.</param>
    /// <param name="limits">The limits judged.</param>
    public static VariantSet Set(string title, ToleranceResult r, IReadOnlyList<SweepLimit> limits)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limits);
        string what = r.Corners ? "corner" : "sample";
        var variants = r.Points.Select(p => new Variant(Label(r, p, limits, what), p.Index, p.Waveforms?.Time, p.Waveforms?.Volts)).ToList();
        var targets = limits.Count > 0 ? limits.Select(l => l.Target).Distinct().ToList() : r.Probes.Select(p => new ProbeFigure(p, "overshoot_pct")).ToList();
        var figures = targets.Select(t => Figure(r, t, limits, what)).ToList();
        return new VariantSet(title, what, "", false, r.Probes, variants, figures)
        {
            Note = $"{r.Points.Count} {what}s over {string.Join(", ", r.Keys.Select(k => k.ToString()))}.",
            Outcome = Outcome(r, limits),
        };
    }

    /// <summary>The yield line: passes of samples, the fraction and (for random samples) the Wilson score 95 % interval.</summary>
    public static string? Outcome(ToleranceResult r, IReadOnlyList<SweepLimit> limits)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limits);
        if (limits.Count == 0 || r.Points.Count == 0) return null;
        int passes = r.Points.Count(p => r.Passes(p, limits));
        string text = string.Create(CultureInfo.InvariantCulture,
            $"Yield: {passes} of {r.Points.Count} meet {string.Join(", ", limits)}: {100.0 * passes / r.Points.Count:F1} %");
        if (r.Corners) return text + " (corners: no interval, they are not a random sample).";
        var w = ToleranceStatistics.Wilson(passes, r.Points.Count);
        return text + string.Create(CultureInfo.InvariantCulture, $" (95 % Wilson interval {w.Low * 100:F1} to {w.High * 100:F1} %).");
    }

    static VariantFigure Figure(ToleranceResult r, ProbeFigure t, IReadOnlyList<SweepLimit> limits, string what)
    {
        int probe = r.Probes.ToList().IndexOf(t.Probe);
        // Only the limited probe's series carries values; the page leaves out series without any.
        var values = r.Probes.Select((_, k) => k == probe ? r.Points.Select(p => r.Value(p, t)).ToArray() : new double?[r.Points.Count]).ToList();
        var ranked = ToleranceSummary.Sensitivity(r, t);
        FigureAxis? axis = null;
        string influence = "no key changes it";
        if (ranked.Count > 0)
        {
            int key = r.Keys.ToList().FindIndex(k => k.KeyPath == ranked[0].Key);
            axis = new FigureAxis(r.Keys[key].KeyPath, DisplayUnit(r.Keys[key]), r.Points.Select(p => p.Values[key]).ToArray());
            influence = string.Create(CultureInfo.InvariantCulture, $"most influential key {ranked[0].Key} (Spearman rho {ranked[0].Rho:F2})");
        }
        string unit = FigureSelector.Unit(t.Figure);
        var held = values[probe].OfType<double>().ToArray();
        string stats = ToleranceStatistics.Describe(held) is { } st
            ? $"mean {Quantity.Format(st.Mean, unit, 4)}, sd {Quantity.Format(st.StandardDeviation, unit, 3)}, p1 {Quantity.Format(st.P1, unit, 4)}, p99 {Quantity.Format(st.P99, unit, 4)}; "
            : $"applies in no {what}; ";
        return new VariantFigure($"{t.Probe} {FigureSelector.Stem(t.Figure)}", unit, values,
            limits.Where(l => l.Target == t).Select(l => ("limit " + l, l.Bound)).ToList())
        {
            Axis = axis,
            PointsOnly = true,
            Note = stats + influence + ".",
        };
    }

    static string Label(ToleranceResult r, SweepPointResult p, IReadOnlyList<SweepLimit> limits, string what)
    {
        string keys = string.Join(", ", r.Keys.Select((k, j) => $"{k.KeyPath} = {Quantity.Format(p.Values[j], DisplayUnit(k), 4)}"));
        string head = r.Corners && p.Index == 0 ? "corner 0 (nominal)" : $"{what} {p.Index}";
        string verdict = limits.Count == 0 ? "" : r.Passes(p, limits) ? " (meets the limits)" : " (fails " + string.Join(", ", limits.Where(l => !l.IsMet(r.Value(p, l.Target)))) + ")";
        return $"{head}: {keys}{verdict}";
    }

    static string DisplayUnit(ToleranceKey k) => k.Distribution.Dimension.SiUnit == "ohm" ? "\u03a9" : k.Distribution.Dimension.SiUnit;
}
