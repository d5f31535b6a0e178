using SkiaSharp;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

/// <summary>
/// Every curve of a chart stays visible: traces that coincide are named so in the legend and drawn so both show, and a
/// reference trace is a band beneath the others. ReferenceData/readable-outputs.md §3 (common practice, no source).
/// </summary>
public class TraceOverlapTests
{
    const int W = 600, H = 360;

    static double[] Times(int n) => Enumerable.Range(0, n).Select(i => i * 10e-9 / (n - 1)).ToArray();

    static double[] Sine(double[] t, double shift = 0) => t.Select(x => 0.5 + 0.4 * Math.Sin(2 * Math.PI * x / 10e-9) + shift).ToArray();

    [Fact]
    public void Traces_within_half_a_percent_of_the_span_coincide_and_one_percent_apart_do_not()
    {
        double[] t = Times(2001);
        var a = new PlotSeries("a", t, Sine(t));
        const double span = 1.0, tol = TraceOverlap.SpanFraction * span;
        Assert.True(TraceOverlap.Coincide(a, new PlotSeries("b", t, Sine(t)), tol));
        Assert.True(TraceOverlap.Coincide(a, new PlotSeries("b", t, Sine(t, 0.004)), tol));
        Assert.False(TraceOverlap.Coincide(a, new PlotSeries("b", t, Sine(t, 0.01)), tol));
        // Apart at one point only is apart.
        double[] y = Sine(t); y[1000] += 0.02;
        Assert.False(TraceOverlap.Coincide(a, new PlotSeries("b", t, y), tol));
        // A trace covering only half the span of the other is not the same curve.
        Assert.False(TraceOverlap.Coincide(a, new PlotSeries("b", t[..1000], Sine(t)[..1000]), tol));
    }

    [Fact]
    public void The_same_curve_sampled_on_another_grid_coincides()
    {
        // Linear interpolation of a smooth f errs by at most h²/8·max|f''| (R. L. Burden and J. D. Faires, Numerical Analysis,
        // Thm 3.3, from memory): h = 10 ns/2000, f'' ≤ 0.4·(2π/10 ns)², so under 2e-6 V, far inside 0.5 % of a 1 V span.
        double[] t1 = Times(2001), t2 = Times(3001);
        Assert.True(TraceOverlap.Coincide(new PlotSeries("a", t1, Sine(t1)), new PlotSeries("b", t2, Sine(t2)), 0.005));
    }

    static (SKBitmap Bmp, ChartGeometry G, ChartLayout L) Draw(params PlotSeries[] series)
    {
        var spec = new ChartSpec("", "Time", "s", [new ChartPanel("Voltage", "V", series) { YRange = new AxisRange(0, 1) }]);
        var layout = XyChart.Layout(spec, W, H);
        return (PngProbe.Decode(XyChart.RenderPng(spec, W, H)), layout.Panels[0].Geometry, layout);
    }

    /// <summary>
    /// The share of 60 stretches of the curve, each about 16 px long (more than one dash and gap), in which a pixel near
    /// <paramref name="colour"/> lies within 3 px of the curve.
    /// </summary>
    internal static double Seen(SKBitmap bmp, ChartGeometry g, double[] t, double[] y, SKColor colour, int tolerance = 40)
    {
        int seen = 0, total = 0;
        double pxPerPoint = g.PlotArea.Width / (t.Length - 1.0);
        int stretch = (int)Math.Ceiling(16 / pxPerPoint);
        for (int k = 0; k + stretch < t.Length; k += Math.Max(stretch, t.Length / 60))
        {
            total++;
            bool hit = false;
            for (int j = k; j < k + stretch && !hit; j++)
            {
                int col = (int)g.XToPixel(t[j]), row = (int)g.YToPixel(y[j]);
                hit = Enumerable.Range(row - 3, 7).Any(r => r >= 0 && r < bmp.Height && PngProbe.Near(bmp.GetPixel(col, r), colour, tolerance));
            }
            if (hit) seen++;
        }
        return (double)seen / total;
    }

    [Fact]
    public void Two_identical_lines_both_show_and_the_legend_says_they_coincide()
    {
        double[] t = Times(2001), y = Sine(t);
        var (bmp, g, layout) = Draw(new PlotSeries("first", t, y), new PlotSeries("second", t, y));
        Assert.Equal(["first", "second (coincides with first)"], layout.Panels[0].LegendTexts);
        // Before: the second line covered the first completely. Now the second is dashed and the first shows in its gaps.
        Assert.True(Seen(bmp, g, t, y, Palette.TraceColour(0)) > 0.9, "first trace hidden");
        Assert.True(Seen(bmp, g, t, y, Palette.TraceColour(1)) > 0.9, "second trace hidden");
    }

    [Fact]
    public void A_reference_band_shows_around_a_line_drawn_on_it()
    {
        double[] t = Times(2001), y = Sine(t);
        // The reference comes second in the list yet is drawn first, beneath.
        var (bmp, g, layout) = Draw(new PlotSeries("model", t, y), new PlotSeries("reference", t, y) { Look = TraceLook.Reference });
        Assert.Equal(["model", "reference (coincides with model)"], layout.Panels[0].LegendTexts);
        Assert.True(Seen(bmp, g, t, y, Palette.ReferenceBand, 20) > 0.9, "reference band hidden");
        Assert.True(Seen(bmp, g, t, y, Palette.TraceColour(0)) > 0.9, "line on the band hidden");
        // Band above and below the line in the same column: the line sits inside it.
        int col = (int)g.XToPixel(t[500]), row = (int)g.YToPixel(y[500]);
        Assert.True(PngProbe.Near(bmp.GetPixel(col, row), Palette.TraceColour(0), 60));
        Assert.Contains(Enumerable.Range(row - 4, 3), r => PngProbe.Near(bmp.GetPixel(col, r), Palette.ReferenceBand, 20));
        Assert.Contains(Enumerable.Range(row + 2, 3), r => PngProbe.Near(bmp.GetPixel(col, r), Palette.ReferenceBand, 20));
    }

    [Fact]
    public void Traces_apart_keep_their_names_and_palette_looks()
    {
        double[] t = Times(2001);
        var (_, _, layout) = Draw(new PlotSeries("a", t, Sine(t)), new PlotSeries("b", t, Sine(t, 0.2)));
        Assert.Equal(["a", "b"], layout.Panels[0].LegendTexts);
    }
}
