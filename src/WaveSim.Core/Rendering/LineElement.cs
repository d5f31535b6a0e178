namespace WaveSim.Core.Rendering;

/// <summary>A marked element along a line.</summary>
/// <param name="Position">Position along the drawing axis, metres.</param>
/// <param name="Kind">What it is; chooses the symbol.</param>
/// <param name="Label">Short text, e.g. "Z0 50 Ω" or "C 2 pF".</param>
public sealed record LineElement(double Position, LineElementKind Kind, string Label)
{
    /// <summary>
    /// Index of the <see cref="LineLayout.Pieces"/> entry the element sits on: 0 (the default) is the main line, others a
    /// branch, drawn on that branch's own axis.
    /// </summary>
    public int Piece { get; init; }
}
