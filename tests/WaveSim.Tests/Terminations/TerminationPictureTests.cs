using WaveSim.Core.Rendering;
using WaveSim.Core.Terminations;
using WaveSim.Tests.Rendering;

namespace WaveSim.Tests.Terminations;

/// <summary>terminations.png shows every strategy's curve, also one identical to the net as drawn.</summary>
public class TerminationPictureTests
{
    [Fact]
    public void A_thevenin_pair_equal_to_the_drawn_VTT_termination_is_named_as_coinciding_and_both_curves_show()
    {
        // The bus ends in 50 Ω to VTT = 1.65 V from a 0/3.3 V driver; the default Thevenin level is 1.65 V, so R1 = R2 = 100 Ω
        // (Z0·Vcc/Vt, common practice; 100 Ω is in E24 and E96, IEC 60063) and their equivalent is 50 Ω to 1.65 V (voltage
        // divider, ReferenceData/readable-outputs.md §2): the same net as drawn, hence the same curve.
        var study = TerminationStudy.Run(TestScenarios.Parse(VerdictTests.VttBus));
        var spec = TerminationPictures.Receiver(study);
        var names = spec.Panels[0].Series.Select(s => s.Name).ToList();
        int drawn = names.IndexOf("as drawn"), th = names.IndexOf("thevenin");
        const int w = 1200, h = 650;
        var layout = XyChart.Layout(spec, w, h);
        Assert.Equal("thevenin (coincides with as drawn)", layout.Panels[0].LegendTexts[th]);
        Assert.Equal("as drawn", layout.Panels[0].LegendTexts[drawn]);

        using var bmp = PngProbe.Decode(XyChart.RenderPng(spec, w, h));
        var g = layout.Panels[0].Geometry;
        var asDrawn = spec.Panels[0].Series[drawn];
        // Before: both were 2 px lines and the Thevenin one, drawn later, covered the net as drawn everywhere.
        Assert.True(TraceOverlapTests.Seen(bmp, g, asDrawn.X, asDrawn.Y, Palette.ReferenceBand, 20) > 0.9, "the net as drawn is hidden");
        Assert.True(TraceOverlapTests.Seen(bmp, g, asDrawn.X, asDrawn.Y, Palette.TraceColour(th)) > 0.9, "the Thevenin curve is hidden");
    }
}
