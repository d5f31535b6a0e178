namespace WaveSim.Core.Measurements;

/// <summary>How the impedance profile of a reflectometer trace ends.</summary>
public enum TdrEnd
{
    /// <summary>It runs to the end of the record: whatever lies beyond was not reached.</summary>
    Record,

    /// <summary>The impedance rose past 10 × the reference: an open end (or one far above the reference).</summary>
    Open,

    /// <summary>The impedance fell below the reference / 10: a short (or one far below the reference).</summary>
    Short,

    /// <summary>The reflection rises from −1 to +1 with τ = Z·C: a capacitance to ground at the end (an open behind it).</summary>
    Capacitive,

    /// <summary>The reflection falls from +1 to −1 with τ = L/Z: an inductance to ground at the end (a short behind it).</summary>
    Inductive,
}
