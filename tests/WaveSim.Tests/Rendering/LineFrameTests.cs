using SkiaSharp;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// Checks of the drawing against its analytic input (plot geometry; common practice, no external source):
// a wave front v(z, t) = 1 V for z < u·t, else 0 V, on a 0.2 m line with u = 1.5e8 m/s.
public class LineFrameTests
{
    const double Length = 0.2, Speed = 1.5e8;
    static readonly double[] X = Enumerable.Range(0, 201).Select(i => i * Length / 200).ToArray();
    static readonly LineLayout Line = LineLayout.Single(X, "mm", 1e-3,
        [new NetMark(0, NetMarkKind.Source, "src"), new NetMark(0.2, NetMarkKind.Load, "load")]);

    static double[] Front(double t) => X.Select(z => z < Speed * t ? 1.0 : 0.0).ToArray();

    [Fact]
    public void Frame_shows_both_levels_of_the_front_on_the_fixed_scale()
    {
        var snap = new LineSnapshot(0.8e-9, Front(0.8e-9)); // front at 0.12 m
        FrameLayout fl = FrameRenderer.Layout(Line, -0.5, 1.5, 320, 200);
        ChartGeometry g = fl.Geometry;
        using SKBitmap bmp = PngProbe.Decode(FrameRenderer.RenderPng(Line, snap, -0.5, 1.5, 320, 200));
        Assert.Equal((320, 200), (bmp.Width, bmp.Height));
        SKRect r = g.PlotArea;
        foreach (var (z, v) in new[] { (0.05, 1.0), (0.17, 0.0) })
        {
            double handRow = r.Bottom - (v + 0.5) / 2.0 * r.Height; // −0.5..1.5 V onto bottom..top
            double seen = PngProbe.MeanRowOf(bmp, (int)g.XToPixel(z), Palette.Traces[0], (int)r.Top, (int)r.Bottom);
            Assert.InRange(seen, handRow - 3, handRow + 3);
        }
        Assert.True(PngProbe.InkCount(bmp, fl.HeaderBox) > 20, "time stamp drawn");
        Assert.Equal("t = 800 ps", FrameRenderer.TimeStamp(0.8e-9));
    }

    [Fact]
    public void Frame_sequence_renders_one_numbered_png_per_snapshot_in_order()
    {
        // More snapshots than one parallel batch, so the order across batches is checked too.
        var snaps = Enumerable.Range(0, 4 * Environment.ProcessorCount + 3).Select(k => new LineSnapshot(k * 0.3e-9 / Environment.ProcessorCount, Front(k * 0.3e-9 / Environment.ProcessorCount))).ToList();
        var frames = FrameSequence.Render(Line, snaps, -0.5, 1.5, 200, 140).ToList();
        Assert.Equal(Enumerable.Range(1, snaps.Count).Select(k => $"frame_{k:D5}.png"), frames.Select(f => f.Name));
        for (int k = 0; k < frames.Count; k++)
        {
            using SKBitmap bmp = PngProbe.Decode(frames[k].Png);
            Assert.Equal((200, 140), (bmp.Width, bmp.Height));
            Assert.Equal(FrameRenderer.RenderPng(Line, snaps[k], -0.5, 1.5, 200, 140), frames[k].Png);
        }
    }

    [Fact]
    public void Frame_sequence_refuses_a_bad_snapshot_before_the_first_frame()
    {
        var snaps = new[] { new LineSnapshot(0, Front(0)), new LineSnapshot(1e-9, new double[3]) };
        Assert.Throws<ArgumentException>(() => FrameSequence.Render(Line, snaps, -0.5, 1.5, 200, 140));
    }

    [Fact]
    public void Snapshot_with_wrong_node_count_is_refused()
    {
        var snap = new LineSnapshot(0, new double[10]);
        Assert.Throws<ArgumentException>(() => FrameRenderer.RenderPng(Line, snap, 0, 1, 200, 140));
    }

    [Fact]
    public void Space_time_map_has_reference_colour_before_the_front_and_high_colour_after()
    {
        double[] times = Enumerable.Range(0, 121).Select(k => k * 0.01e-9).ToArray(); // 0..1.2 ns
        double[][] rows = times.Select(Front).ToArray();
        const int w = 360, h = 280;
        FrameLayout fl = SpaceTimeRenderer.Layout(Line, times, 0, -1, 1, w, h);
        ChartGeometry g = fl.Geometry;
        using SKBitmap bmp = PngProbe.Decode(SpaceTimeRenderer.RenderPng(Line, times, rows, 0, -1, 1, w, h));
        Assert.Equal((w, h), (bmp.Width, bmp.Height));
        SKColor reference = DivergingColourMap.At(0), high = DivergingColourMap.At(1);
        Assert.True(PngProbe.Distance(reference, SKColors.White) < 40, "reference level is near-white");

        SKColor At(double z, double t) => bmp.GetPixel((int)g.XToPixel(z), (int)g.YToPixel(t));
        Assert.True(PngProbe.Near(At(0.15, 0.3e-9), reference, 12), "before arrival (arrives at 1.0 ns)");
        Assert.True(PngProbe.Near(At(0.03, 0.6e-9), high, 12), "after arrival (arrived at 0.2 ns)");

        // Along a row (fixed t), the colour changes where z = u·t.
        var boundary = new List<double>();
        foreach (double t in new[] { 0.4e-9, 0.8e-9 })
        {
            int row = (int)g.YToPixel(t);
            int col = Enumerable.Range((int)g.PlotArea.Left + 2, (int)g.PlotArea.Width - 4)
                .First(c => PngProbe.Distance(bmp.GetPixel(c, row), reference) < PngProbe.Distance(bmp.GetPixel(c, row), high));
            Assert.InRange(col, g.XToPixel(Speed * t) - 3, g.XToPixel(Speed * t) + 3);
            boundary.Add(col);
        }
        // By hand: the front moves u·0.4 ns = 60 mm of the 200 mm plot width between the two rows.
        Assert.Equal(0.06 / Length * g.PlotArea.Width, boundary[1] - boundary[0], 3.0);

        // Down a column (fixed z = 0.1 m) the colour turns at t = z/u = 0.667 ns; time grows downwards.
        int c0 = (int)g.XToPixel(0.1);
        int turn = Enumerable.Range((int)g.PlotArea.Top + 1, (int)g.PlotArea.Height - 2)
            .First(r => PngProbe.Distance(bmp.GetPixel(c0, r), high) < PngProbe.Distance(bmp.GetPixel(c0, r), reference));
        double handRow = g.PlotArea.Top + (0.1 / Speed) / 1.2e-9 * g.PlotArea.Height;
        Assert.InRange(turn, handRow - 3, handRow + 3);
    }

    [Fact]
    public void Diverging_map_lightness_falls_away_from_the_reference_on_both_sides()
    {
        // Luma (ITU-R BT.709 weights, common practice as a lightness proxy) must fall monotonically with |s|.
        static double Luma(SKColor c) => 0.2126 * c.Red + 0.7152 * c.Green + 0.0722 * c.Blue;
        for (int sign = -1; sign <= 1; sign += 2)
            for (double a = 0.1; a <= 1.0001; a += 0.1)
                Assert.True(Luma(DivergingColourMap.At(sign * a)) < Luma(DivergingColourMap.At(sign * (a - 0.1))));
        Assert.True(DivergingColourMap.At(-1).Blue > DivergingColourMap.At(-1).Red, "low side is blue");
        Assert.True(DivergingColourMap.At(1).Red > DivergingColourMap.At(1).Blue, "high side is red");
    }
}
