using System.Globalization;
using System.Text;
using WaveSim.Core.Analysis;
using WaveSim.Core.Pictures;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Reports;

/// <summary>
/// The data the interactive page draws, as JSON: each probe's voltage and current thinned to min/max pairs per pixel column
/// (<see cref="MinMaxColumns"/>), the full record when the page stays within its size budget (so a zoomed range is drawn
/// from every sample), the receiver thresholds, and the frames of the main line (its V(z) at each snapshot instant).
/// </summary>
public static class PageData
{
    /// <summary>Pixel columns of the thinned record: wider than any chart on the page.</summary>
    public const int Columns = 1600;

    /// <summary>Most positions kept along the line in a frame (min/max pairs over the rest).</summary>
    public const int FramePositions = 400;

    /// <summary>
    /// The JSON of one run. The full record is carried when the whole JSON stays under <paramref name="budgetBytes"/>;
    /// <paramref name="picture"/> gives the window first shown and the probes first drawn (the static picture's choices).
    /// </summary>
    public static string Json(RunOutcome run, WaveformPicture picture, IReadOnlyList<string>? plot, long budgetBytes, string label = "")
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(picture);
        var r = run.Result;
        var sb = new StringBuilder();
        sb.Append('{');
        Str(sb, "title", r.Scenario.Title).Append(',');
        Str(sb, "label", label).Append(',');
        Num(sb, "stepS", r.Plan.Dt).Append(',');
        Num(sb, "durationS", r.Time[^1]).Append(',');
        sb.Append("\"window\":[").Append(G(picture.Shown.Start)).Append(',').Append(G(picture.Shown.Stop)).Append("],");
        sb.Append("\"probes\":[");
        var thresholds = run.Verdicts.ToDictionary(v => v.Probe, v => v.Judged ? v.Thresholds : null);
        for (int i = 0; i < r.Probes.Count; i++)
        {
            var p = r.Probes[i];
            if (i > 0) sb.Append(',');
            sb.Append('{');
            Str(sb, "name", p.Name).Append(',');
            Str(sb, "at", p.Location).Append(',');
            sb.Append("\"shown\":").Append(plot is null || plot.Contains(p.Name) ? "true" : "false");
            if (thresholds.GetValueOrDefault(p.Name) is { } th)
                sb.Append(',').Append("\"vihV\":").Append(G(th.Vih)).Append(",\"vilV\":").Append(G(th.Vil));
            sb.Append('}');
        }
        sb.Append("],");
        var series = r.Probes.Select(p => p.Volts).Concat(r.Probes.Select(p => p.Amps)).ToArray();
        var (t, v) = MinMaxColumns.Thin(r.Time, series, Columns);
        sb.Append("\"overview\":");
        Record(sb, t, v, r.Probes.Count);
        sb.Append(',');
        Frames(sb, r);
        // The full record only where it fits: every sample for zoomed ranges, else the zoom draws the thinned record.
        var full = new StringBuilder();
        if (t.Length < r.Time.Length) Record(full, r.Time, series, r.Probes.Count);
        bool fits = full.Length > 0 && sb.Length + full.Length + 16 < budgetBytes;
        sb.Append(",\"full\":").Append(fits ? full.ToString() : "null");
        sb.Append(",\"fullLeftOut\":").Append(full.Length > 0 && !fits ? "true" : "false");
        sb.Append('}');
        return sb.ToString();
    }

    static void Record(StringBuilder sb, double[] t, IReadOnlyList<double[]> series, int probes)
    {
        sb.Append("{\"t\":");
        Array(sb, t, TimeFormat);
        sb.Append(",\"v\":[");
        for (int i = 0; i < probes; i++) { if (i > 0) sb.Append(','); Array(sb, series[i]); }
        sb.Append("],\"a\":[");
        for (int i = 0; i < probes; i++) { if (i > 0) sb.Append(','); Array(sb, series[probes + i]); }
        sb.Append("]}");
    }

    static void Frames(StringBuilder sb, SimulationResult r)
    {
        sb.Append("\"frames\":");
        if (r.Snapshots.Count < 2 || r.Lines.Count == 0) { sb.Append("null"); return; }
        var (z, rows) = MinMaxColumns.Thin(r.Lines[0].Positions, r.Snapshots.Select(s => s.Volts[0]).ToArray(), FramePositions / 2);
        sb.Append("{\"z\":");
        Array(sb, z);
        sb.Append(",\"t\":");
        Array(sb, r.Snapshots.Select(s => s.Time).ToArray(), TimeFormat);
        sb.Append(",\"v\":[");
        for (int k = 0; k < rows.Length; k++) { if (k > 0) sb.Append(','); Array(sb, rows[k]); }
        sb.Append("]}");
    }

    static void Array(StringBuilder sb, IReadOnlyList<double> x, string format = "G6")
    {
        sb.Append('[');
        for (int i = 0; i < x.Count; i++) { if (i > 0) sb.Append(','); sb.Append(G(x[i], format)); }
        sb.Append(']');
    }

    // Instants keep nine digits: six would merge neighbouring steps of a long record.
    const string TimeFormat = "G9";

    /// <summary>Six significant digits: far finer than a pixel or the decimation, and a third of the round-trip length.</summary>
    static string G(double x, string format = "G6") => double.IsFinite(x) ? x.ToString(format, CultureInfo.InvariantCulture) : "null";

    static StringBuilder Num(StringBuilder sb, string key, double x) => sb.Append('"').Append(key).Append("\":").Append(x.ToString("R", CultureInfo.InvariantCulture));

    static StringBuilder Str(StringBuilder sb, string key, string value) =>
        sb.Append('"').Append(key).Append("\":").Append(System.Text.Json.JsonSerializer.Serialize(value));
}
