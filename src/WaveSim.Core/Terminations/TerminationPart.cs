namespace WaveSim.Core.Terminations;

/// <summary>One part of a termination: the computed value, its preferred-value roundings and the value simulated.</summary>
/// <param name="Column">CSV column name, e.g. "series_r_ohm", "rc_c_F".</param>
/// <param name="Label">Short label for tables, e.g. "R1 to supply".</param>
/// <param name="Unit">Unit symbol for display ("Ω" or "F").</param>
/// <param name="Ideal">The computed value, SI.</param>
/// <param name="E24">Nearest E24 value (capacitors: the next E24 value at or above), SI.</param>
/// <param name="E96">Nearest E96 value, SI; null for capacitors, which use E24 values.</param>
/// <param name="Used">The value simulated, SI.</param>
public sealed record TerminationPart(string Column, string Label, string Unit, double Ideal, double E24, double? E96, double Used);
