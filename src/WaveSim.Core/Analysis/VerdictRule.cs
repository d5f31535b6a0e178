namespace WaveSim.Core.Analysis;

/// <summary>The rules a receiver is judged by (docs/verdicts.md states each one exactly).</summary>
public enum VerdictRule
{
    /// <summary>The settled high and low levels clear Vih and Vil (or the mid level) with a margin of zero or more.</summary>
    Levels,
    /// <summary>Each edge crosses the threshold band exactly once.</summary>
    Crossings,
    /// <summary>Each edge goes through the threshold band without turning back.</summary>
    Monotonic,
    /// <summary>After its crossing, an edge never comes back into the threshold band.</summary>
    Ringback,
    /// <summary>Each edge's overshoot beyond the level it settles to stays within the limit.</summary>
    Overshoot,
    /// <summary>Each edge settles within the limit, before the next edge (or the record's end).</summary>
    Settling,
    /// <summary>Bit patterns: the eye opens beyond the thresholds (or at the mid level).</summary>
    Eye,
}
