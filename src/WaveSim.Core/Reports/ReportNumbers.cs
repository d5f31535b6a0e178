using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Reports;

/// <summary>
/// How the report prints numbers: an engineering prefix and three significant digits, never an exponent, and a time
/// smaller than half the solver's step (a rounding residue, e.g. the difference of two equal instants) as 0; likewise a
/// voltage below 1 nV and a current below 1 pA, far under any instrument's resolution (common practice, no source), so a
/// level the solver settles to 2e-13 V reads 0 V, not "218 fV".
/// </summary>
/// <param name="StepS">The solver's time step, s: the resolution of every time the run measures.</param>
public sealed record ReportNumbers(double StepS)
{
    /// <summary>Significant digits of a figure.</summary>
    public const int Digits = 3;

    /// <summary>A time or delay, e.g. "1.23 ns"; below half a step "0 s"; "-" for none.</summary>
    public string S(double? seconds) => seconds is not { } x ? "-" : Math.Abs(x) < StepS / 2 ? "0 s" : Quantity.Format(x, "s", Digits);

    /// <summary>A voltage, e.g. "-12.5 mV"; below 1 nV "0 V"; "-" for none.</summary>
    public static string V(double? volts) => volts is not { } x ? "-" : Math.Abs(x) < 1e-9 ? "0 V" : Quantity.Format(x, "V", Digits);

    /// <summary>A current, e.g. "10 mA"; below 1 pA "0 A"; "-" for none.</summary>
    public static string A(double? amps) => amps is not { } x ? "-" : Math.Abs(x) < 1e-12 ? "0 A" : Quantity.Format(x, "A", Digits);

    /// <summary>A power, e.g. "2.5 mW"; "-" for none.</summary>
    public static string W(double? watts) => watts is { } x ? Quantity.Format(x, "W", Digits) : "-";

    /// <summary>A percentage with one decimal, e.g. "4.2 %" ("-0.0" prints as "0.0"); "-" for none.</summary>
    public static string Pct(double? pct) => pct is { } x
        ? (Math.Round(x, 1) == 0 ? 0.0 : x).ToString("F1", CultureInfo.InvariantCulture) + " %" : "-";
}
