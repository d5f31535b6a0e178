using System.Runtime.Intrinsics;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// The fused, vectorised step against the plain scalar update it replaces: the staggered leapfrog of the telegrapher's equations,
/// I ← Ci1·I + Ci2·(V[k] − V[k+1]) over all half cells, then V ← Cv1·V + Cv2·(I[k−1] − I[k]) over the interior nodes
/// (Yee, IEEE Trans. AP-14, 1966; Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, FDTD chapter),
/// each sum taken as one IEEE 754-2008 fusedMultiplyAdd (section 5.4.1: rounded once), here through Math.FusedMultiplyAdd.
/// Every comparison is bit for bit: the kernel does the same operations in the same order.
/// </summary>
public class LeapfrogKernelTests
{
    // Lengths around every vector width and unroll boundary (2, 4, 8 doubles; four times that per turn).
    public static TheoryData<int> Lengths => new() { 1, 2, 3, 4, 5, 7, 8, 9, 15, 16, 17, 31, 32, 33, 63, 64, 65, 100, 1001 };

    const int Steps = 25;

    static void Reference(double[] v, double[] i, double ci1, double ci2, double cv1, double cv2)
    {
        int n = i.Length;
        for (int k = 0; k < n; k++) i[k] = Math.FusedMultiplyAdd(ci2, v[k] - v[k + 1], ci1 * i[k]);
        for (int k = 1; k < n; k++) v[k] = Math.FusedMultiplyAdd(cv2, i[k - 1] - i[k], cv1 * v[k]);
    }

    static void ReferencePerCell(double[] v, double[] i, CellCoefficients c)
    {
        int n = i.Length;
        for (int k = 0; k < n; k++) i[k] = Math.FusedMultiplyAdd(c.Ci2[k], v[k] - v[k + 1], c.Ci1[k] * i[k]);
        for (int k = 1; k < n; k++) v[k] = Math.FusedMultiplyAdd(c.Cv2[k], i[k - 1] - i[k], c.Cv1[k] * v[k]);
    }

    /// <summary>Random state on a stable line (Courant number below 1): values in [−1, 1].</summary>
    static (double[] V, double[] I) State(int n, int seed)
    {
        var rng = new Random(seed);
        var v = new double[n + 1];
        var i = new double[n];
        for (int k = 0; k <= n; k++) v[k] = 2 * rng.NextDouble() - 1;
        for (int k = 0; k < n; k++) i[k] = (2 * rng.NextDouble() - 1) / 50;
        return (v, i);
    }

    static (double Ci1, double Ci2, double Cv1, double Cv2) Coefficients(int seed, bool lossless)
    {
        var rng = new Random(seed + 1000);
        double s = 0.5 + 0.49 * rng.NextDouble(), z0 = 20 + 80 * rng.NextDouble();
        return lossless ? (1, s / z0, 1, s * z0) : (1 - 0.01 * rng.NextDouble(), s / z0, 1 - 0.01 * rng.NextDouble(), s * z0);
    }

    static void AssertSame(double[] expected, double[] actual, string what)
    {
        Assert.Equal(expected.Length, actual.Length);
        for (int k = 0; k < expected.Length; k++)
            Assert.True(BitConverter.DoubleToInt64Bits(expected[k]) == BitConverter.DoubleToInt64Bits(actual[k]),
                $"{what}[{k}]: expected {expected[k]:R}, got {actual[k]:R}");
    }

