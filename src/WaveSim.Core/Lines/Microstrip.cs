namespace WaveSim.Core.Lines;

/// <summary>
/// Surface microstrip: a strip of width w and thickness t on a substrate of height h and relative
/// permittivity er over a ground plane, air above.
/// </summary>
/// <remarks>
/// Impedance and effective permittivity: Hammerstad and Jensen, "Accurate models for microstrip computer-aided
/// design", IEEE MTT-S Int. Microwave Symp. Digest 1980, pp. 407-409, including their finite-thickness correction
/// (as restated in tests/WaveSim.Tests/ReferenceData/published-checks.md §1). Stated accuracy: Z01 0.01 % for u = w/h &lt;= 1, 0.03 % for
/// u &lt;= 1000; eps_eff 0.2 % for er &lt;= 128 and 0.01 &lt;= u &lt;= 100. Quasi-static: no frequency dispersion.
/// Conductor loss: Rs/w, the current crowded on the strip's lower face (tests/WaveSim.Tests/ReferenceData/published-checks.md §4: real microstrip lies
/// between Rs/w and 2Rs/w, common practice). Dielectric loss uses the filling factor of the substrate:
/// tan d_eff = tan d * er (ee - 1) / (ee (er - 1)) (Pozar, Microwave Engineering, 4th ed., Sec. 3.8, from memory).
/// </remarks>
public static class Microstrip
{
    /// <summary>Lowest u = w/h of the stated eps_eff accuracy range.</summary>
    public const double MinU = 0.01;
    /// <summary>Highest u = w/h of the stated eps_eff accuracy range.</summary>
    public const double MaxU = 100;
    /// <summary>Highest er of the stated eps_eff accuracy range.</summary>
    public const double MaxEr = 128;
    /// <summary>Largest t/h for which the thin-strip thickness correction is trusted (common practice, no source).</summary>
    public const double MaxThicknessRatio = 0.2;

    /// <summary>Z01(u): the impedance of the strip in air (er = 1), ohm. Hammerstad and Jensen 1980.</summary>
    /// <param name="u">w/h, must be &gt; 0.</param>
    public static double AirImpedance(double u)
    {
        double f = 6 + (2 * Math.PI - 6) * Math.Exp(-Math.Pow(30.666 / u, 0.7528));
        return LineConstants.Eta0 / (2 * Math.PI) * Math.Log(f / u + Math.Sqrt(1 + 4 / (u * u)));
    }

    /// <summary>eps_eff(u, er) of a zero-thickness strip. Hammerstad and Jensen 1980.</summary>
    /// <param name="u">w/h, must be &gt; 0.</param>
    /// <param name="er">Substrate relative permittivity, &gt;= 1.</param>
    public static double EffectivePermittivity(double u, double er)
    {
        double u4 = u * u * u * u;
        double a = 1 + Math.Log((u4 + Math.Pow(u / 52, 2)) / (u4 + 0.432)) / 49 + Math.Log(1 + Math.Pow(u / 18.1, 3)) / 18.7;
        double b = 0.564 * Math.Pow((er - 0.9) / (er + 3), 0.053);
        return (er + 1) / 2 + (er - 1) / 2 * Math.Pow(1 + 10 / u, -a * b);
    }

    /// <summary>Z0 and eps_eff with the finite-thickness correction (Hammerstad and Jensen 1980). Inputs in metres.</summary>
    /// <param name="width">Strip width w, &gt; 0.</param>
    /// <param name="height">Substrate height h, &gt; 0.</param>
    /// <param name="thickness">Strip thickness t, &gt;= 0 (0 gives the zero-thickness formulas).</param>
    /// <param name="er">Substrate relative permittivity, &gt;= 1.</param>
    public static QuasiTemResult Analyse(double width, double height, double thickness, double er)
    {
        double u = width / height;
        if (thickness <= 0)
        {
            double ee0 = EffectivePermittivity(u, er);
            return new QuasiTemResult(AirImpedance(u) / Math.Sqrt(ee0), ee0);
        }
        double tr = thickness / height;
        double coth = 1 / Math.Tanh(Math.Sqrt(6.517 * u));
        double du1 = tr / Math.PI * Math.Log(1 + 4 * Math.E / (tr * coth * coth));
        double dur = 0.5 * (1 + 1 / Math.Cosh(Math.Sqrt(er - 1))) * du1;
        double u1 = u + du1, ur = u + dur;
        double eer = EffectivePermittivity(ur, er);
        double z01r = AirImpedance(ur);
        double z0 = z01r / Math.Sqrt(eer);
        double ratio = AirImpedance(u1) / z01r;
        return new QuasiTemResult(z0, eer * ratio * ratio);
    }

    /// <summary>
    /// Effective loss tangent of the partly filled line, tan d * er * q / ee with the filling factor
    /// q = (ee - 1)/(er - 1); at er = 1 the limit is taken by evaluating q at er = 1 + 1e-6.
    /// </summary>
    /// <param name="width">Strip width, m.</param>
    /// <param name="height">Substrate height, m.</param>
    /// <param name="thickness">Strip thickness, m.</param>
    /// <param name="er">Substrate relative permittivity.</param>
    /// <param name="tanDelta">Substrate loss tangent.</param>
    public static double EffectiveLossTangent(double width, double height, double thickness, double er, double tanDelta)
    {
        double erq = Math.Max(er, 1 + 1e-6);
        double q = (Analyse(width, height, thickness, erq).EpsEff - 1) / (erq - 1);
        double ee = Analyse(width, height, thickness, er).EpsEff;
        return tanDelta * er * q / ee;
    }

    /// <summary>Warnings for inputs outside the stated ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double width, double height, double thickness, double er, Func<string, string> label)
    {
        double u = width / height;
        if (u < MinU || u > MaxU)
            yield return $"{label("width")}/{label("height")} = {u:G4} is outside 0.01..100, the range of Hammerstad and Jensen's stated 0.2 % eps_eff accuracy";
        if (er > MaxEr)
            yield return $"{label("er")} = {er:G4} is above 128, the range of Hammerstad and Jensen's stated eps_eff accuracy";
        if (thickness > MaxThicknessRatio * height)
            yield return $"{label("thickness")}/{label("height")} = {thickness / height:G3} is above 0.2; the thickness correction assumes a thin strip (common practice, no source)";
    }
}
