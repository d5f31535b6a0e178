namespace WaveSim.Core.Buffers;

/// <summary>A typ/min/max triple as the model file gives it; a null min or max was written NA and means typ.</summary>
/// <param name="Typ">The typical value (SI).</param>
/// <param name="Min">The minimum-corner value, or null for NA.</param>
/// <param name="Max">The maximum-corner value, or null for NA.</param>
public readonly record struct CornerValue(double Typ, double? Min, double? Max)
{
    /// <summary>The value of <paramref name="corner"/>; NA falls back to typ.</summary>
    public double At(Corner corner) => corner switch
    {
        Corner.Min => Min ?? Typ,
        Corner.Max => Max ?? Typ,
        _ => Typ,
    };

    /// <summary>True when the column of <paramref name="corner"/> holds a number (typ always does).</summary>
    public bool Has(Corner corner) => corner switch
    {
        Corner.Min => Min.HasValue,
        Corner.Max => Max.HasValue,
        _ => true,
    };

    /// <summary>The same value in every corner.</summary>
    public static CornerValue Single(double value) => new(value, null, null);
}
