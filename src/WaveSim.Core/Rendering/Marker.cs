namespace WaveSim.Core.Rendering;

/// <summary>A labelled point annotation, e.g. the overshoot peak.</summary>
/// <param name="X">X position, SI.</param>
/// <param name="Y">Y position, SI.</param>
/// <param name="Label">Text drawn beside the point.</param>
public sealed record Marker(double X, double Y, string Label)
{
    /// <summary>How the point is drawn. Default <see cref="MarkerStyle.Ring"/>.</summary>
    public MarkerStyle Style { get; init; } = MarkerStyle.Ring;
}
