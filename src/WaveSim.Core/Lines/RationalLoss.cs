using System.Numerics;
using WaveSim.Core.Model;
using MathNet.Numerics.LinearAlgebra;
using Vector = MathNet.Numerics.LinearAlgebra.Vector<double>;

namespace WaveSim.Core.Lines;

/// <summary>
/// A sum-of-poles approximation of a <see cref="FrequencyLoss"/> for time stepping:
/// Z(s) ≈ R + s·(L∞ + ΔL) + Σ s·a_k/(s + p_k) and Y(s) ≈ G + s·C∞ + Σ s·b_k/(s + q_k), with real poles p, q &gt; 0 and
/// residues a, b, ΔL ≥ 0 and C∞ ≥ C0·κ(∞).
/// </summary>
/// <remarks>
/// <para>Each series term is a resistor a in parallel with an inductor a/p, each shunt term a resistor 1/b in series with a
/// capacitor b/q: with every residue non-negative the model is a passive RL/RC ladder, so causal and passive by construction.
/// Poles are fixed, log-spaced over (a little beyond) the band; the residues are the non-negative linear least-squares fit
/// (Lawson and Hanson 1974) of the exact functions on a log-spaced grid of the band, weighted to relative error. This is the
/// fixed-pole form of rational fitting; vector fitting (Gustavsen and Semlyen, IEEE Trans. Power Delivery 14(3):1052-1061,
/// 1999) would also move the poles, which these smooth functions (√ and log) do not need.</para>
/// <para>Both exact functions are Stieltjes-type sums of such terms with positive weights: √(s + ω0) − √ω0 =
/// (1/π)∫_{ω0}^∞ s·√(p − ω0)/(p(s + p)) dp, and log((ω2 + s)/(ω1 + s)) = ∫_{ω1}^{ω2} dp/(s + p); so positive residues lose nothing.
/// Poles above the band act there as a constant inductance or capacitance, hence ΔL and C∞.</para>
/// </remarks>
public sealed record RationalLoss
{
    /// <summary>Series poles p_k, rad/s.</summary>
    public required double[] SeriesPoles { get; init; }
    /// <summary>Series residues a_k, ohm/m (each a parallel R = a_k, L = a_k/p_k per length).</summary>
    public required double[] SeriesResidues { get; init; }
    /// <summary>Total high-frequency inductance L∞ + ΔL, H/m.</summary>
    public required double InstantInductance { get; init; }
    /// <summary>Shunt poles q_k, rad/s.</summary>
    public required double[] ShuntPoles { get; init; }
    /// <summary>Shunt residues b_k, S/m (each a series R = 1/b_k, C = b_k/q_k per length).</summary>
    public required double[] ShuntResidues { get; init; }
    /// <summary>High-frequency (instantaneous) capacitance C∞, F/m.</summary>
    public required double InstantCapacitance { get; init; }
    /// <summary>The segment's constant R per length (its R_dc with a conductor model), ohm/m.</summary>
    public required double R { get; init; }
    /// <summary>The segment's constant G per length, S/m (0 with a dielectric model).</summary>
    public required double G { get; init; }
    /// <summary>The fitted band, Hz.</summary>
    public required double BandLow { get; init; }
    /// <summary>The fitted band's upper end, Hz.</summary>
    public required double BandHigh { get; init; }
    /// <summary>Largest |Z_int,fit − Z_int|/|Z_int| over the band (0 without a conductor model).</summary>
    public required double InternalMaxError { get; init; }
    /// <summary>Largest |κ_fit − κ|/|κ| over the band (0 without a dielectric model).</summary>
    public required double PermittivityMaxError { get; init; }
    /// <summary>Largest |Δκ_fit − Δκ|/|Δκ| over the band, Δκ = κ − κ(∞) the dispersive (lossy) part alone.</summary>
    public required double DispersionMaxError { get; init; }

    /// <summary>Pole count chosen from the band: 2.5 per decade of the pole span, within 6..12.</summary>
    public const int AutoPoles = 0;

    /// <summary>The fitted series impedance per length, ohm/m.</summary>
    public Complex SeriesImpedance(Complex s)
    {
        Complex z = R + s * InstantInductance;
        for (int k = 0; k < SeriesPoles.Length; k++) z += s * SeriesResidues[k] / (s + SeriesPoles[k]);
        return z;
    }

    /// <summary>The fitted shunt admittance per length, S/m.</summary>
    public Complex ShuntAdmittance(Complex s)
    {
        Complex y = G + s * InstantCapacitance;
        for (int k = 0; k < ShuntPoles.Length; k++) y += s * ShuntResidues[k] / (s + ShuntPoles[k]);
        return y;
    }

