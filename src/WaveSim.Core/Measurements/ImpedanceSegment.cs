namespace WaveSim.Core.Measurements;

/// <summary>A stretch of line with one impedance.</summary>
/// <param name="StartM">Distance of its start from the reference plane, m.</param>
/// <param name="EndM">Distance of its end from the reference plane, m.</param>
/// <param name="Z0Ohm">Mean impedance of its layers, Ω.</param>
public sealed record ImpedanceSegment(double StartM, double EndM, double Z0Ohm);
