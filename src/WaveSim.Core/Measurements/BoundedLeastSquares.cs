using System.Globalization;
using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Bounded nonlinear least squares for a black-box residual function (each call may be a whole simulation):
/// Levenberg-Marquardt on MathNet.Numerics linear algebra, with the bounds built in by a change of variables.
/// </summary>
/// <remarks>
/// <para>Method: K. Levenberg, Q. Appl. Math. 2:164-168, 1944; D. W. Marquardt, J. SIAM 11(2):431-441, 1963. The step
/// solves (JᵀJ + λ·diag(JᵀJ))·δ = -Jᵀr; λ falls tenfold after a step that lowers the sum of squares and rises
/// tenfold after one that does not. J is a forward-difference Jacobian (n evaluations). It is written here rather than
/// taken from MathNet's minimiser so that every residual evaluation is counted against the budget and the
/// cancellation token is checked before each one.</para>
/// <para>Bounds: the search runs on unbounded internal variables u (the transformations of F. James, MINUIT reference
/// manual, CERN Program Library D506; from memory): both bounds x = lo + (hi - lo)(1 + sin u)/2; lower only
/// x = lo + s(√(u² + 1) - 1); upper only x = hi - s(√(u² + 1) - 1), s the scale of the start; none x = u.
/// A start on a bound is moved 1e-6 of the range inside (the sine is flat there).</para>
/// <para>Uncertainty: the Jacobian in the external parameters at the solution (n more evaluations, one-sided
/// away from a bound), cov = s²·(JᵀJ)⁻¹, s² = SSR/(m - n).</para>
/// </remarks>
public static class BoundedLeastSquares
{
    static readonly double Sqrt2Eps = Math.Sqrt(2.220446049250313e-16);
    /// <summary>Default relative reduction of the sum of squares below which a successful step counts as converged: 1e-14.</summary>
    public const double DefaultReductionTolerance = 1e-14;
    const double StepTolerance = 1e-12;

    /// <summary>Minimises the sum of squares of <paramref name="residuals"/> within the bounds.</summary>
    /// <param name="residuals">Residual vector for a parameter vector; the same length m ≥ 1 on every call.</param>
    /// <param name="start">Starting parameters, inside the bounds, of the right order of magnitude (it sets the difference steps).</param>
    /// <param name="lower">Lower bounds; double.NegativeInfinity for none.</param>
    /// <param name="upper">Upper bounds; double.PositiveInfinity for none. Each must exceed its lower bound.</param>
    /// <param name="maxEvaluations">Budget of residual evaluations. Must be at least 2n + 2.</param>
    /// <param name="ct">Checked before every evaluation.</param>
    /// <param name="reductionTolerance">The fit has converged when a successful step lowers the sum of squares by no more than
    /// this fraction of it. Default <see cref="DefaultReductionTolerance"/>; a noisy or slightly discontinuous residual (a
    /// simulation on a grid) wants a looser one. Must be in [0, 1).</param>
    /// <returns>Best parameters, their standard deviations, the RMS residual and the evaluation count.</returns>
    /// <exception cref="InputException">Inconsistent sizes, bounds or start.</exception>
    /// <exception cref="NumericalException">The residuals at the start are not finite or change length.</exception>
    /// <exception cref="OperationCanceledException"><paramref name="ct"/> was cancelled.</exception>
    public static LeastSquaresResult Fit(Func<double[], double[]> residuals, double[] start, double[] lower, double[] upper,
        int maxEvaluations, CancellationToken ct = default, double reductionTolerance = DefaultReductionTolerance)
    {
        ArgumentNullException.ThrowIfNull(residuals);
        if (!(reductionTolerance >= 0 && reductionTolerance < 1))
            throw new ArgumentOutOfRangeException(nameof(reductionTolerance), reductionTolerance, "Must be in [0, 1).");
        int n = start.Length;
        Validate(start, lower, upper, maxEvaluations);
        var transforms = new ParameterTransform[n];
        var u = Vector<double>.Build.Dense(n);
        for (int j = 0; j < n; j++)
        {
            transforms[j] = new ParameterTransform(lower[j], upper[j], start[j]);
            u[j] = transforms[j].ToInternal(start[j]);
        }

        int evaluations = 0;
        int m = -1;
        Vector<double> Evaluate(double[] x)
        {
            ct.ThrowIfCancellationRequested();
            evaluations++;
            double[] r = residuals(x);
            if (m < 0)
                m = r.Length;
            if (r.Length != m || m == 0)
                throw new NumericalException($"the residual function returned {r.Length} values, expected {(m == 0 ? "at least 1" : m)}");
            return Vector<double>.Build.DenseOfArray(r);
        }
        double[] External(Vector<double> internalU)
        {
            var x = new double[n];
            for (int j = 0; j < n; j++)
                x[j] = transforms[j].ToExternal(internalU[j]);
            return x;
        }

        // The difference step's scale in u. A bounded variable's u is an angle or a ratio of order one, so its step is
        // √(2ε) whatever u is: scaled by |u| instead, a start at the centre of symmetric bounds (u = asin(≈1e-16)) got a step of
        // 1e-24, its Jacobian column came out zero and the variable never moved. An unbounded u is the parameter itself.
        var typical = Vector<double>.Build.Dense(n, j => transforms[j].Bounded ? 1.0 : Math.Abs(u[j]) > 0 ? Math.Abs(u[j]) : 1.0);
        Vector<double> res = Evaluate(External(u));
        double ssr = res.DotProduct(res);
        if (!double.IsFinite(ssr))
            throw new NumericalException("the residuals at the start of the fit are not finite");

        double lambda = 1e-3;
        bool converged = ssr == 0;
        while (!converged && evaluations + 2 * n + 1 <= maxEvaluations)
        {
            Matrix<double> jac = Jacobian(u, res, typical, External, Evaluate);
            Matrix<double> a = jac.TransposeThisAndMultiply(jac);
            Vector<double> g = jac.TransposeThisAndMultiply(res);
            double diagFloor = 1e-12 * Math.Max(a.Diagonal().Maximum(), double.Epsilon);
            bool improved = false;
            while (evaluations + n + 1 <= maxEvaluations)
            {
                Matrix<double> damped = a.Clone();
                for (int j = 0; j < n; j++)
                    damped[j, j] += lambda * Math.Max(a[j, j], diagFloor);
                Vector<double> delta;
                try
                {
                    delta = damped.Cholesky().Solve(-g);
                }
                catch (ArgumentException)
                {
                    lambda *= 10;   // not positive definite at this damping
                    if (lambda > 1e16)
                        break;
                    continue;
                }
                if (!delta.ForAll(double.IsFinite))
                {
                    lambda *= 10;
                    if (lambda > 1e16)
                        break;
                    continue;
                }
                if (delta.L2Norm() <= StepTolerance * (u.L2Norm() + StepTolerance))
                {
                    converged = true;   // no step left that the parameters can resolve
                    break;
                }
                Vector<double> uNew = u + delta;
                Vector<double> resNew = Evaluate(External(uNew));
                double ssrNew = resNew.DotProduct(resNew);
                if (double.IsFinite(ssrNew) && ssrNew < ssr)
                {
                    converged = ssr - ssrNew <= reductionTolerance * ssr;
                    u = uNew;
                    res = resNew;
                    ssr = ssrNew;
                    lambda = Math.Max(lambda / 10, 1e-12);
                    improved = true;
                    break;
                }
                lambda *= 10;
                if (lambda > 1e16)
                {
                    converged = true;   // no descent direction at this precision: a minimum
                    break;
                }
            }
            if (!improved && !converged)
                break;   // out of evaluations inside the damping loop
        }

        double[] values = External(u);
        double[] sigma = Uncertainty(values, res, lower, upper, Evaluate, maxEvaluations - evaluations);
        return new LeastSquaresResult(values, sigma, Math.Sqrt(ssr / res.Count), evaluations, converged);
    }

