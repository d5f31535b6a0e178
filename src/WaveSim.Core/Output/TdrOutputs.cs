using System.Text.Json.Nodes;
using CsvHelper;
using System.Globalization;
using WaveSim.Core.Measurements;
using WaveSim.Core.Model;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;
using Series = WaveSim.Core.Rendering.PlotSeries;

namespace WaveSim.Core.Output;

/// <summary>The files of <c>wavesim tdr</c>: tdr.csv, tdr.json and the impedance chart.</summary>
public static class TdrOutputs
{
    /// <summary>tdr.json: segments [{start_m, end_m, z0_ohm}], lumped [{at_m, shunt_c_F | series_l_H, pair}], the end (with
    /// end_c_F or end_l_H when capacitive or inductive), and the settings used (SI).</summary>
    /// <param name="r">The analysis.</param>
    /// <returns>The JSON object.</returns>
    public static JsonObject Json(TdrResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        var segments = new JsonArray(r.Segments.Select(s => (JsonNode)new JsonObject
        {
            ["start_m"] = s.StartM, ["end_m"] = s.EndM, ["z0_ohm"] = s.Z0Ohm,
        }).ToArray());
        var lumped = new JsonArray(r.Lumped.Select(l =>
        {
            var o = l.Kind == LumpedKind.ShuntCapacitance
                ? new JsonObject { ["at_m"] = l.AtM, ["shunt_c_F"] = l.Value }
                : new JsonObject { ["at_m"] = l.AtM, ["series_l_H"] = l.Value };
            if (l.Paired) o["pair"] = true;
            return (JsonNode)o;
        }).ToArray());
        var json = new JsonObject
        {
            ["segments"] = segments,
            ["lumped"] = lumped,
            ["end"] = r.End.ToString().ToLowerInvariant(),
            ["end_m"] = r.EndM,
            ["reference_ohm"] = r.ReferenceOhm,
            ["velocity_m_per_s"] = r.VelocityMps,
            ["layer_step_s"] = r.LayerStepS,
            ["rise_s"] = r.RiseS,
            ["incident_V"] = r.IncidentV,
            ["warnings"] = new JsonArray(r.Warnings.Select(w => (JsonNode)JsonValue.Create(w)!).ToArray()),
        };
        if (r.End == TdrEnd.Capacitive) json["end_c_F"] = r.EndValue;
        if (r.End == TdrEnd.Inductive) json["end_l_H"] = r.EndValue;
        return json;
    }

    /// <summary>tdr.csv: time_s (round trip from the reference plane), distance_m, port_V, rho, z_naive_ohm, z_layer_ohm.</summary>
    /// <param name="r">The analysis.</param>
    /// <param name="writer">Where the table goes (left open).</param>
    public static void WriteCsv(TdrResult r, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(r);
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string h in new[] { "time_s", "distance_m", "port_V", "rho", "z_naive_ohm", "z_layer_ohm" }) csv.WriteField(h);
        csv.NextRecord();
        for (int k = 0; k < r.TimeS.Length; k++)
        {
            csv.WriteField(CsvNumber.Format(r.TimeS[k]));
            csv.WriteField(CsvNumber.Format(r.DistanceM[k]));
            csv.WriteField(CsvNumber.Format(r.PortVolts[k]));
            csv.WriteField(CsvNumber.Format(r.Rho[k]));
            csv.WriteField(Cell(r.NaiveOhms[k]));
            csv.WriteField(Cell(r.LayerOhms[k]));
            csv.NextRecord();
        }
    }

    /// <summary>Impedance against distance (naive and layer-peeled), with ρ below; the true segment impedances as reference lines when known.</summary>
    /// <param name="r">The analysis.</param>
    /// <param name="title">Chart title.</param>
    /// <param name="truth">The scenario simulated, for its segments' impedances; null for a capture.</param>
    /// <returns>The chart.</returns>
    public static ChartSpec Chart(TdrResult r, string title, Scenario? truth)
    {
        ArgumentNullException.ThrowIfNull(r);
        double top = 4 * r.ReferenceOhm;
        double[] Clip(double[] z) => z.Select(x => double.IsFinite(x) && x <= top ? x : double.NaN).ToArray();
        var refs = truth is null
            ? []
            : truth.Line.OfType<Segment>().Select(s => s.Z0).Distinct()
                .Select(z => new ReferenceLine(z, "Z0 " + Quantity.Format(z, "Ω", 3))).ToList();
        return new ChartSpec(title, "Distance", "m",
        [
            new ChartPanel("Impedance", "Ω",
            [
                new PlotSeries("layer peeling", r.DistanceM, Clip(r.LayerOhms)),
                new PlotSeries("naive Z0(1+ρ)/(1-ρ)", r.DistanceM, Clip(r.NaiveOhms)),
            ]) { ReferenceLines = refs },
            new ChartPanel("Reflection ρ", "", [new PlotSeries("ρ", r.DistanceM, r.Rho)]) { HeightWeight = 0.5 },
        ]);
    }

    static string Cell(double x) => double.IsFinite(x) ? CsvNumber.Format(x) : "";
}
