using System.Collections.Immutable;

namespace WaveSim.Core.Model;

/// <summary>
/// What a segment given by its cross-section keeps of it, as plain numbers: the figures the check shows, the formulas'
/// warnings, and the inputs, so a variant can derive the segment again. The segment's L, C, R and G were computed from the
/// cross-section when the scenario was read.
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

    /// <summary>The cross-section's inputs as given, SI (lengths in m, er and tand plain, at in Hz), by key name.</summary>
    public IReadOnlyDictionary<string, double> Inputs
    {
        get;
        init => field = value.ToImmutableDictionary(StringComparer.OrdinalIgnoreCase);
    } = ImmutableDictionary<string, double>.Empty;

    /// <summary>The mode a coupled pair is driven in ("differential" or "common"); null for a single line.</summary>
    public string? Mode { get; init; }

    /// <summary>True when the segment carries the cross-section's frequency-dependent loss; false for constant R and G.</summary>
    public bool FrequencyLoss { get; init; }

    /// <summary>A resistance per length given beside the geometry, ohm/m, which replaces the derived one; null for none.</summary>
    public double? R { get; init; }

    /// <summary>A conductance per length given beside the geometry, S/m, which replaces the dielectric model; null for none.</summary>
    public double? G { get; init; }

    /// <summary>Delay per length √eps_eff / c, s/m.</summary>
    public double DelayPerLength => Math.Sqrt(EpsEff) / Units.Quantity.SpeedOfLight;
}
