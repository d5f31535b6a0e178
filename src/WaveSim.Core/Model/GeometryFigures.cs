using System.Collections.Immutable;

namespace WaveSim.Core.Model;

/// <summary>
/// What a segment given by its cross-section keeps of it, as plain numbers: the figures the check shows and the formulas'
/// warnings. The segment's L, C, R and G were computed from the cross-section when the scenario was read.
/// </summary>
/// <param name="Kind">The cross-section kind, e.g. microstrip.</param>
/// <param name="Z0">Lossless characteristic impedance, ohm.</param>
/// <param name="EpsEff">Effective relative permittivity.</param>
/// <param name="FrequencyHz">The frequency R and G were evaluated at, Hz; null for DC only.</param>
/// <param name="Warnings">Inputs outside a formula's stated range of validity, one line each.</param>
public sealed record GeometryFigures(string Kind, double Z0, double EpsEff, double? FrequencyHz, IReadOnlyList<string> Warnings)
{
    /// <summary>Inputs outside a formula's stated range of validity (held as an immutable array).</summary>
    public IReadOnlyList<string> Warnings { get; init => field = value.ToImmutableArray(); } = Warnings.ToImmutableArray();

    /// <summary>Delay per length √eps_eff / c, s/m.</summary>
    public double DelayPerLength => Math.Sqrt(EpsEff) / Units.Quantity.SpeedOfLight;
}
