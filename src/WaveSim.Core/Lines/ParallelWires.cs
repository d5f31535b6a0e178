namespace WaveSim.Core.Lines;

/// <summary>Two parallel round wires of diameter d, centre-to-centre spacing s, in a uniform dielectric er.</summary>
/// <remarks>
/// Pozar, Microwave Engineering, 4th ed., Table 2.1, two-wire line (exact TEM for round wires; from memory):
/// Z0 = eta0/(pi sqrt(er)) acosh(s/d). Conductor loss per wire Rs/(pi d) (Pozar; tests/WaveSim.Tests/ReferenceData/published-checks.md §4, for d much larger
/// than the skin depth), two wires in the loop; the proximity effect, which crowds the current towards the other
/// wire, is neglected and warned when s/d &lt; 3 (common practice, no source).
/// </remarks>
public static class ParallelWires
{
    /// <summary>The s/d below which the proximity effect makes Rs/(pi d) too low (common practice, no source).</summary>
    public const double MinSpacingRatioForSkinFormula = 3;

    /// <summary>Z0 and eps_eff (= er).</summary>
    /// <param name="diameter">Wire diameter d, m, &gt; 0.</param>
    /// <param name="spacing">Centre-to-centre spacing s, m, &gt; d.</param>
    /// <param name="er">Relative permittivity of the surrounding medium, &gt;= 1.</param>
    public static QuasiTemResult Analyse(double diameter, double spacing, double er) =>
        new(Impedance(diameter, spacing, er), er);

    /// <summary>Z0 = eta0/(pi sqrt(er)) acosh(s/d), ohm.</summary>
    /// <param name="diameter">Wire diameter d, m.</param>
    /// <param name="spacing">Centre-to-centre spacing s, m.</param>
    /// <param name="er">Relative permittivity.</param>
    public static double Impedance(double diameter, double spacing, double er) =>
        LineConstants.Eta0 / (Math.PI * Math.Sqrt(er)) * Math.Acosh(spacing / diameter);

    /// <summary>The factor F (1/m) with R_ac = Rs F for both wires: 2/(pi d).</summary>
    /// <param name="diameter">Wire diameter d, m.</param>
    public static double SkinResistanceFactor(double diameter) => 2 / (Math.PI * diameter);

    /// <summary>DC resistance of the loop (both wires), ohm/m.</summary>
    /// <param name="diameter">Wire diameter d, m.</param>
    /// <param name="resistivity">Conductor resistivity, ohm m.</param>
    public static double DcResistance(double diameter, double resistivity) => 2 * resistivity / (Math.PI * diameter * diameter / 4);

    /// <summary>Warnings for inputs outside the trusted ranges. <paramref name="label"/> turns a key into its display name.</summary>
    public static IEnumerable<string> RangeWarnings(double diameter, double spacing, Func<string, string> label)
    {
        if (spacing < MinSpacingRatioForSkinFormula * diameter)
            yield return $"{label("spacing")}/{label("diameter")} = {spacing / diameter:G3} is below 3; the proximity effect raises the AC resistance above Rs/(pi d) (common practice, no source)";
    }
}
