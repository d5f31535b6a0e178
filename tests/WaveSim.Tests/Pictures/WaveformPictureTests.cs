using SkiaSharp;
using WaveSim.Core;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Tests.Rendering;

namespace WaveSim.Tests.Pictures;

/// <summary>
/// What waveforms.png shows: the receiver's thresholds, the time window and the probes. Expected values are worked from the
/// scenario by hand: a linear 0-100 % ramp of 1.25 × the 10-90 % rise crosses its middle halfway (the source model's
/// definition); a line of delay τ shifts a wave by τ (Pozar, Microwave Engineering, 4th ed., eq. 2.35). The 50-edge limit
/// and the 10 edges shown are this product's choices (common practice, no source).
/// </summary>
public class WaveformPictureTests
{
    const string Receiver = @"
title: thresholds
source: { waveform: step, high: 3.3 V, rise: 200 ps, delay: 0.5 ns, resistance: 50 ohm }
line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm, receiver: { vih: 2.0 V, vil: 0.8 V } }
probes: [ { name: near, at: source }, { name: far, at: load } ]
simulation: { duration: 3 ns, output_step: 10 ps, resolution: 10 }
";

    // An alternating pattern: one edge per bit, so edge k (from 0) crosses its middle at delay + k·T + 0.625·rise.
    const string Long = @"
