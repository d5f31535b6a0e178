using WaveSim.Core.Model;

namespace WaveSim.Core.Analysis;

/// <summary>The driver's levels and the edges of its open-circuit waveform within a record.</summary>
public static class SourceEdgeFinder
{
    /// <summary>
    /// The driver's lower and higher levels (a table's lowest and highest value), V. A driver that idles high (source.low, its
    /// initial level, above source.high) still has its low level below its high one.
    /// </summary>
    public static (double Low, double High) Levels(SourceSpec src) =>
        src.Waveform == WaveformKind.Table && src.TableVolts.Length > 0 ? (src.TableVolts.Min(), src.TableVolts.Max())
            : (Math.Min(src.Low, src.High), Math.Max(src.Low, src.High));

    /// <summary>
    /// The source's edges within the record <paramref name="time"/>, as they leave the driver (<see cref="SourceEdge.DelayS"/> 0):
    /// crossings of its mid level by the open-circuit waveform sampled on those instants (linear interpolation between them),
    /// each starting half its 0-100 % length before that instant. The length is the edge's own after widening
    /// (<see cref="SourceWaveform.EdgeLength"/>: 1.25 × its 10-90 time, or the Gaussian-filtered step's 8σ when shorter than the
    /// run's minimum edge, a fall of 0 included); a table, Gaussian or sine source has no ramp, so its edges start at the crossing.
    /// </summary>
    public static IReadOnlyList<SourceEdge> Find(SourceSpec src, double[] time)
    {
        var (lo, hi) = Levels(src);
        double mid = 0.5 * (lo + hi);
        var list = new List<SourceEdge>();
        double prev = src.Value(time[0]);
        int side = Math.Sign(prev - mid);
        for (int k = 1; k < time.Length; k++)
        {
            double v = src.Value(time[k]);
            int sd = Math.Sign(v - mid);
            if (sd != 0 && side != 0 && sd != side)
            {
                bool rising = sd > 0;
                // Interpolate between the last sample on the old side and this one.
                double t = time[k - 1] + (mid - prev) / (v - prev) * (time[k] - time[k - 1]);
                // The rise is the edge from source.low to source.high, whichever way that goes in volts.
                bool towardHigh = rising == (src.High >= src.Low);
                double length = Ramped(src) ? SourceWaveform.EdgeLength(src, towardHigh ? src.Rise : src.Fall) : 0;
                list.Add(new SourceEdge(rising, t, t - length / 2, 0));
            }
            if (sd != 0) side = sd;
            prev = v;
        }
        return list;
    }

    static bool Ramped(SourceSpec src) => src.Waveform is WaveformKind.Step or WaveformKind.Pulse or WaveformKind.Trapezoid or WaveformKind.Bits;

    /// <summary>The edges as they reach a probe <paramref name="delay"/> after the driver, those whose middle falls by <paramref name="end"/>.</summary>
    public static SourceEdge[] AtProbe(IReadOnlyList<SourceEdge> edges, double delay, double end) =>
        edges.Where(e => e.SourceMidS + delay <= end).Select(e => e with { StartS = e.StartS + delay, DelayS = delay }).ToArray();
}
