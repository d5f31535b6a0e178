using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;

namespace WaveSim.Core.Terminations;

/// <summary>The JSON form of a termination study, as a command prints it (SI units).</summary>
public static class TerminationReport
{
    /// <summary>The whole study: the line, the limits, and per strategy its parts, figures, power and verdict.</summary>
    public static JsonObject Json(TerminationStudyResult r, string? folder)
    {
        var strategies = new JsonArray();
        foreach (var o in r.Outcomes)
        {
            var probes = new JsonObject();
            for (int i = 0; i < o.Figures.Count; i++) probes[r.Probes[i]] = o.Figures[i].ToJsonObject();
            strategies.Add(new JsonObject
            {
                ["strategy"] = o.Design.Name,
                ["applies"] = o.Result is not null,
                ["note"] = o.Design.Note,
                ["change"] = o.Design.Kind == TerminationKind.AsDrawn ? null : o.Design.Note,
                ["parts"] = new JsonArray(o.Design.Parts.Select(p => (JsonNode)new JsonObject
                {
                    ["name"] = p.Column, ["label"] = p.Label, ["computed"] = p.Ideal, ["e24"] = p.E24, ["e96"] = p.E96, ["simulated"] = p.Used,
                }).ToArray()),
                ["thevenin_target_V"] = TheveninTarget(o.Design),
                ["thevenin_level_V"] = TheveninLevel(o.Design),
                ["receiver"] = o.Receiver?.ToJsonObject(),
                ["receiver_eye"] = o.ReceiverEye?.ToJsonObject(),
                ["probes"] = probes,
                ["power_high_W"] = o.PowerHighW,
                ["power_low_W"] = o.PowerLowW,
                ["power_avg_W"] = o.PowerAverageW,
                ["meets_limits"] = o.MeetsLimits,
                ["verdict"] = o.Verdict,
                ["receivers"] = new JsonArray(o.Verdicts.Where(v => v.Judged).Select(v => (JsonNode)VerdictJson(v)).ToArray()),
            });
        }
        return new JsonObject
        {
            ["z0_ohm"] = r.Z0,
            ["line_delay_s"] = r.LineDelayS,
            ["receiver_probe"] = r.ReceiverProbe,
            ["resistor_series"] = r.Options.Series.ToString(),
            ["max_overshoot_pct"] = r.Options.MaxOvershootPct,
            ["max_settling_s"] = r.Options.MaxSettlingS,
            ["settle_band"] = r.Options.SettleBand,
            ["folder"] = folder,
            ["strategies"] = strategies,
        };
    }

    /// <summary>For a Thevenin design that applies: the level asked for, V; otherwise null.</summary>
    public static double? TheveninTarget(TerminationDesign d) => IsThevenin(d) ? d.TargetTheveninV : null;

    /// <summary>For a Thevenin design that applies: the level its preferred-value pair gives, Vcc·R2/(R1 + R2), V; otherwise null.</summary>
    public static double? TheveninLevel(TerminationDesign d) => IsThevenin(d) ? d.TheveninV : null;

    static bool IsThevenin(TerminationDesign d) => d.Kind == TerminationKind.Thevenin && d.Variant is not null;

    /// <summary>One receiver's verdict: its levels, margins, edges judged and the rules missed.</summary>
    public static JsonObject VerdictJson(ProbeVerdict v) => new()
    {
        ["probe"] = v.Probe,
        ["pass"] = v.Pass,
        ["thresholds"] = v.Thresholds is { } t ? new JsonObject { ["vih_V"] = t.Vih, ["vil_V"] = t.Vil } : null,
        ["mid_level_V"] = v.Thresholds is null ? v.MidV : null,
        ["settled_low_V"] = v.LowV,
        ["settled_high_V"] = v.HighV,
        ["margin_low_V"] = v.MarginLowV,
        ["margin_high_V"] = v.MarginHighV,
        ["edges_judged"] = v.Edges.Count,
        ["failures"] = new JsonArray(v.Failures.Select(f => (JsonNode)new JsonObject
        {
            ["rule"] = f.Rule.ToString().ToLowerInvariant(),
            ["edge"] = f.Edge,
            ["rising"] = f.Rising,
            ["source_edge_s"] = f.AtS,
            ["later_edges"] = f.MoreEdges,
            ["detail"] = f.Detail,
        }).ToArray()),
    };
}