    static void CheckUniform(int n, bool lossless, Action<double[], double[], double, double, double, double> kernel)
    {
        var (ci1, ci2, cv1, cv2) = Coefficients(n, lossless);
        var (v, i) = State(n, n);
        var (rv, ri) = ((double[])v.Clone(), (double[])i.Clone());
        for (int s = 0; s < Steps; s++)
        {
            kernel(v, i, ci1, ci2, cv1, cv2);
            Reference(rv, ri, ci1, ci2, cv1, cv2);
        }
        AssertSame(rv, v, "V");
        AssertSame(ri, i, "I");
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void Dispatched_step_equals_the_scalar_update_bit_for_bit(int n)
    {
        CheckUniform(n, false, (v, i, a, b, c, d) => LeapfrogKernel.Step(v, i, a, b, c, d));
        CheckUniform(n, true, (v, i, a, b, c, d) => LeapfrogKernel.Step(v, i, a, b, c, d));
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void Every_vector_width_equals_the_scalar_update_bit_for_bit(int n)
    {
        // Widths this machine lacks run in software: slower, but the same arithmetic, so the body is checked on any host.
        CheckUniform(n, false, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes128, Vector128<double>, ScaledSelf>(v, i, a, b, c, d));
        CheckUniform(n, false, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes256, Vector256<double>, ScaledSelf>(v, i, a, b, c, d));
        CheckUniform(n, false, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes512, Vector512<double>, ScaledSelf>(v, i, a, b, c, d));
        CheckUniform(n, true, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes128, Vector128<double>, UnitSelf>(v, i, a, b, c, d));
        CheckUniform(n, true, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes256, Vector256<double>, UnitSelf>(v, i, a, b, c, d));
        CheckUniform(n, true, (v, i, a, b, c, d) => LeapfrogKernel.Uniform<Lanes512, Vector512<double>, UnitSelf>(v, i, a, b, c, d));
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void Per_cell_step_equals_the_scalar_update_bit_for_bit_on_every_width(int n)
    {
        var rng = new Random(7 * n);
        double[] Draw(int len, double lo, double hi) => Enumerable.Range(0, len).Select(_ => lo + (hi - lo) * rng.NextDouble()).ToArray();
        // A line whose impedance and loss change from cell to cell, Courant number below 1 everywhere.
        double[] z = Draw(n + 1, 30, 90);
        var c = new CellCoefficients(Draw(n, 0.99, 1), Enumerable.Range(0, n).Select(k => 0.9 / z[k]).ToArray(),
                                     Draw(n + 1, 0.99, 1), Enumerable.Range(0, n + 1).Select(k => 0.9 * z[k]).ToArray());
        var kernels = new Action<double[], double[]>[]
        {
            (v, i) => LeapfrogKernel.Step(v, i, c),
            (v, i) => LeapfrogKernel.PerCell<Lanes128, Vector128<double>>(v, i, c),
            (v, i) => LeapfrogKernel.PerCell<Lanes256, Vector256<double>>(v, i, c),
            (v, i) => LeapfrogKernel.PerCell<Lanes512, Vector512<double>>(v, i, c),
        };
        foreach (var kernel in kernels)
        {
            var (v, i) = State(n, n + 1);
            var (rv, ri) = ((double[])v.Clone(), (double[])i.Clone());
            for (int s = 0; s < Steps; s++)
            {
                kernel(v, i);
                ReferencePerCell(rv, ri, c);
            }
            AssertSame(rv, v, "V");
            AssertSame(ri, i, "I");
        }
    }

    [Fact]
    public void End_nodes_are_left_to_the_junctions()
    {
        var (v, i) = State(64, 3);
        double first = v[0], last = v[^1];
        LeapfrogKernel.Step(v, i, 0.99, 0.01, 0.99, 40);
        Assert.Equal(first, v[0]);
        Assert.Equal(last, v[^1]);
    }

    [Fact]
    public void Mismatched_array_lengths_are_refused()
    {
        Assert.Throws<ArgumentException>(() => LeapfrogKernel.Step(new double[10], new double[10], 1, 1, 1, 1));
    }

    [Fact]
    public void A_run_gives_the_same_waveforms_as_the_unfused_two_pass_update()
    {
        // With energy tracking on, the solver runs the scalar current pass and the scalar voltage pass separately over all
        // segments; without it, the fused vectorised step. The probes must agree bit for bit (same scheme, Yee 1966).
        const string yaml = @"
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 10 ohm }
line: [ { segment: { length: 1 m, z0: 50 ohm, delay: 5 ns, r: 20 ohm/m, g: 0.001 S/m } }, { shunt: { c: 2 pF } }, { segment: { length: 0.3 m, z0: 65 ohm, delay: 1.7 ns } } ]
load: { r: 75 ohm, c: 1 pF }
probes: [ { name: src, at: source }, { name: mid, at: 0.5 m }, { name: rx, at: load } ]
simulation: { duration: 20 ns, resolution: 10 }
";
        var fused = TestScenarios.Run(yaml);
        var twoPass = TestScenarios.Run(yaml, new SimulationOptions { TrackEnergy = true });
        foreach (var p in fused.Probes)
        {
            AssertSame(twoPass.Probe(p.Name).Volts, p.Volts, p.Name + " V");
            AssertSame(twoPass.Probe(p.Name).Amps, p.Amps, p.Name + " I");
        }
    }
}
