using System.Text.Json.Nodes;

namespace WaveSim.Core.Analysis;

/// <summary>
/// Signal-quality figures of one probe waveform, for its first edge and the level that edge settles to.
/// SI units; null where a figure does not apply (no edge, no threshold given, not settled in the record).
/// Definitions: docs/signal-figures.md and <see cref="SignalQuality.Compute"/>.
/// </summary>
public sealed record SignalFigures
{
    /// <summary>JSON / CSV names of the figures, in output order. Sweep CSV columns are "&lt;probe&gt;.&lt;name&gt;".</summary>
    public static IReadOnlyList<string> FigureNames { get; } =
    [
        "low_V", "high_V", "overshoot_pct", "undershoot_pct", "above_high_V", "below_low_V", "ringback_V", "rise_10_90_s", "fall_90_10_s",
        "delay_50_s", "settling_s", "monotonic", "threshold_crossings", "noise_margin_high_V", "noise_margin_low_V",
    ];

    /// <summary>The lower of the two settled levels [V] (initial and final of the first edge).</summary>
    public double? LowV { get; init; }

    /// <summary>The higher of the two settled levels [V].</summary>
    public double? HighV { get; init; }

    /// <summary>True for a rising first edge, false for falling, null when the waveform does not move.</summary>
    public bool? Rising { get; init; }

    /// <summary>True when the record returns to its initial level (a pulse); figures then describe the first edge and its plateau.</summary>
    public bool IsPulse { get; init; }

    /// <summary>Largest excursion beyond the final level in the edge direction after the edge, % of swing (≥ 0).</summary>
    public double? OvershootPct { get; init; }

    /// <summary>Largest excursion back past the final level (against the edge direction) after the overshoot peak, % of swing (≥ 0).</summary>
    public double? UndershootPct { get; init; }

    /// <summary>
    /// How far the whole record rises above <see cref="HighV"/> [V] (≥ 0): the worst excursion over every edge, not only the
    /// first, which is what a part's absolute maximum rating is checked against.
    /// </summary>
    public double? AboveHighV { get; init; }

    /// <summary>How far the whole record falls below <see cref="LowV"/> [V] (≥ 0), over every edge.</summary>
    public double? BelowLowV { get; init; }

    /// <summary>Largest peak-to-following-trough drop against the edge direction after the first threshold crossing [V] (≥ 0).</summary>
    public double? RingbackV { get; init; }

    /// <summary>10 % to 90 % transition duration of a rising first edge [s].</summary>
    public double? Rise1090S { get; init; }

    /// <summary>90 % to 10 % transition duration of a falling first edge [s].</summary>
    public double? Fall9010S { get; init; }

    /// <summary>First 50 % crossing minus the source's 50 % instant [s]; needs <see cref="SignalQualityOptions.SourceEdgeTimeS"/>.</summary>
    public double? Delay50S { get; init; }

    /// <summary>
    /// Time [s] from the edge's arrival at the probe (the source edge's 50 % instant plus <see cref="SignalQualityOptions.LineDelayS"/>;
    /// the first sample without a source edge instant) after which the waveform stays inside ±band·swing of the final level.
    /// </summary>
    public double? SettlingS { get; init; }

    /// <summary>True when no edge through the 10 %–90 % band reverses by more than the tolerance; null without edges.</summary>
    public bool? Monotonic { get; init; }

    /// <summary>Number of transitions between the regions at or below Vil and at or above Vih (or crossings of the 50 % level without thresholds).</summary>
    public int ThresholdCrossings { get; init; }

    /// <summary>Settled high level minus Vih [V]; needs Vih.</summary>
    public double? NoiseMarginHighV { get; init; }

    /// <summary>Vil minus settled low level [V]; needs Vil.</summary>
    public double? NoiseMarginLowV { get; init; }

