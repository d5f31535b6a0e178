using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Times in a scenario that are wildly out of scale with the net or the record: the mark of a unit slip (<c>0.8 ms</c> for
/// <c>0.8 ns</c>), which would otherwise run and print only "-" figures. The thresholds are in docs/warnings.md.
/// </summary>
public static class TimeScaleWarnings
{
    /// <summary>An edge slower than this many times the net's total delay shows no line effect at all.</summary>
    public const double SlowEdgeFactor = 1e3;
    /// <summary>A duration longer than this many times every time in the net and the source is warned about.</summary>
    public const double LongRecordFactor = 1e4;
    /// <summary>A time shorter than this fraction of the larger of the net's delay and the duration is warned about.</summary>
    public const double TinyFactor = 1e-6;
    /// <summary>An output step coarser than this fraction of the duration leaves too few rows to read figures from.</summary>
    public const double CoarseOutputFraction = 0.1;

    /// <summary>The time-scale warnings of <paramref name="s"/>, source keys first.</summary>
    public static IReadOnlyList<ScenarioWarning> For(Scenario s)
    {
        var list = new List<ScenarioWarning>();
        var src = s.Source;
        double d = s.Simulation.Duration;
        double net = Solver.GridPlan.AllSegments(s.Line, "line").Sum(x => x.Seg.Delay);
        string D = Quantity.Format(d, "s"), N = Quantity.Format(net, "s");
        static string F(double t) => Quantity.Format(t, "s");
        void Add(string key, string message) => list.Add(new ScenarioWarning(key, message));

        // The times the waveform uses, by key.
        var times = new List<(string Key, double Value)>();
        bool edges = Solver.EdgeLimit.HasRampedEdges(src);
        if (edges) times.Add(("source.rise", src.Rise));
        if (edges && src.Waveform != WaveformKind.Step && src.Fall != src.Rise) times.Add(("source.fall", src.Fall));
        if (src.Waveform is WaveformKind.Pulse or WaveformKind.Trapezoid or WaveformKind.Gaussian) times.Add(("source.width", src.Width));
        if (src.Waveform is WaveformKind.Trapezoid or WaveformKind.Sine) times.Add(("source.period", src.Period));
        if (src.Waveform == WaveformKind.Bits) times.Add(("source.bit_time", src.BitTime));

        foreach (var (key, t) in times)
        {
            bool edge = key is "source.rise" or "source.fall";
            string what = key == "source.period" ? "the period (or 1/frequency)" : key["source.".Length..].Replace('_', ' ');
            if (t > d)
                Add(key, edge ? $"{F(t)} is longer than the whole duration {D} (simulation.duration): the edge does not finish within the record and its figures will be missing; is the unit right?"
                              : $"{what} {F(t)} is longer than the whole duration {D} (simulation.duration): the record holds less than one of it; is the unit right?");
            else if (edge && t > SlowEdgeFactor * net)
                Add(key, $"{F(t)} is more than 1000 times the net's total delay {N}: the net is electrically tiny at this edge and shows no line effect; is the unit right?");
            if (t > 0 && t < TinyFactor * Math.Max(net, d))
                Add(key, $"{what} {F(t)} is less than 10^-6 of the larger of the net's total delay {N} and the duration {D}; is the unit right?");
        }
        if (src.Delay >= d)
            Add("source.delay", $"{F(src.Delay)} is at or after the end of the record {D} (simulation.duration): the source never moves; is the unit right?");

        double longest = Math.Max(net, times.Select(x => x.Value).Append(src.Delay).Max());
        if (d > LongRecordFactor * longest)
            Add("simulation.duration", $"{D} is more than 10^4 times the longest time in the net and the source ({F(longest)}): almost all of the record is after everything has settled; is the unit right?");
        if (s.Simulation.OutputStep is { } h)
        {
            if (h > CoarseOutputFraction * d)
                Add("simulation.output_step", $"{F(h)} leaves fewer than 11 rows over the duration {D}: the waveform and its figures cannot be resolved; is the unit right?");
            else if (h < TinyFactor * Math.Max(net, d))
                Add("simulation.output_step", $"{F(h)} is less than 10^-6 of the larger of the net's total delay {N} and the duration {D}; is the unit right?");
        }
        return list;
    }
}
