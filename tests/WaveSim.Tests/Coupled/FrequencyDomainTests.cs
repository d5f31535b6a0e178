using Complex = System.Numerics.Complex;
using MathNet.Numerics.IntegralTransforms;
using MathNet.Numerics.LinearAlgebra;
using WaveSim.Core.Coupled;
using WaveSim.Core.Model;
using static WaveSim.Tests.Coupled.CoupledNets;

namespace WaveSim.Tests.Coupled;

/// <summary>
/// The time-domain waveforms against an independent frequency-domain solution computed here: the chain matrix of each
/// section, exp(A·len) with A = [[0, −Z], [−Y, 0]], Z = R + jωL, Y = G + jωC, from the eigen-decomposition of A (the
/// chain-parameter solution of the multiconductor line, Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008;
/// from memory; MathNet's eigen solver), the end networks as admittances, and the source's spectrum by FFT.
/// </summary>
public class FrequencyDomainTests
{
    const double Vs = 1, Rs = 50, Rq = 50, Lq = 2e-9, Rf = 55, Rd = 150, Width = 250e-12;
    static readonly double Len1 = 6 * Inch, Len2 = 2 * Inch;

    static CoupledSection First(bool lossy) => new(Len1,
        Scaled(M([9.9, 1.5], [1.5, 9.9]), NanoHenryPerInch), Scaled(M([3.6, -0.4], [-0.4, 3.6]), PicoFaradPerInch),
        lossy ? M([20, 3], [3, 25]) : ConductorMatrix.Zero(2), lossy ? M([2e-3, -2e-4], [-2e-4, 2e-3]) : ConductorMatrix.Zero(2));

    static CoupledSection Second() => CoupledSection.Lossless(Len2,
        Scaled(M([8.5, 0.6], [0.6, 9.0]), NanoHenryPerInch), Scaled(M([3.3, -0.2], [-0.2, 3.2]), PicoFaradPerInch));

    static SourceSpec Bump => new() { Waveform = WaveformKind.Gaussian, High = Vs, Width = Width, Delay = 0.2e-9, Resistance = Rs };

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Time_domain_waveforms_agree_with_the_chain_matrix_solution_within_half_a_percent(bool lossy)
    {
        var sections = new[] { First(lossy), Second() };
        var near = new List<EndBranch> { new(0, null, Rs, Source: new CoupledSource(Bump)), new(1, null, Rq, Lq) };
        var far = new List<EndBranch> { Resistor(0, Rf), Resistor(1, Rf), Resistor(0, Rd, to: 1) };
        var r = Solve(Net(sections, near, far, 6e-9));

        // The frequency-domain solution on an FFT grid long enough for the response to die out.
        const int n = 1 << 14;
        const double h = 5e-12;
        var spectrum = new Complex[n];
        for (int k = 0; k < n; k++) spectrum[k] = Bump.Value(k * h);
        Fourier.Forward(spectrum, FourierOptions.Matlab);
        var outs = new Complex[4][];
        for (int p = 0; p < 4; p++) outs[p] = new Complex[n];
        for (int k = 0; k <= n / 2; k++)
        {
            double w = 2 * Math.PI * k / (n * h);
            var (v0, vl) = Chain(sections, w);
            for (int p = 0; p < 4; p++)
            {
                Complex x = (p switch { 0 => v0[0], 1 => v0[1], 2 => vl[0], _ => vl[1] }) * spectrum[k];
                outs[p][k] = x;
                if (k > 0 && k < n / 2) outs[p][n - k] = Complex.Conjugate(x);
            }
        }
        foreach (var o in outs) Fourier.Inverse(o, FourierOptions.Matlab);
        string[] names = ["c0_near", "c1_near", "c0_far", "c1_far"];
        double peak = 0;
        for (int p = 0; p < 4; p++)
        {
            var probe = r.Probe(names[p]);
            double worst = 0;
            for (int i = 0; i < r.Time.Length; i++)
            {
                double t = r.Time[i], x = t / h;
                int k = (int)x;
                double f = x - k, reference = outs[p][k].Real * (1 - f) + outs[p][k + 1].Real * f;
                worst = Math.Max(worst, Math.Abs(probe.Volts[i] - reference));
                peak = Math.Max(peak, Math.Abs(reference));
            }
            Assert.True(worst < 0.005 * Vs, $"{names[p]}: largest difference {worst:E3} V");
        }
        Assert.True(peak > 0.3 * Vs, "the pulse was seen");
    }

    /// <summary>Near- and far-end voltages per volt of source at angular frequency <paramref name="w"/>.</summary>
    static (Vector<Complex> V0, Vector<Complex> Vl) Chain(CoupledSection[] sections, double w)
    {
        var mb = Matrix<Complex>.Build;
        var phi = mb.DenseIdentity(4);
        foreach (var s in sections)
        {
            var z = mb.Dense(2, 2, (i, j) => new Complex(s.R[i, j], w * s.L[i, j]));
            var y = mb.Dense(2, 2, (i, j) => new Complex(s.G[i, j], w * s.C[i, j]));
            var a = mb.Dense(4, 4);
            a.SetSubMatrix(0, 2, -z); a.SetSubMatrix(2, 0, -y);
            phi = Exp(a * s.Length) * phi;
        }
        if (w == 0) w = 1e-3;   // DC: the inductor of the quiet near branch is a short at a vanishing frequency
        var yn = mb.Dense(2, 2);
        yn[0, 0] = 1 / Rs; yn[1, 1] = 1 / new Complex(Rq, w * Lq);
        var yf = mb.Dense(2, 2);
        yf[0, 0] = 1 / Rf + 1 / Rd; yf[1, 1] = 1 / Rf + 1 / Rd; yf[0, 1] = yf[1, 0] = -1 / Rd;
        var isrc = Vector<Complex>.Build.Dense([1 / Rs, 0]);
        var p11 = phi.SubMatrix(0, 2, 0, 2); var p12 = phi.SubMatrix(0, 2, 2, 2);
        var p21 = phi.SubMatrix(2, 2, 0, 2); var p22 = phi.SubMatrix(2, 2, 2, 2);
        // I(0) = Is − Yn·V(0) flows into the line; I(l) = Yf·V(l) flows into the far network.
        var lhs = yf * (p11 - p12 * yn) - (p21 - p22 * yn);
        var v0 = lhs.Solve((p22 - yf * p12) * isrc);
        var vl = p11 * v0 + p12 * (isrc - yn * v0);
        return (v0, vl);
    }

    static Matrix<Complex> Exp(Matrix<Complex> a)
    {
        if (a.FrobeniusNorm() == 0) return Matrix<Complex>.Build.DenseIdentity(a.RowCount);
        var evd = a.Evd();
        var d = Matrix<Complex>.Build.DiagonalOfDiagonalVector(evd.EigenValues.Map(Complex.Exp));
        return evd.EigenVectors * d * evd.EigenVectors.Inverse();
    }
}
