using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Lines;

/// <summary>Linear least squares with every unknown kept ≥ 0.</summary>
/// <remarks>
/// The active-set method of Lawson and Hanson, Solving Least Squares Problems, Prentice-Hall 1974, ch. 23 (algorithm NNLS):
/// unknowns enter the free set one at a time by the largest gradient component, and the step back toward the feasible region
/// keeps them non-negative. The unconstrained sub-problems are solved by MathNet's QR decomposition.
/// </remarks>
internal static class NonNegativeLeastSquares
{
    /// <summary>Minimises |A x − b|² subject to x ≥ 0.</summary>
    public static double[] Solve(Matrix<double> a, Vector<double> b)
    {
        int n = a.ColumnCount;
        var x = Vector<double>.Build.Dense(n);
        var free = new bool[n];
        double tol = 1e-12 * a.L1Norm() * b.L2Norm();
        for (int outer = 0; outer < 3 * n + 10; outer++)
        {
            var w = a.TransposeThisAndMultiply(b - a * x);
            int best = -1;
            for (int j = 0; j < n; j++)
                if (!free[j] && w[j] > tol && (best < 0 || w[j] > w[best])) best = j;
            if (best < 0) break;
            free[best] = true;
            for (int inner = 0; inner < 3 * n + 10; inner++)
            {
                var z = SolveFree(a, b, free);
                bool ok = true;
                for (int j = 0; j < n; j++) if (free[j] && z[j] <= 0) ok = false;
                if (ok) { x = z; break; }
                double alpha = 1;
                for (int j = 0; j < n; j++)
                    if (free[j] && z[j] <= 0) alpha = Math.Min(alpha, x[j] / (x[j] - z[j]));
                x += alpha * (z - x);
                for (int j = 0; j < n; j++)
                    if (free[j] && x[j] <= 1e-300) { free[j] = false; x[j] = 0; }
            }
        }
        return x.ToArray();
    }

    static Vector<double> SolveFree(Matrix<double> a, Vector<double> b, bool[] free)
    {
        var cols = Enumerable.Range(0, free.Length).Where(j => free[j]).ToArray();
        var sub = Matrix<double>.Build.Dense(a.RowCount, cols.Length, (r, c) => a[r, cols[c]]);
        var y = sub.QR().Solve(b);
        var z = Vector<double>.Build.Dense(free.Length);
        for (int c = 0; c < cols.Length; c++) z[cols[c]] = y[c];
        return z;
    }
}
