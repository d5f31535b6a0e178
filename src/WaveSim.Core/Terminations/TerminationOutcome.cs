using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Terminations;

/// <summary>One strategy's simulated outcome.</summary>
/// <param name="Design">The strategy and its parts.</param>
/// <param name="Result">The run; null when the strategy does not apply.</param>
/// <param name="Figures">Signal figures of every probe (empty when not run).</param>
/// <param name="Receiver">The receiver probe's figures, or null.</param>
/// <param name="PowerLowW">Static power in the termination with the driver low, W.</param>
/// <param name="PowerHighW">Static power in the termination with the driver high, W.</param>
/// <param name="Failures">The limits missed, as short texts; empty when all are met.</param>
public sealed record TerminationOutcome(TerminationDesign Design, SimulationResult? Result, IReadOnlyList<SignalFigures> Figures,
    SignalFigures? Receiver, double? PowerLowW, double? PowerHighW, IReadOnlyList<string> Failures)
{
    /// <summary>The receiver's eye when the source is a bit pattern (then the verdict is judged on it), else null.</summary>
    public ProbeEye? ReceiverEye { get; init; }

    /// <summary>Average static power for a 50 % duty cycle, W.</summary>
    public double? PowerAverageW => PowerLowW is { } lo && PowerHighW is { } hi ? 0.5 * (lo + hi) : null;

    /// <summary>True when the strategy applies and meets every limit.</summary>
    public bool MeetsLimits => Result is not null && Failures.Count == 0;

    /// <summary>"ok", "n/a" or the limits missed.</summary>
    public string Verdict => Result is null ? "n/a" : Failures.Count == 0 ? "ok" : string.Join("; ", Failures);
}

/// <summary>Every strategy's outcome on one net.</summary>
/// <param name="Z0">The first segment's impedance the strategies were sized for, ohm.</param>
/// <param name="LineDelayS">The main line's one-way delay, s.</param>
/// <param name="ReceiverProbe">The probe the figures and verdicts refer to.</param>
/// <param name="Probes">Probe names, in the order of each outcome's figures.</param>
/// <param name="Options">The settings used.</param>
/// <param name="Outcomes">One per <see cref="TerminationKind"/>, in that order.</param>
public sealed record TerminationStudyResult(double Z0, double LineDelayS, string ReceiverProbe, IReadOnlyList<string> Probes,
    TerminationOptions Options, IReadOnlyList<TerminationOutcome> Outcomes);
