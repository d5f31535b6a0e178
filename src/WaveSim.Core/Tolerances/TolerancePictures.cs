using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Units;

namespace WaveSim.Core.Tolerances;

/// <summary>Charts of a tolerance run as Rendering's plain data: a histogram of a limited figure with its limit, and the figure against its most influential key.</summary>
public static class TolerancePictures
{
    /// <summary>
    /// Bins for n values: ⌈log2 n⌉ + 1 (H. A. Sturges, "The choice of a class interval", J. Am. Stat. Assoc. 21, 1926),
    /// at least 5 and at most 50.
    /// </summary>
    public static int Bins(int n) => Math.Clamp((int)Math.Ceiling(Math.Log2(Math.Max(n, 1))) + 1, 5, 50);

    /// <summary>The histogram of the limit's figure (samples where it applies), drawn as a step outline, with the limit as a dashed vertical line; null when no sample has a value.</summary>
    public static ChartSpec? Histogram(ToleranceResult r, SweepLimit limit)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limit);
        var values = r.Points.Select(p => r.Value(p, limit.Target)).OfType<double>().ToArray();
        if (values.Length == 0) return null;
        string unit = FigureSelector.Unit(limit.Target.Figure);
        double bound = limit.Bound;
        var si = values.Select(v => v).ToArray();
        // The bins span the samples only; the axis adds the limit and a margin so neither sits on the frame.
        double lo = si.Min(), hi = si.Max();
        if (!(hi > lo)) { double pad = lo == 0 ? 1e-12 : Math.Abs(lo) * 0.01; lo -= pad; hi += pad; }
        double shownLo = Math.Min(lo, bound), shownHi = Math.Max(hi, bound), margin = 0.04 * (shownHi - shownLo);
        int bins = Bins(si.Length);
        var counts = new double[bins];
        foreach (double v in si) counts[Math.Min((int)((v - lo) / (hi - lo) * bins), bins - 1)]++;
        var x = new List<double>();
        var y = new List<double>();
        for (int b = 0; b < bins; b++)
        {
            double a = lo + (hi - lo) * b / bins, e = lo + (hi - lo) * (b + 1) / bins;
            x.AddRange([a, a, e, e]);
            y.AddRange([0, counts[b], counts[b], 0]);
        }
        string name = Name(limit.Target);
        var samples = new PlotSeries($"{name} ({si.Length} samples)", [.. x], [.. y]);
        var line = new PlotSeries($"limit {limit}", [bound, bound], [0, counts.Max()]) { Look = TraceLook.Dashed };
        return new ChartSpec($"{name}: distribution over {si.Length} samples", name, unit,
            [new ChartPanel("Samples", "", [samples, line])]) { XRange = new AxisRange(shownLo - margin, shownHi + margin) };
    }

    /// <summary>The limit's figure against <paramref name="keyIndex"/>'s values, one ring per sample, the limit as a horizontal line; null when no sample has a value.</summary>
    public static ChartSpec? Scatter(ToleranceResult r, SweepLimit limit, int keyIndex)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limit);
        string unit = FigureSelector.Unit(limit.Target.Figure);
        var pts = r.Points.Where(p => r.Value(p, limit.Target) is not null)
            .Select(p => (X: r.Keys[keyIndex].Distribution.RankValue(p.Values[keyIndex]), Y: r.Value(p, limit.Target)!.Value)).OrderBy(p => p.X).ToArray();
        if (pts.Length == 0) return null;
        var key = r.Keys[keyIndex];
        string keyUnit = Scenarios.ScenarioKeys.Unit(key.Distribution.Dimension) is var u && u == "ohm" ? "\u03a9" : Scenarios.ScenarioKeys.Unit(key.Distribution.Dimension);
        // The series only sets the axes and the legend: every point lies between gaps, so only its ring is drawn.
        var xs = pts.SelectMany(p => new[] { p.X, p.X }).ToArray();
        var ys = pts.SelectMany(p => new[] { p.Y, double.NaN }).ToArray();
        string name = Name(limit.Target);
        var panel = new ChartPanel(name, unit, [new PlotSeries($"{pts.Length} samples", xs, ys)])
        {
            Markers = [.. pts.Select(p => new Marker(p.X, p.Y, ""))],
            ReferenceLines = [new ReferenceLine(limit.Bound, $"limit {limit}")],
        };
        return new ChartSpec($"{name} against {key.KeyPath}", key.KeyPath, keyUnit, [panel]);
    }

    static string Name(ProbeFigure f) => $"{f.Probe} {FigureSelector.Stem(f.Figure).Replace('_', ' ')}";
}
