using SkiaSharp;
using WaveSim.Core;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;

namespace WaveSim.Tests.Pictures;

/// <summary>
/// The space-time map of a real run: a step on a matched 1 m, 5 ns line moves at v = 2e8 m/s, so the line reads 0 V ahead of
/// the front and VS/2 behind it, with the front along z = v·(t − t0) (Pozar eq. 2.35 with Γ = 0; the map is a computed bounce diagram).
/// </summary>
public class RunPicturesTests
{
    [Fact]
    public void Space_time_map_shows_the_front_along_z_equals_v_t()
    {
        var s = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 50 ohm }
line: [ { segment: { length: 1 m, z0: 50 ohm, delay: 5 ns } } ]
load: { r: 50 ohm }
simulation: { duration: 5.5 ns, resolution: 10 }
");
        var r = Simulate.Run(s).Result;
        using var bmp = SKBitmap.Decode(RunPictures.SpaceTime(r, 800, 600));
        Assert.Equal(800, bmp.Width);
        var (lo, hi) = RunPictures.VoltageRange(r);
        var g = SpaceTimeRenderer.Layout(RunPictures.Layout(r), r.Snapshots.Select(s => s.Time).ToArray(), 0, lo, hi, 800, 600).Geometry;
        double v = 2e8, t0 = 1e-9 + 0.5 * 1.25 * 100e-12;
        SKColor At(double z, double t) => bmp.GetPixel((int)g.XToPixel(z), (int)g.YToPixel(t));
        static double Distance(SKColor a, SKColor b) => Math.Abs(a.Red - b.Red) + Math.Abs(a.Green - b.Green) + Math.Abs(a.Blue - b.Blue);
        var reference = DivergingColourMap.Map(0, 0, lo, hi);
        var high = DivergingColourMap.Map(0.5, 0, lo, hi);
        Assert.True(Distance(At(0.6, t0 + 1e-9), reference) < 12, "ahead of the front: the reference colour");
        Assert.True(Distance(At(0.4, t0 + 4e-9), high) < 12, "behind the front: the colour of VS/2");
        // Along one row the colour changes from high to reference where z = v·(t − t0).
        double t = t0 + 2.5e-9;
        int row = (int)g.YToPixel(t), edge = -1;
        for (int c = (int)g.PlotArea.Left + 2; c < (int)g.PlotArea.Right - 2; c++)
            if (Distance(bmp.GetPixel(c, row), reference) < Distance(bmp.GetPixel(c, row), high)) { edge = c; break; }
        Assert.InRange(edge, g.XToPixel(v * (t - t0)) - 4, g.XToPixel(v * (t - t0)) + 4);
    }
}
