using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>
/// The same probe from several runs (and optionally a capture) on one time axis: a static chart and an interactive page
/// with the report's charts (zoom, readout, cursors, toggles). Every trace keeps its own instants in the chart; the page
/// puts them on one grid at the finest step (linear between samples, empty outside a trace's record).
/// </summary>
public static class OverlayPage
{
    /// <summary>Most instants of the page's common grid; a finer step over a longer span is coarsened to fit.</summary>
    public const int MaxGridPoints = 2_000_000;

    /// <summary>Labels made unique: a label used twice gets its source beside it.</summary>
    public static IReadOnlyList<OverlayTrace> Distinct(IReadOnlyList<OverlayTrace> traces)
    {
        ArgumentNullException.ThrowIfNull(traces);
        return traces.Select(t => traces.Count(o => o.Label == t.Label) > 1 ? t with { Label = $"{t.Label} ({t.Source})" } : t).ToList();
    }

    /// <summary>The static chart of <paramref name="traces"/> over <paramref name="window"/> (null: every trace's whole record).</summary>
    public static ChartSpec Chart(string title, IReadOnlyList<OverlayTrace> traces, TimeWindow? window)
    {
        ArgumentNullException.ThrowIfNull(traces);
        var series = traces.Select(t => new PlotSeries(t.Label, t.Time, t.Volts)).ToList();
        var chart = new ChartSpec(title, "Time", "s", [new ChartPanel("Voltage", "V", series)]);
        return window is { IsWhole: false } w ? chart with { XRange = new AxisRange(w.Start, w.Stop) } : chart;
    }

    /// <summary>The interactive page.</summary>
    /// <param name="title">The page's heading.</param>
    /// <param name="probe">The probe overlaid, named in the note.</param>
    /// <param name="traces">The waveforms, labelled.</param>
    /// <param name="window">The span first shown; null for everything.</param>
    public static string Html(string title, string probe, IReadOnlyList<OverlayTrace> traces, TimeWindow? window)
    {
        ArgumentNullException.ThrowIfNull(traces);
        if (traces.Count == 0) throw new ArgumentException("an overlay needs at least one trace", nameof(traces));
        var record = Grid(title, traces, window);
        var w = new HtmlWriter();
        PageShell.Head(w, $"{title} - WaveSim overlay");
        w.El("h1", title);
        w.El("p", $"Probe '{probe}' from {traces.Count} waveform(s), each on its own record's time axis from 0 s; drawn on a common grid " +
            $"of {Quantity.Format(record.StepS, "s", 3)} steps.", ("class", "note"));
        w.Raw("<table id=\"overlay-sources\">\n").HeaderRow(["label", "read from", "span", "samples"]);
        foreach (var t in traces)
            w.Row([(t.Label, null), (t.Source, null), ($"{Quantity.Format(t.Time[0], "s", 4)} to {Quantity.Format(t.Time[^1], "s", 4)}", null),
                (t.Time.Length.ToString(System.Globalization.CultureInfo.InvariantCulture), null)]);
        w.Raw("</table>\n");
        PageShell.Waveforms(w, new WaveformPicture(Chart(title, traces, window), record.Window, false, 0, 0));
        long rest = w.Length + PageShell.ScriptBytes;
        PageShell.Scripts(w, PageData.Json(record, HtmlReport.MaxPageBytes - rest));
        w.Line("</body>").Line("</html>");
        return w.ToString();
    }

    static PageRecord Grid(string title, IReadOnlyList<OverlayTrace> traces, TimeWindow? window)
    {
        double start = traces.Min(t => t.Time[0]), stop = traces.Max(t => t.Time[^1]);
        double step = traces.Min(t => MedianStep(t.Time));
        if (!(step > 0) || !(stop > start)) step = Math.Max(stop - start, 1e-12);
        long count = (long)Math.Ceiling((stop - start) / step) + 1;
        if (count > MaxGridPoints) { count = MaxGridPoints; step = (stop - start) / (count - 1); }
        var time = new double[count];
        for (long i = 0; i < count; i++) time[i] = Math.Min(stop, start + i * step);
        var list = traces.Select(t => new PageTrace(t.Label, t.Source, Resample(t, time), null)).ToList();
        var shown = window is { IsWhole: false } w ? new TimeWindow(Math.Max(w.Start, start), Math.Min(w.Stop, stop)) : new TimeWindow(start, stop);
        return new PageRecord(title, step, time, list, shown);
    }

    static double MedianStep(double[] t)
    {
        if (t.Length < 2) return 0;
        var d = new double[t.Length - 1];
        for (int i = 1; i < t.Length; i++) d[i - 1] = t[i] - t[i - 1];
        Array.Sort(d);
        return d[d.Length / 2];
    }

    /// <summary>Linear between the trace's samples, NaN (a gap on the chart) outside its record.</summary>
    static double[] Resample(OverlayTrace trace, double[] grid)
    {
        var t = trace.Time;
        var v = trace.Volts;
        var y = new double[grid.Length];
        int j = 0;
        for (int i = 0; i < grid.Length; i++)
        {
            double x = grid[i];
            if (x < t[0] || x > t[^1]) { y[i] = double.NaN; continue; }
            while (j < t.Length - 2 && t[j + 1] < x) j++;
            if (t.Length == 1) { y[i] = v[0]; continue; }
            double f = (x - t[j]) / (t[j + 1] - t[j]);
            y[i] = v[j] + Math.Clamp(f, 0, 1) * (v[j + 1] - v[j]);
        }
        return y;
    }
}
