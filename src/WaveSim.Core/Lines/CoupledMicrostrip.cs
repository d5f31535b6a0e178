namespace WaveSim.Core.Lines;

/// <summary>
/// Edge-coupled microstrip: two equal strips of width w, edge-to-edge gap s, on a substrate of height h and
/// relative permittivity er over a ground plane, air above.
/// </summary>
/// <remarks>
/// <para>Kirschning and Jansen, "Accurate wide-range design equations for the frequency-dependent characteristic of
/// parallel coupled microstrip lines", IEEE Trans. MTT-32(1):83-90, 1984, quasi-static part (formulas from memory;
/// equation numbers not confirmed against the printed page). With u = w/h, g = s/h and the single strip's Z0, eps_eff
/// (<see cref="Microstrip"/>, Hammerstad and Jensen 1980):</para>
/// <para>Even-mode eps_eff: Hammerstad and Jensen's single-strip formula evaluated at
/// v = u (20 + g^2)/(10 + g^2) + g e^-g.</para>
/// <para>Odd-mode eps_eff: eps_o = (0.5 (er + 1) + a_o - eps_eff) exp(-c_o g^d_o) + eps_eff,
/// a_o = 0.7287 (eps_eff - 0.5 (er + 1)) (1 - e^(-0.179 u)), b_o = 0.747 er/(0.15 + er),
/// c_o = b_o - (b_o - 0.207) e^(-0.414 u), d_o = 0.593 + 0.694 e^(-0.562 u).</para>
/// <para>Impedances: Z0e = Z0 sqrt(eps_eff/eps_e)/(1 - Q4 Z0 sqrt(eps_eff)/eta0), Z0o the same with eps_o and Q10, where
/// Q1 = 0.8695 u^0.194, Q2 = 1 + 0.7519 g + 0.189 g^2.31,
/// Q3 = 0.1975 + (16.6 + (8.4/g)^6)^-0.387 + ln(g^10/(1 + (g/3.4)^10))/241,
/// Q4 = (2 Q1/Q2)/(e^-g u^Q3 + (2 - e^-g) u^-Q3), Q5 = 1.794 + 1.14 ln(1 + 0.638/(g + 0.517 g^2.43)),
/// Q6 = 0.2305 + ln(g^10/(1 + (g/5.8)^10))/281.3 + ln(1 + 0.598 g^1.154)/5.1, Q7 = (10 + 190 g^2)/(1 + 82.3 g^3),
/// Q8 = exp(-6.5 - 0.95 ln g - (g/0.15)^5), Q9 = ln(Q7) (Q8 + 1/16.5), Q10 = Q4 - (Q5/Q2) exp(Q6 ln(u) u^-Q9).</para>
/// <para>Stated range 0.1 &lt;= u &lt;= 10, 0.1 &lt;= g &lt;= 10, 1 &lt;= er &lt;= 18, accuracy about 1 % (from memory); warned
/// outside. Zero-thickness strips: a thickness only sets the conductor loss (warned). No dispersion.
/// Loss per strip as for <see cref="Microstrip"/> (Rs/w; proximity effect neglected, common practice, no source);
/// each mode's dielectric loss uses its own filling factor q = (eps_mode - 1)/(er - 1).</para>
/// </remarks>
public static class CoupledMicrostrip
{
    /// <summary>Lowest u = w/h and g = s/h of the stated range (from memory).</summary>
    public const double MinRatio = 0.1;
    /// <summary>Highest u = w/h and g = s/h of the stated range (from memory).</summary>
    public const double MaxRatio = 10;
    /// <summary>Highest er of the stated range (from memory).</summary>
    public const double MaxEr = 18;

