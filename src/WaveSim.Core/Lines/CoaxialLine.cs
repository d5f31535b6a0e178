namespace WaveSim.Core.Lines;

/// <summary>Coaxial line: inner conductor diameter d, outer conductor inner diameter D, dielectric er.</summary>
/// <remarks>
/// Pozar, Microwave Engineering, 4th ed., Table 2.1 (exact TEM): Z0 = eta0/(2 pi sqrt(er)) ln(D/d)
/// (= 59.958/sqrt(er) ln(D/d)), R = Rs/(2 pi) (1/a + 1/b) with a = d/2, b = D/2.
/// The TEM formulas hold below the first higher mode, TE11, whose cutoff is near kc = 2/(a + b)
/// (Pozar Sec. 3.5, from memory); a frequency above it is warned.
/// </remarks>
public static class CoaxialLine
{
    /// <summary>Z0 and eps_eff (= er).</summary>
    /// <param name="inner">Inner conductor diameter d, m, &gt; 0.</param>
    /// <param name="outer">Outer conductor inner diameter D, m, &gt; d.</param>
    /// <param name="er">Relative permittivity, &gt;= 1.</param>
    public static QuasiTemResult Analyse(double inner, double outer, double er) =>
        new(LineConstants.Eta0 / (2 * Math.PI * Math.Sqrt(er)) * Math.Log(outer / inner), er);

    /// <summary>The factor F (1/m) with R_ac = Rs F: (1/a + 1/b)/(2 pi).</summary>
    /// <param name="inner">Inner diameter d, m.</param>
    /// <param name="outer">Outer diameter D, m.</param>
    public static double SkinResistanceFactor(double inner, double outer) => (2 / inner + 2 / outer) / (2 * Math.PI);

    /// <summary>Approximate cutoff frequency of the TE11 mode, Hz: c/(pi (a + b) sqrt(er)).</summary>
    /// <param name="inner">Inner diameter d, m.</param>
    /// <param name="outer">Outer diameter D, m.</param>
    /// <param name="er">Relative permittivity.</param>
    public static double Te11Cutoff(double inner, double outer, double er) =>
        LineConstants.SpeedOfLight / (Math.PI * (inner / 2 + outer / 2) * Math.Sqrt(er));
}
