namespace WaveSim.Core.Measurements;

/// <summary>A lumped element read from a reflectometer trace.</summary>
/// <param name="Kind">Shunt C or series L.</param>
/// <param name="AtM">Its distance from the reference plane, m.</param>
/// <param name="Value">Farads for a shunt C, henries for a series L.</param>
/// <param name="AreaS">∫(ρ - baseline) dt of its excursion, s (for a pair, of the whole excursion both parts make).</param>
/// <param name="TauS">Its time constant on the line around it, s: Z·C/2 for a shunt C, L/(2·Z) for a series L. A step
/// passing it is delayed by about this much, each way.</param>
/// <param name="Paired">One part of a series-L/shunt-C pair at one place, fitted together; the other part is the
/// neighbouring entry at the same distance, in the order the step meets them.</param>
public sealed record TdrLumped(LumpedKind Kind, double AtM, double Value, double AreaS, double TauS, bool Paired = false);
