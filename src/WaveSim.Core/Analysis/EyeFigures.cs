using System.Text.Json.Nodes;

namespace WaveSim.Core.Analysis;

/// <summary>
/// Openings of an eye diagram (SI units; null where they do not apply). Definitions:
/// <see cref="EyeAnalysis.Compute"/> and the "Eye figures" section of docs/signal-figures.md.
/// </summary>
public sealed record EyeFigures
{
    /// <summary>JSON / CSV names of the figures in output order (the last two only with thresholds).</summary>
    public static IReadOnlyList<string> FigureNames { get; } =
        ["eye_height_V", "eye_width_s", "eye_height_thresholds_V", "eye_width_thresholds_s"];

    /// <summary>Lowest "1" minus highest "0" at the bit centre [V]; null unless both classes occur.</summary>
    public double? EyeHeightV { get; init; }

    /// <summary>Horizontal opening [s] in which every "1" trace is at or above and every "0" trace at or below the mid level.</summary>
    public double? EyeWidthS { get; init; }

    /// <summary>Worst-case centre margin against the thresholds [V]: min(lowest "1" − Vih, Vil − highest "0"); negative when a bit misses.</summary>
    public double? EyeHeightThresholdsV { get; init; }

    /// <summary>Horizontal opening [s] in which every "1" trace is at or above Vih and every "0" trace at or below Vil; 0 when closed.</summary>
    public double? EyeWidthThresholdsS { get; init; }

    /// <summary>Mid level [V]: halfway between the highest and the lowest bit-centre value. Classifies the bits.</summary>
    public double MidLevelV { get; init; }

    /// <summary>Number of folded traces (bits analysed).</summary>
    public int TraceCount { get; init; }

    /// <summary>Bits classified "1" (centre value above the mid level).</summary>
    public int OnesCount { get; init; }

    /// <summary>Bits classified "0".</summary>
    public int ZerosCount { get; init; }

    /// <summary>True when Vih and Vil were given; then the threshold keys are present in the output.</summary>
    public bool HasThresholds { get; init; }

    /// <summary>The figures as name/value pairs in <see cref="FigureNames"/> order.</summary>
    public IReadOnlyList<KeyValuePair<string, double?>> ToPairs()
    {
        var pairs = new List<KeyValuePair<string, double?>> { new("eye_height_V", EyeHeightV), new("eye_width_s", EyeWidthS) };
        if (HasThresholds)
        {
            pairs.Add(new("eye_height_thresholds_V", EyeHeightThresholdsV));
            pairs.Add(new("eye_width_thresholds_s", EyeWidthThresholdsS));
        }
        return pairs;
    }

    /// <summary>The figures as a JSON object with the keys of <see cref="ToPairs"/>.</summary>
    public JsonObject ToJsonObject()
    {
        var json = new JsonObject();
        foreach (var (key, value) in ToPairs())
            json[key] = value is { } d ? JsonValue.Create(d) : null;
        return json;
    }
}
