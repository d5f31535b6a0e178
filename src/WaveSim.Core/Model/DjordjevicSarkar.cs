using System.Numerics;

namespace WaveSim.Core.Model;

/// <summary>
/// The Djordjevic-Sarkar wideband (causal) dielectric model, fitted from er and tan d at one frequency.
/// </summary>
/// <remarks>
/// Djordjevic, Biljic, Likar-Smiljanic, Sarkar, "Wideband frequency-domain characterization of FR-4 and
/// time-domain causality", IEEE Trans. EMC 43(4):662-667, 2001 (form as commonly restated):
/// eps_r(omega) = eps_inf + d_eps/(m2 - m1) log10[(omega2 + j omega)/(omega1 + j omega)], omega1 = 10^m1,
/// omega2 = 10^m2 rad/s, with eps = eps' - j eps'' for the e^(j omega t) convention. Fit from one point:
/// Lf = log10((omega2 + j omega0)/(omega1 + j omega0)), d_eps = -eps'0 tan d0 (m2 - m1)/Im(Lf),
/// eps_inf = eps'0 - d_eps Re(Lf)/(m2 - m1). The DC conductivity term is not included.
/// </remarks>
public sealed class DjordjevicSarkar
{
    /// <summary>Default lower corner exponent: omega1 = 1e4 rad/s.</summary>
    public const double DefaultM1 = 4;
    /// <summary>Default upper corner exponent: omega2 = 1e12 rad/s.</summary>
    public const double DefaultM2 = 12;

    /// <summary>High-frequency permittivity eps_inf (the limit above omega2).</summary>
    public double EpsInfinity { get; }
    /// <summary>The permittivity step d_eps between the low and high limits.</summary>
    public double DeltaEps { get; }
    /// <summary>Lower corner exponent m1 (omega1 = 10^m1 rad/s).</summary>
    public double M1 { get; }
    /// <summary>Upper corner exponent m2 (omega2 = 10^m2 rad/s).</summary>
    public double M2 { get; }

    /// <summary>Creates the model from its parameters.</summary>
    /// <param name="epsInfinity">eps_inf, &gt;= 1.</param>
    /// <param name="deltaEps">d_eps, &gt;= 0.</param>
    /// <param name="m1">Lower corner exponent (default 4).</param>
    /// <param name="m2">Upper corner exponent, &gt; m1 (default 12).</param>
    public DjordjevicSarkar(double epsInfinity, double deltaEps, double m1 = DefaultM1, double m2 = DefaultM2)
    {
        if (!(m2 > m1)) throw new ArgumentOutOfRangeException(nameof(m2), "m2 must be greater than m1.");
        EpsInfinity = epsInfinity; DeltaEps = deltaEps; M1 = m1; M2 = m2;
    }

    /// <summary>The static (DC) permittivity eps_inf + d_eps, the limit below omega1.</summary>
    public double StaticPermittivity => EpsInfinity + DeltaEps;

    /// <summary>Fits the model so that eps' = <paramref name="er"/> and tan d = <paramref name="tanDelta"/> at <paramref name="frequency"/>.</summary>
    /// <param name="er">Real relative permittivity at the fit frequency, &gt;= 1.</param>
    /// <param name="tanDelta">Loss tangent at the fit frequency, &gt;= 0.</param>
    /// <param name="frequency">Fit frequency, Hz, &gt; 0.</param>
    /// <param name="m1">Lower corner exponent (default 4).</param>
    /// <param name="m2">Upper corner exponent (default 12).</param>
    /// <exception cref="InputException">er &lt; 1, tan d &lt; 0 or frequency &lt;= 0.</exception>
    public static DjordjevicSarkar Fit(double er, double tanDelta, double frequency, double m1 = DefaultM1, double m2 = DefaultM2)
    {
        if (!(er >= 1)) throw new InputException($"dielectric model: er must be >= 1 (got {er})");
        if (!(tanDelta >= 0)) throw new InputException($"dielectric model: tand must be >= 0 (got {tanDelta})");
        if (!(frequency > 0)) throw new InputException($"dielectric model: the fit frequency must be > 0 Hz (got {frequency})");
        Complex lf = Log10Ratio(2 * Math.PI * frequency, m1, m2);
        double dEps = -er * tanDelta * (m2 - m1) / lf.Imaginary;
        double epsInf = er - dEps * lf.Real / (m2 - m1);
        return new DjordjevicSarkar(epsInf, dEps, m1, m2);
    }

    /// <summary>Complex relative permittivity eps' - j eps'' at <paramref name="frequency"/> (Hz, &gt;= 0).</summary>
    public Complex Permittivity(double frequency) =>
        EpsInfinity + DeltaEps / (M2 - M1) * Log10Ratio(2 * Math.PI * frequency, M1, M2);

    /// <summary>
    /// The permittivity as a function of the complex frequency s (rad/s), eps_inf + d_eps/(m2 - m1) log10((omega2 + s)/(omega1 + s));
    /// at s = j omega it equals <see cref="Permittivity(double)"/>. Analytic for Re s &gt; -omega1, so the model is causal.
    /// </summary>
    public Complex Permittivity(Complex s) =>
        EpsInfinity + DeltaEps / (M2 - M1) * Complex.Log10((Math.Pow(10, M2) + s) / (Math.Pow(10, M1) + s));

    /// <summary>Loss tangent eps''/eps' at <paramref name="frequency"/> (Hz).</summary>
    public double LossTangent(double frequency)
    {
        Complex e = Permittivity(frequency);
        return -e.Imaginary / e.Real;
    }

    static Complex Log10Ratio(double omega, double m1, double m2) =>
        Complex.Log10(new Complex(Math.Pow(10, m2), omega) / new Complex(Math.Pow(10, m1), omega));
}
