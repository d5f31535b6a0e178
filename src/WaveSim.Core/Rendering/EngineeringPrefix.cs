namespace WaveSim.Core.Rendering;

/// <summary>An SI prefix chosen for an axis: the symbol and the factor a value is divided by for display.</summary>
/// <param name="Symbol">The prefix, e.g. "n", "µ", "m" or "" for none.</param>
/// <param name="Factor">The value of the prefix, e.g. 1e-9 for "n".</param>
public readonly record struct EngineeringPrefix(string Symbol, double Factor)
{
    static readonly EngineeringPrefix[] Ladder =
    [
        new("T", 1e12), new("G", 1e9), new("M", 1e6), new("k", 1e3), new("", 1),
        new("m", 1e-3), new("\u00b5", 1e-6), new("n", 1e-9), new("p", 1e-12), new("f", 1e-15),
    ];

    /// <summary>No prefix (factor 1).</summary>
    public static EngineeringPrefix None { get; } = new("", 1);

    /// <summary>
    /// The largest prefix that keeps <paramref name="magnitude"/> at 1 or more once divided by it
    /// (so axis numbers run from 1 to 999), e.g. 2e-9 → "n", 0.25 → "m", 3.3 → "".
    /// Rule: common practice, no source.
    /// </summary>
    /// <param name="magnitude">The largest absolute value shown on the axis. 0 or non-finite gives no prefix.</param>
    public static EngineeringPrefix ForMagnitude(double magnitude)
    {
        double a = Math.Abs(magnitude);
        if (a == 0 || !double.IsFinite(a)) return None;
        foreach (EngineeringPrefix p in Ladder)
            if (a >= p.Factor * (1 - 1e-9)) return p;
        return Ladder[^1];
    }

    /// <summary>
    /// The prefix for an axis of unit <paramref name="unit"/> spanning [min, max]: by <see cref="ForMagnitude"/>
    /// of the larger end for SI units that take prefixes (s, V, A, W, Hz, F, H, Ω), none for any other unit.
    /// </summary>
    public static EngineeringPrefix ForAxis(string unit, double min, double max) =>
        TakesPrefix(unit) ? ForMagnitude(Math.Max(Math.Abs(min), Math.Abs(max))) : None;

    /// <summary>True for the SI unit symbols that take an engineering prefix on an axis.</summary>
    public static bool TakesPrefix(string unit) =>
        unit is "s" or "V" or "A" or "W" or "Hz" or "F" or "H" or "\u03a9" or "\u2126" or "S";
}
