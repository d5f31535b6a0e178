using WaveSim.Core.Analysis;

namespace WaveSim.Core.Sweeps;

/// <summary>One point's outcome.</summary>
/// <param name="Index">Position in sweep order.</param>
/// <param name="Values">The varied keys' SI values, in axis order.</param>
/// <param name="Figures">Signal figures per probe, in the scenario's probe order.</param>
public sealed record SweepPointResult(int Index, IReadOnlyList<double> Values, IReadOnlyList<SignalFigures> Figures)
{
    /// <summary>The point's probe voltages thinned for drawing (<see cref="SweepRunOptions.WaveformColumns"/>), or null when not kept.</summary>
    public SweepWaveforms? Waveforms { get; init; }
}

/// <summary>A point's probe voltages thinned to min/max pairs per column (<see cref="Rendering.MinMaxColumns"/>).</summary>
/// <param name="Time">The kept instants, s.</param>
/// <param name="Volts">Per probe, in probe order, the voltage at those instants, V.</param>
public sealed record SweepWaveforms(double[] Time, double[][] Volts);

/// <summary>The outcome of a sweep: every point's figures, in sweep order.</summary>
/// <param name="Axes">The varied keys.</param>
/// <param name="Probes">Probe names, matching each point's <see cref="SweepPointResult.Figures"/>.</param>
/// <param name="Points">One result per point, in sweep order.</param>
public sealed record SweepResult(IReadOnlyList<SweepAxis> Axes, IReadOnlyList<string> Probes, IReadOnlyList<SweepPointResult> Points)
{
    /// <summary>The value of <paramref name="target"/> at a point, null where it does not apply.</summary>
    public double? Value(SweepPointResult point, ProbeFigure target)
    {
        int i = Probes.ToList().IndexOf(target.Probe);
        if (i < 0) throw new InputException($"no probe named '{target.Probe}'; probes: {string.Join(", ", Probes)}");
        return point.Figures[i].GetNumber(target.Figure);
    }

    /// <summary>
    /// The point that best meets <paramref name="goal"/> among those meeting every limit (points where the goal's
    /// figure does not apply are skipped); the earliest point wins a tie. Null when no point qualifies.
    /// </summary>
    public SweepPointResult? Best(SweepGoal goal, IReadOnlyList<SweepLimit> limits)
    {
        SweepPointResult? best = null;
        double bestValue = 0;
        foreach (var p in Points)
        {
            if (!limits.All(l => l.IsMet(Value(p, l.Target)))) continue;
            if (Value(p, goal.Target) is not { } v) continue;
            if (best is null || (goal.Maximise ? v > bestValue : v < bestValue)) { best = p; bestValue = v; }
        }
        return best;
    }
}
