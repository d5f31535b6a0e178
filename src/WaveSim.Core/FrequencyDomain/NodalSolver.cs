using System.Numerics;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>
/// Solves a <see cref="Circuit"/> at one complex frequency s by nodal analysis with current unknowns for the lumped branches and
/// the line ends. A line piece enters through its chain (ABCD) relation, V(l) = cosh(γl)·V(0) − Zc·sinh(γl)·I(0),
/// I(l) = −sinh(γl)/Zc·V(0) + cosh(γl)·I(0), with γ = √((R+sL)(G+sC)), Zc = √((R+sL)/(G+sC)) (Pozar, Microwave Engineering,
/// 4th ed. 2012, section 2.7 and Table 4.1; Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008); a segment with a
/// frequency-dependent loss enters with its exact Z(s) and Y(s) (<see cref="Model.FrequencyLoss"/>), not a fitted form. When the piece
/// is lossy and long (Re γl above <see cref="ChainLimit"/>) cosh and sinh grow like e^(Re γl), so it enters instead through its
/// admittance parameters coth(γl)/Zc and csch(γl)/Zc, computed from e^(−γl), which stay bounded however long the line.
/// </summary>
internal sealed class NodalSolver(Circuit c)
{
    /// <summary>Re γl above which the admittance form is used; cosh(5) ≈ 74 keeps the chain form well conditioned below it.</summary>
    const double ChainLimit = 5;

    /// <summary>Leak to ground at every junction at s = 0, S, so that a section cut off by series capacitors rests at 0 V.</summary>
    const double Gmin = 1e-15;

    readonly List<(int, int, Complex)> _a = new(4 * c.Size);
    readonly Complex[] _b = new Complex[c.Size], _x = new Complex[c.Size];
    Solver.SparseLu<Complex>? _lu;

    /// <summary>
    /// The unknown vector for the driver's open-circuit voltage <paramref name="drive"/>. With <paramref name="dc"/> the solve is the
    /// ω = 0 operating point (s must be 0) and load resistors return to their 'to' voltages; otherwise those are 0 (small signal).
    /// Returns null when the system is singular. The array is reused by the next call.
    /// </summary>
    public Complex[]? Solve(Complex s, double drive, bool dc)
    {
        var a = _a;
        var b = _b;
        a.Clear();
        Array.Clear(b);
        int row = 0;
        // KCL at every junction: the currents leaving sum to zero.
        bool zero = s == Complex.Zero;
        for (int j = 0; j < c.Junctions; j++, row++)
            if (zero) a.Add((j, j, Gmin));
        int id = c.DriverCurrent;
        a.Add((0, id, -1));
        a.Add((row, 0, 1)); a.Add((row, id, c.DriverResistance)); b[row] = drive; row++;

        for (int k = 0; k < c.Lumped.Count; k++, row++)
        {
            var e = c.Lumped[k];
            int ik = c.Junctions + 1 + k;
            a.Add((e.A, ik, 1));
            if (e.B >= 0) a.Add((e.B, ik, -1));
            Complex z = e.R + s * e.L;
            Complex ret = dc ? e.Return : 0;
            if (e.C is { } cap)
            {
                // sC(Va − Vb) = (1 + sC(R + sL)) I: finite at s = 0, where it says I = 0 (the capacitor is open).
                Complex sc = s * cap;
                a.Add((row, e.A, sc)); if (e.B >= 0) a.Add((row, e.B, -sc));
                a.Add((row, ik, -(1 + sc * z)));
                b[row] = sc * ret;
            }
            else
            {
                a.Add((row, e.A, 1)); if (e.B >= 0) a.Add((row, e.B, -1));
                a.Add((row, ik, -z));
                b[row] = ret;
            }
        }

        for (int k = 0; k < c.Segments.Count; k++)
        {
            var seg = c.Segments[k];
            var line = seg.Line;
            int i0 = c.Index(new CurrentRef(CurrentKind.SegmentStart, k)), i1 = i0 + 1;
            a.Add((seg.Start, i0, 1));
            a.Add((seg.End, i1, -1));
            Complex z = line.SeriesImpedance(s), y = line.ShuntAdmittance(s);
            Complex gl = Complex.Sqrt(z * y) * line.Length;
            if (gl.Real <= ChainLimit)
            {
                Complex ch = Complex.Cosh(gl), sc = LineFunctions.Sinhc(gl);
                Complex bb = z * line.Length * sc, cc = y * line.Length * sc;
                a.Add((row, seg.End, 1)); a.Add((row, seg.Start, -ch)); a.Add((row, i0, bb)); row++;
                a.Add((row, i1, 1)); a.Add((row, seg.Start, cc)); a.Add((row, i0, -ch)); row++;
            }
            else
            {
                Complex zc = z * line.Length / gl;
                Complex e1 = Complex.Exp(-gl), e2 = e1 * e1;
                Complex yCoth = (1 + e2) / (1 - e2) / zc, yCsch = 2 * e1 / (1 - e2) / zc;
                a.Add((row, i0, 1)); a.Add((row, seg.Start, -yCoth)); a.Add((row, seg.End, yCsch)); row++;
                a.Add((row, i1, 1)); a.Add((row, seg.Start, -yCsch)); a.Add((row, seg.End, yCoth)); row++;
            }
        }
        // The pattern is the same at every s ≠ 0: replay the first factorisation's pivots, and choose afresh only if one fails.
        if (_lu is null || !_lu.Refactor(a)) _lu = Solver.SparseLu<Complex>.Factor(c.Size, a, Norm1);
        if (_lu is null) return null;
        _lu.Solve(b, _x);
        foreach (var v in _x)
            if (!double.IsFinite(v.Real) || !double.IsFinite(v.Imaginary)) return null;
        return _x;
    }

    /// <summary>|re| + |im|: a norm within √2 of the modulus, cheap enough for pivoting.</summary>
    static double Norm1(Complex z) => Math.Abs(z.Real) + Math.Abs(z.Imaginary);
}
