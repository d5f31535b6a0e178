namespace WaveSim.Core.Solver;

/// <summary>
/// The nonlinear parts' equations with the linear network reduced to the k part voltages: v = v0 + M·(c·f(v)), where v0 is
/// the part voltages the linear network gives with no part current, M (k × k) the part voltages per unit current through each
/// part (the Schur complement of the factored network seen from the parts, a Thevenin resistance matrix), c the share of the
/// unknown current the equations carry (½ for the trapezoidal step, 1 at DC) and f the parts' I-V laws.
/// </summary>
/// <remarks>
/// One part (the usual case): g(v) = v − v0 − m·c·f(v) rises with slope ≥ 1 when the network is passive (m ≤ 0) and the
/// law does not fall (f′ ≥ 0), so the root lies within |g(x)| of any guess x; it is bracketed there (widened if the law
/// falls somewhere) and found by Newton's method kept inside the bracket, bisecting when a Newton step leaves it
/// (the safeguarded Newton of Press et al., Numerical Recipes, 3rd ed. 2007, §9.4, "rtsafe"). Several parts: Newton's method
/// on the k equations, damped by halving the step until the residual falls (Dennis and Schnabel, Numerical Methods for
/// Unconstrained Optimization and Nonlinear Equations, 1983, §6.3), then nonlinear Gauss-Seidel with the one-part solve if that fails.
/// </remarks>
internal sealed class PartEquations
{
    readonly IReadOnlyList<NonlinearPart> _parts;
    readonly double[,] _m;
    readonly double _c;
    readonly int _k;
    readonly double[] _g, _step, _trial, _jac;
    readonly IPartLaw[] _laws;

    public PartEquations(IReadOnlyList<NonlinearPart> parts, double[,] m, double c)
    {
        _parts = parts; _m = m; _c = c; _k = parts.Count;
        _g = new double[_k]; _step = new double[_k]; _trial = new double[_k]; _jac = new double[_k * _k];
        // Parts the step's network does not couple (at the two ends of a line, which only the line's cells join) have M_pq = 0
        // exactly: their equations are independent, one scalar root each.
        _currents = new double[_k];
        _laws = parts.Select(p => p.Law).ToArray();
        _uncoupled = true;
        for (int p = 0; p < _k; p++)
            for (int q = 0; q < _k; q++)
                if (p != q && m[p, q] != 0) _uncoupled = false;
    }

    readonly bool _uncoupled;
    readonly double[] _currents = [];

    /// <summary>The parts' currents f(v) at the solution of the last <see cref="Solve"/> (the laws' own values, before c).</summary>
    public ReadOnlySpan<double> Currents => _currents;

    double F(int p, double v) => _c * _laws[p].Current(v, out _);

    /// <summary>Solves for the part voltages, starting from <paramref name="v"/> (the guess, overwritten by the solution).</summary>
    /// <returns>False when no solution was found to the tolerance.</returns>
    public bool Solve(ReadOnlySpan<double> v0, double[] v)
    {
        if (_uncoupled)
        {
            for (int p = 0; p < _k; p++)
                if (!SolveOne(p, v0[p], _m[p, p], v[p], out v[p], out _currents[p])) return false;
            return true;
        }
        if (Newton(v0, v)) return Done(v);
        for (int sweep = 0; sweep < 2000; sweep++)
        {
            for (int p = 0; p < _k; p++)
            {
                double rest = v0[p];
                for (int q = 0; q < _k; q++) if (q != p) rest += _m[p, q] * F(q, v[q]);
                if (!SolveOne(p, rest, _m[p, p], v[p], out v[p], out _)) return false;
            }
            if (Residual(v0, v, _g) <= Tolerance(v)) return Done(v);
        }
        return false;
    }

    bool Done(double[] v)
    {
        for (int p = 0; p < _k; p++) _currents[p] = _laws[p].Current(v[p], out _);
        return true;
    }

    static double Tolerance(ReadOnlySpan<double> v)
    {
        double scale = 1;
        foreach (double x in v) scale = Math.Max(scale, Math.Abs(x));
        return 1e-12 * scale;
    }

    /// <summary>g(v) = v − v0 − M·c·f(v) into <paramref name="g"/>; returns max |g|.</summary>
    double Residual(ReadOnlySpan<double> v0, ReadOnlySpan<double> v, double[] g)
    {
        double worst = 0;
        for (int p = 0; p < _k; p++)
        {
            double s = v[p] - v0[p];
            for (int q = 0; q < _k; q++) s -= _m[p, q] * F(q, v[q]);
            g[p] = s;
            worst = Math.Max(worst, Math.Abs(s));
        }
        return worst;
    }

    double Slope(int q, double v) { _laws[q].Current(v, out double s); return s; }

