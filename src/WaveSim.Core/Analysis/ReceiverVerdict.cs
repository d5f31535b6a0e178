using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Analysis;

/// <summary>
/// The one place where a receiver is judged, edge by edge, for both <c>terminations</c> and <c>report</c>. A receiver passes
/// when its settled levels (the DC solution with the driver held low and held high) clear Vil and Vih with a margin of zero or
/// more, and every edge of the record, rising and falling, crosses the threshold band exactly once, monotonically, never comes
/// back into the band, overshoots by no more than the limit and settles within the limit before the next edge. Without receiver
/// thresholds the band shrinks to the mid level. A bit pattern is judged on its eye instead of edge by edge. docs/verdicts.md
/// states every rule; they are common practice (no source).
/// </summary>
public static class ReceiverVerdict
{
    /// <summary>The rule in one paragraph, as printed under the report's table.</summary>
    public const string RuleText =
        "A receiver passes when (1) its settled levels, from the DC solution with the driver held high and held low, clear Vih and Vil " +
        "with a margin of zero or more (the mid level between the driver's low and high when no receiver thresholds are given), and " +
        "on every edge of the record, rising and falling: (2) the edge crosses the threshold band between Vil and Vih exactly once, " +
        "(3) without turning back inside it by more than 1 % of the swing, (4) never comes back into the band before the next edge " +
        "(ringback), (5) overshoots the level it settles to by no more than the overshoot limit and (6) settles within the settling band " +
        "and limit, measured from the edge's arrival at the probe (the source edge's 50 % instant plus the line delay), before the next edge starts. A bit pattern is judged on its eye " +
        "instead of (2) to (6): its height and width against the thresholds must both be above zero. Common practice, no source; " +
        "docs/verdicts.md has the exact definitions.";

    /// <summary>Judges one probe's record.</summary>
    /// <param name="probe">The probe's name, for the failure texts.</param>
    /// <param name="time">Sample instants, s, strictly increasing.</param>
    /// <param name="volts">Samples, V.</param>
    /// <param name="thresholds">The receiver's thresholds, or null to judge at <paramref name="midV"/>.</param>
    /// <param name="midV">The mid level used without thresholds, V.</param>
    /// <param name="lowV">Settled level with the driver held low, V.</param>
    /// <param name="highV">Settled level with the driver held high, V.</param>
    /// <param name="edges">The source edges that reach the probe within the record, in time order (ignored for a bit pattern).</param>
    /// <param name="limits">The overshoot, settling and monotonicity limits.</param>
    /// <param name="eye">For a bit pattern: the probe's eye, judged instead of the edges.</param>
    /// <exception cref="InputException">The record is not a valid waveform.</exception>
    public static ProbeVerdict Judge(string probe, double[] time, double[] volts, ReceiverThresholds? thresholds, double midV,
        double lowV, double highV, IReadOnlyList<SourceEdge> edges, VerdictLimits limits, EyeJudgement? eye = null)
    {
        WaveformMath.ValidateRecord(time, volts);
        var failures = new List<VerdictFailure>();
        double hiTh = thresholds?.Vih ?? midV, loTh = thresholds?.Vil ?? midV;
        string hiName = thresholds is null ? "the mid level" : "VIH", loName = thresholds is null ? "the mid level" : "VIL";
        if (highV - hiTh < 0)
            failures.Add(new(probe, VerdictRule.Levels, null, null, null,
                $"settled high {V(highV)} is below {hiName} {V(hiTh)} (margin {V(highV - hiTh)})", 0));
        if (loTh - lowV < 0)
            failures.Add(new(probe, VerdictRule.Levels, null, null, null,
                $"settled low {V(lowV)} is above {loName} {V(loTh)} (margin {V(loTh - lowV)})", 0));
        double swing = highV - lowV;
        if (!(swing > 1e-9 * Math.Max(1, Math.Abs(highV))))
        {
            failures.Add(new(probe, VerdictRule.Levels, null, null, null, $"the settled levels do not differ (low {V(lowV)}, high {V(highV)})", 0));
            return new ProbeVerdict(probe, true, thresholds, midV, lowV, highV, [], failures, limits);
        }
        if (eye is not null)
        {
            if (eye.Failure() is { } why) failures.Add(new(probe, VerdictRule.Eye, null, null, null, why, 0));
            return new ProbeVerdict(probe, true, thresholds, midV, lowV, highV, [], failures, limits);
        }

        var judged = new List<EdgeVerdict>(edges.Count);
        var firsts = new Dictionary<VerdictRule, (EdgeVerdict Edge, string Detail, int Count)>();
        for (int k = 0; k < edges.Count; k++)
        {
            double end = k + 1 < edges.Count ? edges[k + 1].StartS : double.PositiveInfinity;
            var (ev, details) = JudgeEdge(k + 1, edges[k], end, time, volts, lowV, highV, loTh, hiTh, thresholds is null, limits);
            judged.Add(ev);
            foreach (var (rule, detail) in details)
                firsts[rule] = firsts.TryGetValue(rule, out var f) ? (f.Edge, f.Detail, f.Count + 1) : (ev, detail, 1);
        }
        if (edges.Count == 0)
            failures.Add(new(probe, VerdictRule.Crossings, null, null, null, "no edge of the source reaches the probe within the record", 0));
        foreach (var rule in Enum.GetValues<VerdictRule>())
            if (firsts.TryGetValue(rule, out var f))
                failures.Add(new(probe, rule, f.Edge.Index, f.Edge.Edge.Rising, f.Edge.Edge.SourceMidS, f.Detail, f.Count - 1));
        return new ProbeVerdict(probe, true, thresholds, midV, lowV, highV, judged, failures, limits);
    }

