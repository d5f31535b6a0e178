using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Output;

/// <summary>summary.json of a run: the plan, and for each probe its final, maximum and minimum voltage and its signal-quality figures.</summary>
public static class RunSummary
{
    /// <summary>The plan as a JSON object (SI units).</summary>
    public static JsonObject PlanJson(GridPlan plan) => new()
    {
        ["dt_s"] = plan.Dt,
        ["dt_limit_s"] = plan.DtLimit,
        ["steps"] = plan.Steps,
        ["cells"] = plan.TotalCells,
        ["cell_updates"] = plan.CellUpdates,
        ["memory_bytes"] = plan.MemoryBytes,
        ["output_rows"] = plan.OutputRows,
        ["figure_step_s"] = plan.FigureStep,   // null: the figures use the output record, which is fine enough
        ["segments"] = new JsonArray(plan.Segments.Select(s => (JsonNode)new JsonObject
        {
            ["where"] = s.Where,
            ["length_m"] = s.Segment.Length,
            ["z0_ohm"] = s.Segment.Z0,
            ["delay_s"] = s.Segment.Delay,
            ["cells"] = s.Cells,
            ["courant"] = s.Courant,
        }).ToArray()),
    };

    /// <summary>A probe's entry in summary.json: where it sits, its levels and its signal figures (single-line and coupled runs alike).</summary>
    internal static JsonObject ProbeJson(ProbeTrace p, SignalFigures f)
    {
        var o = new JsonObject
        {
            ["at"] = p.Location,
            ["position_m"] = p.Position,
            ["final_V"] = p.Volts[^1],
            ["max_V"] = p.FigureVolts.Max(),
            ["min_V"] = p.FigureVolts.Min(),
            ["final_A"] = p.Amps[^1],
        };
        foreach (var kv in f.ToJsonObject()) o[kv.Key] = kv.Value?.DeepClone();
        return o;
    }

    /// <summary>
    /// The whole summary.json object of a run: the plan, every probe's levels and figures (and its eye when the source is a bit
    /// pattern), and the frequency-domain check when the outcome holds one.
    /// </summary>
    public static JsonObject Json(RunOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var r = outcome.Result;
        var probes = new JsonObject();
        foreach (var (p, f) in outcome.Figures)
        {
            var o = ProbeJson(p, f);
            if (outcome.Eyes.FirstOrDefault(e => e.Probe.Name == p.Name) is { } eye) o["eye"] = eye.ToJsonObject();
            probes[p.Name] = o;
        }
        var json = new JsonObject
        {
            ["title"] = r.Scenario.Title,
            ["scenario"] = r.Scenario.FilePath,
            ["plan"] = PlanJson(r.Plan),
            ["elapsed_s"] = r.Elapsed.TotalSeconds,
            ["probes"] = probes,
        };
        if (outcome.FrequencyCheck is { } fd)
            json["frequency_domain_check"] = new JsonObject(fd.Select(d =>
                KeyValuePair.Create(d.Probe, (JsonNode?)new JsonObject { ["max_diff_V"] = d.MaxDiffV, ["max_diff_pct"] = d.MaxDiffPct })));
        return json;
    }

    /// <summary>JSON text with indentation, as written to files and printed (<see cref="JsonText"/>).</summary>
    public static string Text(JsonNode node) => JsonText.Write(node);
}
