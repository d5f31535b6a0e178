using WaveSim.Core.Analysis;
using WaveSim.Core.Fitting;
using WaveSim.Core.Measurements;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Tests.Rendering;

namespace WaveSim.Tests.Output;

/// <summary>compare.png and fit.png: one residual sign, stated on the axis, and a capture never hidden under the simulation.</summary>
public class CaptureResidualTests
{
    // A capture 0.1 V above a simulation everywhere: its residual is +0.1 V (observed − model, ReferenceData/readable-outputs.md §4).
    static readonly double[] T = Enumerable.Range(0, 1001).Select(i => i * 1e-11).ToArray();
    static readonly double[] Sim = T.Select(t => t < 3e-9 ? 0 : t < 4e-9 ? (t - 3e-9) / 1e-9 : 1).ToArray();
    static readonly double[] Cap = Sim.Select(v => v + 0.1).ToArray();

    static ScenarioFitResult Fit(double[] captured, double[] fitted) =>
        new([], 0, double.NaN, false, 0, 0, 1, true, TestScenarios.Parse(Fitting.FitScenarios.Truth), T, captured, Sim, fitted,
            new UncertaintyBasis(T.Length, 1, 0, 0, T.Length, 1));

    static CaptureComparisonResult Comparison() =>
        new("rx", new AlignedWaveforms(0, T, Sim, Cap, Cap.Select((c, i) => c - Sim[i]).ToArray(), 0.1, 0.1, 10, 10),
            new SignalFigures(), new SignalFigures(), []);

    [Fact]
    public void Both_pictures_plot_captured_minus_simulated_and_say_so_on_the_axis()
    {
        var fit = FitOutputs.Chart(Fit(Cap, Sim), "fit").Panels[1];
        var compare = CompareOutputs.Chart(Comparison(), "compare").Panels[1];
        foreach (var panel in new[] { fit, compare })
        {
            Assert.Equal("captured − simulated", panel.YLabel);
            var residual = Assert.Single(panel.Series);
            // Before: fit.png plotted fitted − captured, −0.1 V here.
            Assert.All(residual.Y, r => Assert.Equal(0.1, r, 1e-12));
        }
        Assert.Equal("residual, captured − fitted", fit.Series[0].Name);
        Assert.Equal("residual, captured − simulated", compare.Series[0].Name);
    }

    [Fact]
    public void A_fit_that_lands_on_the_capture_still_shows_the_capture()
    {
        var spec = FitOutputs.Chart(Fit(Sim, Sim), "perfect fit");
        const int w = 1200, h = 800;
        var layout = XyChart.Layout(spec, w, h);
        Assert.Equal(["captured", "start (coincides with captured)", "fitted (coincides with captured)"], layout.Panels[0].LegendTexts);
        using var bmp = PngProbe.Decode(XyChart.RenderPng(spec, w, h));
        var g = layout.Panels[0].Geometry;
        // Before: the fitted line (drawn last, as wide as the capture) covered the capture completely.
        Assert.True(TraceOverlapTests.Seen(bmp, g, T, Sim, Palette.ReferenceBand, 20) > 0.9, "the capture is hidden");
        Assert.True(TraceOverlapTests.Seen(bmp, g, T, Sim, Palette.TraceColour(2)) > 0.9, "the fitted curve is hidden");
    }
}
