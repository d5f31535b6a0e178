using WaveSim.Core.Analysis;
using WaveSim.Core.Sweeps;

namespace WaveSim.Core.Tolerances;

/// <summary>The outcome of a tolerance run (or of one shard of it): every sample's key values and figures, in index order.</summary>
/// <param name="Keys">The varied keys, tolerances resolved.</param>
/// <param name="Nominal">Each key's scenario value, SI.</param>
/// <param name="Probes">Probe names, matching each point's figures.</param>
/// <param name="Points">One result per sample (or corner) held, in index order.</param>
/// <param name="Corners">True for a corner run (sample 0 is nominal).</param>
public sealed record ToleranceResult(IReadOnlyList<ToleranceKey> Keys, IReadOnlyList<double> Nominal, IReadOnlyList<string> Probes,
    IReadOnlyList<SweepPointResult> Points, bool Corners)
{
    /// <summary>The value of <paramref name="target"/> at a sample, null where it does not apply.</summary>
    public double? Value(SweepPointResult point, ProbeFigure target)
    {
        ArgumentNullException.ThrowIfNull(point);
        ArgumentNullException.ThrowIfNull(target);
        int i = Probes.ToList().IndexOf(target.Probe);
        return i < 0 ? throw new InputException($"no probe named '{target.Probe}'; probes: {string.Join(", ", Probes)}") : point.Figures[i].GetNumber(target.Figure);
    }

    /// <summary>Every figure of every probe, in CSV column order.</summary>
    public IEnumerable<ProbeFigure> AllFigures() => Probes.SelectMany(p => SignalFigures.FigureNames.Select(f => new ProbeFigure(p, f)));

    /// <summary>True when the sample meets every limit (a figure that does not apply fails its limit).</summary>
    public bool Passes(SweepPointResult point, IReadOnlyList<SweepLimit> limits) => limits.All(l => l.IsMet(Value(point, l.Target)));
}
