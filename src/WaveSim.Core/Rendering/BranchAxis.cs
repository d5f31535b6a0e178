using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Where a branch of a line frame is drawn: its own short axis below the axis it leaves (the main line's or a parent
/// branch's), starting under its junction, with a thin connector from the junction down to the branch axis's start.
/// </summary>
/// <param name="Piece">Index of the branch in <see cref="LineLayout.Pieces"/>.</param>
/// <param name="Parent">Index of the piece it leaves (0 for the main line).</param>
/// <param name="Junction">The junction's position along the drawing axis, m: the branch's own X axis counts from it (0 there).</param>
/// <param name="Row">Branch row below the main axis, from 0.</param>
/// <param name="Geometry">The branch's plot area and mapping (X: distance from the junction, m; Y: volts).</param>
/// <param name="NameBox">The row above the plot holding the branch's name.</param>
/// <param name="Connector">The connector's corners, from the junction on the parent axis's bottom edge to the branch axis's top-left corner.</param>
public sealed record BranchAxis(int Piece, int Parent, double Junction, int Row, ChartGeometry Geometry, SKRect NameBox, IReadOnlyList<SKPoint> Connector);
