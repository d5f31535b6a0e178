namespace WaveSim.Core.Lines;

/// <summary>
/// Edge-coupled stripline: two equal strips of width w, edge-to-edge gap s, centred between two ground planes a
/// distance b apart, in one dielectric er (so both modes have eps_eff = er).
/// </summary>
/// <remarks>
/// <para>Zero thickness: Cohn's exact conformal-map result, S. B. Cohn, "Shielded coupled-strip transmission line",
/// IRE Trans. MTT-3, 1955 (also Pozar, Microwave Engineering, 4th ed., Sec. 7.6):
/// Z0e,o = eta0/(4 sqrt(er)) K(k')/K(k), ke = tanh(pi w/(2b)) tanh(pi (w + s)/(2b)),
/// ko = tanh(pi w/(2b)) coth(pi (w + s)/(2b)), k' = sqrt(1 - k^2). (eta0/4 is written 30 pi there.) No range limit.</para>
/// <para>Thickness: Cohn's thick-strip approximation from the same paper (from memory):
/// Z0e,o = 30 pi (b - t)/(sqrt(er) (w + b Cf A/(2 pi))), Ae = 1 + ln(1 + tanh theta)/ln 2, Ao = 1 + ln(1 + coth theta)/ln 2,
/// theta = pi s/(2b), Cf = 2 ln((2b - t)/(b - t)) - (t/b) ln(t (2b - t)/(b - t)^2); stated for w/b &gt;= 0.35 and thin
/// strips (t/b &lt;= 0.1, from memory). It is applied as the ratio Z(t)/Z(0) on the exact value, as <see cref="Stripline"/>
/// does with Wheeler's formula, so t = 0 stays exact (the ratio is common practice, no source).</para>
/// <para>Conductor loss per strip: that of a single centred strip of the same width (Pozar Sec. 3.7), proximity
/// effect neglected (common practice, no source).</para>
/// </remarks>
public static class CoupledStripline
{
    /// <summary>Smallest w/b for which Cohn's thick-strip correction is stated (from memory).</summary>
    public const double MinThickWidthRatio = 0.35;
    /// <summary>Largest t/b for which Cohn's thick-strip correction is trusted (from memory).</summary>
    public const double MaxThicknessRatio = 0.1;

    /// <summary>Cohn's exact Z0e and Z0o of zero-thickness strips, ohm (even first).</summary>
    /// <param name="width">Strip width w, m, &gt; 0.</param>
    /// <param name="gap">Edge-to-edge gap s, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static (double Even, double Odd) ExactZeroThickness(double width, double gap, double spacing, double er)
    {
        double x1 = Math.PI * width / (2 * spacing), d = Math.PI * gap / (2 * spacing), x2 = x1 + d, sum = x1 + x2;
        // The moduli and their complements in forms that neither overflow for wide strips nor cancel for small gaps:
        // 1 - tanh a tanh b = cosh(a - b)/(cosh a cosh b), tanh b - tanh a = sinh(b - a)/(cosh a cosh b), written with e^-x.
        double e1 = Math.Exp(-2 * x1), e2 = Math.Exp(-2 * x2), eD = Math.Exp(-2 * d), eS = Math.Exp(-2 * sum);
        double t1 = Math.Tanh(x1), t2 = Math.Tanh(x2);
        double lnCommon = Math.Log(2) - x1 - Math.Log(1 + e1);
        double lnKeP = lnCommon + 0.5 * Math.Log((1 + eD) * (1 + eS)) - Math.Log(1 + e2);
        double lnKoP = lnCommon + 0.5 * Math.Log(OneMinusExpMinus2(d) * OneMinusExpMinus2(sum)) - Math.Log(OneMinusExpMinus2(x2));
        double z = LineConstants.Eta0 / (4 * Math.Sqrt(er));
        return (z * RatioKPrimeOverK(t1 * t2, lnKeP), z * RatioKPrimeOverK(t1 / t2, lnKoP));
    }

    /// <summary>1 - e^(-2y), as 2 e^-y sinh y for small y (no cancellation) and directly for large y (no overflow).</summary>
    static double OneMinusExpMinus2(double y) => y < 1 ? 2 * Math.Exp(-y) * Math.Sinh(y) : 1 - Math.Exp(-2 * y);

    /// <summary>K(k')/K(k) given k and ln k'.</summary>
    static double RatioKPrimeOverK(double k, double lnKPrime)
    {
        // k' below 1e-8: K(k) = ln(4/k') to O(k'^2) (Abramowitz and Stegun 17.3.26, from memory), K(k') = pi/2 to O(k'^2).
        if (lnKPrime < -18.4) return Math.PI / 2 / (Math.Log(4) - lnKPrime);
        double kPrime = Math.Exp(lnKPrime);
        // K(k') from its complement k, K(k) from its complement k': each keeps full precision.
        return EllipticIntegral.KFromComplement(k) / EllipticIntegral.KFromComplement(kPrime);
    }

    /// <summary>Cohn's thick-strip approximation for Z0e and Z0o, ohm (even first); see the remarks.</summary>
    /// <param name="width">Strip width w, m, &gt; 0.</param>
    /// <param name="gap">Edge-to-edge gap s, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; t.</param>
    /// <param name="thickness">Strip thickness t, m, &gt;= 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static (double Even, double Odd) ThickStrip(double width, double gap, double spacing, double thickness, double er)
    {
        double b = spacing, t = thickness, theta = Math.PI * gap / (2 * b);
        double cf = t > 0
            ? 2 * Math.Log((2 * b - t) / (b - t)) - t / b * Math.Log(t * (2 * b - t) / ((b - t) * (b - t)))
            : 2 * Math.Log(2);
        double ae = 1 + Math.Log(1 + Math.Tanh(theta)) / Math.Log(2);
        double ao = 1 + Math.Log(1 + 1 / Math.Tanh(theta)) / Math.Log(2);
        double Z(double a) => 30 * Math.PI * (b - t) / (Math.Sqrt(er) * (width + b * cf * a / (2 * Math.PI)));
        return (Z(ae), Z(ao));
    }

    /// <summary>Z0e, Z0o (eps_eff = er for both) of the centred pair: Cohn exact, scaled by the thick-strip ratio when t &gt; 0.</summary>
    /// <param name="width">Strip width w, m, &gt; 0.</param>
    /// <param name="gap">Edge-to-edge gap s, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; t.</param>
    /// <param name="thickness">Strip thickness t, m, &gt;= 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static CoupledModes Analyse(double width, double gap, double spacing, double thickness, double er)
    {
        var (ze, zo) = ExactZeroThickness(width, gap, spacing, er);
        if (thickness > 0)
        {
            var (te, to) = ThickStrip(width, gap, spacing, thickness, er);
            var (t0e, t0o) = ThickStrip(width, gap, spacing, 0, er);
            ze *= te / t0e;
            zo *= to / t0o;
        }
        return new CoupledModes(new QuasiTemResult(ze, er), new QuasiTemResult(zo, er));
    }

    /// <summary>Warnings for inputs outside the trusted ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double width, double spacing, double thickness, Func<string, string> label)
    {
        if (thickness > 0 && width < MinThickWidthRatio * spacing)
            yield return $"{label("width")}/{label("spacing")} = {width / spacing:G3} is below 0.35, where Cohn's thick-strip correction is not stated (Cohn 1955, from memory)";
        if (thickness > MaxThicknessRatio * spacing)
            yield return $"{label("thickness")}/{label("spacing")} = {thickness / spacing:G3} is above 0.1; Cohn's thick-strip correction assumes thin strips (from memory)";
    }
}
