namespace WaveSim.Core.Measurements;

/// <summary>Impedance profile of a stack of equal-delay layers, as recovered by <see cref="LayerPeeling"/>.</summary>
/// <param name="Reflection">r_k: reflection coefficient of the interface at the top of layer k (k = 0 is at the reference plane).</param>
/// <param name="Impedance">Z_k: impedance of layer k, Ω. Layer k spans round-trip times [k·Δt, (k+1)·Δt).</param>
/// <param name="ReferenceOhm">Z0 of the instrument and of the line ahead of layer 0, Ω.</param>
public sealed record ImpedanceProfile(double[] Reflection, double[] Impedance, double ReferenceOhm);
