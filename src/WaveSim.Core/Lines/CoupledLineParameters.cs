namespace WaveSim.Core.Lines;

/// <summary>
/// Per-length parameters of an edge-coupled pair: each strip in the even and the odd mode, and the pair as one line
/// driven differentially or in common.
/// </summary>
/// <remarks>
/// Differential: V = 2 Vo across the strips, the same current out on one strip and back on the other, so Zdiff = 2 Z0o,
/// L and R double, C halves. Common: both strips in parallel against ground, so Zcomm = Z0e/2, L and R halve, C doubles.
/// Each keeps its mode's eps_eff, delay and loss tangent (Paul, Analysis of Multiconductor Transmission Lines, 2nd ed.
/// 2008, mode decomposition of a symmetric pair; from memory).
/// </remarks>
public sealed record CoupledLineParameters
{
    /// <summary>One strip in the even mode (Z0 = Z0e, the even-mode eps_eff, one strip's R).</summary>
    public required LineParameters Even { get; init; }
    /// <summary>One strip in the odd mode (Z0 = Z0o, the odd-mode eps_eff, one strip's R).</summary>
    public required LineParameters Odd { get; init; }

    /// <summary>The line kind.</summary>
    public string Kind => Even.Kind;
    /// <summary>Even-mode impedance Z0e, ohm.</summary>
    public double Z0Even => Even.Z0;
    /// <summary>Odd-mode impedance Z0o, ohm.</summary>
    public double Z0Odd => Odd.Z0;
    /// <summary>Differential impedance Zdiff = 2 Z0o, ohm.</summary>
    public double Zdiff => 2 * Odd.Z0;
    /// <summary>Common-mode impedance Zcomm = Z0e/2, ohm.</summary>
    public double Zcomm => Even.Z0 / 2;
    /// <summary>Coupling coefficient k = (Z0e - Z0o)/(Z0e + Z0o).</summary>
    public double Coupling => (Even.Z0 - Odd.Z0) / (Even.Z0 + Odd.Z0);
    /// <summary>Inputs outside a formula's stated range of validity, one line each (shared by both modes).</summary>
    public IReadOnlyList<string> Warnings => Even.Warnings;

    /// <summary>The pair as one differentially driven line: Z0 = Zdiff, odd-mode eps_eff, R = 2 R_strip.</summary>
    public LineParameters Differential => Scaled(Odd, 2);
    /// <summary>The pair as one line driven in common: Z0 = Zcomm, even-mode eps_eff, R = R_strip/2.</summary>
    public LineParameters Common => Scaled(Even, 0.5);

    /// <summary>The pair as one line in the given mode.</summary>
    /// <param name="mode">How the pair is driven.</param>
    public LineParameters For(PairMode mode) => mode == PairMode.Common ? Common : Differential;

    // Z0 and R scale alike, so L = Z0 sqrt(ee)/c scales with them and C = sqrt(ee)/(c Z0) inversely; G = omega C tan d follows C.
    static LineParameters Scaled(LineParameters p, double factor) =>
        p with { Z0 = p.Z0 * factor, RDc = p.RDc * factor, SkinFactor = p.SkinFactor * factor };
}
