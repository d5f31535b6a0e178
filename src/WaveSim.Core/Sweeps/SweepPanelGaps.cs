using WaveSim.Core.Analysis;

namespace WaveSim.Core.Sweeps;

/// <summary>
/// The panels a sweep chart leaves out: a probe where the figure applies at no point of the sweep would get an empty panel
/// with an axis made up for no data, so it gets none, and the summary says why instead.
/// </summary>
public static class SweepPanelGaps
{
    /// <summary>True when <paramref name="figure"/> has a value at <paramref name="probe"/> at one point of the sweep at least.</summary>
    public static bool HasData(SweepResult r, string probe, string figure)
    {
        var target = new ProbeFigure(probe, figure);
        return r.Points.Any(p => r.Value(p, target) is { } v && double.IsFinite(v));
    }

    /// <summary>
    /// One line per probe whose panel the chart of <paramref name="figure"/> leaves out, in probe order, naming the probe and
    /// why the figure does not apply, e.g. "drv: rise 10 90 applies at no point (its first edge falls)". Empty when every
    /// probe has a panel.
    /// </summary>
    public static IReadOnlyList<string> LeftOut(SweepResult r, string figure)
    {
        var lines = new List<string>();
        for (int i = 0; i < r.Probes.Count; i++)
        {
            string probe = r.Probes[i];
            if (HasData(r, probe, figure)) continue;
            var reasons = r.Points.Select(p => Why(p.Figures[i], figure)).Distinct().ToList();
            string why = reasons.Count <= 2 ? string.Join("; at other points ", reasons) : "for several reasons; see sweep.csv";
            lines.Add($"{probe}: {FigureSelector.Stem(figure).Replace('_', ' ')} applies at no point ({why})");
        }
        return lines;
    }

    /// <summary>Why <paramref name="figure"/> is null in <paramref name="f"/>, in the terms of the figure definitions in docs/signal-figures.md.</summary>
    static string Why(SignalFigures f, string figure)
    {
        if (figure is "noise_margin_high_V" or "noise_margin_low_V" && !f.HasThresholds) return "the probe has no receiver thresholds";
        if (f.Rising is null) return "no edge: the probe settles at the level it starts from";
        if (figure == "rise_10_90_s" && f.Rising == false) return "its first edge falls; see fall_90_10";
        if (figure == "fall_90_10_s" && f.Rising == true) return "its first edge rises; see rise_10_90";
        if (f.OvershootPct is null) return "its first edge never gets half way to the level it settles to";
        return figure switch
        {
            "settling_s" => "it is still outside the settling band at the end of the record",
            "rise_10_90_s" or "fall_90_10_s" => "its first edge does not pass both 10 % and 90 % of the swing",
            "delay_50_s" => "the source has no edge instant to measure from",
            "monotonic" => "no edge passes through the 10 %-90 % band",
            _ => "the figure does not apply",
        };
    }
}
