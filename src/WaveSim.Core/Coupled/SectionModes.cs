using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Coupled;

/// <summary>
/// The propagation modes of one lossless section: the eigenvalues of L·C are 1/v² of its modes (Paul, Analysis of
/// Multiconductor Transmission Lines, 2nd ed. 2008, the modal decomposition; from memory).
/// </summary>
/// <param name="Velocities">Each mode's velocity, m/s, fastest first.</param>
public sealed record SectionModes(IReadOnlyList<double> Velocities)
{
    /// <summary>The fastest mode's velocity, m/s: the one the time step must respect.</summary>
    public double Fastest => Velocities[0];

    /// <summary>The modes of a section, from the eigenvalues of L·C (real and positive for symmetric positive definite L and C).</summary>
    public static SectionModes Of(CoupledSection s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var lc = s.L.ToMatrix() * s.C.ToMatrix();
        var v = lc.Evd().EigenValues.Select(e => 1 / Math.Sqrt(e.Real)).OrderByDescending(x => x).ToArray();
        return new SectionModes(v);
    }

    /// <summary>
    /// For a symmetric pair, the even and odd modes' impedances (Z0e, Z0o, ohm) and velocities (m/s), from
    /// Le = L11 + L12, Ce = C11 + C12 and Lo = L11 − L12, Co = C11 − C12 (standard even/odd analysis, e.g. Pozar,
    /// Microwave Engineering, sec. 7.6; from memory). Null unless the section has two conductors with equal self terms.
    /// </summary>
    public static EvenOdd? Pair(CoupledSection s)
    {
        ArgumentNullException.ThrowIfNull(s);
        if (s.L.Size != 2 || Math.Abs(s.L[0, 0] - s.L[1, 1]) > 1e-9 * s.L[0, 0] || Math.Abs(s.C[0, 0] - s.C[1, 1]) > 1e-9 * s.C[0, 0]) return null;
        double le = s.L[0, 0] + s.L[0, 1], lo = s.L[0, 0] - s.L[0, 1], ce = s.C[0, 0] + s.C[0, 1], co = s.C[0, 0] - s.C[0, 1];
        return new EvenOdd(Math.Sqrt(le / ce), Math.Sqrt(lo / co), 1 / Math.Sqrt(le * ce), 1 / Math.Sqrt(lo * co));
    }

    /// <summary>
    /// The per-length L and C of a symmetric pair with the given even and odd modes: L11 = (Le + Lo)/2, L12 = (Le − Lo)/2,
    /// C11 = (Ce + Co)/2, C12 = (Ce − Co)/2 with Le = Z0e/ve, Ce = 1/(Z0e·ve) and likewise for the odd mode (the same analysis).
    /// </summary>
    public static (ConductorMatrix L, ConductorMatrix C) FromModes(double z0e, double z0o, double ve, double vo)
    {
        double le = z0e / ve, lo = z0o / vo, ce = 1 / (z0e * ve), co = 1 / (z0o * vo);
        double l11 = (le + lo) / 2, l12 = (le - lo) / 2, c11 = (ce + co) / 2, c12 = (ce - co) / 2;
        return (new ConductorMatrix([[l11, l12], [l12, l11]]), new ConductorMatrix([[c11, c12], [c12, c11]]));
    }

    /// <summary>Backward and forward coupling coefficients of a weakly coupled pair: Kb = (Lm/L + Cm/C)/4, Kf = (Lm/L − Cm/C)/2
    /// (Paul, Transmission Lines in Digital Systems for EMC Practitioners, 2012, ch. 5; from memory), with Cm = −C12.</summary>
    public static (double Kb, double Kf) Coupling(CoupledSection s, int a = 0, int b = 1)
    {
        ArgumentNullException.ThrowIfNull(s);
        double lr = s.L[a, b] / s.L[b, b], cr = -s.C[a, b] / s.C[b, b];
        return ((lr + cr) / 4, (lr - cr) / 2);
    }

    /// <summary>The symmetric square root of a symmetric positive definite matrix (for the energy tests and the modal checks).</summary>
    internal static Matrix<double> Sqrt(Matrix<double> m)
    {
        var evd = m.Evd(Symmetricity.Symmetric);
        var d = Matrix<double>.Build.DiagonalOfDiagonalVector(evd.EigenValues.Map(e => Math.Sqrt(e.Real)));
        return evd.EigenVectors * d * evd.EigenVectors.Transpose();
    }
}

/// <summary>Even- and odd-mode impedances (ohm, per line) and velocities (m/s) of a symmetric pair.</summary>
/// <param name="Z0e">Even-mode impedance of each line, ohm.</param>
/// <param name="Z0o">Odd-mode impedance of each line, ohm.</param>
/// <param name="Ve">Even-mode velocity, m/s.</param>
/// <param name="Vo">Odd-mode velocity, m/s.</param>
public sealed record EvenOdd(double Z0e, double Z0o, double Ve, double Vo)
{
    /// <summary>Differential impedance 2·Z0o, ohm.</summary>
    public double Zdiff => 2 * Z0o;
    /// <summary>Common-mode impedance Z0e/2, ohm.</summary>
    public double Zcomm => Z0e / 2;
}
