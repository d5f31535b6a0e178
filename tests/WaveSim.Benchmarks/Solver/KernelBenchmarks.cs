using System.Numerics;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using WaveSim.Core.Solver;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// One leapfrog step of a single segment, repeated: the plain scalar loops (baseline) against the solver's fused vectorised kernel,
/// with uniform and with per-cell coefficients. Every invocation does exactly <see cref="UpdatesPerInvoke"/> cell updates, so
/// Mean reads as ns per cell update and the "Cell updates/s" column is 1e9 / Mean.
/// </summary>
[Config(typeof(Config))]
[MemoryDiagnoser]
public class KernelBenchmarks
{
    /// <summary>Cells × steps per invocation (the same for every size).</summary>
    public const int UpdatesPerInvoke = 10_000_000;

    sealed class Config : ManualConfig
    {
        public Config() => AddColumn(new CellUpdatesColumn());
    }

    /// <summary>Cells in the line.</summary>
    [Params(1_000, 10_000, 100_000, 1_000_000)]
    public int Cells { get; set; }

    /// <summary>True: R = G = 0 (the self coefficients are exactly 1); false: a lossy line.</summary>
    [Params(false, true)]
    public bool Lossless { get; set; }

    SegmentKernel _kernel = null!;
    CellCoefficients _perCell = null!;
    double[] _v = [], _i = [];
    int _steps;

    /// <summary>Builds the line of <c>wavesim bench</c> and a tapered copy of its coefficients for the per-cell kernel.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _kernel = KernelBench.TestLine(Cells, Lossless, out _v, out _i);
        _steps = UpdatesPerInvoke / Cells;
        // Per cell: impedance tapered ±20 % along the line at Courant number 0.99, same losses (stable: Ci2·Cv2 < 1 everywhere).
        int n = Cells;
        double Z(double k) => 50 * (1 + 0.2 * Math.Sin(2 * Math.PI * k / n));
        var ci1 = new double[n]; var ci2 = new double[n]; var cv1 = new double[n + 1]; var cv2 = new double[n + 1];
        for (int k = 0; k < n; k++) { ci1[k] = _kernel.Ci1; ci2[k] = 0.99 / Z(k + 0.5); }
        for (int k = 0; k <= n; k++) { cv1[k] = _kernel.Cv1; cv2[k] = 0.99 * Z(k); }
        _perCell = new CellCoefficients(ci1, ci2, cv1, cv2);
    }

    /// <summary>The two scalar passes as plain loops over the arrays.</summary>
    [Benchmark(Baseline = true, OperationsPerInvoke = UpdatesPerInvoke)]
    public double Scalar()
    {
        double[] v = _v, i = _i;
        double a = _kernel.Ci1, b = _kernel.Ci2, c = _kernel.Cv1, d = _kernel.Cv2;
        int n = i.Length;
        for (int s = 0; s < _steps; s++)
        {
            for (int k = 0; k < n; k++) i[k] = a * i[k] + b * (v[k] - v[k + 1]);
            for (int k = 1; k < n; k++) v[k] = c * v[k] + d * (i[k - 1] - i[k]);
        }
        return v[n / 2];
    }

    /// <summary>
    /// The two passes each vectorised on their own (System.Numerics.Vector, fused multiply-add), without the fusion of the two
    /// passes into one sweep: the step between <see cref="Scalar"/> and <see cref="Uniform"/>, so each gain shows in one run.
    /// </summary>
    [Benchmark(OperationsPerInvoke = UpdatesPerInvoke)]
    public double TwoPassVector()
    {
        var v = _v.AsSpan(); var i = _i.AsSpan();
        double a = _kernel.Ci1, b = _kernel.Ci2, c = _kernel.Cv1, d = _kernel.Cv2;
        var va = new Vector<double>(a); var vb = new Vector<double>(b); var vc = new Vector<double>(c); var vd = new Vector<double>(d);
        int n = i.Length, w = Vector<double>.Count;
        for (int s = 0; s < _steps; s++)
        {
            int k = 0;
            for (; k <= n - w; k += w)
                Vector.FusedMultiplyAdd(vb, new Vector<double>(v[k..]) - new Vector<double>(v[(k + 1)..]), va * new Vector<double>(i[k..])).CopyTo(i[k..]);
            for (; k < n; k++) i[k] = Math.FusedMultiplyAdd(b, v[k] - v[k + 1], a * i[k]);
            for (k = 1; k <= n - w; k += w)
                Vector.FusedMultiplyAdd(vd, new Vector<double>(i[(k - 1)..]) - new Vector<double>(i[k..]), vc * new Vector<double>(v[k..])).CopyTo(v[k..]);
            for (; k < n; k++) v[k] = Math.FusedMultiplyAdd(d, i[k - 1] - i[k], c * v[k]);
        }
        return v[n / 2];
    }

    /// <summary>The solver's step with uniform coefficients (what a run uses).</summary>
    [Benchmark(OperationsPerInvoke = UpdatesPerInvoke)]
    public double Uniform()
    {
        for (int s = 0; s < _steps; s++) _kernel.Step(_v, _i);
        return _v[Cells / 2];
    }

    /// <summary>The scalar passes with a coefficient per cell.</summary>
    [Benchmark(OperationsPerInvoke = UpdatesPerInvoke)]
    public double ScalarPerCell()
    {
        double[] v = _v, i = _i, a = _perCell.Ci1, b = _perCell.Ci2, c = _perCell.Cv1, d = _perCell.Cv2;
        int n = i.Length;
        for (int s = 0; s < _steps; s++)
        {
            for (int k = 0; k < n; k++) i[k] = a[k] * i[k] + b[k] * (v[k] - v[k + 1]);
            for (int k = 1; k < n; k++) v[k] = c[k] * v[k] + d[k] * (i[k - 1] - i[k]);
        }
        return v[n / 2];
    }

    /// <summary>The fused vectorised step with a coefficient per cell.</summary>
    [Benchmark(OperationsPerInvoke = UpdatesPerInvoke)]
    public double PerCell()
    {
        for (int s = 0; s < _steps; s++) LeapfrogKernel.Step(_v, _i, _perCell);
        return _v[Cells / 2];
    }
}
