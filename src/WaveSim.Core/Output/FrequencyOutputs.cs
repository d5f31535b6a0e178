using System.Globalization;
using CsvHelper;
using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>Writes a <see cref="FrequencyResponse"/> as frequency.csv and frequency.png into an <see cref="OutputFolder"/>.</summary>
public static class FrequencyOutputs
{
    /// <summary>The table's file name.</summary>
    public const string CsvName = "frequency.csv";
    /// <summary>The chart's file name.</summary>
    public const string PngName = "frequency.png";

    /// <summary>Writes <see cref="CsvName"/> and <see cref="PngName"/> into <paramref name="output"/> (committed with its other files).</summary>
    /// <param name="output">Output folder.</param>
    /// <param name="response">The sweep.</param>
    /// <param name="title">Chart title.</param>
    public static void Write(OutputFolder output, FrequencyResponse response, string title)
    {
        ArgumentNullException.ThrowIfNull(output);
        output.WriteText(CsvName, w => WriteCsv(w, response));
        output.Write(PngName, XyChart.RenderPng(Chart(response, title), PictureSizes.Frequency.Width, PictureSizes.Frequency.Height));
    }

    /// <summary>
    /// Writes the table: f_Hz, zin_re_ohm, zin_im_ohm, zin_mag_ohm, then for each probe &lt;probe&gt;_gain_dB and &lt;probe&gt;_phase_deg
    /// (invariant culture; a field is left empty where the value is not finite, e.g. the gain of a shorted node).
    /// </summary>
    /// <param name="writer">Where the table goes (left open).</param>
    /// <param name="r">The sweep.</param>
    public static void WriteCsv(TextWriter writer, FrequencyResponse r)
    {
        ArgumentNullException.ThrowIfNull(r);
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string h in new[] { "f_Hz", "zin_re_ohm", "zin_im_ohm", "zin_mag_ohm" }) csv.WriteField(h);
        foreach (var p in r.Probes) { csv.WriteField(p.Name + "_gain_dB"); csv.WriteField(p.Name + "_phase_deg"); }
        csv.NextRecord();
        void Field(double x) { if (double.IsFinite(x)) csv.WriteField(x); else csv.WriteField(""); }
        for (int k = 0; k < r.F.Length; k++)
        {
            Field(r.F[k]); Field(r.Zin[k].Real); Field(r.Zin[k].Imaginary); Field(r.Zin[k].Magnitude);
            foreach (var p in r.Probes) { Field(p.GainDb(k)); Field(p.PhaseDeg(k)); }
            csv.NextRecord();
        }
    }

    /// <summary>
    /// The chart: each probe's gain (dB) and phase (degrees, wrapped to ±180°), then |Zin| (ohm), against frequency. A
    /// logarithmic sweep is drawn on a logarithmic axis labelled with prefixed frequencies (1 M, 10 M, 100 M, 1 G).
    /// </summary>
    public static ChartSpec Chart(FrequencyResponse r, string title)
    {
        double[] x = r.F;
        var gains = r.Probes.Select(p => new PlotSeries(p.Name, x, Enumerable.Range(0, x.Length).Select(p.GainDb).ToArray())).ToArray();
        var phases = r.Probes.Select(p => PhaseSeries(p.Name, x, Enumerable.Range(0, x.Length).Select(p.PhaseDeg).ToArray(), r.Logarithmic)).ToArray();
        var zin = new PlotSeries("|Zin|", x, r.Zin.Select(z => z.Magnitude).ToArray());
        var panels = new List<ChartPanel>();
        if (gains.Length > 0)
        {
            panels.Add(new ChartPanel("Gain", "dB", gains));
            panels.Add(new ChartPanel("Phase", "\u00b0", phases) { YRange = new AxisRange(-180, 180), YTicks = [-180, -90, 0, 90, 180] });
        }
        panels.Add(new ChartPanel("Input impedance", "\u03a9", [zin]));
        return new ChartSpec(title, "Frequency", "Hz", panels) { XKind = r.Logarithmic ? AxisKind.Logarithmic : AxisKind.Linear };
    }

    /// <summary>
    /// A wrapped phase trace with a gap wherever it jumps by more than 180° between neighbours (a wrap, not a feature), so no
    /// vertical stroke joins +180° to −180°.
    /// </summary>
    internal static PlotSeries PhaseSeries(string name, double[] f, double[] phase, bool logarithmic)
    {
        var xs = new List<double>(f.Length + 8);
        var ys = new List<double>(f.Length + 8);
        for (int k = 0; k < f.Length; k++)
        {
            if (k > 0 && double.IsFinite(phase[k]) && double.IsFinite(phase[k - 1]) && Math.Abs(phase[k] - phase[k - 1]) > 180)
            {
                xs.Add(logarithmic ? Math.Sqrt(f[k] * f[k - 1]) : 0.5 * (f[k] + f[k - 1]));
                ys.Add(double.NaN);
            }
            xs.Add(f[k]);
            ys.Add(phase[k]);
        }
        return new PlotSeries(name, xs.ToArray(), ys.ToArray());
    }
}
