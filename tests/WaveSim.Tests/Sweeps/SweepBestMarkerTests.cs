using SkiaSharp;
using WaveSim.Core.Analysis;
using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;
using WaveSim.Tests.Rendering;

namespace WaveSim.Tests.Sweeps;

/// <summary>The sweep chart marks the point the goal chose. Figures are invented for the chart (demo values, not results).</summary>
public class SweepBestMarkerTests
{
    // Overshoot dips at the fourth point (index 3): 30, 20, 12, 4, 9, 18 %.
    static readonly double[] Overshoot = [30, 20, 12, 4, 9, 18];

    static SweepResult Result()
    {
        var axis = SweepAxis.Parse("load.r=10,20,30,40,50,60 ohm");
        var points = Overshoot.Select((o, i) => new SweepPointResult(i, [axis.Values[i]], [new SignalFigures { OvershootPct = o }])).ToList();
        return new SweepResult([axis], ["rx"], points);
    }

    [Fact]
    public void The_goal_s_best_point_gets_a_highlighted_labelled_marker()
    {
        var r = Result();
        var goal = SweepGoal.Parse("min:rx.overshoot", ["rx"]);
        var best = r.Best(goal, [])!;
        Assert.Equal(3, best.Index); // smallest of the list above, by inspection
        ChartSpec chart = SweepPictures.Chart(r, "overshoot_pct", best, goal);
        Marker m = Assert.Single(chart.Panels[0].Markers, m => m.Style == MarkerStyle.Highlight);
        Assert.Equal((40.0, 4.0), (m.X, m.Y));
        Assert.Equal("lowest rx overshoot: load.r 40 Ω", m.Label);
        // Another figure's chart marks the same point, briefly.
        var other = SweepPictures.Chart(r, "settling_s", best, goal);
        Assert.Empty(other.Panels); // settling applies at no point here, so its panel is left out and nothing is marked

        // No goal, no mark.
        Assert.DoesNotContain(SweepPictures.Chart(r, "overshoot_pct").Panels[0].Markers, m => m.Style == MarkerStyle.Highlight);
    }

    [Fact]
    public void The_best_point_is_drawn_in_the_highlight_colour_where_it_lies()
    {
        var r = Result();
        var goal = SweepGoal.Parse("min:rx.overshoot", ["rx"]);
        ChartSpec chart = SweepPictures.Chart(r, "overshoot_pct", r.Best(goal, []), goal);
        const int w = 900, h = 500;
        ChartGeometry g = XyChart.Layout(chart, w, h).Panels[0].Geometry;
        using SKBitmap bmp = PngProbe.Decode(XyChart.RenderPng(chart, w, h));
        int x = (int)g.XToPixel(40), y = (int)g.YToPixel(4);
        Assert.True(PngProbe.Near(bmp.GetPixel(x, y), Palette.Highlight, 40), $"pixel ({x}, {y}) is {bmp.GetPixel(x, y)}");
        // Nowhere near the other points.
        Assert.False(PngProbe.Near(bmp.GetPixel((int)g.XToPixel(10), (int)g.YToPixel(30)), Palette.Highlight, 40));
    }
}
