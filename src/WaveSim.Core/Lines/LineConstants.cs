namespace WaveSim.Core.Lines;

/// <summary>Physical constants used by the cross-section formulas, in SI units.</summary>
public static class LineConstants
{
    /// <summary>Speed of light in vacuum, 299 792 458 m/s (exact, SI definition).</summary>
    public const double SpeedOfLight = 299_792_458.0;

    /// <summary>Vacuum permeability mu0 = 4 pi 1e-7 H/m (the pre-2019 defined value; the 2019 SI value differs by 1e-10).</summary>
    public const double Mu0 = 4e-7 * Math.PI;

    /// <summary>Vacuum permittivity eps0 = 1/(mu0 c^2), about 8.8542e-12 F/m.</summary>
    public const double Eps0 = 1.0 / (Mu0 * SpeedOfLight * SpeedOfLight);

    /// <summary>Wave impedance of free space eta0 = mu0 c, about 376.730 ohm.</summary>
    public const double Eta0 = Mu0 * SpeedOfLight;

    /// <summary>
    /// Resistivity of annealed copper, 1.7241e-8 ohm m (International Annealed Copper Standard, 100 % IACS);
    /// the default conductor when a geometry gives no resistivity.
    /// </summary>
    public const double AnnealedCopperResistivity = 1.7241e-8;
}
