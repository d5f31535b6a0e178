using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Output;

/// <summary>The figures of one run: the plan, and for each probe its final, maximum and minimum voltage and its signal-quality figures.</summary>
public static class RunSummary
{
    /// <summary>
    /// Signal-quality figures for every probe, with the receiver thresholds applied at loads that have them, computed from the
    /// figure record (<see cref="SimulationResult.FigureTime"/>, the solver's steps), never from the thinned output record. The
    /// first-edge figures of a clock or pulse are measured from its first edge to the start of the next source edge at the probe,
    /// and settling from the edge's arrival at the probe (the source edge's 50 % instant plus the line delay to the probe).
    /// </summary>
    public static IReadOnlyList<(ProbeTrace Probe, SignalFigures Figures)> Figures(SimulationResult r, double settleBand = SignalQualityOptions.DefaultSettleBand)
    {
        var list = new List<(ProbeTrace, SignalFigures)>();
        var edges = RunVerdicts.SourceEdges(r.Scenario.Source, r.FigureTime);
        for (int i = 0; i < r.Probes.Count; i++)
        {
            var spec = r.Scenario.Probes[i];
            var rx = spec.Anchor == ProbeAnchor.Load ? LoadOf(r.Scenario, spec.BranchPath).Receiver : null;
            var src = r.Scenario.Source;
            var options = new SignalQualityOptions
            {
                SettleBand = settleBand,
                VihV = rx?.Vih,
                VilV = rx?.Vil,
                SourceEdgeTimeS = src.FirstEdgeMidpoint,
                // Settling counts from the edge's arrival here, as the verdict's rule 6 does.
                LineDelayS = RunEyes.DelayTo(r.Scenario.Line, spec, 0),
                FinalLevelV = r.Probes[i].SettledVolts,
                // A clock or a pulse: the first edge's figures end where the next source edge reaches the probe.
                NextEdgeTimeS = RunVerdicts.NextEdgeStart(r.Scenario, i, edges),
            };
            list.Add((r.Probes[i], SignalQuality.Compute(r.FigureTime, r.Probes[i].FigureVolts, options)));
        }
        return list;
    }

    /// <summary>The load at the end of the line reached by <paramref name="path"/>.</summary>
    public static LoadSpec LoadOf(Scenario s, IReadOnlyList<string> path)
    {
        var load = s.Load;
        IReadOnlyList<LineElement> line = s.Line;
        foreach (string name in path)
        {
            var b = line.OfType<Branch>().First(x => x.Name == name);
            line = b.Line; load = b.Load;
        }
        return load;
    }

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

    /// <summary>The whole summary.json object; with <paramref name="eyes"/> (see <see cref="RunEyes.Compute"/>) each probe gets an "eye" object.</summary>
    public static JsonObject Json(SimulationResult r, IReadOnlyList<(ProbeTrace Probe, SignalFigures Figures)> figures, IReadOnlyList<ProbeEye>? eyes = null)
    {
        var probes = new JsonObject();
        foreach (var (p, f) in figures)
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
            if (eyes?.FirstOrDefault(e => e.Probe.Name == p.Name) is { } eye) o["eye"] = RunEyes.Json(eye);
            probes[p.Name] = o;
        }
        return new JsonObject
        {
            ["title"] = r.Scenario.Title,
            ["scenario"] = r.Scenario.FilePath,
            ["plan"] = PlanJson(r.Plan),
            ["elapsed_s"] = r.Elapsed.TotalSeconds,
            ["probes"] = probes,
        };
    }

    /// <summary>JSON text with indentation, as written to files and printed (<see cref="JsonText"/>).</summary>
    public static string Text(JsonNode node) => JsonText.Write(node);
}
