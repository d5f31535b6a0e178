using SkiaSharp;
using WaveSim.Core;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Rendering;

// Where a frame draws a branch (plot geometry; the layout rules are this product's choice, common practice, no source):
// its own axis below the main one, starting under the junction, joined to it by a connector; never over the main trace.
public class BranchFrameTests
{
    const double Junction = 0.08, StubLength = 0.05;
    static readonly double[] MainX = Enumerable.Range(0, 201).Select(i => i * 0.2 / 200).ToArray();
    static readonly double[] StubX = Enumerable.Range(0, 51).Select(i => Junction + i * StubLength / 50).ToArray();
    static readonly LineLayout Stubbed = new(
        [new LinePiece("line", MainX), new LinePiece("stub", StubX)], "mm", 1e-3,
        [
            new NetMark(0, NetMarkKind.Source, "src"),
            new NetMark(Junction, NetMarkKind.Branch, "stub"),
            new NetMark(0.2, NetMarkKind.Load, "load"),
            new NetMark(Junction + StubLength, NetMarkKind.Load, "stub load") { Piece = 1 },
            new NetMark(Junction + StubLength, NetMarkKind.Probe, "rx1") { Piece = 1 },
        ]);

    [Fact]
    public void A_branch_gets_its_own_axis_below_the_main_one_starting_under_its_junction()
    {
        FrameLayout fl = FrameRenderer.Layout(Stubbed, -0.5, 1.5, 1280, 720);
        ChartGeometry main = fl.Geometry;
        BranchAxis b = Assert.Single(fl.Branches);
        Assert.Equal((1, 0, 0), (b.Piece, b.Parent, b.Row));
        SKRect r = b.Geometry.PlotArea;
        Assert.True(r.Top > main.PlotArea.Bottom + 20, $"branch top {r.Top} must sit below the main axis (bottom {main.PlotArea.Bottom}) and its labels");
        Assert.Equal(main.XToPixel(Junction), r.Left, 0.5);
        // The branch axis counts from its junction: 0 to the stub's 50 mm.
        Assert.Equal((0.0, StubLength), (b.Geometry.X.Min, b.Geometry.X.Max));
        Assert.Equal((-0.5, 1.5), (b.Geometry.Y.Min, b.Geometry.Y.Max));
        // The connector runs from the junction on the main axis's bottom edge to the branch axis's top-left corner.
        Assert.Equal(new SKPoint(main.XToPixel(Junction), main.PlotArea.Bottom), b.Connector[0]);
        Assert.Equal(new SKPoint(r.Left, r.Top), b.Connector[^1]);
        // The main axis spans the main line only (the stub no longer widens it).
        Assert.Equal((0.0, 0.2), (main.X.Min, main.X.Max));
    }

    [Fact]
    public void The_branch_trace_is_drawn_on_its_own_axis_and_never_over_the_main_trace()
    {
        // Main line at 0 V, stub at 1 V: a branch drawn on the main axes would put its colour at the 1 V row there.
        var snap = new LineSnapshot(1e-9, [MainX.Select(_ => 0.0).ToArray(), StubX.Select(_ => 1.0).ToArray()]);
        const int w = 1000, h = 640;
        FrameLayout fl = FrameRenderer.Layout(Stubbed, -0.5, 1.5, w, h);
        using SKBitmap bmp = PngProbe.Decode(FrameRenderer.RenderPng(Stubbed, snap, -0.5, 1.5, w, h));
        SKColor stubColour = Palette.Traces[1];
        ChartGeometry main = fl.Geometry, branch = fl.Branches[0].Geometry;
        int col = (int)main.XToPixel(Junction + 0.02);
        Assert.True(double.IsNaN(PngProbe.MeanRowOf(bmp, col, stubColour, (int)main.PlotArea.Top + 2, (int)main.PlotArea.Bottom - 2, 40)),
            "no branch-coloured pixels inside the main plot");
        int bcol = (int)branch.XToPixel(0.02);
        double seen = PngProbe.MeanRowOf(bmp, bcol, stubColour, (int)branch.PlotArea.Top, (int)branch.PlotArea.Bottom, 40);
        double hand = branch.PlotArea.Bottom - (1.0 + 0.5) / 2.0 * branch.PlotArea.Height; // 1 V on −0.5..1.5 V
        Assert.InRange(seen, hand - 3, hand + 3);
    }

