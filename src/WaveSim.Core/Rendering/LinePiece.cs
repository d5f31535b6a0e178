namespace WaveSim.Core.Rendering;

/// <summary>One piece of a drawn line: its name and the positions of its nodes along the drawing axis.</summary>
/// <param name="Name">Label, e.g. "main" or "stub A".</param>
/// <param name="X">Node positions, metres, ascending; at least two.</param>
public sealed record LinePiece(string Name, double[] X);
