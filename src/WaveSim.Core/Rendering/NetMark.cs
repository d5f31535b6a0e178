namespace WaveSim.Core.Rendering;

/// <summary>A mark drawn on a picture of the net: a source, part, segment boundary, branch, load or probe at its position.</summary>
/// <param name="Position">Position along the drawing axis, metres.</param>
/// <param name="Kind">What it is; chooses the symbol.</param>
/// <param name="Label">Short text, e.g. "Z0 50 Ω" or "C 2 pF".</param>
public sealed record NetMark(double Position, NetMarkKind Kind, string Label)
{
    /// <summary>
    /// Index of the <see cref="LineLayout.Pieces"/> entry the element sits on: 0 (the default) is the main line, others a
    /// branch, drawn on that branch's own axis.
    /// </summary>
    public int Piece { get; init; }
}
