using WaveSim.Core.Analysis;
using WaveSim.Core.Model;

namespace WaveSim.Core.Reports;

/// <summary>
/// The report's pass/fail cells of one probe: a view of its <see cref="ProbeVerdict"/> (<see cref="RunVerdicts"/> through <see cref="RunAnalysis"/>, the same rules
/// that judge <c>terminations</c>). Null members are "not judged" (no thresholds at this probe, or the rule does not apply).
/// </summary>
/// <param name="Verdict">The probe's verdict.</param>
public sealed record ReceiverCheck(ProbeVerdict Verdict)
{
    /// <summary>The probe's name.</summary>
    public string Probe => Verdict.Probe;

    /// <summary>The receiver thresholds at the probe's load, or null (then nothing is judged).</summary>
    public ReceiverThresholds? Thresholds => Verdict.Judged ? Verdict.Thresholds : null;

    /// <summary>Settled high level minus Vih is zero or more.</summary>
    public bool? MarginHighOk => Verdict.MarginHighV is { } m && Verdict.Judged ? m >= 0 : null;

    /// <summary>Vil minus settled low level is zero or more.</summary>
    public bool? MarginLowOk => Verdict.MarginLowV is { } m && Verdict.Judged ? m >= 0 : null;

    /// <summary>Every edge crosses the threshold band exactly once, monotonically.</summary>
    public bool? CrossingsOk => Both(Verdict.Holds(VerdictRule.Crossings), Verdict.Holds(VerdictRule.Monotonic));

    /// <summary>No edge rings back into the threshold band.</summary>
    public bool? RingbackOk => Verdict.Holds(VerdictRule.Ringback);

    /// <summary>Every edge's overshoot is within the limit.</summary>
    public bool? OvershootOk => Verdict.Holds(VerdictRule.Overshoot);

    /// <summary>Every edge settles within the limit before the next one.</summary>
    public bool? SettlingOk => Verdict.Holds(VerdictRule.Settling);

    /// <summary>Bit pattern: the eye opens beyond both thresholds (height and width against them above 0).</summary>
    public bool? EyeOk => Verdict.Holds(VerdictRule.Eye);

    /// <summary>True when every judged rule passes, false when one fails, null when nothing is judged.</summary>
    public bool? Pass => Verdict.Pass;

    /// <summary>The rule in words, as printed in the report (common practice, no source).</summary>
    public const string Rule = ReceiverVerdict.RuleText + " Probes without receiver thresholds are not judged.";

    /// <summary>The checks of every probe of an analysed run (in probe order), from its verdicts (<see cref="RunOutcome.Verdicts"/>).</summary>
    public static IReadOnlyList<ReceiverCheck> Of(RunOutcome outcome) => outcome.Verdicts.Select(v => new ReceiverCheck(v)).ToArray();

    static bool? Both(bool? a, bool? b) => a is null && b is null ? null : a is not false && b is not false;
}