    bool Newton(ReadOnlySpan<double> v0, double[] v)
    {
        double norm = Residual(v0, v, _g);
        for (int it = 0; it < 100; it++)
        {
            if (norm <= Tolerance(v)) return true;
            for (int p = 0; p < _k; p++)
                for (int q = 0; q < _k; q++)
                    _jac[p * _k + q] = (p == q ? 1 : 0) - _m[p, q] * _c * Slope(q, v[q]);
            for (int p = 0; p < _k; p++) _step[p] = -_g[p];
            if (!Dense.SolveInPlace(_jac, _step, _k)) return false;
            double lambda = 1, trialNorm = double.PositiveInfinity;
            for (int half = 0; half < 40; half++, lambda /= 2)
            {
                for (int p = 0; p < _k; p++) _trial[p] = v[p] + lambda * _step[p];
                trialNorm = Residual(v0, _trial, _g);
                if (trialNorm < norm) break;
            }
            if (!(trialNorm < norm)) return false;
            Array.Copy(_trial, v, _k);
            norm = trialNorm;
        }
        return norm <= Tolerance(v);
    }

    /// <summary>Solves x − rest − m·c·f_p(x) = 0 for one part by safeguarded Newton on a bracket.</summary>
    bool SolveOne(int p, double rest, double m, double guess, out double x, out double current)
    {
        var law = _laws[p];
        double last = 0, slope = 0;   // f and f′ at the latest point G was evaluated at: the root's current when G ends there
        double G(double y) { last = law.Current(y, out slope); return y - rest - m * _c * last; }
        bool Found(double y, out double at, out double i) { at = y; G(y); i = last; return true; }
        x = double.IsFinite(guess) ? guess : rest;
        double at = x, lo0, hi0;
        last = law.Piece(x, out slope, out lo0, out hi0);
        double gx = x - rest - m * _c * last;
        current = last;
        double tol = 1e-13 * Math.Max(1, Math.Abs(rest));
        if (Math.Abs(gx) <= tol) return true;
        // One Newton step first: on the law's piece holding the root it lands on the root (to rounding); when it lands
        // inside the piece the guess was on, that piece's line gives the current there without another evaluation.
        double d = 1 - m * _c * slope;
        if (d > 0)
        {
            double y = x - gx / d;
            if (y >= lo0 && y < hi0) { current = last + slope * (y - at); x = y; return true; }
            double gy = G(y);
            if (Math.Abs(gy) <= tol) { x = y; current = last; return true; }
        }
        // A bracket: with slope ≥ 1 the root is within |g(x)| of x; wider if the law falls somewhere.
        double lo = x, glo = gx, width = Math.Max(Math.Abs(gx), 1e-12);
        double hi = x, ghi = gx;
        for (int grow = 0; grow < 200 && Math.Sign(glo) == Math.Sign(ghi); grow++)
        {
            if (gx > 0) { lo = x - width; glo = G(lo); }
            else { hi = x + width; ghi = G(hi); }
            width *= 2;
            if (!double.IsFinite(width)) break;
        }
        if (Math.Sign(glo) == Math.Sign(ghi)) { current = double.NaN; return false; }
        if (glo > 0) { (lo, hi) = (hi, lo); } // keep g(lo) < 0 < g(hi), lo and hi in either order
        x = 0.5 * (lo + hi);
        for (int it = 0; it < 200; it++)
        {
            double g = G(x);
            if (Math.Abs(g) <= tol) { current = last; return true; }
            if (g < 0) lo = x; else hi = x;
            double dg = 1 - m * _c * slope;
            double next = dg != 0 ? x - g / dg : double.NaN;
            if (!(next > Math.Min(lo, hi) && next < Math.Max(lo, hi))) next = 0.5 * (lo + hi);
            if (Math.Abs(hi - lo) <= 1e-15 * Math.Max(1, Math.Abs(x))) return Found(next, out x, out current);
            x = next;
        }
        bool ok = Math.Abs(G(x)) <= 1e-9 * Math.Max(1, Math.Abs(rest));
        current = last;
        return ok;
    }
}

/// <summary>Gaussian elimination with partial pivoting for the small dense systems of the parts' Newton steps.</summary>
internal static class Dense
{
    /// <summary>Solves A·x = b in place (A row-major n × n, overwritten; b becomes x); false when A is singular.</summary>
    public static bool SolveInPlace(double[] a, double[] b, int n)
    {
        for (int col = 0; col < n; col++)
        {
            int piv = col;
            for (int r = col + 1; r < n; r++) if (Math.Abs(a[r * n + col]) > Math.Abs(a[piv * n + col])) piv = r;
            if (a[piv * n + col] == 0 || !double.IsFinite(a[piv * n + col])) return false;
            if (piv != col)
            {
                for (int c = 0; c < n; c++) (a[col * n + c], a[piv * n + c]) = (a[piv * n + c], a[col * n + c]);
                (b[col], b[piv]) = (b[piv], b[col]);
            }
            for (int r = col + 1; r < n; r++)
            {
                double f = a[r * n + col] / a[col * n + col];
                if (f == 0) continue;
                for (int c = col; c < n; c++) a[r * n + c] -= f * a[col * n + c];
                b[r] -= f * b[col];
            }
        }
        for (int r = n - 1; r >= 0; r--)
        {
            double s = b[r];
            for (int c = r + 1; c < n; c++) s -= a[r * n + c] * b[c];
            b[r] = s / a[r * n + r];
        }
        return true;
    }
}
