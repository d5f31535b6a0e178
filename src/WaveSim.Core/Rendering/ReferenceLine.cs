using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>A labelled horizontal line across a panel, e.g. a receiver threshold.</summary>
/// <param name="Y">Level, SI units of the panel's Y axis.</param>
/// <param name="Label">Text drawn at the right end of the line, e.g. "VIH 2.0 V".</param>
public sealed record ReferenceLine(double Y, string Label)
{
    /// <summary>Colour of the line and its label; null draws it in <see cref="Palette.Muted"/>, thin and finely dashed.</summary>
    public SKColor? Colour { get; init; }
}
