using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>
/// The residual panel below a capture overlay, shared by compare.png and fit.png so both use one sign: captured minus
/// simulated, the measured value minus the model's (the usual sense of a residual, observed − fitted), as compare.csv's
/// <c>residual_V</c> and every figure difference already are. A positive residual means the capture lies above the simulation.
/// </summary>
public static class CaptureResidual
{
    /// <summary>The sign convention as printed on the axis and in the legend.</summary>
    public const string Definition = "captured − simulated";

    /// <summary>captured[i] − simulated[i].</summary>
    /// <param name="captured">The capture at the common sample times, V.</param>
    /// <param name="simulated">The simulation at the same times, V.</param>
    public static double[] Of(double[] captured, double[] simulated)
    {
        ArgumentNullException.ThrowIfNull(captured);
        ArgumentNullException.ThrowIfNull(simulated);
        if (captured.Length != simulated.Length)
            throw new ArgumentException($"{captured.Length} captured values but {simulated.Length} simulated ones.", nameof(simulated));
        return captured.Select((c, i) => c - simulated[i]).ToArray();
    }

    /// <summary>A half-height panel of the residual, its sign stated on the Y axis.</summary>
    /// <param name="time">Sample times, s.</param>
    /// <param name="captured">The capture at those times, V.</param>
    /// <param name="simulated">The simulation at those times, V.</param>
    /// <param name="simulatedName">What the simulation is called in the overlay above (e.g. "fitted"), for the legend.</param>
    public static ChartPanel Panel(double[] time, double[] captured, double[] simulated, string simulatedName) =>
        new(Definition, "V", [new PlotSeries($"residual, captured − {simulatedName}", time, Of(captured, simulated))]) { HeightWeight = 0.5 };
}