    static Matrix<double> Jacobian(Vector<double> u, Vector<double> res, Vector<double> typical,
        Func<Vector<double>, double[]> external, Func<double[], Vector<double>> evaluate)
    {
        int n = u.Count;
        var jac = Matrix<double>.Build.Dense(res.Count, n);
        for (int j = 0; j < n; j++)
        {
            Vector<double> shifted = u.Clone();
            double h = Sqrt2Eps * Math.Max(Math.Abs(u[j]), typical[j]);
            shifted[j] += h;
            h = shifted[j] - u[j];   // the step actually taken in floating point
            Vector<double> r = evaluate(external(shifted));
            jac.SetColumn(j, (r - res) / h);
        }
        return jac;
    }

    static double[] Uncertainty(double[] x, Vector<double> res, double[] lower, double[] upper,
        Func<double[], Vector<double>> evaluate, int budget)
    {
        int n = x.Length, m = res.Count;
        var sigma = Enumerable.Repeat(double.NaN, n).ToArray();
        if (m <= n || budget < n)
            return sigma;
        var jac = Matrix<double>.Build.Dense(m, n);
        for (int j = 0; j < n; j++)
        {
            double range = upper[j] - lower[j];
            double scale = x[j] != 0 ? Math.Abs(x[j]) : double.IsFinite(range) ? range : 1.0;
            double h = Sqrt2Eps * scale;
            if (x[j] + h > upper[j])
                h = -h;   // step away from the upper bound
            var shifted = (double[])x.Clone();
            shifted[j] += h;
            h = shifted[j] - x[j];
            jac.SetColumn(j, (evaluate(shifted) - res) / h);
        }
        Matrix<double> a = jac.TransposeThisAndMultiply(jac);
        double s2 = res.DotProduct(res) / (m - n);
        var lu = a.LU();
        if (lu.Determinant == 0)
            return sigma;
        Matrix<double> cov = lu.Inverse() * s2;
        for (int j = 0; j < n; j++)
            sigma[j] = cov[j, j] >= 0 ? Math.Sqrt(cov[j, j]) : double.NaN;
        return sigma;
    }

    static void Validate(double[] start, double[] lower, double[] upper, int maxEvaluations)
    {
        ArgumentNullException.ThrowIfNull(start);
        ArgumentNullException.ThrowIfNull(lower);
        ArgumentNullException.ThrowIfNull(upper);
        int n = start.Length;
        if (n == 0)
            throw new InputException("the fit has no parameters");
        if (lower.Length != n || upper.Length != n)
            throw new InputException($"the fit has {n} parameters but {lower.Length} lower and {upper.Length} upper bounds");
        for (int j = 0; j < n; j++)
        {
            if (double.IsNaN(lower[j]) || double.IsNaN(upper[j]) || !(upper[j] > lower[j]))
                throw new InputException($"fit parameter {j + 1}: bounds [{Text(lower[j])}, {Text(upper[j])}] are not an interval");
            if (!double.IsFinite(start[j]) || start[j] < lower[j] || start[j] > upper[j])
                throw new InputException($"fit parameter {j + 1}: start {Text(start[j])} is outside [{Text(lower[j])}, {Text(upper[j])}]");
        }
        if (maxEvaluations < 2 * n + 2)
            throw new InputException($"the fit needs at least {2 * n + 2} evaluations for {n} parameters, got {maxEvaluations}");
    }

    static string Text(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
