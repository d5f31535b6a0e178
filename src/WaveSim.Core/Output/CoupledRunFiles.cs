using System.Text.Json.Nodes;
using WaveSim.Core.Coupled;
using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>What <see cref="CoupledRunFiles.Write"/> wrote.</summary>
/// <param name="Files">The files, relative to the output folder.</param>
/// <param name="Summary">The text of summary.json.</param>
public sealed record CoupledFilesWritten(IReadOnlyList<string> Files, string Summary);

/// <summary>
/// Writes a coupled run's files into an <see cref="OutputFolder"/>: probes.csv (the single-line form,
/// <c>time_s,&lt;probe&gt;_V,&lt;probe&gt;_A</c>), summary.json (the plan with each section's modes, every probe's figures,
/// the crosstalk peaks of quiet-conductor probes), waveforms.png (.svg) with the peaks marked, and spacetime_CONDUCTOR.png for
/// every conductor on one voltage scale when the run kept snapshots. The caller commits.
/// </summary>
public static class CoupledRunFiles
{
    /// <summary>Writes every file of <paramref name="outcome"/> into <paramref name="output"/>.</summary>
    public static CoupledFilesWritten Write(CoupledOutcome outcome, OutputFolder output, bool svg = false, bool currents = false)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(output);
        var r = outcome.Result;
        var files = new List<string>();
        output.WriteText("probes.csv", w => ProbesCsv.Write(r.Time, r.Probes, w)); files.Add("probes.csv");
        string summary = JsonText.Write(Json(outcome));
        output.WriteText("summary.json", summary); files.Add("summary.json");
        var chart = Chart(outcome, currents);
        var size = currents ? PictureSizes.WaveformsWithCurrents : PictureSizes.Waveforms;
        output.Write("waveforms.png", XyChart.RenderPng(chart, size.Width, size.Height)); files.Add("waveforms.png");
        if (svg) { output.WriteText("waveforms.svg", XyChart.RenderSvg(chart, size.Width, size.Height)); files.Add("waveforms.svg"); }
        if (r.Snapshots.Count > 1)
        {
            // One space-time map per conductor, all on one voltage scale so that a quiet conductor's crosstalk reads against the drive.
            double lo = r.Snapshots.Min(x => x.Volts.Min(c => c.Min())), hi = r.Snapshots.Max(x => x.Volts.Max(c => c.Max()));
            if (!(hi > lo)) hi = lo + 1;
            var layout = LineLayout.Single(r.Positions, r.Scenario.LengthUnit, r.Scenario.LengthFactor, []);
            double[] times = r.Snapshots.Select(x => x.Time).ToArray();
            for (int c = 0; c < r.Scenario.Conductors.Count; c++)
            {
                string name = $"spacetime_{r.Scenario.Conductors[c]}.png";
                output.Write(name, SpaceTimeRenderer.RenderPng(layout, times, r.Snapshots.Select(x => x.Volts[c]).ToArray(),
                    Math.Clamp(0, lo, hi), lo, hi, PictureSizes.SpaceTime.Width, PictureSizes.SpaceTime.Height));
                files.Add(name);
            }
        }
        return new CoupledFilesWritten(files, summary);
    }

    /// <summary>The plan of a coupled run as JSON: the step, and each section's cells, mode velocities and Courant numbers.</summary>
    public static JsonObject PlanJson(CoupledPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return new JsonObject
        {
            ["dt_s"] = plan.Dt,
            ["dt_limit_s"] = plan.DtLimit,
            ["steps"] = plan.Steps,
            ["cell_updates"] = plan.CellUpdates,
            ["sections"] = new JsonArray(plan.Sections.Select(SectionJson).ToArray()),
        };
    }

    static JsonNode SectionJson(CoupledSectionPlan p)
    {
        var (kb, kf) = p.Section.L.Size >= 2 ? SectionModes.Coupling(p.Section) : (0, 0);
        var o = new JsonObject
        {
            ["at"] = p.Where,
            ["length_m"] = p.Section.Length,
            ["cells"] = p.Cells,
            ["mode_velocities_m_per_s"] = new JsonArray(p.Modes.Velocities.Select(v => (JsonNode)v).ToArray()),
            ["mode_courant"] = new JsonArray(p.Courant.Select(c => (JsonNode)c).ToArray()),
            ["kb_01"] = kb,
            ["kf_01"] = kf,
        };
        if (SectionModes.Pair(p.Section) is { } eo)
        {
            o["z0_even_ohm"] = eo.Z0e; o["z0_odd_ohm"] = eo.Z0o; o["zdiff_ohm"] = eo.Zdiff; o["zcomm_ohm"] = eo.Zcomm;
            o["v_even_m_per_s"] = eo.Ve; o["v_odd_m_per_s"] = eo.Vo;
        }
        return o;
    }

    /// <summary>The whole summary.json object of a coupled run.</summary>
    public static JsonObject Json(CoupledOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var r = outcome.Result;
        var probes = new JsonObject();
        foreach (var (p, f) in outcome.Figures)
        {
            var o = RunSummary.ProbeJson(p, f);
            if (outcome.Crosstalk.FirstOrDefault(x => x.Probe == p.Name) is { } xt)
            {
                o["crosstalk_peak_V"] = xt.PeakV; o["crosstalk_pct"] = xt.Percent; o["crosstalk_time_s"] = xt.TimeS;
            }
            probes[p.Name] = o;
        }
        return new JsonObject
        {
            ["title"] = r.Scenario.Title,
            ["scenario"] = r.Scenario.FilePath,
            ["conductors"] = new JsonArray(r.Scenario.Conductors.Select(c => (JsonNode)c).ToArray()),
            ["plan"] = PlanJson(r.Plan),
            ["elapsed_s"] = r.Elapsed.TotalSeconds,
            ["probes"] = probes,
        };
    }

    /// <summary>Every probe's voltage (and current) against time, the crosstalk peaks marked NEXT (near end) and FEXT (far end).</summary>
    static ChartSpec Chart(CoupledOutcome outcome, bool currents)
    {
        var r = outcome.Result;
        var markers = outcome.Crosstalk.Select(x =>
        {
            var spec = r.Scenario.Probes.First(p => p.Name == x.Probe);
            string what = spec.Anchor switch { CoupledAnchor.Near => "NEXT", CoupledAnchor.Far => "FEXT", _ => "crosstalk" };
            double start = r.Probe(x.Probe).FigureVolts[0];
            return new Marker(x.TimeS, start + x.PeakV, $"{what} {x.Probe} {Units.Quantity.Format(x.PeakV, "V", 3)} ({x.Percent:F1} %)");
        }).ToList();
        var panels = new List<ChartPanel>
        {
            new("Voltage", "V", r.Probes.Select(p => new PlotSeries($"V({p.Name})", r.FigureTime, p.FigureVolts)).ToList()) { Markers = markers, HeightWeight = 2 },
        };
        if (currents) panels.Add(new ChartPanel("Current", "A", r.Probes.Select(p => new PlotSeries($"I({p.Name})", r.Time, p.Amps)).ToList()));
        return new ChartSpec(r.Scenario.Title, "Time", "s", panels);
    }
}
