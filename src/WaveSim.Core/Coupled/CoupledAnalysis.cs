using WaveSim.Core.Analysis;

namespace WaveSim.Core.Coupled;

/// <summary>
/// The analysis of a coupled run: the single-line signal figures for every probe (<see cref="SignalQuality"/>), timed from
/// the first source's first edge, and the crosstalk peak of every probe on a quiet conductor.
/// </summary>
public static class CoupledAnalysis
{
    /// <summary>Analyses a finished run.</summary>
    public static CoupledOutcome Analyse(CoupledResult r, double settleBand = SignalQualityOptions.DefaultSettleBand)
    {
        ArgumentNullException.ThrowIfNull(r);
        var s = r.Scenario;
        var first = s.Sources.FirstOrDefault();
        var figures = r.Probes.Select((p, k) => new ProbeFigures(p, SignalQuality.Compute(r.FigureTime, p.FigureVolts, new SignalQualityOptions
        {
            SettleBand = settleBand,
            SourceEdgeTimeS = first?.Spec.FirstEdgeMidpoint,
            LineDelayS = DelayTo(r, s.Probes[k]),
        }))).ToList();
        double swing = s.Sources.Select(x => x.Swing).DefaultIfEmpty(0).Max();
        var xt = new List<CrosstalkPeak>();
        for (int k = 0; k < s.Probes.Count; k++)
        {
            var spec = s.Probes[k];
            if (spec.Minus is not null || s.IsDriven(spec.Conductor)) continue;
            xt.Add(Peak(spec.Name, r.FigureTime, r.Probes[k].FigureVolts, swing));
        }
        return new CoupledOutcome { Result = r, Figures = figures, Crosstalk = xt };
    }

    /// <summary>The signed largest excursion from the first sample, its share of <paramref name="swing"/> and its instant.</summary>
    public static CrosstalkPeak Peak(string name, double[] time, double[] volts, double swing)
    {
        ArgumentNullException.ThrowIfNull(time);
        ArgumentNullException.ThrowIfNull(volts);
        double start = volts[0], peak = 0, at = 0;
        for (int i = 0; i < volts.Length; i++)
            if (Math.Abs(volts[i] - start) > Math.Abs(peak)) { peak = volts[i] - start; at = time[i]; }
        return new CrosstalkPeak(name, peak, swing > 0 ? 100 * Math.Abs(peak) / swing : 0, at);
    }

    /// <summary>The delay from the near end to the probe at the fastest mode's velocity, s (where settling starts counting).</summary>
    static double DelayTo(CoupledResult r, CoupledProbe p)
    {
        double z = p.Anchor switch { CoupledAnchor.Near => 0, CoupledAnchor.Far => r.Scenario.Length, _ => p.Distance }, d = 0;
        foreach (var sp in r.Plan.Sections)
        {
            double take = Math.Clamp(z, 0, sp.Section.Length);
            d += take / sp.Modes.Fastest;
            z -= take;
        }
        return d;
    }
}
