using Complex = System.Numerics.Complex;
using MathNet.Numerics.LinearAlgebra;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// The sparse LU against MathNet.Numerics' dense LU (the outside reference library) on random tree networks of the shape the
/// junction step builds: junction rows C/dt + G/2 with ±1 for each branch current, branch rows ±1/2 at their ends and −Zeq on the
/// diagonal, with some 0 ohm branches (a shorted load, a 0 ohm series part) whose diagonal is exactly zero. Fixed seeds.
/// </summary>
public class SparseLuTests
{
    /// <summary>A random tree net: junction j &gt; 0 hangs off an earlier one by a series branch; shunts to ground here and there.</summary>
    static (int N, List<(int Row, int Col, double Value)> Entries) TreeNet(int seed, int junctions)
    {
        var rng = new Random(seed);
        var branches = new List<(int A, int B, double Z)>();
        for (int j = 1; j < junctions; j++)
            branches.Add((rng.Next(j), j, rng.Next(8) == 0 ? 0 : Math.Pow(10, rng.NextDouble() * 5 - 2)));
        for (int j = 0; j < junctions; j++)
            if (rng.Next(3) == 0) branches.Add((j, -1, rng.Next(6) == 0 ? 0 : Math.Pow(10, rng.NextDouble() * 5 - 2)));
        int n = junctions + branches.Count;
        var e = new List<(int, int, double)>();
        for (int j = 0; j < junctions; j++) e.Add((j, j, rng.Next(5) == 0 ? 0 : Math.Pow(10, rng.NextDouble() * 3 - 3)));
        for (int b = 0; b < branches.Count; b++)
        {
            var (a, bb, z) = branches[b];
            int row = junctions + b;
            e.Add((a, row, 1)); e.Add((row, a, 0.5));
            if (bb >= 0) { e.Add((bb, row, -1)); e.Add((row, bb, -0.5)); }
            e.Add((row, row, -z));
        }
        return (n, e);
    }

    static Matrix<double> Dense(int n, IEnumerable<(int Row, int Col, double Value)> entries)
    {
        var m = Matrix<double>.Build.Dense(n, n);
        foreach (var (r, c, v) in entries) m[r, c] += v;
        return m;
    }

    [Theory]
    [InlineData(1, 5)]
    [InlineData(2, 20)]
    [InlineData(3, 60)]
    [InlineData(4, 150)]
    [InlineData(5, 300)]
    public void Tree_nets_solve_as_the_dense_LU_does(int seed, int junctions)
    {
        var (n, entries) = TreeNet(seed, junctions);
        var a = Dense(n, entries);
        double cond = a.ConditionNumber();
        Assert.True(cond < 1e10, $"the generated net is ill-conditioned ({cond:G3}); the comparison would say nothing");
        var rng = new Random(100 + seed);
        var b = Enumerable.Range(0, n).Select(_ => rng.NextDouble() * 2 - 1).ToArray();
        var expected = a.LU().Solve(Vector<double>.Build.DenseOfArray(b));
        var lu = SparseLu<double>.Factor(n, entries, Math.Abs);
        Assert.NotNull(lu);
        var x = new double[n];
        lu.Solve(b, x);
        // Both are backward stable: they agree to about cond × machine epsilon relative to the solution's size.
        double tol = 1e-14 * cond * expected.AbsoluteMaximum() + 1e-300;
        for (int i = 0; i < n; i++) Assert.True(Math.Abs(x[i] - expected[i]) <= tol, $"x[{i}] = {x[i]} against {expected[i]} (tolerance {tol:G3})");
        // A tree factors with no fill: the work of a solve stays a small multiple of the entries.
        Assert.True(lu.FactorEntries <= 2L * entries.Count, $"{lu.FactorEntries} factor entries for {entries.Count} matrix entries");
    }

    [Theory]
    [InlineData(11, 40)]
    [InlineData(12, 200)]
    public void Complex_tree_nets_refactored_for_new_values_solve_as_the_dense_LU_does(int seed, int junctions)
    {
        var (n, pattern) = TreeNet(seed, junctions);
        var rng = new Random(seed);
        SparseLu<Complex>? lu = null;
        for (int pass = 0; pass < 3; pass++)
        {
            // The same pattern with new complex values, as one frequency after another (each nonzero turned by a random phase).
            var entries = pattern.Select(t => (t.Row, t.Col, t.Value * Complex.FromPolarCoordinates(1, rng.NextDouble() - 0.5))).ToList();
            var a = Matrix<Complex>.Build.Dense(n, n);
            foreach (var (r, c, v) in entries) a[r, c] += v;
            double cond = a.ConditionNumber().Real;
            Assert.True(cond < 1e10, $"ill-conditioned ({cond:G3})");
            var b = Enumerable.Range(0, n).Select(_ => new Complex(rng.NextDouble(), rng.NextDouble())).ToArray();
            var expected = a.LU().Solve(Vector<Complex>.Build.DenseOfArray(b));
            static double Norm1(Complex z) => Math.Abs(z.Real) + Math.Abs(z.Imaginary);
            if (lu is null || !lu.Refactor(entries)) lu = SparseLu<Complex>.Factor(n, entries, Norm1);
            Assert.NotNull(lu);
            var x = new Complex[n];
            lu.Solve(b, x);
            double tol = 1e-14 * cond * expected.AbsoluteMaximum().Magnitude;
            for (int i = 0; i < n; i++) Assert.True((x[i] - expected[i]).Magnitude <= tol, $"pass {pass}: x[{i}] = {x[i]} against {expected[i]}");
        }
    }

    [Fact]
    public void A_node_held_at_two_voltages_is_singular()
    {
        // Two 0 ohm branches from one junction to ground: their currents are not defined separately (rows 1 and 2 equal).
        var entries = new List<(int, int, double)> { (0, 1, 1), (0, 2, 1), (1, 0, 0.5), (2, 0, 0.5) };
        Assert.Null(SparseLu<double>.Factor(3, entries, Math.Abs));
    }
}
