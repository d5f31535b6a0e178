using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Terminations;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>
/// Sweeps and termination studies as <see cref="VariantSet"/>s for their pages (<see cref="VariantPage"/>). A further study
/// (Monte Carlo samples, for instance) needs only its own mapping to a <see cref="VariantSet"/> here.
/// </summary>
public static class StudyPages
{
    /// <summary>Columns each variant's waveforms are thinned to: a chart's width, and small enough for many variants.</summary>
    public const int WaveformColumns = 500;

    /// <summary>
    /// Columns a sweep's waveforms are thinned to so the page of <paramref name="points"/> points of <paramref name="probes"/>
    /// probes stays near 10 MB: <see cref="WaveformColumns"/> for a small sweep, fewer for a large one, 0 (none kept) when
    /// fewer than 20 would be left.
    /// </summary>
    public static int ColumnsFor(int points, int probes)
    {
        long cells = Math.Max(1L, (long)points * Math.Max(1, probes + 1));
        long columns = Math.Min(WaveformColumns, 500_000 / cells);
        return columns < 20 ? 0 : (int)columns;
    }

    /// <summary>The figures the termination page charts, each with the limit that holds it (if any).</summary>
    static readonly string[] TerminationFigures = ["overshoot_pct", "undershoot_pct", "settling_s", "delay_50_s"];

    /// <summary>
    /// A sweep: one axis is the charts' horizontal axis, a grid of several is laid out by point index; the best point (by
    /// <paramref name="goal"/> within <paramref name="limits"/>) and the limits on each figure are marked.
    /// </summary>
    public static VariantSet Sweep(string title, SweepResult result, IReadOnlyList<string> figures, SweepGoal? goal, IReadOnlyList<SweepLimit> limits)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(figures);
        ArgumentNullException.ThrowIfNull(limits);
        bool one = result.Axes.Count == 1;
        var points = result.Points;
        var variants = points.Select((p, i) => new Variant(
            string.Join(", ", result.Axes.Select((a, k) => $"{a.KeyPath} = {Quantity.Format(p.Values[k], a.DisplayUnit, 4)}")),
            one ? p.Values[0] : i, p.Waveforms?.Time, p.Waveforms?.Volts)).ToList();
        var charted = figures.Select(f => new VariantFigure(FigureSelector.Stem(f), FigureSelector.Unit(f),
            result.Probes.Select(probe => points.Select(p => result.Value(p, new ProbeFigure(probe, f))).ToArray()).ToList(),
            limits.Where(l => l.Target.Figure == f).Select(l => (l.ToString(), l.Bound)).ToList())).ToList();
        var best = goal is null ? null : result.Best(goal, limits);
        return new VariantSet(title, one ? result.Axes[0].KeyPath : "point", one ? result.Axes[0].DisplayUnit : "", !one, result.Probes, variants, charted)
        {
            Best = best is null ? null : points.ToList().IndexOf(best),
            BestNote = goal is null ? null : goal + (limits.Count == 0 ? "" : " within " + string.Join(", ", limits)),
            Note = $"{points.Count} points over {string.Join(" x ", result.Axes.Select(a => $"{a.KeyPath} ({a.Values.Count})"))}.",
        };
    }

    /// <summary>
    /// A termination study: one category per strategy; overshoot and settling carry their limits. The first strategy that
    /// meets the limits, after the net as drawn, is marked best (the order of <see cref="TerminationKind"/>).
    /// </summary>
    public static VariantSet Terminations(string title, TerminationStudyResult study)
    {
        ArgumentNullException.ThrowIfNull(study);
        var outcomes = study.Outcomes;
        var variants = outcomes.Select((o, i) =>
        {
            if (o.Result is not { } r) return new Variant($"{o.Design.Name} (n/a)", i, null, null);
            var (t, v) = MinMaxColumns.Thin(r.Time, study.Probes.Select(p => r.Probe(p).Volts).ToArray(), WaveformColumns);
            return new Variant(o.Design.Name, i, t, v);
        }).ToList();
        var figures = TerminationFigures.Select(f => new VariantFigure(FigureSelector.Stem(f), FigureSelector.Unit(f),
            study.Probes.Select((_, k) => outcomes.Select(o => o.Figures.Count > k ? o.Figures[k].GetNumber(f) : null).ToArray()).ToList(),
            f switch
            {
                "overshoot_pct" => [("limit " + study.Options.MaxOvershootPct.ToString("G3", System.Globalization.CultureInfo.InvariantCulture) + " %", study.Options.MaxOvershootPct)],
                "settling_s" => [($"limit {Quantity.Format(study.Options.MaxSettlingS, "s", 3)}", study.Options.MaxSettlingS)],
                _ => [],
            })).ToList();
        int best = outcomes.Select((o, i) => (o, i)).Where(x => x.o.Design.Kind != TerminationKind.AsDrawn && x.o.MeetsLimits).Select(x => x.i).DefaultIfEmpty(-1).First();
        return new VariantSet(title, "strategy", "", true, study.Probes, variants, figures)
        {
            Best = best < 0 ? null : best,
            BestNote = best < 0 ? null : "the first strategy that meets the limits",
            Note = $"Receiver '{study.ReceiverProbe}'; Z0 {Quantity.Format(study.Z0, "Ω", 3)}, line delay {Quantity.Format(study.LineDelayS, "s", 3)}; " +
                $"parts simulated with {study.Options.Series} values.",
        };
    }
}
