namespace WaveSim.Core.Analysis;

/// <summary>Preferred-number series for resistor values (IEC 60063).</summary>
public enum PreferredSeries
{
    /// <summary>24 values per decade, two significant figures (5 % tolerance parts).</summary>
    E24,

    /// <summary>96 values per decade, three significant figures (1 % tolerance parts).</summary>
    E96,
}
