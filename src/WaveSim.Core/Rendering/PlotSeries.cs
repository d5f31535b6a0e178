namespace WaveSim.Core.Rendering;

/// <summary>One trace: points (X[i], Y[i]) in SI units. Non-finite points leave a gap in the line.</summary>
/// <param name="Name">Legend text, e.g. "V(far)".</param>
/// <param name="X">X values, SI (usually seconds), ascending.</param>
/// <param name="Y">Y values, SI (volts, amperes …); as many as <paramref name="X"/>.</param>
public sealed record PlotSeries(string Name, double[] X, double[] Y)
{
    /// <summary>How the trace is drawn. Default <see cref="TraceLook.Line"/>.</summary>
    public TraceLook Look { get; init; } = TraceLook.Line;
}
