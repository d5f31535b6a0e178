using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;

namespace WaveSim.Core.Sweeps;

/// <summary>The JSON form of a sweep's outcome, as a command prints it.</summary>
public static class SweepReport
{
    /// <summary>The axes, the point count and the best point by <paramref name="goal"/> within <paramref name="limits"/> (SI values).</summary>
    public static JsonObject Json(SweepResult r, SweepGoal? goal, IReadOnlyList<SweepLimit> limits, string? folder)
    {
        var axes = new JsonArray(r.Axes.Select(a => (JsonNode)new JsonObject
        {
            ["key"] = a.KeyPath,
            ["unit"] = a.Unit,
            ["values"] = new JsonArray(a.Values.Select(v => (JsonNode)JsonValue.Create(v)).ToArray()),
        }).ToArray());
        var o = new JsonObject { ["axes"] = axes, ["points"] = r.Points.Count, ["folder"] = folder };
        if (goal is not null)
        {
            o["goal"] = goal.ToString();
            o["limits"] = new JsonArray(limits.Select(l => (JsonNode)JsonValue.Create(l.ToString())).ToArray());
            o["best"] = r.Best(goal, limits) is { } b ? PointJson(r, b) : null;
        }
        return o;
    }

    /// <summary>One point: its index, the varied values and every probe's figures.</summary>
    public static JsonObject PointJson(SweepResult r, SweepPointResult p)
    {
        var values = new JsonObject();
        for (int k = 0; k < r.Axes.Count; k++) values[r.Axes[k].KeyPath] = p.Values[k];
        var figures = new JsonObject();
        for (int i = 0; i < r.Probes.Count; i++) figures[r.Probes[i]] = p.Figures[i].ToJsonObject();
        return new JsonObject { ["index"] = p.Index, ["values"] = values, ["figures"] = figures };
    }
}