    /// <summary>Z0e, Z0o and the eps_eff of each mode of zero-thickness strips (Kirschning and Jansen 1984).</summary>
    /// <param name="width">Strip width w, m, &gt; 0.</param>
    /// <param name="gap">Edge-to-edge gap s, m, &gt; 0.</param>
    /// <param name="height">Substrate height h, m, &gt; 0.</param>
    /// <param name="er">Substrate relative permittivity, &gt;= 1.</param>
    public static CoupledModes Analyse(double width, double gap, double height, double er)
    {
        double u = width / height, g = gap / height;
        double ee = Microstrip.EffectivePermittivity(u, er);
        double z01 = Microstrip.AirImpedance(u); // Z0 sqrt(eps_eff)
        double z0 = z01 / Math.Sqrt(ee);
        double half = 0.5 * (er + 1);

        double v = u * (20 + g * g) / (10 + g * g) + g * Math.Exp(-g);
        double eeEven = Microstrip.EffectivePermittivity(v, er);

        double ao = 0.7287 * (ee - half) * (1 - Math.Exp(-0.179 * u));
        double bo = 0.747 * er / (0.15 + er);
        double co = bo - (bo - 0.207) * Math.Exp(-0.414 * u);
        double dO = 0.593 + 0.694 * Math.Exp(-0.562 * u);
        double eeOdd = (half + ao - ee) * Math.Exp(-co * Math.Pow(g, dO)) + ee;

        double g10 = Math.Pow(g, 10);
        double q1 = 0.8695 * Math.Pow(u, 0.194);
        double q2 = 1 + 0.7519 * g + 0.189 * Math.Pow(g, 2.31);
        double q3 = 0.1975 + Math.Pow(16.6 + Math.Pow(8.4 / g, 6), -0.387) + Math.Log(g10 / (1 + Math.Pow(g / 3.4, 10))) / 241;
        double q4 = 2 * q1 / q2 / (Math.Exp(-g) * Math.Pow(u, q3) + (2 - Math.Exp(-g)) * Math.Pow(u, -q3));
        double q5 = 1.794 + 1.14 * Math.Log(1 + 0.638 / (g + 0.517 * Math.Pow(g, 2.43)));
        double q6 = 0.2305 + Math.Log(g10 / (1 + Math.Pow(g / 5.8, 10))) / 281.3 + Math.Log(1 + 0.598 * Math.Pow(g, 1.154)) / 5.1;
        double q7 = (10 + 190 * g * g) / (1 + 82.3 * g * g * g);
        double q8 = Math.Exp(-6.5 - 0.95 * Math.Log(g) - Math.Pow(g / 0.15, 5));
        double q9 = Math.Log(q7) * (q8 + 1 / 16.5);
        double q10 = q4 - q5 / q2 * Math.Exp(q6 * Math.Log(u) * Math.Pow(u, -q9));

        double zEven = z0 * Math.Sqrt(ee / eeEven) / (1 - q4 * z01 / LineConstants.Eta0);
        double zOdd = z0 * Math.Sqrt(ee / eeOdd) / (1 - q10 * z01 / LineConstants.Eta0);
        return new CoupledModes(new QuasiTemResult(zEven, eeEven), new QuasiTemResult(zOdd, eeOdd));
    }

    /// <summary>
    /// A mode's effective loss tangent tan d er q/eps_mode with its filling factor q = (eps_mode - 1)/(er - 1);
    /// at er = 1 (no dielectric to fill) the value is tan d.
    /// </summary>
    /// <param name="modeEpsEff">The mode's eps_eff.</param>
    /// <param name="er">Substrate relative permittivity.</param>
    /// <param name="tanDelta">Substrate loss tangent.</param>
    public static double EffectiveLossTangent(double modeEpsEff, double er, double tanDelta) =>
        er - 1 < 1e-9 ? tanDelta : tanDelta * er * Math.Clamp((modeEpsEff - 1) / (er - 1), 0, 1) / modeEpsEff;

    /// <summary>Warnings for inputs outside the stated ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double width, double gap, double height, double thickness, double er, Func<string, string> label)
    {
        double u = width / height, g = gap / height;
        if (u < MinRatio || u > MaxRatio)
            yield return $"{label("width")}/{label("height")} = {u:G4} is outside 0.1..10, the stated range of Kirschning and Jansen's coupled-line formulas";
        if (g < MinRatio || g > MaxRatio)
            yield return $"{label("gap")}/{label("height")} = {g:G4} is outside 0.1..10, the stated range of Kirschning and Jansen's coupled-line formulas";
        if (er > MaxEr)
            yield return $"{label("er")} = {er:G4} is above 18, the stated range of Kirschning and Jansen's coupled-line formulas";
        if (thickness > 0)
            yield return $"the even/odd impedances are for zero-thickness strips (Kirschning and Jansen 1984); {label("thickness")} sets only the conductor loss, and thick copper lowers both impedances";
    }
}
