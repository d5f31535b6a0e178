namespace WaveSim.Core.Lines;

/// <summary>
/// Per-length parameters of a line cross-section (SI): the lossless Z0, eps_eff, delay, L, C, and the loss
/// terms R and G, at DC and at one frequency, with the rules to recompute R and G at any other frequency.
/// </summary>
public sealed record LineParameters
{
    /// <summary>The line kind.</summary>
    public required string Kind { get; init; }
    /// <summary>Lossless characteristic impedance, ohm.</summary>
    public required double Z0 { get; init; }
    /// <summary>Effective relative permittivity.</summary>
    public required double EpsEff { get; init; }
    /// <summary>Delay per length sqrt(eps_eff)/c, s/m.</summary>
    public double DelayPerLength => Math.Sqrt(EpsEff) / LineConstants.SpeedOfLight;
    /// <summary>Inductance per length L = Z0 sqrt(eps_eff)/c, H/m.</summary>
    public double L => Z0 * Math.Sqrt(EpsEff) / LineConstants.SpeedOfLight;
    /// <summary>Capacitance per length C = sqrt(eps_eff)/(c Z0), F/m.</summary>
    public double C => Math.Sqrt(EpsEff) / (LineConstants.SpeedOfLight * Z0);
    /// <summary>DC resistance per length of the conductor cross-section, ohm/m (0 when the conductor is not modelled).</summary>
    public required double RDc { get; init; }
    /// <summary>Conductor resistivity used, ohm m.</summary>
    public required double Resistivity { get; init; }
    /// <summary>Geometry factor F, 1/m, with the skin-effect resistance R = Rs(f) F.</summary>
    public required double SkinFactor { get; init; }
    /// <summary>Effective loss tangent of the line (the material's, weighted by the filling factor on partly filled lines).</summary>
    public required double LossTangent { get; init; }
    /// <summary>The frequency R_ac and G were evaluated at, Hz; null for DC only.</summary>
    public double? FrequencyHz { get; init; }
    /// <summary>Resistance per length at <see cref="FrequencyHz"/> (R_dc when null), ohm/m.</summary>
    public double RAc => ResistanceAt(FrequencyHz ?? 0);
    /// <summary>Conductance per length at <see cref="FrequencyHz"/> (0 when null), S/m.</summary>
    public double G => ConductanceAt(FrequencyHz ?? 0);
    /// <summary>Inputs outside a formula's stated range of validity, one line each.</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>R(f) = max(R_dc, Rs(f) F), Rs = sqrt(pi f mu0 rho), ohm/m; R_dc at f = 0.</summary>
    /// <param name="frequency">Frequency, Hz, &gt;= 0.</param>
    public double ResistanceAt(double frequency) =>
        frequency <= 0 ? RDc : Math.Max(RDc, SkinEffect.SurfaceResistance(frequency, Resistivity) * SkinFactor);

    /// <summary>G(f) = 2 pi f C tan d, S/m.</summary>
    /// <param name="frequency">Frequency, Hz, &gt;= 0.</param>
    public double ConductanceAt(double frequency) => 2 * Math.PI * Math.Max(frequency, 0) * C * LossTangent;
}
