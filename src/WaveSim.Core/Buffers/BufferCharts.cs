using WaveSim.Core.Rendering;

namespace WaveSim.Core.Buffers;

/// <summary>
/// The pictures of a buffer model: its I-V curves against pin voltage (one panel per table, one trace per corner) and its
/// switching (the waveforms of each edge with their fixtures, and the coefficients Ku, Kd of each edge).
/// </summary>
public static class BufferCharts
{
    /// <summary>The I-V curves of <paramref name="model"/> in <paramref name="corners"/>, every current into the pin.</summary>
    public static ChartSpec IvChart(BufferModel model, IReadOnlyList<Corner> corners)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(corners);
        var curves = corners.Select(model.Curves).ToList();
        var panels = new List<ChartPanel>();
        void Add(string label, Func<BufferCurves, IvCurve?> pick)
        {
            var series = curves.Where(c => pick(c) is not null)
                .Select(c => new PlotSeries($"{label} {Name(c.Corner)}", [.. pick(c)!.Voltages], [.. pick(c)!.Currents])).ToList();
            if (series.Count > 0) panels.Add(new ChartPanel(label, "A", series));
        }
        if (model.Drives)
        {
            if (model.Type != BufferModelType.OpenDrain) Add("Pullup", c => c.Pullup);
            Add("Pulldown", c => c.Pulldown);
        }
        Add("GND clamp", c => c.GndClamp);
        Add("POWER clamp", c => c.PowerClamp);
        if (panels.Count == 0)
            throw new InputException($"{model.Source}:{model.Line}: [Model] {model.Name}: has no I-V table to draw");
        return new ChartSpec($"{model.Name} ({model.TypeName}): current into the pin", "Pin voltage", "V", panels);
    }

    /// <summary>
    /// The switching of a driving model: for each edge its waveforms (when the file gives any) and its coefficients, in
    /// <paramref name="corners"/>.
    /// </summary>
    public static ChartSpec SwitchingChart(BufferModel model, IReadOnlyList<Corner> corners)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(corners);
        var panels = new List<ChartPanel>();
        foreach (bool rising in new[] { true, false })
        {
            string edge = rising ? "Rising" : "Falling";
            var waves = rising ? model.RisingWaveforms : model.FallingWaveforms;
            if (waves.Count > 0)
            {
                var series = corners.SelectMany(c => waves.Select(w =>
                {
                    var pts = w.Table.At(c);
                    return new PlotSeries($"{w.Describe(c)} {Name(c)}", pts.Select(p => p.X).ToArray(), pts.Select(p => p.Y).ToArray());
                })).ToList();
                panels.Add(new ChartPanel($"{edge} waveforms", "V", series) { HeightWeight = 1.2 });
            }
            var tables = corners.Select(c => SwitchingCoefficients.For(model, c, rising)).ToList();
            var ks = new List<PlotSeries>();
            bool openDrain = model.Type == BufferModelType.OpenDrain;
            foreach (SwitchingTable t in tables)
            {
                if (!openDrain) ks.Add(new PlotSeries($"Ku {Name(t.Corner)}", t.Time, t.Ku));
                ks.Add(new PlotSeries($"Kd {Name(t.Corner)}", t.Time, t.Kd) { Look = openDrain ? TraceLook.Line : TraceLook.Dashed });
            }
            panels.Add(new ChartPanel(openDrain ? $"{edge} Kd" : $"{edge} Ku, Kd", "", ks));
        }
        // A ramp ends long before a waveform does; every trace is drawn on to the common end at its final value, as it holds.
        double end = panels.SelectMany(p => p.Series).Max(s => s.X[^1]);
        panels = panels.Select(p => p with { Series = p.Series.Select(s => Hold(s, end)).ToList() }).ToList();
        return new ChartSpec($"{model.Name} ({model.TypeName}): switching", "Time from the start of the edge", "s", panels);
    }

    /// <summary>The I-V picture as PNG bytes (1200 × 900 px).</summary>
    public static byte[] IvPng(BufferModel model, IReadOnlyList<Corner> corners) => XyChart.RenderPng(IvChart(model, corners), 1200, 900);

    /// <summary>The switching picture as PNG bytes (1200 × 1000 px).</summary>
    public static byte[] SwitchingPng(BufferModel model, IReadOnlyList<Corner> corners) => XyChart.RenderPng(SwitchingChart(model, corners), 1200, 1000);

    static PlotSeries Hold(PlotSeries s, double end) =>
        s.X[^1] >= end ? s : s with { X = [.. s.X, end], Y = [.. s.Y, s.Y[^1]] };

    static string Name(Corner c) => c.ToString().ToLowerInvariant();
}
