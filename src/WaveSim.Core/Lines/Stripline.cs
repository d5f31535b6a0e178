namespace WaveSim.Core.Lines;

/// <summary>
/// Stripline: a strip of width w and thickness t between two ground planes a distance b apart, in one
/// dielectric er (so eps_eff = er); centred, or moved by an offset towards one plane.
/// </summary>
/// <remarks>
/// <para>Zero thickness: the exact conformal-map result, Cohn, IRE Trans. MTT-2, 1954:
/// Z0 = eta0/(4 sqrt(er)) K(k)/K(k'), k = sech(pi w/(2b)), k' = tanh(pi w/(2b)); no range limit.</para>
/// <para>Thickness: Wheeler, IEEE Trans. MTT-26(11), 1978 (0.5 % claimed; from memory), applied as the ratio
/// Z0(t) = Z0_Cohn * Wheeler(t)/Wheeler(0), so that t = 0 stays exact (the ratio is common practice, no source).
/// Warned above t/b = 0.25 (common practice, no source).</para>
/// <para>Offset strip: the parallel combination of two centred striplines with plane spacings 2 h1 and 2 h2,
/// h1,2 = b/2 +- offset the distances from each plane to the strip's centre line: 1/Z0 = (1/Z0(2h1) + 1/Z0(2h2))/2
/// (each plane carries half of the centred line's capacitance; common practice, no source).</para>
/// <para>Conductor loss: Pozar, Microwave Engineering, 4th ed., Sec. 3.7 (Wheeler's incremental inductance rule):
/// alpha_c = 2.7e-3 Rs er Z0 A/(30 pi (b - t)), A = 1 + 2w/(b - t) + (b + t)/(pi (b - t)) ln((2b - t)/t), for
/// sqrt(er) Z0 &lt; 120 ohm; otherwise alpha_c = 0.16 Rs B/(Z0 b),
/// B = 1 + b/(0.5w + 0.7t) (0.5 + 0.414 t/w + ln(4 pi w/t)/(2 pi)) (from memory). R = 2 Z0 alpha_c.
/// An offset strip uses the centred line's loss for the same b (common practice, no source).</para>
/// </remarks>
public static class Stripline
{
    /// <summary>Largest t/b for which the thickness correction is trusted (common practice, no source).</summary>
    public const double MaxThicknessRatio = 0.25;

    /// <summary>Exact Z0 of a centred zero-thickness strip (Cohn 1954), ohm.</summary>
    /// <param name="width">Strip width, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static double ExactZeroThickness(double width, double spacing, double er)
    {
        double x = Math.PI * width / (2 * spacing);
        double ratio;
        if (x > 20)
        {
            // Wide strip: k = sech x ~ 2 e^-x, K(k) -> pi/2 and K(k') -> ln(4/k) = x + ln 2 (Abramowitz and Stegun 17.3.26, from memory), error ~ k^2 < 1e-16.
            ratio = Math.PI / 2 / (x + Math.Log(2));
        }
        else
        {
            double k = 1 / Math.Cosh(x), kp = Math.Tanh(x);
            // K(k)/K(k') with each K computed from its own complementary modulus, so neither loses precision.
            ratio = EllipticIntegral.KFromComplement(kp) / EllipticIntegral.KFromComplement(k);
        }
        return LineConstants.Eta0 / (4 * Math.Sqrt(er)) * ratio;
    }

    /// <summary>Wheeler's 1978 closed form for a centred strip with thickness, ohm.</summary>
    /// <param name="width">Strip width, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; t.</param>
    /// <param name="thickness">Strip thickness, m, &gt;= 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static double Wheeler(double width, double spacing, double thickness, double er)
    {
        double w = width, b = spacing, t = thickness;
        double wEff = w;
        if (t > 0)
        {
            double m = 2 / (1 + 2.0 / 3.0 * t / (b - t));
            double inner = Math.Pow(t / (2 * b - t), 2) + Math.Pow(1 / (4 * Math.PI) / (w / t + 1.1), m);
            wEff = w + t / Math.PI * (1 - 0.5 * Math.Log(inner));
        }
        double q = (b - t) / wEff;
        double p = 8 / Math.PI * q;
        return 30 / Math.Sqrt(er) * Math.Log(1 + 4 / Math.PI * q * (p + Math.Sqrt(p * p + 6.27)));
    }

    /// <summary>Z0 of a centred strip: Cohn's exact value scaled by Wheeler's thickness ratio, ohm.</summary>
    /// <param name="width">Strip width, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m, &gt; t.</param>
    /// <param name="thickness">Strip thickness, m, &gt;= 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static double Centred(double width, double spacing, double thickness, double er)
    {
        double z = ExactZeroThickness(width, spacing, er);
        return thickness > 0 ? z * Wheeler(width, spacing, thickness, er) / Wheeler(width, spacing, 0, er) : z;
    }

    /// <summary>Z0 and eps_eff (= er) of a centred or offset strip.</summary>
    /// <param name="width">Strip width, m, &gt; 0.</param>
    /// <param name="spacing">Ground-plane spacing b, m.</param>
    /// <param name="thickness">Strip thickness, m, &gt;= 0.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    /// <param name="offset">Distance of the strip's centre line from the mid-plane, m; |offset| &lt; (b - t)/2. Default 0.</param>
    public static QuasiTemResult Analyse(double width, double spacing, double thickness, double er, double offset = 0)
    {
        if (offset == 0) return new QuasiTemResult(Centred(width, spacing, thickness, er), er);
        double h1 = spacing / 2 + offset, h2 = spacing / 2 - offset;
        double z1 = Centred(width, 2 * h1, thickness, er), z2 = Centred(width, 2 * h2, thickness, er);
        return new QuasiTemResult(2 * z1 * z2 / (z1 + z2), er);
    }

    /// <summary>
    /// The factor F (1/m) with R_ac = Rs F for the strip and both planes (Pozar Sec. 3.7); 0 when t = 0
    /// (the formula needs t &gt; 0; a zero-thickness strip is treated as a perfect conductor).
    /// </summary>
    /// <param name="width">Strip width, m.</param>
    /// <param name="spacing">Ground-plane spacing b, m.</param>
    /// <param name="thickness">Strip thickness, m.</param>
    /// <param name="er">Relative permittivity.</param>
    /// <param name="z0">Characteristic impedance of the line, ohm.</param>
    public static double SkinResistanceFactor(double width, double spacing, double thickness, double er, double z0)
    {
        double w = width, b = spacing, t = thickness;
        if (t <= 0) return 0;
        double alphaOverRs;
        if (Math.Sqrt(er) * z0 < 120)
        {
            double a = 1 + 2 * w / (b - t) + (b + t) / (Math.PI * (b - t)) * Math.Log((2 * b - t) / t);
            alphaOverRs = 2.7e-3 * er * z0 * a / (30 * Math.PI * (b - t));
        }
        else
        {
            double bb = 1 + b / (0.5 * w + 0.7 * t) * (0.5 + 0.414 * t / w + Math.Log(4 * Math.PI * w / t) / (2 * Math.PI));
            alphaOverRs = 0.16 * bb / (z0 * b);
        }
        return 2 * z0 * alphaOverRs;
    }

    /// <summary>Warnings for inputs outside the trusted ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double width, double spacing, double thickness, Func<string, string> label)
    {
        if (thickness > MaxThicknessRatio * spacing)
            yield return $"{label("thickness")}/{label("spacing")} = {thickness / spacing:G3} is above 0.25; the thickness correction is not trusted there (common practice, no source)";
    }
}
