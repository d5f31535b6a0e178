namespace WaveSim.Core.Analysis;

/// <summary>
/// An edge through the receiver threshold band (from the Vil side to the Vih side or back) that reverses
/// by more than the monotonicity tolerance on its way.
/// </summary>
/// <param name="StartS">Instant [s] the edge leaves its old region (interpolated threshold crossing).</param>
/// <param name="EndS">Instant [s] the edge reaches its new region (interpolated threshold crossing).</param>
/// <param name="Rising">True for a low-to-high edge.</param>
/// <param name="ReversalV">Largest step back against the edge direction [V] (running extreme minus value).</param>
public sealed record NonMonotonicEdge(double StartS, double EndS, bool Rising, double ReversalV);
