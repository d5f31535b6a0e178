using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Output;

/// <summary>
/// Gathers what <see cref="ReceiverVerdict"/> needs from a run (each receiver's settled levels from the DC solution, the source's
/// edges delayed to the probe, the eye of a bit pattern) and judges every probe at a load that has receiver thresholds.
/// Both <c>terminations</c> and <c>report</c> judge through here, so the two cannot disagree.
/// </summary>
public static class RunVerdicts
{
    /// <summary>One verdict per probe, in probe order; probes without receiver thresholds are not judged, except <paramref name="atMidLevel"/>.</summary>
    /// <param name="r">The run.</param>
    /// <param name="limits">The limits; null for the defaults.</param>
    /// <param name="eyes">For a bit pattern, the eyes of <see cref="RunEyes.Compute"/> (computed here when null).</param>
    /// <param name="atMidLevel">The index of a probe to judge at the mid level when it has no receiver thresholds, or null.</param>
    public static IReadOnlyList<ProbeVerdict> Judge(SimulationResult r, VerdictLimits? limits = null, IReadOnlyList<ProbeEye>? eyes = null, int? atMidLevel = null)
    {
        limits ??= new VerdictLimits();
        var s = r.Scenario;
        var (lo, hi) = SourceLevels(s.Source);
        double mid = 0.5 * (lo + hi);
        bool bits = RunEyes.Applies(s);
        if (bits) eyes ??= RunEyes.Compute(r);
        double[]? low = null, high = null;
        bool dcTried = false;
        // The figure record (the solver's steps), never the thinned output record: output_step must not move a verdict.
        var edges = SourceEdges(s.Source, r.FigureTime);
        var list = new List<ProbeVerdict>(s.Probes.Count);
        for (int i = 0; i < s.Probes.Count; i++)
        {
            var spec = s.Probes[i];
            var rx = spec.Anchor == ProbeAnchor.Load ? RunSummary.LoadOf(s, spec.BranchPath).Receiver : null;
            if (spec.Anchor != ProbeAnchor.Load || (rx is null && atMidLevel != i)) { list.Add(ProbeVerdict.NotJudged(spec.Name)); continue; }
            if (!dcTried) { low = LoadDcLevels.At(s, r.Plan, lo); high = LoadDcLevels.At(s, r.Plan, hi); dcTried = true; }
            if (low is null || high is null)
            {
                list.Add(ProbeVerdict.NotJudged(spec.Name) with { Note = "not judged: the network has no DC solution, so its settled levels are unknown" });
                continue;
            }
            double delay = RunEyes.DelayTo(s.Line, spec, 0), end = r.FigureTime[^1];
            var delayed = edges.Where(e => e.Mid + delay <= end)
                .Select(e => new SourceEdge(e.Rising, e.Mid, e.Start + delay, delay)).ToArray();
            EyeJudgement? eye = null;
            if (bits && eyes!.FirstOrDefault(x => x.Probe.Name == spec.Name) is { } pe) eye = new EyeJudgement(pe.Diagram?.Figures, pe.Note);
            else if (bits) eye = new EyeJudgement(null, "no eye at this probe");
            var p = r.Probes[i];
            list.Add(ReceiverVerdict.Judge(p.Name, r.FigureTime, p.FigureVolts, rx, mid, low[i], high[i], delayed, limits, eye));
        }
        return list;
    }

    /// <summary>
    /// The instant the source's second edge starts at probe <paramref name="probe"/>, s: the end of the window its first-edge
    /// figures are measured in. Null when the record holds no second edge. <paramref name="edges"/> from <see cref="SourceEdges"/>.
    /// </summary>
    internal static double? NextEdgeStart(Scenario s, int probe, IReadOnlyList<(bool Rising, double Mid, double Start)> edges) =>
        edges.Count >= 2 ? edges[1].Start + RunEyes.DelayTo(s.Line, s.Probes[probe], 0) : null;

    /// <summary>
    /// The driver's lower and higher levels (a table's lowest and highest value), V. A driver that idles high (source.low, its
    /// initial level, above source.high) still has its low level below its high one.
    /// </summary>
    public static (double Low, double High) SourceLevels(SourceSpec src) =>
        src.Waveform == WaveformKind.Table && src.TableVolts.Length > 0 ? (src.TableVolts.Min(), src.TableVolts.Max())
            : (Math.Min(src.Low, src.High), Math.Max(src.Low, src.High));

    /// <summary>
    /// The source's edges within the record: crossings of its mid level by the open-circuit waveform sampled on the output
    /// instants (linear interpolation between them), each starting half its ramp before that instant.
    /// </summary>
    internal static List<(bool Rising, double Mid, double Start)> SourceEdges(SourceSpec src, double[] time)
    {
        var (lo, hi) = SourceLevels(src);
        double mid = 0.5 * (lo + hi);
        var list = new List<(bool, double, double)>();
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
                // The rise is the ramp from source.low to source.high, whichever way that goes in volts.
                bool towardHigh = rising == (src.High >= src.Low);
                double ramp = src.Waveform == WaveformKind.Table ? 0 : 1.25 * (towardHigh ? src.Rise : (src.Fall > 0 ? src.Fall : src.Rise));
                list.Add((rising, t, t - ramp / 2));
            }
            if (sd != 0) side = sd;
            prev = v;
        }
        return list;
    }
}
