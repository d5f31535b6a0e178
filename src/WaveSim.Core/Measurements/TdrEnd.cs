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
}
