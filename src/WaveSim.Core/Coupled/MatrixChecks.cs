namespace WaveSim.Core.Coupled;

/// <summary>
/// The checks a section's matrices must pass before they are run: the right size, symmetric, positive definite (L and C;
/// R and G positive semi-definite), and the Maxwell sign rule (off-diagonal C and G ≤ 0; off-diagonal R ≥ 0).
/// </summary>
/// <remarks>
/// A per-length L and C of a passive line are symmetric positive definite and C, as a Maxwell capacitance matrix, has
/// non-positive off-diagonal entries (Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, ch. 3; from memory).
/// Each method returns null when the matrix passes and otherwise what is wrong, so the loader can put it after file, line and key.
/// </remarks>
public static class MatrixChecks
{
    /// <summary>Relative tolerance of the symmetry check.</summary>
    public const double SymmetryTolerance = 1e-9;

    /// <summary>What is wrong with an inductance matrix, or null.</summary>
    public static string? Inductance(ConductorMatrix m, int n) =>
        Size(m, n) ?? Symmetric(m) ?? (IsPositiveDefinite(m) ? null : "is not positive definite (the energy ½·Iᵀ·L·I must be positive for every current); a mutual term cannot exceed the self terms");

    /// <summary>What is wrong with a Maxwell capacitance matrix, or null.</summary>
    public static string? Capacitance(ConductorMatrix m, int n) =>
        Size(m, n) ?? Symmetric(m) ?? Maxwell(m, "c") ?? (IsPositiveDefinite(m) ? null : "is not positive definite (each self term must exceed the sum of its mutual terms' magnitudes, about)");

    /// <summary>What is wrong with a series resistance matrix, or null.</summary>
    public static string? Resistance(ConductorMatrix m, int n)
    {
        if ((Size(m, n) ?? Symmetric(m)) is { } e) return e;
        for (int i = 0; i < m.Size; i++)
        {
            if (m[i, i] < 0) return $"has a negative self term in row {i + 1}";
            for (int j = 0; j < m.Size; j++)
                if (i != j && m[i, j] < 0) return $"has a negative entry in row {i + 1}, column {j + 1}: off-diagonal resistances are mutual (common-return) terms, ≥ 0";
        }
        return IsPositiveDefinite(m, semi: true) ? null : "is not positive semi-definite (a passive line never gains power)";
    }

    /// <summary>What is wrong with a Maxwell conductance matrix, or null.</summary>
    public static string? Conductance(ConductorMatrix m, int n)
    {
        if ((Size(m, n) ?? Symmetric(m) ?? Maxwell(m, "g")) is { } e) return e;
        for (int i = 0; i < m.Size; i++) if (m[i, i] < 0) return $"has a negative self term in row {i + 1}";
        return IsPositiveDefinite(m, semi: true) ? null : "is not positive semi-definite (a passive line never gains power)";
    }

    static string? Size(ConductorMatrix m, int n) =>
        m.Size == n ? null : $"is {m.Size} × {m.Size}; the scenario has {n} conductors, so it must be {n} × {n}";

    static string? Symmetric(ConductorMatrix m)
    {
        for (int i = 0; i < m.Size; i++)
            for (int j = i + 1; j < m.Size; j++)
            {
                double a = m[i, j], b = m[j, i], scale = Math.Max(Math.Abs(m[i, i]), Math.Abs(m[j, j]));
                if (Math.Abs(a - b) > SymmetryTolerance * Math.Max(scale, Math.Max(Math.Abs(a), Math.Abs(b))))
                    return $"is not symmetric: row {i + 1}, column {j + 1} differs from row {j + 1}, column {i + 1}";
            }
        return null;
    }

    static string? Maxwell(ConductorMatrix m, string key)
    {
        for (int i = 0; i < m.Size; i++)
            for (int j = 0; j < m.Size; j++)
                if (i != j && m[i, j] > 0)
                    return $"has a positive entry in row {i + 1}, column {j + 1}: '{key}' is the Maxwell matrix, whose mutual entries are ≤ 0 (write the coupling as a negative value)";
        return null;
    }

    /// <summary>Whether the symmetric matrix is positive definite (or semi-definite): its smallest eigenvalue against its largest.</summary>
    internal static bool IsPositiveDefinite(ConductorMatrix m, bool semi = false)
    {
        var evd = m.ToMatrix().Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric);
        double min = evd.EigenValues.Min(e => e.Real), max = evd.EigenValues.Max(e => Math.Abs(e.Real));
        return semi ? min >= -1e-12 * Math.Max(max, double.Epsilon) : max > 0 && min > 1e-12 * max;
    }
}
