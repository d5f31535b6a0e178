using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Checks that a capture's time axis is on the simulation's scale: the guard against a unit slip (a file in ns read as seconds).
/// </summary>
/// <remarks>
/// A capture in ns read as seconds spans 10⁹ times too much; aligned on its edge it would still be "compared", shifted by seconds.
/// Two rules, both common practice (no source): a span more than <see cref="ScaleWarningRatio"/> away from the simulated duration
/// either way is warned about, and a comparison or fit needs at least <see cref="MinimumOverlapFraction"/> of the capture's span to
/// lie inside the simulated record after alignment (a capture may be shorter than the simulation, a zoom on one edge, but the
/// part of it that is compared must be most of it).
/// </remarks>
public static class CaptureTimeSpan
{
    /// <summary>Ratio of capture span to simulated duration (or its inverse) beyond which a warning is given: 10⁶.</summary>
    public const double ScaleWarningRatio = 1e6;

    /// <summary>Fraction of the capture's time span that must overlap the simulated record after alignment: 0.5.</summary>
    public const double MinimumOverlapFraction = 0.5;

    /// <summary>One-line warnings when the capture's time span is wildly out of scale with the simulation's.</summary>
    /// <param name="capture">The capture.</param>
    /// <param name="simulationDuration">The scenario's simulated duration, s.</param>
    /// <returns>No line, or one naming the file and the time column.</returns>
    public static IReadOnlyList<string> Warnings(Capture capture, double simulationDuration)
    {
        ArgumentNullException.ThrowIfNull(capture);
        double span = Span(capture);
        if (!(simulationDuration > 0) || !(span > 0))
            return [];
        double ratio = span / simulationDuration;
        if (ratio < ScaleWarningRatio && ratio > 1 / ScaleWarningRatio)
            return [];
        string times = ratio >= 1 ? $"{G(ratio)} times" : $"1/{G(1 / ratio)} of";   // e.g. "1e9 times"
        return [$"{Where(capture)}: the capture spans {Quantity.Format(span, "s", 3)}, {times} the simulated duration " +
                $"({Quantity.Format(simulationDuration, "s", 3)}); is the capture's time unit right?"];
    }

    /// <summary>Refuses a capture too long for at least half of it ever to overlap the simulated record, before any alignment.</summary>
    /// <param name="capture">The capture.</param>
    /// <param name="simulationDuration">The simulated duration, s.</param>
    /// <exception cref="InputException">The capture spans more than 1/<see cref="MinimumOverlapFraction"/> times the simulation.</exception>
    public static void RequireFits(Capture capture, double simulationDuration)
    {
        ArgumentNullException.ThrowIfNull(capture);
        double span = Span(capture);
        if (MinimumOverlapFraction * span > simulationDuration * (1 + 1e-9))
            throw new InputException(
                $"{Where(capture)}: the capture spans {Quantity.Format(span, "s", 3)} but the simulation only {Quantity.Format(simulationDuration, "s", 3)}, " +
                $"so less than {Pct(MinimumOverlapFraction)} of it can overlap the simulation; check the capture's time unit or lengthen simulation.duration");
    }

    /// <summary>Refuses an alignment that leaves less than <see cref="MinimumOverlapFraction"/> of the capture's span inside the simulated record.</summary>
    /// <param name="capture">The capture.</param>
    /// <param name="offset">Shift added to the capture's time axis, s.</param>
    /// <param name="simStart">First simulated time, s.</param>
    /// <param name="simEnd">Last simulated time, s.</param>
    /// <exception cref="InputException">Too little overlap.</exception>
    public static void RequireOverlap(Capture capture, double offset, double simStart, double simEnd)
    {
        ArgumentNullException.ThrowIfNull(capture);
        double fraction = OverlapFraction(capture.Time[0] + offset, capture.Time[^1] + offset, simStart, simEnd);
        if (fraction < MinimumOverlapFraction)
            throw new InputException(
                $"{Where(capture)}: after alignment (capture shifted by {Quantity.Format(offset, "s", 4)}) only {Pct(fraction)} of the capture " +
                $"({Quantity.Format(capture.Time[0] + offset, "s", 4)} to {Quantity.Format(capture.Time[^1] + offset, "s", 4)}) overlaps the simulated record " +
                $"({Quantity.Format(simStart, "s", 4)} to {Quantity.Format(simEnd, "s", 4)}); at least {Pct(MinimumOverlapFraction)} must; " +
                "check the capture's time unit or lengthen simulation.duration");
    }

    /// <summary>Fraction of the interval [c0, c1] that lies inside [s0, s1]; 1 for a zero-length interval inside.</summary>
    /// <param name="c0">Capture start, s.</param>
    /// <param name="c1">Capture end, s, at least <paramref name="c0"/>.</param>
    /// <param name="s0">Simulation start, s.</param>
    /// <param name="s1">Simulation end, s.</param>
    /// <returns>0 to 1.</returns>
    public static double OverlapFraction(double c0, double c1, double s0, double s1)
    {
        double overlap = Math.Min(c1, s1) - Math.Max(c0, s0);
        if (c1 <= c0)
            return c0 >= s0 && c0 <= s1 ? 1 : 0;
        return Math.Clamp(overlap / (c1 - c0), 0, 1);
    }

    static double Span(Capture c) => c.Time[^1] - c.Time[0];

    static string Where(Capture c) => $"{Path.GetFileName(c.Source)} time column {c.TimeColumn}";

    static string G(double x) => x.ToString("0.##e0", CultureInfo.InvariantCulture);

    static string Pct(double f) => (100 * f).ToString("0.#", CultureInfo.InvariantCulture) + " %";
}
