namespace WaveSim.Core.Analysis;

/// <summary>
/// Settings for <see cref="SignalQuality.Compute"/>. All voltages in volts, times in seconds.
/// Immutable; every member has a named default.
/// </summary>
public sealed record SignalQualityOptions
{
    /// <summary>Default settling band: 0.05 (±5 % of the swing).</summary>
    public const double DefaultSettleBand = 0.05;

    /// <summary>Default monotonicity tolerance: 0.01 (1 % of the swing).</summary>
    public const double DefaultMonotonicTolerance = 0.01;

    /// <summary>
    /// Half-width of the settling band as a fraction of the swing |high − low|.
    /// Default 0.05. Must be in (0, 0.5).
    /// </summary>
    public double SettleBand { get; init; } = DefaultSettleBand;

    /// <summary>
    /// Largest reversal, as a fraction of the swing, that an edge may show and still count as monotonic.
    /// Default 0.01. Must be in [0, 0.5).
    /// </summary>
    public double MonotonicTolerance { get; init; } = DefaultMonotonicTolerance;

    /// <summary>Receiver input-high threshold Vih [V], or null. When given with <see cref="VilV"/> it must exceed it.</summary>
    public double? VihV { get; init; }

    /// <summary>Receiver input-low threshold Vil [V], or null.</summary>
    public double? VilV { get; init; }

    /// <summary>
    /// Instant [s] at which the source's first edge crosses its own 50 % level, or null.
    /// Needed for delay_50_s; with <see cref="LineDelayS"/> also the reference for settling_s (otherwise the first sample time).
    /// </summary>
    public double? SourceEdgeTimeS { get; init; }

    /// <summary>
    /// One-way line delay [s] from the driver to the probe (the sum of the segment delays; lumped parts add none). Default 0;
    /// must be finite and at least 0. settling_s is measured from the edge's arrival at the probe,
    /// <see cref="SourceEdgeTimeS"/> + this delay, so that it counts the ringing at the probe and not the flight down the line.
    /// Ignored without <see cref="SourceEdgeTimeS"/>; delay_50_s (the flight figure) does not use it.
    /// </summary>
    public double LineDelayS { get; init; }

    /// <summary>
    /// Level [V] before the first edge (e.g. the source's initial level), or null to take the first sample.
    /// </summary>
    public double? InitialLevelV { get; init; }

    /// <summary>
    /// Level [V] the first edge heads for (e.g. the source's level after its first edge), or null to
    /// estimate it from the record. Give it when the record ends before the waveform has settled.
    /// </summary>
    public double? FinalLevelV { get; init; }

    /// <summary>
    /// Instant [s] the source's next edge starts at the probe, or null when the first edge is the last in the record. The
    /// first edge's figures (overshoot, undershoot, ringback, rise or fall, settling) are measured before it, never across
    /// later edges; an edge that has not settled by then has no settling time (<see cref="SignalFigures.UnsettledAtNextEdge"/>).
    /// </summary>
    public double? NextEdgeTimeS { get; init; }

    /// <summary>True when both receiver thresholds are given.</summary>
    public bool HasThresholds => VihV is not null && VilV is not null;

    internal void Validate()
    {
        if (!(SettleBand > 0 && SettleBand < 0.5))
            throw new InputException($"settle band {SettleBand} is out of range: expected a fraction of the swing in (0, 0.5), e.g. 0.05.");
        if (!(MonotonicTolerance >= 0 && MonotonicTolerance < 0.5))
            throw new InputException($"monotonic tolerance {MonotonicTolerance} is out of range: expected a fraction of the swing in [0, 0.5), e.g. 0.01.");
        CheckFinite(VihV, "Vih");
        CheckFinite(VilV, "Vil");
        CheckFinite(SourceEdgeTimeS, "source edge time");
        if (!(LineDelayS >= 0 && double.IsFinite(LineDelayS)))
            throw new InputException($"line delay {LineDelayS} is out of range: expected a finite delay of 0 s or more.");
        CheckFinite(InitialLevelV, "initial level");
        CheckFinite(FinalLevelV, "final level");
        CheckFinite(NextEdgeTimeS, "next edge time");
        if (VihV is { } vih && VilV is { } vil && !(vih > vil))
            throw new InputException($"Vih ({vih} V) must be greater than Vil ({vil} V).");
    }

    static void CheckFinite(double? value, string name)
    {
        if (value is { } v && !double.IsFinite(v))
            throw new InputException($"{name} must be a finite number, got {v}.");
    }
}
