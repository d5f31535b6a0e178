using WaveSim.Core.Units;

namespace WaveSim.Core.Pictures;

/// <summary>The part of a record the waveform picture shows, s. <see cref="Whole"/> shows everything.</summary>
/// <param name="Start">First instant shown, s.</param>
/// <param name="Stop">Last instant shown, s; greater than <paramref name="Start"/>.</param>
public readonly record struct TimeWindow(double Start, double Stop)
{
    /// <summary>The whole record, however long.</summary>
    public static TimeWindow Whole { get; } = new(double.NegativeInfinity, double.PositiveInfinity);

    /// <summary>True for <see cref="Whole"/> (both ends open).</summary>
    public bool IsWhole => double.IsNegativeInfinity(Start) && double.IsPositiveInfinity(Stop);

    /// <summary>
    /// Throws <see cref="InputException"/> unless the window is ordered and overlaps a record from 0 to
    /// <paramref name="duration"/>: checked before a run, so a bad window costs no simulation.
    /// </summary>
    public void CheckAgainst(double duration)
    {
        if (IsWhole) return;
        if (double.IsNaN(Start) || double.IsNaN(Stop) || !(Stop > Start))
            throw new InputException($"the window {Describe()} must end after it starts");
        if (!(Start < duration) || !(Stop > 0))
            throw new InputException($"the window {Describe()} lies outside the record, which runs from 0 s to {Quantity.Format(duration, "s")}");
    }

    /// <summary>"10 ns to 20 ns", or "the whole record".</summary>
    public string Describe() => IsWhole ? "the whole record" : $"{Quantity.Format(Start, "s")} to {Quantity.Format(Stop, "s")}";
}
