namespace WaveSim.Core.Analysis;

/// <summary>
/// What one edge did at one probe. Null members were not judged (e.g. ringback and monotonicity when the edge did not
/// cross the band exactly once, settling when the edge never reached its level).
/// </summary>
/// <param name="Index">The edge's number in the record, from 1.</param>
/// <param name="Edge">The source edge.</param>
/// <param name="Crossings">Transitions between the regions at or below the low threshold and at or above the high one inside the edge's window.</param>
/// <param name="ReversalV">Largest step back against the edge direction while crossing the band, V.</param>
/// <param name="RingbackMarginV">After the crossing: rising, the lowest value minus the high threshold; falling, the low threshold minus the highest value, V. Negative: back in the band.</param>
/// <param name="OvershootPct">Largest excursion beyond the level the edge settles to, % of the swing (≥ 0).</param>
/// <param name="SettlingS">Time from the edge's arrival at the probe (<see cref="SourceEdge.ArrivalMidS"/>) until the probe stays within the settling band, s; null when it does not settle in the window.</param>
/// <param name="WindowEndS">Where the edge's window ends: the next edge's start at the probe, or the record's end, s.</param>
/// <param name="Failed">The rules this edge missed.</param>
public sealed record EdgeVerdict(int Index, SourceEdge Edge, int Crossings, double? ReversalV, double? RingbackMarginV, double? OvershootPct,
    double? SettlingS, double WindowEndS, IReadOnlyList<VerdictRule> Failed);
