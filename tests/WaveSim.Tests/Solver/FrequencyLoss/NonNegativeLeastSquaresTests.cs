using MathNet.Numerics.LinearAlgebra;
using WaveSim.Core.Lines;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>The non-negative least-squares solver used for the residues.</summary>
public class NonNegativeLeastSquaresTests
{
    [Fact]
    public void Solution_meets_the_Karush_Kuhn_Tucker_conditions()
    {
        // Optimality of min |Ax − b|² subject to x ≥ 0 (Karush-Kuhn-Tucker; Lawson and Hanson, Solving Least Squares Problems,
        // 1974, ch. 23): x ≥ 0, the gradient w = Aᵀ(b − Ax) is ≤ 0 where x = 0 and 0 where x > 0.
        var rng = new Random(7);
        for (int trial = 0; trial < 20; trial++)
        {
            var a = Matrix<double>.Build.Dense(30, 8, (_, _) => rng.NextDouble() - 0.5);
            var b = Vector<double>.Build.Dense(30, _ => rng.NextDouble() - 0.5);
            var x = Vector<double>.Build.DenseOfArray(NonNegativeLeastSquares.Solve(a, b));
            var w = a.TransposeThisAndMultiply(b - a * x);
            double scale = a.L1Norm() * b.L2Norm();
            for (int j = 0; j < x.Count; j++)
            {
                Assert.True(x[j] >= 0);
                if (x[j] > 0) Assert.True(Math.Abs(w[j]) < 1e-9 * scale, $"trial {trial}: w[{j}] = {w[j]} on a free unknown");
                else Assert.True(w[j] < 1e-9 * scale, $"trial {trial}: w[{j}] = {w[j]} > 0 on a bound unknown");
            }
        }
    }

    [Fact]
    public void A_problem_with_a_positive_unconstrained_solution_gives_that_solution()
    {
        // When the ordinary least-squares solution is already ≥ 0 it is the constrained optimum too (MathNet QR as reference).
        var a = Matrix<double>.Build.DenseOfArray(new double[,] { { 1, 0.2 }, { 0.3, 1 }, { 0.5, 0.5 } });
        var b = Vector<double>.Build.DenseOfArray([1.0, 2.0, 1.6]);
        var reference = a.QR().Solve(b);
        Assert.True(reference.All(v => v > 0));
        var x = NonNegativeLeastSquares.Solve(a, b);
        Assert.Equal(reference[0], x[0], 12);
        Assert.Equal(reference[1], x[1], 12);
    }
}