    /// <summary>
    /// Worst-case margin after the first crossing of the receiving threshold [V]: rising, the lowest value
    /// after the overshoot peak minus Vih; falling, Vil minus the highest value after the (negative) peak;
    /// over the post-transition region. Negative: the ringback re-enters the threshold band. Needs the threshold.
    /// Not one of <see cref="FigureNames"/>.
    /// </summary>
    public double? MarginAfterCrossingV { get; init; }

    /// <summary>Edges through the Vil–Vih band that reverse by more than the tolerance (empty without thresholds).</summary>
    public IReadOnlyList<NonMonotonicEdge> NonMonotonicEdges { get; init; } = [];

    /// <summary>
    /// Where the first edge's figures end [s]: the instant the source's next edge starts at the probe
    /// (<see cref="SignalQualityOptions.NextEdgeTimeS"/>), or null when they run to the end of the record (or of a pulse's plateau).
    /// </summary>
    public double? FirstEdgeWindowEndS { get; init; }

    /// <summary>
    /// True when the first edge had not settled within the band by the time the next source edge reached the probe: then
    /// <see cref="SettlingS"/> is null, since a settling time measured past that instant would span later edges.
    /// </summary>
    public bool UnsettledAtNextEdge { get; init; }

    /// <summary>True when both thresholds were given; then the two noise-margin keys are present in the output.</summary>
    public bool HasThresholds { get; init; }

    /// <summary>
    /// The figures as name/value pairs in <see cref="FigureNames"/> order. Values are double?, bool? or int;
    /// the noise-margin keys are present only when thresholds were given.
    /// </summary>
    public IReadOnlyList<KeyValuePair<string, object?>> ToPairs()
    {
        var pairs = new List<KeyValuePair<string, object?>>
        {
            new("low_V", LowV), new("high_V", HighV), new("overshoot_pct", OvershootPct),
            new("undershoot_pct", UndershootPct), new("above_high_V", AboveHighV), new("below_low_V", BelowLowV),
            new("ringback_V", RingbackV), new("rise_10_90_s", Rise1090S),
            new("fall_90_10_s", Fall9010S), new("delay_50_s", Delay50S), new("settling_s", SettlingS),
            new("monotonic", Monotonic), new("threshold_crossings", ThresholdCrossings),
        };
        if (HasThresholds)
        {
            pairs.Add(new("noise_margin_high_V", NoiseMarginHighV));
            pairs.Add(new("noise_margin_low_V", NoiseMarginLowV));
        }
        return pairs;
    }

    /// <summary>The figures as a JSON object with the keys of <see cref="ToPairs"/> (null for figures that do not apply).</summary>
    public JsonObject ToJsonObject()
    {
        var json = new JsonObject();
        foreach (var (key, value) in ToPairs())
            json[key] = value switch
            {
                null => null,
                double d => JsonValue.Create(d),
                bool b => JsonValue.Create(b),
                int i => JsonValue.Create(i),
                _ => throw new InvalidOperationException($"figure {key} has an unexpected type."),
            };
        return json;
    }

    /// <summary>
    /// One figure as a number for a CSV cell: monotonic as 1/0, crossings as a count; null when the figure
    /// does not apply. Throws <see cref="InputException"/> for a name not in <see cref="FigureNames"/>.
    /// </summary>
    public double? GetNumber(string name) => name switch
    {
        "low_V" => LowV,
        "high_V" => HighV,
        "overshoot_pct" => OvershootPct,
        "undershoot_pct" => UndershootPct,
        "above_high_V" => AboveHighV,
        "below_low_V" => BelowLowV,
        "ringback_V" => RingbackV,
        "rise_10_90_s" => Rise1090S,
        "fall_90_10_s" => Fall9010S,
        "delay_50_s" => Delay50S,
        "settling_s" => SettlingS,
        "monotonic" => Monotonic is { } m ? (m ? 1 : 0) : null,
        "threshold_crossings" => ThresholdCrossings,
        "noise_margin_high_V" => NoiseMarginHighV,
        "noise_margin_low_V" => NoiseMarginLowV,
        _ => throw new InputException($"unknown signal figure '{name}'; expected one of: {string.Join(", ", FigureNames)}."),
    };
}
