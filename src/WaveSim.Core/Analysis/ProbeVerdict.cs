using WaveSim.Core.Model;

namespace WaveSim.Core.Analysis;

/// <summary>
/// A receiver's verdict over the whole record: its settled levels against the thresholds and every edge against the rules
/// of <see cref="ReceiverVerdict"/>. A probe that is not judged (no receiver there) has <see cref="Judged"/> false.
/// </summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="Judged">False when the probe is not judged: then every other member is empty.</param>
/// <param name="Thresholds">The receiver's thresholds, or null when judged at the mid level.</param>
/// <param name="MidV">The mid level used without thresholds (half-way between the driver's low and high), V.</param>
/// <param name="LowV">The settled level with the driver held low (DC solution), V.</param>
/// <param name="HighV">The settled level with the driver held high (DC solution), V.</param>
/// <param name="Edges">Every edge that reaches the probe within the record (empty for a bit pattern, judged on its eye).</param>
/// <param name="Failures">The rules missed, one per rule with its first edge; empty when the probe passes.</param>
/// <param name="Limits">The limits used.</param>
public sealed record ProbeVerdict(string Probe, bool Judged, ReceiverThresholds? Thresholds, double MidV, double? LowV, double? HighV,
    IReadOnlyList<EdgeVerdict> Edges, IReadOnlyList<VerdictFailure> Failures, VerdictLimits Limits)
{
    /// <summary>A probe that is not judged.</summary>
    public static ProbeVerdict NotJudged(string probe) => new(probe, false, null, 0, null, null, [], [], new VerdictLimits());

    /// <summary>Why a probe at a receiver could not be judged, or null.</summary>
    public string? Note { get; init; }

    /// <summary>True when judged and every rule holds; false when one is missed; null when not judged.</summary>
    public bool? Pass => Judged ? Failures.Count == 0 : null;

    /// <summary>The high threshold judged against: Vih, or the mid level.</summary>
    public double HighThresholdV => Thresholds?.Vih ?? MidV;

    /// <summary>The low threshold judged against: Vil, or the mid level.</summary>
    public double LowThresholdV => Thresholds?.Vil ?? MidV;

    /// <summary>Settled high level minus the high threshold, V (null when not judged).</summary>
    public double? MarginHighV => HighV is { } h ? h - HighThresholdV : null;

    /// <summary>The low threshold minus the settled low level, V.</summary>
    public double? MarginLowV => LowV is { } l ? LowThresholdV - l : null;

    /// <summary>
    /// The failures in one line, grouped by edge: "rx: settled low 828 mV is above VIL 800 mV (margin -28.3 mV); edge 1 (rising,
    /// source at 1.31 ns): overshoot 50.4 % > 10 %, settles in 13.1 ns > 5 ns"; "pass" when there are none.
    /// </summary>
    public string Summary()
    {
        if (!Judged) return Note ?? "not judged";
        if (Failures.Count == 0) return "pass";
        var groups = Failures.GroupBy(f => f.Edge).Select(g =>
        {
            var f0 = g.First();
            string where = f0.Edge is { } e
                ? $"edge {e} ({(f0.Rising == true ? "rising" : "falling")}, source at {Units.Quantity.Format(f0.AtS ?? 0, "s", 3)}): " : "";
            return where + string.Join(", ", g.Select(f => f.Detail + (f.MoreEdges > 0 ? $" (and {f.MoreEdges} later edge{(f.MoreEdges == 1 ? "" : "s")})" : "")));
        });
        return $"{Probe}: " + string.Join("; ", groups);
    }

    /// <summary>
    /// The "first-edge crossings" cell of the termination and report tables: how many times the first edge crosses the threshold
    /// band (rule 2's count, from the region the edge comes from; 1 is right), and beside it the settled level that misses its
    /// threshold (rule 1) when one does, since such a receiver cannot register every edge whatever the count shows
    /// ("1; low 828 mV above VIL 800 mV", "3 (1 expected)"). "-" when not judged or judged on an eye.
    /// </summary>
    public string FirstEdgeCrossingsText()
    {
        if (!Judged || Edges.Count == 0) return "-";
        int n = Edges[0].Crossings;
        string count = n.ToString(System.Globalization.CultureInfo.InvariantCulture) + (n == 1 ? "" : " (1 expected)");
        string hi = Thresholds is null ? "the mid level" : "VIH", lo = Thresholds is null ? "the mid level" : "VIL";
        var levels = new List<string>();
        if (MarginLowV < 0) levels.Add($"low {V(LowV!.Value)} above {lo} {V(LowThresholdV)}");
        if (MarginHighV < 0) levels.Add($"high {V(HighV!.Value)} below {hi} {V(HighThresholdV)}");
        return levels.Count == 0 ? count : count + "; " + string.Join(", ", levels);
    }

    static string V(double v) => Units.Quantity.Format(v, "V", 3);

    /// <summary>True when the rule was judged and missed.</summary>
    public bool Missed(VerdictRule rule) => Failures.Any(f => f.Rule == rule);

    /// <summary>The verdict of one rule: true held, false missed, null not judged at this probe.</summary>
    public bool? Holds(VerdictRule rule)
    {
        if (!Judged) return null;
        if (Missed(rule)) return false;
        bool eyeOnly = Edges.Count == 0;
        return rule switch
        {
            VerdictRule.Eye => eyeOnly ? true : null,
            VerdictRule.Levels => LowV is not null ? true : null,
            _ => eyeOnly ? null : true,
        };
    }
}
