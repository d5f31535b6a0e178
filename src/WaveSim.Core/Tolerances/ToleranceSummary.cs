using System.Text.Json.Nodes;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;

namespace WaveSim.Core.Tolerances;

/// <summary>
/// The summary of a tolerance run as JSON: the keys, for each figure its statistics (<see cref="ToleranceStatistics.Describe"/>),
/// the samples giving its minimum and maximum, and its sensitivity ranking (Spearman's ρ of each key, strongest first);
/// the yield over every limit with its Wilson 95 % interval; for corners, the worst corner of each limited figure.
/// </summary>
public static class ToleranceSummary
{
    /// <summary>The summary of <paramref name="r"/> within <paramref name="limits"/>.</summary>
    /// <param name="r">A whole (merged) run.</param>
    /// <param name="limits">The limits judged.</param>
    /// <param name="seed">The seed (null for corners).</param>
    public static JsonObject Json(ToleranceResult r, IReadOnlyList<SweepLimit> limits, ulong? seed)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limits);
        var o = new JsonObject
        {
            ["mode"] = r.Corners ? "corners" : "montecarlo",
            ["samples"] = r.Points.Count,
            ["seed"] = seed is { } s ? JsonValue.Create(s) : null,
            ["keys"] = new JsonArray(r.Keys.Select((k, j) => (JsonNode)new JsonObject
            {
                ["key"] = k.KeyPath,
                ["distribution"] = k.Distribution.ToString(),
                ["unit"] = ScenarioKeys.Unit(k.Distribution.Dimension),
                ["nominal"] = k.Distribution.Name(r.Nominal[j]) is { } name ? (JsonNode?)name : r.Nominal[j],
            }).ToArray()),
            ["limits"] = new JsonArray(limits.Select(l => (JsonNode)JsonValue.Create(l.ToString())).ToArray()),
        };
        o["yield"] = limits.Count == 0 || r.Points.Count == 0 ? null : Yield(r, limits);
        var figures = new JsonObject();
        foreach (var f in r.AllFigures()) figures[f.Column] = Figure(r, f, limits);
        o["figures"] = figures;
        return o;
    }

    static JsonObject Yield(ToleranceResult r, IReadOnlyList<SweepLimit> limits)
    {
        int passes = r.Points.Count(p => r.Passes(p, limits));
        var y = new JsonObject
        {
            ["passes"] = passes,
            ["samples"] = r.Points.Count,
            ["fraction"] = (double)passes / r.Points.Count,
            ["per_limit"] = new JsonObject(limits.Select(l => KeyValuePair.Create(l.ToString(), (JsonNode?)r.Points.Count(p => l.IsMet(r.Value(p, l.Target)))))),
        };
        if (!r.Corners)
        {
            var w = ToleranceStatistics.Wilson(passes, r.Points.Count);
            y["wilson_95"] = new JsonObject { ["low"] = w.Low, ["high"] = w.High };
        }
        return y;
    }

    static JsonNode? Figure(ToleranceResult r, ProbeFigure f, IReadOnlyList<SweepLimit> limits)
    {
        var held = r.Points.Where(p => r.Value(p, f) is not null).ToArray();
        // + 0.0 turns -0 into 0, as the CSV writes it, so a summary read back from the CSV is the same.
        var values = held.Select(p => r.Value(p, f)!.Value + 0.0).ToArray();
        if (ToleranceStatistics.Describe(values) is not { } st) return null;
        var o = new JsonObject
        {
            ["count"] = st.Count, ["mean"] = st.Mean, ["sd"] = st.StandardDeviation, ["min"] = st.Min, ["max"] = st.Max,
            ["p1"] = st.P1, ["p50"] = st.P50, ["p99"] = st.P99,
            ["min_sample"] = held[Array.IndexOf(values, st.Min)].Index,
            ["max_sample"] = held[Array.IndexOf(values, st.Max)].Index,
        };
        o["sensitivity"] = new JsonArray(Sensitivity(r, f).Select(s => (JsonNode)new JsonObject { ["key"] = s.Key, ["spearman"] = s.Rho }).ToArray());
        if (limits.FirstOrDefault(l => l.Target == f) is { } limit)
        {
            // The worst sample is the one furthest on the failing side of the limit: the largest under '<', the smallest under '>'.
            bool upper = limit.Operator.StartsWith('<');
            var worst = held[Array.IndexOf(values, upper ? st.Max : st.Min)];
            o["worst"] = new JsonObject
            {
                [r.Corners ? "corner" : "sample"] = worst.Index,
                ["value"] = upper ? st.Max : st.Min,
                ["values"] = new JsonObject(r.Keys.Select((k, j) => KeyValuePair.Create(k.KeyPath, k.Distribution.Name(worst.Values[j]) is { } n ? (JsonNode?)n : worst.Values[j]))),
            };
        }
        return o;
    }

    /// <summary>Spearman's ρ of each key with the figure over the samples where it applies, strongest |ρ| first (key order breaks ties); keys that do not vary give none.</summary>
    public static IReadOnlyList<(string Key, double Rho)> Sensitivity(ToleranceResult r, ProbeFigure f)
    {
        ArgumentNullException.ThrowIfNull(r);
        var held = r.Points.Where(p => r.Value(p, f) is not null).ToArray();
        var y = held.Select(p => r.Value(p, f)!.Value).ToArray();
        var list = new List<(string, double, int)>();
        for (int j = 0; j < r.Keys.Count; j++)
            if (ToleranceStatistics.Spearman(held.Select(p => r.Keys[j].Distribution.RankValue(p.Values[j])).ToArray(), y) is { } rho) list.Add((r.Keys[j].KeyPath, rho, j));
        return list.OrderByDescending(t => Math.Abs(t.Item2)).ThenBy(t => t.Item3).Select(t => (t.Item1, t.Item2)).ToArray();
    }
}
