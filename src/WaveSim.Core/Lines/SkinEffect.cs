namespace WaveSim.Core.Lines;

/// <summary>Skin depth and surface resistance of a good conductor.</summary>
/// <remarks>
/// delta = sqrt(rho/(pi f mu0 mu_r)) = 1/sqrt(pi f mu0 mu_r sigma), Rs = rho/delta = sqrt(pi f mu0 mu_r rho)
/// (Pozar, Microwave Engineering, 4th ed., Sec. 1.7 and 2.7).
/// </remarks>
public static class SkinEffect
{
    /// <summary>
    /// ω0 of a <see cref="Model.FrequencyLoss"/> for a cross-section, matching R_dc·√(1 + s/ω0) to Rs(f)·F at high frequency:
    /// ω0 = R_dc²/(F²μ0ρ).
    /// </summary>
    /// <param name="p">The cross-section's parameters, with R_dc &gt; 0 and a skin factor &gt; 0.</param>
    public static double CornerFromGeometry(LineParameters p) =>
        p.RDc * p.RDc / (p.SkinFactor * p.SkinFactor * LineConstants.Mu0 * p.Resistivity);

    /// <summary>Skin depth delta, m.</summary>
    /// <param name="frequency">Frequency, Hz, &gt; 0.</param>
    /// <param name="resistivity">Resistivity rho, ohm m, &gt; 0. Default annealed copper (IACS).</param>
    /// <param name="relativePermeability">mu_r, default 1 (copper, aluminium).</param>
    public static double SkinDepth(double frequency, double resistivity = LineConstants.AnnealedCopperResistivity, double relativePermeability = 1)
    {
        Guard(frequency, resistivity);
        return Math.Sqrt(resistivity / (Math.PI * frequency * LineConstants.Mu0 * relativePermeability));
    }

    /// <summary>Skin depth from the conductivity: delta = 1/sqrt(pi f mu0 mu_r sigma), m.</summary>
    /// <param name="frequency">Frequency, Hz, &gt; 0.</param>
    /// <param name="conductivity">Conductivity sigma, S/m, &gt; 0.</param>
    /// <param name="relativePermeability">mu_r, default 1.</param>
    public static double SkinDepthFromConductivity(double frequency, double conductivity, double relativePermeability = 1)
    {
        Guard(frequency, conductivity);
        return 1 / Math.Sqrt(Math.PI * frequency * LineConstants.Mu0 * relativePermeability * conductivity);
    }

    /// <summary>Surface resistance Rs = sqrt(pi f mu0 mu_r rho), ohm (per square).</summary>
    /// <param name="frequency">Frequency, Hz, &gt;= 0 (0 gives 0).</param>
    /// <param name="resistivity">Resistivity rho, ohm m, &gt; 0. Default annealed copper (IACS).</param>
    /// <param name="relativePermeability">mu_r, default 1.</param>
    public static double SurfaceResistance(double frequency, double resistivity = LineConstants.AnnealedCopperResistivity, double relativePermeability = 1)
    {
        if (frequency == 0) return 0;
        Guard(frequency, resistivity);
        return Math.Sqrt(Math.PI * frequency * LineConstants.Mu0 * relativePermeability * resistivity);
    }

    static void Guard(double frequency, double material)
    {
        if (!(frequency > 0) || !double.IsFinite(frequency))
            throw new ArgumentOutOfRangeException(nameof(frequency), "The frequency must be > 0.");
        if (!(material > 0) || !double.IsFinite(material))
            throw new ArgumentOutOfRangeException(nameof(material), "The resistivity or conductivity must be > 0.");
    }
}
