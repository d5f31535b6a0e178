using System.Globalization;
using System.Text;
using WaveSim.Core.Analysis;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;

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

    /// <summary>The JSON of one run (<see cref="PageRecord.Of"/>); the full record is carried when the whole stays under <paramref name="budgetBytes"/>.</summary>
    public static string Json(RunOutcome run, WaveformPicture picture, IReadOnlyList<string>? plot, long budgetBytes, bool currents = false) =>
        Json(PageRecord.Of(run, picture, plot, currents), budgetBytes);

    /// <summary>
    /// The JSON of <paramref name="record"/>: the thinned record always, the full record when the whole JSON stays under
    /// <paramref name="budgetBytes"/>.
    /// </summary>
    public static string Json(PageRecord record, long budgetBytes)
    {
        ArgumentNullException.ThrowIfNull(record);
        var traces = record.Traces;
        bool currents = traces.Count > 0 && traces.All(x => x.Amps is not null);
        var sb = new StringBuilder();
        sb.Append('{');
        Str(sb, "title", record.Title).Append(',');
        Num(sb, "stepS", record.StepS).Append(',');
        Num(sb, "durationS", record.Time[^1]).Append(',');
        sb.Append("\"currents\":").Append(currents ? "true" : "false").Append(',');
        sb.Append("\"currentsShown\":").Append(currents && record.CurrentsShown ? "true" : "false").Append(',');
        sb.Append("\"window\":[").Append(G(Math.Max(record.Window.Start, record.Time[0]), TimeFormat)).Append(',')
          .Append(G(Math.Min(record.Window.Stop, record.Time[^1]), TimeFormat)).Append("],");
        sb.Append("\"probes\":[");
        for (int i = 0; i < traces.Count; i++)
        {
            var p = traces[i];
            if (i > 0) sb.Append(',');
            sb.Append('{');
            Str(sb, "name", p.Name).Append(',');
            Str(sb, "at", p.At).Append(',');
            sb.Append("\"shown\":").Append(p.Shown ? "true" : "false");
            if (p.Thresholds is { } th)
                sb.Append(',').Append("\"vihV\":").Append(G(th.Vih)).Append(",\"vilV\":").Append(G(th.Vil));
            sb.Append('}');
        }
        sb.Append("],");
        var series = traces.Select(p => p.Volts).Concat(currents ? traces.Select(p => p.Amps!) : []).ToArray();
        var (t, v) = MinMaxColumns.Thin(record.Time, series, Columns);
        sb.Append("\"overview\":");
        Record(sb, t, v, traces.Count);
        sb.Append(',');
        Frames(sb, record);
        // The full record only where it fits: every sample for zoomed ranges, else the zoom draws the thinned record.
        var full = new StringBuilder();
        if (t.Length < record.Time.Length) Record(full, record.Time, series, traces.Count);
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
        for (int i = 0; i < probes && series.Count > probes; i++) { if (i > 0) sb.Append(','); Array(sb, series[probes + i]); }
        sb.Append("]}");
    }

    static void Frames(StringBuilder sb, PageRecord r)
    {
        sb.Append("\"frames\":");
        if (r.FramePositions is not { } positions || r.FrameTimes is not { } times || r.FrameVolts is not { } rows0 || times.Length < 2) { sb.Append("null"); return; }
        var (z, rows) = MinMaxColumns.Thin(positions, rows0, FramePositions / 2);
        sb.Append("{\"z\":");
        Array(sb, z);
        sb.Append(",\"t\":");
        Array(sb, times, TimeFormat);
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
