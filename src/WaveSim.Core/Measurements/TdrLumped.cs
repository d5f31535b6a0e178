namespace WaveSim.Core.Measurements;

/// <summary>A lumped element read from a reflectometer trace.</summary>
/// <param name="Kind">Shunt C or series L.</param>
/// <param name="AtM">Its distance from the reference plane, m.</param>
/// <param name="Value">Farads for a shunt C, henries for a series L.</param>
/// <param name="AreaS">∫(ρ - baseline) dt of its excursion, s.</param>
/// <param name="TauS">Its time constant on the line around it, s: Z·C/2 for a shunt C, L/(2·Z) for a series L. A step
/// passing it is delayed by about this much, each way.</param>
public sealed record TdrLumped(LumpedKind Kind, double AtM, double Value, double AreaS, double TauS);
