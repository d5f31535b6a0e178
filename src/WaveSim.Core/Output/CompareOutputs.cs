using System.Globalization;
using System.Text.Json.Nodes;
using CsvHelper;
using WaveSim.Core.Measurements;
using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>The files of <c>wavesim compare</c>: compare.json, compare.csv and the overlay chart.</summary>
public static class CompareOutputs
{
    /// <summary>compare.json: offset_s, rms_V, peak_V, rms_pct, peak_pct and figures {name: {simulated, captured, difference}} (SI).</summary>
    /// <param name="r">The comparison.</param>
    /// <returns>The JSON object.</returns>
    public static JsonObject Json(CaptureComparisonResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        var figures = new JsonObject();
        foreach (var f in r.Figures)
            figures[f.Name] = new JsonObject { ["simulated"] = f.Simulated, ["captured"] = f.Captured, ["difference"] = f.Difference };
        var c = r.Comparison;
        return new JsonObject
        {
            ["probe"] = r.Probe,
            ["offset_s"] = c.OffsetS,
            ["rms_V"] = c.RmsV,
            ["peak_V"] = c.PeakV,
            ["rms_pct"] = Finite(c.RmsPct),
            ["peak_pct"] = Finite(c.PeakPct),
            ["samples"] = c.Time.Length,
            ["figures"] = figures,
        };
    }

    /// <summary>compare.csv: time_s, simulated_V, captured_V, residual_V (captured minus simulated, <see cref="CaptureResidual"/>), round-trip doubles.</summary>
    /// <param name="r">The comparison.</param>
    /// <param name="writer">Where the table goes (left open).</param>
    public static void WriteCsv(CaptureComparisonResult r, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(r);
        var c = r.Comparison;
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string h in new[] { "time_s", "simulated_V", "captured_V", "residual_V" }) csv.WriteField(h);
        csv.NextRecord();
        for (int k = 0; k < c.Time.Length; k++)
        {
            csv.WriteField(CsvNumber.Format(c.Time[k]));
            csv.WriteField(CsvNumber.Format(c.Simulated[k]));
            csv.WriteField(CsvNumber.Format(c.Captured[k]));
            csv.WriteField(CsvNumber.Format(c.Residual[k]));
            csv.NextRecord();
        }
    }

    /// <summary>
    /// The overlay of capture and simulation, with the residual (captured − simulated) in a half-height panel below. The
    /// capture is a pale band beneath the simulation, so a simulation that lands on it still shows both.
    /// </summary>
    /// <param name="r">The comparison.</param>
    /// <param name="title">Chart title.</param>
    /// <returns>The chart.</returns>
    public static ChartSpec Chart(CaptureComparisonResult r, string title)
    {
        ArgumentNullException.ThrowIfNull(r);
        var c = r.Comparison;
        return new ChartSpec(title, "Time", "s",
        [
            new ChartPanel("Voltage", "V",
            [
                new PlotSeries("captured", c.Time, c.Captured) { Look = TraceLook.Reference },
                new PlotSeries("simulated " + r.Probe, c.Time, c.Simulated),
            ]),
            CaptureResidual.Panel(c.Time, c.Captured, c.Simulated, "simulated"),
        ]);
    }

    internal static double? Finite(double x) => double.IsFinite(x) ? x : null;
}
