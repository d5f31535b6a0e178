namespace WaveSim.Core.Lines;

/// <summary>The quasi-static (quasi-TEM) result of a closed-form line formula.</summary>
/// <param name="Z0">Characteristic impedance, ohm.</param>
/// <param name="EpsEff">Effective relative permittivity (equal to er for a line in one uniform dielectric).</param>
public readonly record struct QuasiTemResult(double Z0, double EpsEff);
