using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Terminations;

/// <summary>One strategy's simulated outcome.</summary>
/// <param name="Design">The strategy and its parts.</param>
/// <param name="Result">The run; null when the strategy does not apply.</param>
/// <param name="Figures">Signal figures of every probe (empty when not run).</param>
/// <param name="Receiver">The receiver probe's figures, or null.</param>
/// <param name="PowerLowW">Static power in the termination with the driver held low (DC solution), W.</param>
/// <param name="PowerHighW">Static power in the termination with the driver held high (DC solution), W.</param>
/// <param name="Verdicts">The verdict of every judged receiver (<see cref="RunVerdicts"/>), in probe order; empty when not run.</param>
public sealed record TerminationOutcome(TerminationDesign Design, SimulationResult? Result, IReadOnlyList<SignalFigures> Figures,
    SignalFigures? Receiver, double? PowerLowW, double? PowerHighW, IReadOnlyList<ProbeVerdict> Verdicts)
{
    /// <summary>The receiver's eye when the source is a bit pattern (then the verdict is judged on it), else null.</summary>
    public ProbeEye? ReceiverEye { get; init; }

    /// <summary>Mean power over the record in the termination's resistors, from the simulated v·i (<see cref="TerminationPower.Average"/>), W.</summary>
    public double? PowerAverageW { get; init; }

    /// <summary>The verdict of the judged probe named <paramref name="probe"/>, or null.</summary>
    public ProbeVerdict? VerdictAt(string probe) => Verdicts.FirstOrDefault(v => v.Probe == probe && v.Judged);

    /// <summary>Every rule missed, at every judged receiver, in probe order.</summary>
    public IReadOnlyList<VerdictFailure> Failures => Verdicts.SelectMany(v => v.Failures).ToArray();

    /// <summary>True when the strategy applies and every judged receiver passes every rule.</summary>
    public bool MeetsLimits => Result is not null && Verdicts.Any(v => v.Judged) && Failures.Count == 0;

    /// <summary>
    /// The verdict in a few words for a table cell: "ok", "n/a", "not judged", or "fail: " and the rules missed with the receivers
    /// that missed them (e.g. "fail: levels, ringback at u1, u2"). <see cref="Verdict"/> holds the full account.
    /// </summary>
    public string BriefVerdict
    {
        get
        {
            if (Result is null) return "n/a";
            if (!Verdicts.Any(v => v.Judged)) return "not judged";
            if (Failures.Count == 0) return Verdicts.Any(v => v.Note is not null) ? "ok (some receivers not judged)" : "ok";
            var rules = Failures.Select(f => f.Rule).Distinct().Order().Select(r => r.ToString().ToLowerInvariant());
            var probes = Failures.Select(f => f.Probe).Distinct();
            return $"fail: {string.Join(", ", rules)} at {string.Join(", ", probes)}";
        }
    }

    /// <summary>"ok", "n/a", "not judged" or the rules missed (probe, edge, what was measured); receivers that could not be judged are named.</summary>
    public string Verdict
    {
        get
        {
            if (Result is null) return "n/a";
            var skipped = Verdicts.Where(v => v.Note is not null).Select(v => $"{v.Probe}: {v.Note}").ToArray();
            string verdict = !Verdicts.Any(v => v.Judged) ? "not judged"
                : Failures.Count == 0 ? "ok" : string.Join(" | ", Verdicts.Where(v => v.Judged && v.Failures.Count > 0).Select(v => v.Summary()));
            return skipped.Length == 0 ? verdict : verdict + " (" + string.Join("; ", skipped) + ")";
        }
    }
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
