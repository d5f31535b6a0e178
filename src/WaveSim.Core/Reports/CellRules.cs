using System.Globalization;
using WaveSim.Core.Analysis;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>The rule behind each judged cell of the figures table, in words, shown when the pointer rests on the cell.</summary>
/// <param name="Limits">The limits the receivers were judged against.</param>
internal sealed record CellRules(VerdictLimits Limits)
{
    public const string NotJudged = "not judged: no receiver thresholds at this probe";
    public const string Ringback = "pass when no edge comes back into the band between Vil and Vih after crossing it, before the next edge";
    public const string Crossings = "pass when every edge crosses the band between Vil and Vih exactly once, without turning back inside it by more than 1 % of the swing";
    public const string MarginHigh = "pass when the settled high level minus Vih is zero or more";
    public const string MarginLow = "pass when Vil minus the settled low level is zero or more";
    public const string Eye = "pass when the eye opens beyond both thresholds: height and width measured against Vih and Vil above zero";
    public const string Verdict = "pass when every judged rule of this row passes; fail when one fails";

    public string Overshoot => $"pass when every edge overshoots the level it settles to by at most {Limits.MaxOvershootPct.ToString("G3", CultureInfo.InvariantCulture)} %";

    public string Settling => $"pass when every edge settles within ±{(Limits.SettleBand * 100).ToString("G3", CultureInfo.InvariantCulture)} % of the swing " +
        $"within {Quantity.Format(Limits.MaxSettlingS, "s", 3)} of its arrival at the probe, before the next edge";
}