    static (EdgeVerdict, List<(VerdictRule, string)>) JudgeEdge(int index, SourceEdge edge, double windowEnd, double[] t, double[] v,
        double lowV, double highV, double loTh, double hiTh, bool mid, VerdictLimits limits)
    {
        int n = t.Length;
        int i0 = Array.BinarySearch(t, edge.StartS);
        i0 = i0 >= 0 ? i0 : Math.Min(n - 1, ~i0);
        int i1 = Math.Max(i0, WaveformMath.LowerBound(t, windowEnd) - 1);   // the last sample before the window ends
        bool rising = edge.Rising, lastEdge = double.IsPositiveInfinity(windowEnd);
        double swing = highV - lowV, target = rising ? highV : lowV;
        var failed = new List<(VerdictRule, string)>();
        string band = mid ? $"the mid level {V(hiTh)}" : $"the threshold band {V(loTh)} to {V(hiTh)}";

        // (2) Region changes between "at or below the low threshold" and "at or above the high one", starting from the edge's origin.
        int state = rising ? -1 : 1, crossings = 0, lastOld = i0, firstNew = -1;
        for (int i = i0; i <= i1; i++)
        {
            int region = v[i] <= loTh ? -1 : v[i] >= hiTh ? 1 : 0;
            if (region == 0) continue;
            if (region != state)
            {
                crossings++;
                if (crossings == 1) firstNew = i;
                state = region;
            }
            if (crossings == 0) lastOld = i;
        }
        if (crossings == 0) failed.Add((VerdictRule.Crossings, $"never crosses {band}"));
        else if (crossings > 1) failed.Add((VerdictRule.Crossings, $"crosses {band} {crossings} times (once expected)"));

        double? reversal = null, ringback = null;
        if (crossings == 1)
        {
            // (3) Monotonic through the band: the largest step back while crossing it.
            reversal = WaveformMath.LargestReversal(v, lastOld, firstNew, rising);
            double tolerance = limits.MonotonicTolerance * swing;
            if (reversal > tolerance)
                failed.Add((VerdictRule.Monotonic, $"turns back by {V(reversal.Value)} inside {band} (tolerance {V(tolerance)})"));
            // (4) Ringback: after the crossing the probe stays out of the band until the next edge. Any sample back in the band
            // fails; otherwise the margin is taken from the first peak on (right after the crossing the value is the threshold).
            double worst = v[firstNew];
            for (int i = firstNew; i <= i1; i++) worst = rising ? Math.Min(worst, v[i]) : Math.Max(worst, v[i]);
            if (rising ? worst >= hiTh : worst <= loTh)
            {
                int peak = firstNew;
                while (peak < i1 && (rising ? v[peak + 1] >= v[peak] : v[peak + 1] <= v[peak])) peak++;
                worst = v[peak];
                for (int i = peak; i <= i1; i++) worst = rising ? Math.Min(worst, v[i]) : Math.Max(worst, v[i]);
            }
            ringback = rising ? worst - hiTh : loTh - worst;
            if (ringback < 0)
                failed.Add((VerdictRule.Ringback, rising
                    ? $"rings back to {V(worst)} after crossing {(mid ? "the mid level" : "VIH")} {V(hiTh)} (margin {V(ringback.Value)})"
                    : $"rings back to {V(worst)} after crossing {(mid ? "the mid level" : "VIL")} {V(loTh)} (margin {V(ringback.Value)})"));
        }

        // (5) Overshoot beyond the level the edge settles to, % of the swing.
        double extreme = v[i0];
        for (int i = i0; i <= i1; i++) extreme = rising ? Math.Max(extreme, v[i]) : Math.Min(extreme, v[i]);
        double overshoot = Math.Max(0, (rising ? extreme - highV : lowV - extreme) / swing * 100);
        if (overshoot > limits.MaxOvershootPct)
            failed.Add((VerdictRule.Overshoot, $"overshoot {overshoot.ToString("F1", System.Globalization.CultureInfo.InvariantCulture)} % > {limits.MaxOvershootPct.ToString("G3", System.Globalization.CultureInfo.InvariantCulture)} %"));

        // (6) Settling: inside ±band·swing of the target from some instant to the window's end, measured from the edge's arrival at
        // the probe: the flight down the line is no ringing, and a long cable must not fail every termination.
        double half = limits.SettleBand * swing;
        double? settling = null;
        if (Math.Abs(v[i1] - target) > half)
            failed.Add((VerdictRule.Settling, $"does not settle within ±{Pct(limits.SettleBand)} of {V(target)} before {(lastEdge ? "the record ends" : "the next edge")}"));
        else
        {
            int lastOut = -1;
            for (int i = i1; i >= i0; i--) if (Math.Abs(v[i] - target) > half) { lastOut = i; break; }
            double settledAt = lastOut < 0 ? t[i0] : WaveformMath.CrossingTime(t, v, lastOut, v[lastOut] > target ? target + half : target - half);
            settling = Math.Max(0, settledAt - edge.ArrivalMidS);
            if (settling > limits.MaxSettlingS)
                failed.Add((VerdictRule.Settling, $"settles in {Quantity.Format(settling.Value, "s", 3)} after arriving > {Quantity.Format(limits.MaxSettlingS, "s", 3)}"));
        }
        var ev = new EdgeVerdict(index, edge, crossings, reversal, ringback, overshoot, settling, lastEdge ? t[n - 1] : windowEnd,
            failed.Select(f => f.Item1).ToArray());
        return (ev, failed);
    }

    static string V(double v) => Quantity.Format(v, "V", 3);
    static string Pct(double fraction) => (fraction * 100).ToString("G3", System.Globalization.CultureInfo.InvariantCulture) + " %";
}
