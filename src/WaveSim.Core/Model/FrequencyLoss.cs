using System.Collections.Immutable;
using System.Numerics;

namespace WaveSim.Core.Model;

/// <summary>
/// Frequency-dependent loss of a line segment as exact causal functions of the complex frequency s: the conductor's internal
/// impedance Z_int(s) = R_dc·√(1 + s/ω0) and the dielectric's permittivity ratio κ(s) of the Djordjevic-Sarkar model, so that
/// Z(s) = s·L∞ + Z_int(s) and Y(s) = s·C0·κ(s) per length.
/// </summary>
/// <remarks>
/// <para>Conductor: a good conductor's internal impedance per length tends to (1 + j)·Rs(f)·F, equal internal resistance and
/// reactance, with R rising as √f once the skin depth is small against the conductor (Paul, Analysis of Multiconductor
/// Transmission Lines, 2nd ed. 2008; Pozar, Microwave Engineering, 4th ed. 2012, Sec. 1.7 and 2.7). R_dc·√(1 + s/ω0) has that
/// high-frequency limit, R_dc at DC, and is analytic for Re s &gt; −ω0, hence causal; this one-corner form is common practice
/// (no single source). ω0 is set by the high-frequency match: R_dc·√(ω/(2ω0)) = F·√(ωμ0ρ/2), so ω0 = R_dc²/(F²μ0ρ).</para>
/// <para>Dielectric: the Djordjevic-Sarkar wideband model (Djordjevic, Biljic, Likar-Smiljanic, Sarkar, IEEE Trans. EMC
/// 43(4):662-667, 2001), ε(s) = ε∞ + Δε/(m2 − m1)·log10((ω2 + s)/(ω1 + s)), causal by construction. On a partly filled line
/// (microstrip) the substrate fills a fraction q of the field: ε_eff(s) = 1 + q·(ε(s) − 1), the same filling factor that
/// gives a cross-section its effective loss tangent tan δ·er·q/ε_eff; κ(s) = ε_eff(s)/ε_eff,ref, so that at the reference
/// frequency Y = jωC0 + ωC0·tan δ_eff, as in the constant-G model.</para>
/// </remarks>
public sealed record FrequencyLoss
{
    /// <summary>Reference frequency of a geometry's er and tan δ when it gives no <c>at</c>, Hz (a common reference for board materials; common practice, no source).</summary>
    public const double DefaultReferenceFrequency = 1e9;

    /// <summary>
    /// The values the loss was given by (r_dc, skin_at, r_skin, tand, er, at; SI, by name), so a variant can fit it again; empty
    /// for a cross-section's loss, which its geometry's inputs give.
    /// </summary>
    public IReadOnlyDictionary<string, double> Inputs
    {
        get;
        init => field = value.ToImmutableDictionary();
    } = ImmutableDictionary<string, double>.Empty;

    /// <summary>DC resistance per length, ohm/m; used only when <see cref="SkinCorner"/> is given.</summary>
    public double RDc { get; init; }
    /// <summary>ω0, rad/s, of Z_int = R_dc·√(1 + s/ω0); null for no conductor model (the segment's constant R applies).</summary>
    public double? SkinCorner { get; init; }
    /// <summary>The substrate's wideband permittivity; null for no dielectric model (the segment's constant G applies).</summary>
    public DjordjevicSarkar? Dielectric { get; init; }
    /// <summary>The real permittivity er at the reference frequency, where the segment's C is C0.</summary>
    public double ReferencePermittivity { get; init; } = 1;
    /// <summary>The filling factor q of the substrate (1 for a homogeneous line).</summary>
    public double Filling { get; init; } = 1;

    /// <summary>ω0 from the resistance <paramref name="rAt"/> at <paramref name="frequency"/>, exactly: Re[R_dc·√(1 + jω/ω0)] = R(f).</summary>
    /// <param name="rDc">DC resistance per length, &gt; 0.</param>
    /// <param name="rAt">Resistance per length at the frequency, &gt; rDc.</param>
    /// <param name="frequency">Hz, &gt; 0.</param>
    public static double CornerFromResistance(double rDc, double rAt, double frequency)
    {
        // Re √(1 + jx) = √((√(1 + x²) + 1)/2) = ρ gives x = 2ρ√(ρ² − 1).
        double rho = rAt / rDc;
        return 2 * Math.PI * frequency / (2 * rho * Math.Sqrt(rho * rho - 1));
    }

    /// <summary>Z_int(s) − R_dc = R_dc·(√(1 + s/ω0) − 1), ohm/m; 0 without a conductor model.</summary>
    public Complex InternalExcess(Complex s) =>
        SkinCorner is { } w0 ? RDc * (Complex.Sqrt(1 + s / w0) - 1) : Complex.Zero;

    /// <summary>κ(s) = ε_eff(s)/ε_eff,ref; 1 without a dielectric model.</summary>
    public Complex PermittivityRatio(Complex s) =>
        Dielectric is { } d ? (1 + Filling * (d.Permittivity(s) - 1)) / (1 + Filling * (ReferencePermittivity - 1)) : Complex.One;

    /// <summary>κ(∞) = ε_eff(ε∞)/ε_eff,ref, the instantaneous part, which sets the fastest wave on the line (1 without a dielectric model).</summary>
    public double HighFrequencyRatio =>
        Dielectric is { } d ? (1 + Filling * (d.EpsInfinity - 1)) / (1 + Filling * (ReferencePermittivity - 1)) : 1;

    /// <summary>κ(0), the static part (1 without a dielectric model).</summary>
    public double StaticRatio => PermittivityRatio(Complex.Zero).Real;

    /// <summary>Series impedance per length Z(s) = R + s·L∞ + Z_int excess, ohm/m (R = R_dc with a conductor model).</summary>
    /// <param name="s">Complex frequency, Re s ≥ 0.</param>
    /// <param name="r">The segment's resistance per length (its R_dc), ohm/m.</param>
    /// <param name="l">The segment's external inductance per length L∞, H/m.</param>
    public Complex SeriesImpedance(Complex s, double r, double l) => r + s * l + InternalExcess(s);

    /// <summary>Shunt admittance per length Y(s) = G + s·C0·κ(s), S/m (G = 0 with a dielectric model).</summary>
    /// <param name="s">Complex frequency, Re s ≥ 0.</param>
    /// <param name="g">The segment's conductance per length, S/m.</param>
    /// <param name="c">The segment's capacitance per length at the reference frequency, C0, F/m.</param>
    public Complex ShuntAdmittance(Complex s, double g, double c) => g + s * c * PermittivityRatio(s);
}
