namespace WaveSim.Core.Coupled;

/// <summary>
/// One uniform stretch of every conductor over the common reference: the per-length matrices of the multiconductor
/// telegrapher's equations ∂V/∂z = −R·I − L·∂I/∂t, ∂I/∂z = −G·V − C·∂V/∂t. SI units.
/// </summary>
/// <param name="Length">Length, m (&gt; 0).</param>
/// <param name="L">Inductance per length, H/m: symmetric, positive definite.</param>
/// <param name="C">Maxwell capacitance per length, F/m: symmetric, positive definite, off-diagonal entries ≤ 0.</param>
/// <param name="R">Series resistance per length, ohm/m: diagonal, or with positive mutual (common-return) entries.</param>
/// <param name="G">Shunt conductance per length, S/m, in Maxwell form like <paramref name="C"/>.</param>
public sealed record CoupledSection(double Length, ConductorMatrix L, ConductorMatrix C, ConductorMatrix R, ConductorMatrix G)
{
    /// <summary>A lossless section.</summary>
    public static CoupledSection Lossless(double length, ConductorMatrix l, ConductorMatrix c) =>
        new(length, l, c, ConductorMatrix.Zero(l.Size), ConductorMatrix.Zero(l.Size));
}
