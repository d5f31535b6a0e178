namespace WaveSim.Core.Rendering;

/// <summary>A fixed axis range in SI units.</summary>
/// <param name="Min">Axis start.</param>
/// <param name="Max">Axis end; must be greater than <paramref name="Min"/>.</param>
public readonly record struct AxisRange(double Min, double Max);
