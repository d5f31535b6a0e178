using System.Text.Json.Nodes;
using WaveSim.Core.Fitting;
using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>The files of <c>wavesim fit</c>: fit.json and the overlay chart (fitted.yaml is the scenario text with <see cref="ScenarioFit.Changes"/> spliced in).</summary>
public static class FitOutputs
{
    /// <summary>fit.json: parameters {key: {value, uncertainty, start, lower, upper, unit}}, capture_offset_s, rms_V, start_rms_V,
    /// uncertainty_basis {samples, fitted_values, standard_error_V, lag1_autocorrelation, effective_samples, widening}, simulations,
    /// converged (SI).</summary>
    /// <param name="r">The fit.</param>
    /// <returns>The JSON object.</returns>
    public static JsonObject Json(ScenarioFitResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        var parameters = new JsonObject();
        foreach (var p in r.Parameters)
            parameters[p.Parameter.KeyPath] = new JsonObject
            {
                ["value"] = p.Value,
                ["uncertainty"] = CompareOutputs.Finite(p.Uncertainty),
                ["start"] = p.Parameter.Start,
                ["lower"] = p.Parameter.Lower,
                ["upper"] = p.Parameter.Upper,
                ["unit"] = p.Parameter.Unit,
            };
        return new JsonObject
        {
            ["parameters"] = parameters,
            ["capture_offset_s"] = new JsonObject
            {
                ["value"] = r.OffsetS,
                ["uncertainty"] = CompareOutputs.Finite(r.OffsetUncertaintyS),
                ["fitted"] = r.OffsetFitted,
            },
            ["rms_V"] = r.RmsV,
            ["start_rms_V"] = r.StartRmsV,
            ["uncertainty_basis"] = new JsonObject
            {
                ["samples"] = r.Basis.Samples,
                ["fitted_values"] = r.Basis.Parameters,
                ["standard_error_V"] = CompareOutputs.Finite(r.Basis.StandardErrorV),
                ["lag1_autocorrelation"] = r.Basis.Lag1,
                ["effective_samples"] = r.Basis.EffectiveSamples,
                ["widening"] = r.Basis.Widening,
            },
            ["simulations"] = r.Simulations,
            ["converged"] = r.Converged,
        };
    }

    /// <summary>
    /// Capture, starting and fitted simulation at the capture's samples, with the fitted residual (captured − fitted) below.
    /// The capture is a pale band beneath the two simulations, so a fit that lands on it still shows both.
    /// </summary>
    /// <param name="r">The fit.</param>
    /// <param name="title">Chart title.</param>
    /// <returns>The chart.</returns>
    public static ChartSpec Chart(ScenarioFitResult r, string title)
    {
        ArgumentNullException.ThrowIfNull(r);
        return new ChartSpec(title, "Time", "s",
        [
            new ChartPanel("Voltage", "V",
            [
                new PlotSeries("captured", r.Time, r.Captured) { Look = TraceLook.Reference },
                new PlotSeries("start", r.Time, r.StartSimulated) { Look = TraceLook.Dashed },
                new PlotSeries("fitted", r.Time, r.FittedSimulated),
            ]),
            CaptureResidual.Panel(r.Time, r.Captured, r.FittedSimulated, "fitted"),
        ]);
    }
}
