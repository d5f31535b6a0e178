using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Core.Sweeps;

/// <summary>
/// Charts of a sweep: one figure against the first varied key, one panel per probe, one line per value of the other keys.
/// The X axis is logarithmic when the first key charts on one (<see cref="SweepAxis.ChartsOnLogAxis"/>); the other keys
/// only name the lines, so their spacing does not matter here.
/// </summary>
public static class SweepPictures
{
    /// <summary>The chart of <paramref name="figure"/> (a <see cref="Analysis.SignalFigures.FigureNames"/> entry); a figure that does not apply leaves a gap.</summary>
    /// <param name="r">The sweep.</param>
    /// <param name="figure">The figure charted.</param>
    /// <param name="best">The point a goal chose (<see cref="SweepResult.Best"/>), marked in every panel where the figure applies; null marks none.</param>
    /// <param name="goal">The goal that chose <paramref name="best"/>, named in its label.</param>
    public static ChartSpec Chart(SweepResult r, string figure, SweepPointResult? best = null, SweepGoal? goal = null)
    {
        var first = r.Axes[0];
        var groups = r.Points.GroupBy(p => string.Join("|", p.Values.Skip(1))).ToList();
        var panels = new List<ChartPanel>();
        foreach (string probe in r.Probes)
        {
            if (!SweepPanelGaps.HasData(r, probe, figure)) continue;   // no empty panels: SweepPanelGaps.LeftOut says why; may leave none
            var target = new ProbeFigure(probe, figure);
            var series = groups.Select(g =>
            {
                var pts = g.OrderBy(p => p.Values[0]).ToArray();
                string name = r.Axes.Count == 1 ? probe
                    : string.Join(", ", r.Axes.Skip(1).Select((a, k) => a.KeyPath + " " + Quantity.Format(pts[0].Values[k + 1], a.DisplayUnit, 3)));
                return new Rendering.PlotSeries(name, pts.Select(p => p.Values[0]).ToArray(), pts.Select(p => r.Value(p, target) ?? double.NaN).ToArray());
            }).ToList();
            panels.Add(new ChartPanel($"{probe} {FigureSelector.Stem(figure).Replace('_', ' ')}", FigureSelector.Unit(figure), series)
            {
                Markers = [.. series.SelectMany(IsolatedPoints), .. BestMarker(r, best, goal, target)],
            });
        }
        return new ChartSpec($"{FigureSelector.Stem(figure).Replace('_', ' ')} against {first.KeyPath}", first.KeyPath, first.DisplayUnit, panels)
        {
            XKind = first.ChartsOnLogAxis ? AxisKind.Logarithmic : AxisKind.Linear,
        };
    }

    /// <summary>The best point of this panel's probe and figure, as a highlighted marker labelled with its key values.</summary>
    static IEnumerable<Marker> BestMarker(SweepResult r, SweepPointResult? best, SweepGoal? goal, ProbeFigure target)
    {
        if (best is null || r.Value(best, target) is not { } y) yield break;
        string at = string.Join(", ", r.Axes.Select((a, k) => $"{a.KeyPath} {Quantity.Format(best.Values[k], a.DisplayUnit, 3)}"));
        // The full label where the goal's own figure is charted; elsewhere the same point, named briefly.
        string label = goal is null ? $"best point: {at}"
            : goal.Target == target ? $"{(goal.Maximise ? "highest" : "lowest")} {goal.Target.Probe} {FigureSelector.Stem(goal.Target.Figure).Replace('_', ' ')}: {at}"
            : "best point";
        yield return new Marker(best.Values[0], y, label) { Style = MarkerStyle.Highlight };
    }

    /// <summary>Points whose neighbours are gaps (the figure does not apply there): a line cannot show them, so they get a ring.</summary>
    static IEnumerable<Marker> IsolatedPoints(Rendering.PlotSeries s)
    {
        for (int i = 0; i < s.Y.Length; i++)
        {
            bool before = i > 0 && double.IsFinite(s.Y[i - 1]), after = i < s.Y.Length - 1 && double.IsFinite(s.Y[i + 1]);
            if (double.IsFinite(s.Y[i]) && !before && !after) yield return new Marker(s.X[i], s.Y[i], s.Name);
        }
    }
}
