namespace WaveSim.Core.Analysis;

/// <summary>One rule a receiver missed.</summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="Rule">The rule missed.</param>
/// <param name="Edge">The first edge that missed it, counted from 1 in the record; null for a rule of the whole probe (levels, eye).</param>
/// <param name="Rising">That edge's direction; null without an edge.</param>
/// <param name="AtS">That edge's source 50 % instant, s; null without an edge.</param>
/// <param name="Detail">What was measured against what, e.g. "settled low 828 mV is above VIL 800 mV (margin -28.3 mV)".</param>
/// <param name="MoreEdges">How many later edges missed the same rule.</param>
public sealed record VerdictFailure(string Probe, VerdictRule Rule, int? Edge, bool? Rising, double? AtS, string Detail, int MoreEdges)
{
    /// <summary>One line: probe, edge, rule detail, e.g. "rx edge 2 (falling, source at 10.6 ns): crosses the band 3 times".</summary>
    public override string ToString()
    {
        string where = Edge is { } e
            ? $"{Probe} edge {e} ({(Rising == true ? "rising" : "falling")}, source at {Units.Quantity.Format(AtS ?? 0, "s", 3)})"
            : Probe;
        string more = MoreEdges > 0 ? $" (and {MoreEdges} later edge{(MoreEdges == 1 ? "" : "s")})" : "";
        return $"{where}: {Detail}{more}";
    }
}
