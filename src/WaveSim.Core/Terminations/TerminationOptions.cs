using WaveSim.Core.Analysis;

namespace WaveSim.Core.Terminations;

/// <summary>Settings of a termination study.</summary>
public sealed record TerminationOptions
{
    /// <summary>Default overshoot limit at the receiver, % of the swing: 10.</summary>
    public const double DefaultMaxOvershootPct = VerdictLimits.DefaultMaxOvershootPct;

    /// <summary>Default settling-time limit at the receiver: 5 ns.</summary>
    public const double DefaultMaxSettlingS = VerdictLimits.DefaultMaxSettlingS;

    /// <summary>Resistor series the simulated values are rounded to (default E96). Both roundings are reported.</summary>
    public PreferredSeries Series { get; init; } = PreferredSeries.E96;

    /// <summary>Thevenin level, V; null means halfway between the source's low and high.</summary>
    public double? TheveninLevelV { get; init; }

    /// <summary>R·C of the RC termination as a multiple of the line's round-trip delay (default 3; at least 1).</summary>
    public double RcRoundTrips { get; init; } = 3;

    /// <summary>Largest acceptable overshoot at the receiver, % of the swing (default 10).</summary>
    public double MaxOvershootPct { get; init; } = DefaultMaxOvershootPct;

    /// <summary>Largest acceptable settling time at the receiver, s (default 5 ns).</summary>
    public double MaxSettlingS { get; init; } = DefaultMaxSettlingS;

    /// <summary>Settling band as a fraction of the swing (default 0.05).</summary>
    public double SettleBand { get; init; } = SignalQualityOptions.DefaultSettleBand;

    /// <summary>The limits every receiver's edges are judged against (<see cref="ReceiverVerdict"/>).</summary>
    public VerdictLimits Limits => new() { MaxOvershootPct = MaxOvershootPct, MaxSettlingS = MaxSettlingS, SettleBand = SettleBand };

    /// <summary>Run the strategies one after another (default false: in parallel).</summary>
    public bool Serial { get; init; }

    /// <summary>Run beyond the memory or cell-update limits.</summary>
    public bool Force { get; init; }
}
