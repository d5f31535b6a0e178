namespace WaveSim.Core.Measurements;

/// <summary>A lumped element read from a reflectometer trace.</summary>
/// <param name="Kind">Shunt C or series L.</param>
/// <param name="AtM">Its distance from the reference plane, m.</param>
/// <param name="Value">Farads for a shunt C, henries for a series L.</param>
/// <param name="AreaS">∫(ρ - baseline) dt of its excursion, s.</param>
public sealed record TdrLumped(LumpedKind Kind, double AtM, double Value, double AreaS);