    [Fact]
    public void A_small_frame_still_fits_the_branch_axis_below_the_main_one()
    {
        var snap = new LineSnapshot(0, [new double[MainX.Length], new double[StubX.Length]]);
        using SKBitmap bmp = PngProbe.Decode(FrameRenderer.RenderPng(Stubbed, snap, -0.5, 1.5, 320, 240));
        Assert.Equal((320, 240), (bmp.Width, bmp.Height));
        FrameLayout fl = FrameRenderer.Layout(Stubbed, -0.5, 1.5, 320, 240);
        Assert.True(fl.Branches[0].Geometry.PlotArea.Top > fl.Geometry.PlotArea.Bottom);
        Assert.True(fl.Branches[0].Geometry.PlotArea.Bottom < 240);
    }

    [Fact]
    public void The_marks_have_a_legend_naming_each_kind_drawn()
    {
        FrameLayout fl = FrameRenderer.Layout(Stubbed, -0.5, 1.5, 1280, 720);
        Assert.Equal(["source", "branch junction", "load", "probe"], fl.Legend.Select(e => e.Text));
        Assert.All(fl.Legend, e => Assert.True(e.At.Y > fl.Branches[0].Geometry.PlotArea.Bottom, "legend at the foot of the frame"));
        // An unbranched line has no branch axes.
        Assert.Empty(FrameRenderer.Layout(Stubbed with { Pieces = [Stubbed.Pieces[0]], Elements = [.. Stubbed.Elements.Where(e => e.Piece == 0)] }, -0.5, 1.5, 1280, 720).Branches);
    }

    [Fact]
    public void A_run_lays_out_branch_elements_and_probes_on_the_piece_they_sit_on()
    {
        var s = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 200 ps, resistance: 50 ohm }
line:
  - segment: { length: 60 mm, z0: 50 ohm, delay: 6 ns/m }
  - branch:
      name: stub
      line: [ { segment: { length: 25 mm, z0: 60 ohm, delay: 6 ns/m } } ]
      load: { c: 2 pF, receiver: { vih: 0.6 V, vil: 0.3 V } }
  - segment: { length: 90 mm, z0: 50 ohm, delay: 6 ns/m }
load: { r: 50 ohm }
probes: [ { name: rx1, at: stub/load }, { name: rx2, at: load } ]
simulation: { duration: 3 ns, resolution: 10 }
");
        var r = Simulate.Run(s).Result;
        LineLayout layout = RunPictures.Layout(r);
        Assert.Equal(["line", "stub"], layout.Pieces.Select(p => p.Name));
        var probes = layout.Elements.Where(e => e.Kind == NetMarkKind.Probe).ToDictionary(e => e.Label);
        // By hand: the stub's load is 60 mm + 25 mm along the drawing axis, the main load at 150 mm.
        Assert.Equal((1, 0.085), (probes["rx1"].Piece, Math.Round(probes["rx1"].Position, 9)));
        Assert.Equal((0, 0.150), (probes["rx2"].Piece, Math.Round(probes["rx2"].Position, 9)));
        var stubLoad = Assert.Single(layout.Elements, e => e.Kind == NetMarkKind.Load && e.Piece == 1);
        Assert.Equal(0.085, stubLoad.Position, 1e-9);
        Assert.Contains(layout.Elements, e => e.Kind == NetMarkKind.Branch && e.Piece == 0 && Math.Abs(e.Position - 0.06) < 1e-9);
        var fl = FrameRenderer.Layout(layout, -0.5, 1.5, 1280, 720);
        Assert.Equal(fl.Geometry.XToPixel(0.06), fl.Branches[0].Geometry.PlotArea.Left, 0.5);
        // The space-time map keeps to the main line.
        Assert.Equal(new byte[] { 0x89, 0x50 }, RunPictures.SpaceTime(r, 400, 300)[..2]);
    }
}
