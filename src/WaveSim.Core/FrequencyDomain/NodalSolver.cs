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

    readonly Complex[,] _a = new Complex[c.Size, c.Size];
    readonly Complex[] _b = new Complex[c.Size], _x = new Complex[c.Size];

    /// <summary>
    /// The unknown vector for the driver's open-circuit voltage <paramref name="drive"/>. With <paramref name="dc"/> the solve is the
    /// ω = 0 operating point (s must be 0) and load resistors return to their 'to' voltages; otherwise those are 0 (small signal).
    /// Returns null when the system is singular. The array is reused by the next call.
    /// </summary>
    public Complex[]? Solve(Complex s, double drive, bool dc)
    {
        var a = _a;
        var b = _b;
        Array.Clear(a);
        Array.Clear(b);
        int row = 0;
        // KCL at every junction: the currents leaving sum to zero.
        bool zero = s == Complex.Zero;
        for (int j = 0; j < c.Junctions; j++, row++)
            if (zero) a[j, j] = Gmin;
        int id = c.DriverCurrent;
        a[0, id] -= 1;
        a[row, 0] = 1; a[row, id] = c.DriverResistance; b[row] = drive; row++;

        for (int k = 0; k < c.Lumped.Count; k++, row++)
        {
            var e = c.Lumped[k];
            int ik = c.Junctions + 1 + k;
            a[e.A, ik] += 1;
            if (e.B >= 0) a[e.B, ik] -= 1;
            Complex z = e.R + s * e.L;
            Complex ret = dc ? e.Return : 0;
            if (e.C is { } cap)
            {
                // sC(Va − Vb) = (1 + sC(R + sL)) I: finite at s = 0, where it says I = 0 (the capacitor is open).
                Complex sc = s * cap;
                a[row, e.A] = sc; if (e.B >= 0) a[row, e.B] = -sc;
                a[row, ik] = -(1 + sc * z);
                b[row] = sc * ret;
            }
            else
            {
                a[row, e.A] = 1; if (e.B >= 0) a[row, e.B] = -1;
                a[row, ik] = -z;
                b[row] = ret;
            }
        }

        for (int k = 0; k < c.Segments.Count; k++)
        {
            var seg = c.Segments[k];
            var line = seg.Line;
            int i0 = c.Index(new CurrentRef(CurrentKind.SegmentStart, k)), i1 = i0 + 1;
            a[seg.Start, i0] += 1;
            a[seg.End, i1] -= 1;
            Complex z = line.SeriesImpedance(s), y = line.ShuntAdmittance(s);
            Complex gl = Complex.Sqrt(z * y) * line.Length;
            if (gl.Real <= ChainLimit)
            {
                Complex ch = Complex.Cosh(gl), sc = LineFunctions.Sinhc(gl);
                Complex bb = z * line.Length * sc, cc = y * line.Length * sc;
                a[row, seg.End] = 1; a[row, seg.Start] = -ch; a[row, i0] = bb; row++;
                a[row, i1] = 1; a[row, seg.Start] = cc; a[row, i0] = -ch; row++;
            }
            else
            {
                Complex zc = z * line.Length / gl;
                Complex e1 = Complex.Exp(-gl), e2 = e1 * e1;
                Complex yCoth = (1 + e2) / (1 - e2) / zc, yCsch = 2 * e1 / (1 - e2) / zc;
                a[row, i0] = 1; a[row, seg.Start] = -yCoth; a[row, seg.End] = yCsch; row++;
                a[row, i1] = 1; a[row, seg.Start] = -yCsch; a[row, seg.End] = yCoth; row++;
            }
        }
        return DenseSolve(a, b, _x) ? _x : null;
    }

    /// <summary>|re| + |im|: a norm within √2 of the modulus, cheap enough for pivoting.</summary>
    static double Norm1(Complex z) => Math.Abs(z.Real) + Math.Abs(z.Imaginary);

    /// <summary>Gaussian elimination with row equilibration and partial pivoting into x; false when singular or not finite.</summary>
    static bool DenseSolve(Complex[,] a, Complex[] b, Complex[] x)
    {
        int n = b.Length;
        for (int i = 0; i < n; i++)
        {
            double m = 0;
            for (int j = 0; j < n; j++) m = Math.Max(m, Norm1(a[i, j]));
            if (m == 0 || !double.IsFinite(m)) return false;
            double inv = 1 / m;
            for (int j = 0; j < n; j++) a[i, j] *= inv;
            b[i] *= inv;
        }
        for (int k = 0; k < n; k++)
        {
            int p = k;
            double best = Norm1(a[k, k]);
            for (int i = k + 1; i < n; i++)
            {
                double v = Norm1(a[i, k]);
                if (v > best) { best = v; p = i; }
            }
            if (best < 1e-300) return false;
            if (p != k)
            {
                for (int j = k; j < n; j++) (a[k, j], a[p, j]) = (a[p, j], a[k, j]);
                (b[k], b[p]) = (b[p], b[k]);
            }
            Complex inv = 1 / a[k, k];
            for (int i = k + 1; i < n; i++)
            {
                Complex f = a[i, k] * inv;
                if (f == Complex.Zero) continue;
                for (int j = k + 1; j < n; j++) a[i, j] -= f * a[k, j];
                b[i] -= f * b[k];
            }
        }
        for (int i = n - 1; i >= 0; i--)
        {
            Complex sum = b[i];
            for (int j = i + 1; j < n; j++) sum -= a[i, j] * x[j];
            x[i] = sum / a[i, i];
            if (!double.IsFinite(x[i].Real) || !double.IsFinite(x[i].Imaginary)) return false;
        }
        return true;
    }
}
