namespace WaveSim.Core.Analysis;

/// <summary>What <see cref="RunAnalysis"/> computes from a run, and what the run records for it (snapshots).</summary>
public sealed record AnalysisOptions
{
    /// <summary>Settling band of the signal-quality figures, as a fraction of the swing.</summary>
    public double SettleBand { get; init; } = SignalQualityOptions.DefaultSettleBand;

    /// <summary>Compute each probe's signal-quality figures (default true).</summary>
    public bool Figures { get; init; } = true;

    /// <summary>Fold every probe into an eye diagram when the source is a bit pattern (default true).</summary>
    public bool Eyes { get; init; } = true;

    /// <summary>The limits receivers are judged against (<see cref="RunVerdicts"/>); null judges nothing.</summary>
    public VerdictLimits? Limits { get; init; } = new();

    /// <summary>The index of a probe to judge at the mid level when no load has receiver thresholds (the receiver of <c>terminations</c>), or null.</summary>
    public int? JudgeAtMidLevel { get; init; }

    /// <summary>Cross-check the run against the frequency-domain solution and sweep its frequency response (default false).</summary>
    public bool FrequencyCheck { get; init; }

    /// <summary>Frames of the voltage along the line to record, evenly spaced from 0 to the duration (0: none).</summary>
    public int Frames { get; init; }

    /// <summary>Record the rows of the space-time map (<see cref="RunAnalysis.SpaceTimeRows"/> snapshots; default true).</summary>
    public bool SpaceTime { get; init; } = true;

    /// <summary>The full analysis of <c>run</c> and <c>report</c>: figures, eyes, verdicts with the default limits, the space-time rows.</summary>
    public static AnalysisOptions Full { get; } = new();

    /// <summary>Only the figures, with the given settling band: what a sweep point keeps (no eyes, verdicts or snapshots).</summary>
    public static AnalysisOptions FiguresOnly(double settleBand) =>
        new() { SettleBand = settleBand, Eyes = false, Limits = null, SpaceTime = false };

    /// <summary>Nothing beyond the waveforms and the source's edges: a fit evaluation or a capture comparison.</summary>
    public static AnalysisOptions WaveformsOnly { get; } = new() { Figures = false, Eyes = false, Limits = null, SpaceTime = false };
}
