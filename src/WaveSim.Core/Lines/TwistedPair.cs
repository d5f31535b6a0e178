namespace WaveSim.Core.Lines;

/// <summary>
/// Twisted pair of insulated round wires: conductor diameter d, centre-to-centre spacing s (for touching
/// wires, d plus twice the insulation thickness), insulation er, optional twist pitch (length of one full twist).
/// </summary>
/// <remarks>
/// Lefferson, "Twisted magnet wire transmission line", IEEE Trans. Parts, Hybrids, and Packaging PHP-7(4), 1971
/// (from memory): the parallel-wire formula Z0 = eta0/(pi sqrt(ee)) acosh(s/d) with ee = 1 + q (er - 1),
/// q = 0.25 + 0.0004 theta^2, theta = atan(pi s / pitch) in degrees (the twist angle). Without a pitch, theta = 0.
/// The fit passes q = 1 near theta = 43 degrees; q is capped at 1 and a twist angle above 40 degrees is warned.
/// Conductor loss as for <see cref="ParallelWires"/> (twist lengthening neglected); dielectric loss is weighted
/// by the filling factor: tan d_eff = tan d er q / ee.
/// </remarks>
public static class TwistedPair
{
    /// <summary>Largest twist angle, degrees, for which the filling-factor fit is used without a warning.</summary>
    public const double MaxTwistAngleDegrees = 40;

    /// <summary>Twist angle, degrees: atan(pi s / pitch); 0 when <paramref name="pitch"/> is null.</summary>
    /// <param name="spacing">Centre-to-centre spacing s, m.</param>
    /// <param name="pitch">Length of one full twist, m, or null for an untwisted pair.</param>
    public static double TwistAngleDegrees(double spacing, double? pitch) =>
        pitch is double p ? Math.Atan(Math.PI * spacing / p) * 180 / Math.PI : 0;

    /// <summary>Dielectric filling factor q = min(1, 0.25 + 0.0004 theta^2).</summary>
    /// <param name="spacing">Centre-to-centre spacing s, m.</param>
    /// <param name="pitch">Length of one full twist, m, or null.</param>
    public static double FillingFactor(double spacing, double? pitch)
    {
        double theta = TwistAngleDegrees(spacing, pitch);
        return Math.Min(1, 0.25 + 0.0004 * theta * theta);
    }

    /// <summary>Z0 and eps_eff.</summary>
    /// <param name="diameter">Conductor diameter d, m, &gt; 0.</param>
    /// <param name="spacing">Centre-to-centre spacing s, m, &gt; d.</param>
    /// <param name="er">Insulation relative permittivity, &gt;= 1.</param>
    /// <param name="pitch">Length of one full twist, m (&gt; 0), or null.</param>
    public static QuasiTemResult Analyse(double diameter, double spacing, double er, double? pitch)
    {
        double ee = 1 + FillingFactor(spacing, pitch) * (er - 1);
        return new QuasiTemResult(ParallelWires.Impedance(diameter, spacing, ee), ee);
    }

    /// <summary>Effective loss tangent tan d er q / ee.</summary>
    /// <param name="spacing">Centre-to-centre spacing s, m.</param>
    /// <param name="er">Insulation relative permittivity.</param>
    /// <param name="pitch">Length of one full twist, m, or null.</param>
    /// <param name="tanDelta">Insulation loss tangent.</param>
    public static double EffectiveLossTangent(double spacing, double er, double? pitch, double tanDelta)
    {
        double q = FillingFactor(spacing, pitch);
        return tanDelta * er * q / (1 + q * (er - 1));
    }

    /// <summary>Warnings for inputs outside the trusted ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double diameter, double spacing, double? pitch, Func<string, string> label)
    {
        double theta = TwistAngleDegrees(spacing, pitch);
        if (theta > MaxTwistAngleDegrees)
            yield return $"twist angle {theta:G3} degrees ({label("pitch")} short for {label("spacing")}) is above 40 degrees, where the filling-factor fit (Lefferson 1971) no longer applies";
        foreach (string w in ParallelWires.RangeWarnings(diameter, spacing, label)) yield return w;
    }
}
