using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>
/// Gathers what <see cref="ReceiverVerdict"/> needs from a run (each receiver's settled levels from the DC solution, the source's
/// edges delayed to the probe, the eye of a bit pattern) and judges every probe at a load that has receiver thresholds.
/// <see cref="RunAnalysis"/> judges through here for every command (<c>run</c>, <c>terminations</c>, <c>report</c>), so they cannot disagree.
/// </summary>
public static class RunVerdicts
{
    /// <summary>One verdict per probe, in probe order; probes without receiver thresholds are not judged, except <paramref name="atMidLevel"/>.</summary>
    /// <param name="r">The run.</param>
    /// <param name="edges">The source's edges on the figure record (<see cref="SourceEdgeFinder.Find"/> of <see cref="SimulationResult.FigureTime"/>).</param>
    /// <param name="limits">The limits.</param>
    /// <param name="eyes">For a bit pattern, the eyes of <see cref="RunEyes.Compute"/>; ignored otherwise.</param>
    /// <param name="atMidLevel">The index of a probe to judge at the mid level when it has no receiver thresholds, or null.</param>
    public static IReadOnlyList<ProbeVerdict> Judge(SimulationResult r, IReadOnlyList<SourceEdge> edges, VerdictLimits limits,
        IReadOnlyList<ProbeEye> eyes, int? atMidLevel = null)
    {
        var s = r.Scenario;
        var (lo, hi) = SourceEdgeFinder.Levels(s.Source);
        double mid = 0.5 * (lo + hi);
        bool bits = RunEyes.Applies(s);
        double[]? low = null, high = null;
        bool dcTried = false;
        var list = new List<ProbeVerdict>(s.Probes.Count);
        for (int i = 0; i < s.Probes.Count; i++)
        {
            var spec = s.Probes[i];
            var rx = NetPaths.ReceiverAt(s, spec);
            if (spec.Anchor != ProbeAnchor.Load || (rx is null && atMidLevel != i)) { list.Add(ProbeVerdict.NotJudged(spec.Name)); continue; }
            if (!dcTried) { low = LoadDcLevels.At(s, r.Plan, lo); high = LoadDcLevels.At(s, r.Plan, hi); dcTried = true; }
            if (low is null || high is null)
            {
                list.Add(ProbeVerdict.NotJudged(spec.Name) with { Note = "not judged: the network has no DC solution, so its settled levels are unknown" });
                continue;
            }
            // The figure record (the solver's steps), never the thinned output record: output_step must not move a verdict.
            var delayed = SourceEdgeFinder.AtProbe(edges, NetPaths.DelayTo(s, spec), r.FigureTime[^1]);
            EyeJudgement? eye = null;
            if (bits && eyes.FirstOrDefault(x => x.Probe.Name == spec.Name) is { } pe) eye = new EyeJudgement(pe.Diagram?.Figures, pe.Note);
            else if (bits) eye = new EyeJudgement(null, "no eye at this probe");
            var p = r.Probes[i];
            list.Add(ReceiverVerdict.Judge(p.Name, r.FigureTime, p.FigureVolts, rx, mid, low[i], high[i], delayed, limits, eye));
        }
        return list;
    }

    /// <summary>
    /// The instant the source's second edge starts at probe <paramref name="probe"/>, s: the end of the window its first-edge
    /// figures are measured in. Null when the record holds no second edge. <paramref name="edges"/> from <see cref="SourceEdgeFinder.Find"/>.
    /// </summary>
    internal static double? NextEdgeStart(Scenario s, int probe, IReadOnlyList<SourceEdge> edges) =>
        edges.Count >= 2 ? edges[1].StartS + NetPaths.DelayTo(s, s.Probes[probe]) : null;
}