title: long
source: { waveform: bits, pattern: '10', high: 1 V, rise: 100 ps, bit_time: 1 ns, delay: 0.3 ns, resistance: 50 ohm }
line: [ { segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm }
probes: [ { name: tx, at: source }, { name: mid, at: 100 mm }, { name: rx, at: load } ]
simulation: { duration: 100 ns, output_step: 10 ps, resolution: 10 }
";

    static Core.Analysis.RunOutcome Run(string yaml) => Simulate.Run(TestScenarios.Parse(yaml));

    [Fact]
    public void A_load_with_a_receiver_puts_its_VIH_and_VIL_on_the_voltage_panel()
    {
        var picture = RunPictures.Waveforms(Run(Receiver), new WaveformOptions { Currents = true });
        var lines = picture.Chart.Panels[0].ReferenceLines;
        Assert.Equal([2.0, 0.8], lines.Select(l => l.Y));
        Assert.Equal(["VIH 2 V", "VIL 800 mV"], lines.Select(l => l.Label));
        Assert.All(lines, l => Assert.Equal(Palette.Threshold, l.Colour));
        Assert.Empty(picture.Chart.Panels[1].ReferenceLines); // the current panel has no voltage thresholds

        // Without a receiver there is nothing to draw.
        var plain = RunPictures.Waveforms(Run(Receiver.Replace(", receiver: { vih: 2.0 V, vil: 0.8 V }", "")), new WaveformOptions());
        Assert.Empty(plain.Chart.Panels[0].ReferenceLines);
        // Choosing only the near probe leaves the far receiver's thresholds out: they do not apply to it.
        var near = RunPictures.Waveforms(Run(Receiver), new WaveformOptions { Probes = ["near"] });
        Assert.Empty(near.Chart.Panels[0].ReferenceLines);
    }

    [Fact]
    public void The_rendered_png_has_threshold_coloured_pixels_along_the_VIH_and_VIL_rows()
    {
        var chart = RunPictures.Waveforms(Run(Receiver), new WaveformOptions()).Chart;
        const int w = 900, h = 500;
        ChartGeometry g = XyChart.Layout(chart, w, h).Panels[0].Geometry;
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(chart, w, h));
        int left = (int)g.PlotArea.Left + 2, right = (int)g.PlotArea.Right - 2;
        int CountRow(int row) => Enumerable.Range(left, right - left).Count(x => PngProbe.Near(bmp.GetPixel(x, row), Palette.Threshold, 90));
        foreach (double level in new[] { 2.0, 0.8 })
        {
            int row = (int)Math.Floor(g.YToPixel(level));
            int best = Math.Max(CountRow(row), Math.Max(CountRow(row - 1), CountRow(row + 1)));
            // A 9-on, 4-off dash covers about 9/13 of the row; the label and crossing traces take a little of it.
            Assert.True(best > 0.45 * (right - left), $"{level} V: {best} threshold pixels of {right - left} at row {row}");
        }
        // Halfway between the thresholds nothing is drawn in that colour.
        Assert.True(CountRow((int)g.YToPixel(1.4)) < 5);
    }

    [Fact]
    public void A_record_of_more_than_50_edges_shows_the_start_up_and_the_first_10_edges_by_default()
    {
        var r = Run(Long);
        double[] edges = r.SourceEdges.Select(e => e.SourceMidS).ToArray();
        // 100 ns of 1 ns bits, the first starting at 0.3 ns: edges at 0.3 + k + 0.0625 ns for k = 0 … 99.
        Assert.Equal(100, edges.Length);
        for (int k = 0; k < edges.Length; k++) Assert.Equal(0.3e-9 + k * 1e-9 + 0.625 * 100e-12, edges[k], 1e-15);

        var picture = RunPictures.Waveforms(r, new WaveformOptions());
        Assert.True(picture.Limited);
        // Halfway between edges 10 and 11 (index 9 and 10), plus the 1 ns delay to the farthest probe (200 mm at 5 ns/m).
        double stop = 0.5 * (edges[9] + edges[10]) + 1e-9;
        Assert.Equal(0, picture.Chart.XRange!.Value.Min);
        Assert.Equal(stop, picture.Chart.XRange.Value.Max, 1e-15);
        Assert.Equal(stop, picture.Shown.Stop, 1e-15);
        Assert.Equal(0, picture.Shown.Start);
        // Edges 0 … 9 reach the far probe by then; edge 10 leaves the source (10.3625 ns) but arrives after the window.
        Assert.Equal(10, picture.EdgesShown);
        Assert.Equal(100, picture.SourceEdges);
        Assert.Contains("first 10 of 100 source edges", picture.Chart.Title);
        // The drawn samples end one step past the window, not at the end of the record.
        Assert.All(picture.Chart.Panels[0].Series, s => Assert.InRange(s.X[^1], stop, stop + 10e-12 + 1e-15));

        // The whole record on request.
        var whole = RunPictures.Waveforms(r, new WaveformOptions { Window = TimeWindow.Whole });
        Assert.False(whole.Limited);
        Assert.Equal(100e-9, whole.Shown.Stop, 1e-15);
        Assert.DoesNotContain("source edges", whole.Chart.Title);
    }

    [Fact]
    public void A_short_record_is_drawn_whole()
    {
        var picture = RunPictures.Waveforms(Run(Receiver), new WaveformOptions());
        Assert.False(picture.Limited);
        Assert.Equal(1, picture.SourceEdges);
        Assert.Equal(0, picture.Shown.Start);
        Assert.Equal(3e-9, picture.Shown.Stop, 1e-18);
    }

    [Fact]
    public void An_explicit_window_and_probe_list_choose_what_is_drawn()
    {
        var picture = RunPictures.Waveforms(Run(Long), new WaveformOptions { Window = new TimeWindow(10e-9, 20e-9), Probes = ["rx", "tx"] });
        Assert.False(picture.Limited);
        Assert.Equal(new AxisRange(10e-9, 20e-9), picture.Chart.XRange);
        Assert.Equal(["rx", "tx"], picture.Chart.Panels[0].Series.Select(s => s.Name));
        foreach (var s in picture.Chart.Panels[0].Series)
        {
            Assert.InRange(s.X[0], 10e-9 - 10e-12 - 1e-18, 10e-9);   // one sample before the window at most, for a joined line
            Assert.InRange(s.X[^1], 20e-9, 20e-9 + 10e-12 + 1e-18);
            Assert.InRange(s.X.Length, 1001, 1003);                     // 10 ns at 10 ps
        }
        // Edges that leave after 10 ns and reach rx (1 ns away) by 20 ns: edges 10 … 18 (10.3625 … 18.3625 ns).
        Assert.Equal(9, picture.EdgesShown);
        var xAxis = XyChart.Layout(picture.Chart, 1200, 600).Panels[0].Geometry.X;
        Assert.Equal((10e-9, 20e-9), (xAxis.Min, xAxis.Max));
    }

    [Fact]
    public void Bad_probe_names_and_windows_outside_the_record_are_one_line_input_errors()
    {
        var r = Run(Receiver);
        var unknown = Assert.Throws<InputException>(() => RunPictures.Waveforms(r, new WaveformOptions { Probes = ["nowhere"] }));
        Assert.Equal("unknown probe 'nowhere'; expected one of near, far", unknown.Message);
        var outside = Assert.Throws<InputException>(() => RunPictures.Waveforms(r, new WaveformOptions { Window = new TimeWindow(5e-9, 6e-9) }));
        Assert.Contains("outside the record", outside.Message);
        Assert.Throws<InputException>(() => new TimeWindow(2e-9, 1e-9).CheckAgainst(3e-9));
        Assert.DoesNotContain('\n', outside.Message);
    }
}
