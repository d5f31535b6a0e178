namespace WaveSim.Core.Buffers;

/// <summary>One of the three columns of every buffer-model table: typical, minimum (weak, slow) and maximum (strong, fast).</summary>
public enum Corner
{
    /// <summary>The typical column; always present.</summary>
    Typ,

    /// <summary>The minimum column (weak, slow devices); NA falls back to typ.</summary>
    Min,

    /// <summary>The maximum column (strong, fast devices); NA falls back to typ.</summary>
    Max,
}
