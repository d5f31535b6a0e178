using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>
/// Eye diagrams of a run whose source is a bit pattern: every probe folded at the bit time, with bit 0 placed at the
/// source's delay plus the line's delay to the probe (then centred between the measured crossings), and the first max(2 bit times, 2 × the total line delay) left out
/// so that the line has filled and the first reflections have died down (common practice, no source).
/// </summary>
public static class RunEyes
{
    /// <summary>True when the scenario's source is a bit pattern.</summary>
    public static bool Applies(Scenario s) => s.Source.Waveform == WaveformKind.Bits && s.Source.BitTime > 0;

    /// <summary>The start-up time left out: max(2 bit times, 2 × the total delay of every segment of the net), s.</summary>
    public static double SkipTime(Scenario s) => Math.Max(2 * s.Source.BitTime, 2 * NetPaths.TotalDelay(s.Line));

    /// <summary>An eye per probe, in the scenario's probe order; empty unless <see cref="Applies"/>.</summary>
    public static IReadOnlyList<ProbeEye> Compute(SimulationResult r)
    {
        var s = r.Scenario;
        if (!Applies(s)) return [];
        double skip = SkipTime(s);
        var list = new List<ProbeEye>();
        for (int i = 0; i < r.Probes.Count; i++)
        {
            var spec = s.Probes[i];
            var rx = NetPaths.ReceiverAt(s, spec);
            // The figure record, not the thinned output record: output_step must not move the eye's edges.
            double start = AlignedStart(r.FigureTime, r.Probes[i].FigureVolts, s.Source.Delay + NetPaths.DelayTo(s, spec), s.Source.BitTime, skip);
            try
            {
                var eye = EyeAnalysis.Compute(r.FigureTime, r.Probes[i].FigureVolts, s.Source.BitTime, start, rx?.Vih, rx?.Vil, skip);
                list.Add(new ProbeEye(r.Probes[i], eye, rx, start, skip, null));
            }
            catch (InputException ex)
            {
                list.Add(new ProbeEye(r.Probes[i], null, rx, start, skip, ex.Message));
            }
        }
        return list;
    }

    /// <summary>
    /// The bit-0 start moved by the mean phase of the waveform's crossings of its mid level (after the skip), so that the
    /// eye is centred between the crossings even when the edges are slowed or delayed by loads (common practice, no source).
    /// The mean is taken on the circle (phases modulo one bit time), so crossings either side of a bit boundary average right.
    /// Without crossings the start is <paramref name="nominal"/>.
    /// </summary>
    public static double AlignedStart(double[] time, double[] volts, double nominal, double bitTime, double skip)
    {
        int from = Array.FindIndex(time, t => t >= nominal + skip);
        if (from < 0 || from >= time.Length - 1) return nominal;
        double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
        for (int k = from; k < volts.Length; k++) { lo = Math.Min(lo, volts[k]); hi = Math.Max(hi, volts[k]); }
        double mid = 0.5 * (lo + hi), sin = 0, cos = 0;
        for (int k = from + 1; k < volts.Length; k++)
        {
            if ((volts[k - 1] < mid) == (volts[k] < mid)) continue;
            double t = time[k - 1] + (mid - volts[k - 1]) / (volts[k] - volts[k - 1]) * (time[k] - time[k - 1]);
            double phase = 2 * Math.PI * (t - nominal) / bitTime;
            sin += Math.Sin(phase); cos += Math.Cos(phase);
        }
        if (sin == 0 && cos == 0) return nominal;
        return nominal + Math.Atan2(sin, cos) / (2 * Math.PI) * bitTime;
    }
}