    /// <summary>Fits <paramref name="loss"/> of a segment with R, L∞, G, C0 per length over [fLow, fHigh] Hz.</summary>
    /// <param name="loss">The exact model.</param>
    /// <param name="r">The segment's R (R_dc), ohm/m.</param>
    /// <param name="l">The segment's L∞, H/m.</param>
    /// <param name="g">The segment's G, S/m.</param>
    /// <param name="c">The segment's C0, F/m.</param>
    /// <param name="fLow">Lower band edge, Hz, &gt; 0.</param>
    /// <param name="fHigh">Upper band edge, Hz, &gt; fLow.</param>
    /// <param name="poles">Poles per function, 2..40, or <see cref="AutoPoles"/> (2.5 per decade of the pole span, 6 to 12).</param>
    /// <exception cref="InputException">Band or pole count out of range.</exception>
    public static RationalLoss Fit(FrequencyLoss loss, double r, double l, double g, double c, double fLow, double fHigh, int poles = AutoPoles)
    {
        if (!(fLow > 0) || !(fHigh > fLow) || !double.IsFinite(fHigh))
            throw new InputException($"frequency-loss fit: the band must satisfy 0 < low < high (got {fLow} Hz to {fHigh} Hz)");
        if (poles == AutoPoles)
            poles = (int)Math.Clamp(Math.Ceiling(2.5 * Math.Log10(fHigh / fLow * PoleSpanBelow * PoleSpanAbove)), 6, 12);
        if (poles < 2 || poles > 40) throw new InputException($"frequency-loss fit: 2 to 40 poles (got {poles})");
        double wLo = 2 * Math.PI * fLow, wHi = 2 * Math.PI * fHigh;
        var grid = LogSpace(wLo, wHi, Math.Max(100, (int)(30 * Math.Log10(wHi / wLo))));
        var pl = LogSpace(wLo / PoleSpanBelow, wHi * PoleSpanAbove, poles);

        double[] sp = [], sr = [], qp = [], qr = [];
        double dl = 0, cInst = c, eZ = 0, eK = 0, eD = 0;
        if (loss.SkinCorner is not null)
        {
            // Unknowns: ΔL then a_k; rows Re and Im of (basis · x − Z_int excess)/|Z_int|.
            var rows = grid.Select(w => new Complex(0, w)).ToArray();
            var (x, _) = FitColumns(rows, s => loss.RDc + loss.InternalExcess(s), s => loss.InternalExcess(s),
                [s => s, .. pl.Select<double, Func<Complex, Complex>>(p => s => s / (s + p))]);
            dl = x[0]; sp = pl; sr = x[1..];
        }
        if (loss.Dielectric is not null)
        {
            // Δκ(s) = κ(s) − κ(∞) ≈ d + Σ c_k/(s + q_k); then C∞ = C0(κ(∞) + d), b_k = C0·c_k.
            double kInf = loss.HighFrequencyRatio;
            var rows = grid.Select(w => new Complex(0, w)).ToArray();
            var (x, _) = FitColumns(rows, s => loss.PermittivityRatio(s) - kInf, s => loss.PermittivityRatio(s) - kInf,
                [_ => 1, .. pl.Select<double, Func<Complex, Complex>>(p => s => 1 / (s + p))]);
            cInst = c * (kInf + x[0]); qp = pl; qr = x[1..].Select(v => c * v).ToArray();
        }
        var fit = new RationalLoss
        {
            SeriesPoles = sp, SeriesResidues = sr, InstantInductance = l + dl, ShuntPoles = qp, ShuntResidues = qr,
            InstantCapacitance = cInst, R = r, G = g, BandLow = fLow, BandHigh = fHigh,
            InternalMaxError = 0, PermittivityMaxError = 0, DispersionMaxError = 0,
        };
        foreach (double w in LogSpace(wLo, wHi, 400))
        {
            var s = new Complex(0, w);
            if (loss.SkinCorner is not null)
            {
                Complex exact = loss.RDc + loss.InternalExcess(s);
                Complex fitted = fit.SeriesImpedance(s) - r - s * l + loss.RDc;
                eZ = Math.Max(eZ, (fitted - exact).Magnitude / exact.Magnitude);
            }
            if (loss.Dielectric is not null)
            {
                Complex exact = loss.PermittivityRatio(s);
                Complex fitted = (fit.ShuntAdmittance(s) - g) / (s * c);
                eK = Math.Max(eK, (fitted - exact).Magnitude / exact.Magnitude);
                eD = Math.Max(eD, (fitted - exact).Magnitude / (exact - loss.HighFrequencyRatio).Magnitude);
            }
        }
        return fit with { InternalMaxError = eZ, PermittivityMaxError = eK, DispersionMaxError = eD };
    }

    /// <summary>Poles reach this factor below the band's lower edge.</summary>
    const double PoleSpanBelow = 10;
    /// <summary>Poles reach this factor above the band's upper edge.</summary>
    const double PoleSpanAbove = 10;

    static double[] LogSpace(double a, double b, int n) =>
        Enumerable.Range(0, n).Select(k => a * Math.Pow(b / a, n == 1 ? 0 : k / (double)(n - 1))).ToArray();

    /// <summary>Non-negative least squares of target ≈ Σ x_j basis_j on the given s points, weighted by 1/|scale(s)|.</summary>
    static (double[] X, double Residual) FitColumns(Complex[] points, Func<Complex, Complex> scale, Func<Complex, Complex> target,
        Func<Complex, Complex>[] basis)
    {
        int m = points.Length, n = basis.Length;
        var a = Matrix<double>.Build.Dense(2 * m, n);
        var b = Vector.Build.Dense(2 * m);
        for (int i = 0; i < m; i++)
        {
            Complex s = points[i];
            double w = 1 / scale(s).Magnitude;
            Complex t = target(s) * w;
            b[2 * i] = t.Real; b[2 * i + 1] = t.Imaginary;
            for (int j = 0; j < n; j++)
            {
                Complex v = basis[j](s) * w;
                a[2 * i, j] = v.Real; a[2 * i + 1, j] = v.Imaginary;
            }
        }
        // Columns scaled to unit norm for conditioning, unscaled afterwards.
        var norms = new double[n];
        for (int j = 0; j < n; j++)
        {
            norms[j] = a.Column(j).L2Norm();
            if (norms[j] > 0) a.SetColumn(j, a.Column(j) / norms[j]);
        }
        var x = NonNegativeLeastSquares.Solve(a, b);
        double res = (a * Vector.Build.DenseOfArray(x) - b).L2Norm();
        for (int j = 0; j < n; j++) x[j] = norms[j] > 0 ? x[j] / norms[j] : 0;
        return (x, res);
    }
}
