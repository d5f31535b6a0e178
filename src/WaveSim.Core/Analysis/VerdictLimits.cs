namespace WaveSim.Core.Analysis;

/// <summary>The limits a receiver's edges are judged against (common practice, no source: change them to suit the logic family).</summary>
public sealed record VerdictLimits
{
    /// <summary>Default overshoot limit, % of the swing at the receiver: 10.</summary>
    public const double DefaultMaxOvershootPct = 10;

    /// <summary>Default settling limit, from the edge's arrival at the probe: 5 ns.</summary>
    public const double DefaultMaxSettlingS = 5e-9;

    /// <summary>Largest acceptable overshoot of any edge, % of the swing between the settled levels.</summary>
    public double MaxOvershootPct { get; init; } = DefaultMaxOvershootPct;

    /// <summary>Largest acceptable settling time of any edge, s, from its arrival at the probe (the source edge's 50 % instant plus the line delay).</summary>
    public double MaxSettlingS { get; init; } = DefaultMaxSettlingS;

    /// <summary>Half-width of the settling band as a fraction of the swing (default 0.05).</summary>
    public double SettleBand { get; init; } = SignalQualityOptions.DefaultSettleBand;

    /// <summary>Largest step back through the threshold band that still counts as monotonic, fraction of the swing (default 0.01).</summary>
    public double MonotonicTolerance { get; init; } = SignalQualityOptions.DefaultMonotonicTolerance;
}
