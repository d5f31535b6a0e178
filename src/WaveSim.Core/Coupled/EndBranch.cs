namespace WaveSim.Core.Coupled;

/// <summary>
/// One branch of an end network: a resistor, an inductor and a capacitor in series (any may be absent) from conductor
/// <see cref="At"/> to conductor <see cref="To"/> or to the reference, optionally with a Thevenin source in series.
/// </summary>
/// <param name="At">The conductor the branch starts at (its row in the matrices).</param>
/// <param name="To">The conductor it ends at, or null for the reference.</param>
/// <param name="R">Series resistance, ohm (≥ 0; with a source, its output resistance).</param>
/// <param name="L">Series inductance, H (≥ 0).</param>
/// <param name="C">Series capacitance, F (&gt; 0), or null for none (a DC path).</param>
/// <param name="Source">The source in series (its voltage raises <see cref="At"/> above the reference), or null.</param>
public sealed record EndBranch(int At, int? To, double R, double L = 0, double? C = null, CoupledSource? Source = null);
