using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// The checks that tie several scenario values together, each giving its message (or null when it holds), shared by the loader
/// and the key-path API (<see cref="ScenarioValues"/>) so that a variant is refused exactly where a file would be.
/// </summary>
internal static class ScenarioRules
{
    /// <summary>A trapezoid's ramps and width must fit in its period.</summary>
    public static string? TrapezoidMisfit(double rise, double width, double fall, double period) =>
        1.25 * rise + width + 1.25 * fall > period * (1 + 1e-12)
            ? $"the rise ramp, width and fall ramp ({Quantity.Format(1.25 * rise + width + 1.25 * fall, "s")}) do not fit in the period"
            : null;

    /// <summary>A bit pattern's edge ramps must fit in a bit.</summary>
    public static string? BitEdgeMisfit(double rise, double fall, double bitTime) =>
        1.25 * Math.Max(rise, fall) > bitTime ? "the edge ramp (1.25 x rise or fall) is longer than a bit" : null;

    /// <summary>A receiver's low threshold must lie below its high one.</summary>
    public static string? ThresholdOrder(double vih, double vil) =>
        vil >= vih ? $"vil ({Quantity.Format(vil, "V")}) must be below vih ({Quantity.Format(vih, "V")})" : null;

    /// <summary>A line given by l and c per length must not be faster than light.</summary>
    public static string? FasterThanLight(double l, double c) =>
        1 / Math.Sqrt(l * c) > Quantity.SpeedOfLight * (1 + 1e-6) ? "l and c give a velocity faster than light" : null;

    /// <summary>A velocity must not exceed the speed of light.</summary>
    public static bool FasterThanLight(double velocity) => velocity > Quantity.SpeedOfLight * (1 + 1e-9);

    /// <summary>The message for a plain number below 1 (eps_eff, er, resolution).</summary>
    public static string AtLeastOne(double x) => $"must be at least 1 (got {x.ToString(CultureInfo.InvariantCulture)})";

    /// <summary>The message for a value that must be above zero.</summary>
    public static string Positive(string written) => $"must be greater than zero (got '{written}')";

    /// <summary>The message for a value that must not be negative.</summary>
    public static string NonNegative(string written) => $"must not be negative (got '{written}')";
}
