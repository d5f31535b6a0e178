namespace WaveSim.Core.Buffers;

/// <summary>How a <see cref="SwitchingTable"/> was made.</summary>
public enum SwitchingMethod
{
    /// <summary>From [Ramp]: a linear blend over the 20-80 % time divided by 0.6 (common practice, no source).</summary>
    Ramp,

    /// <summary>From two waveforms of the edge into different fixtures, solving two equations per instant for Ku and Kd.</summary>
    TwoWaveforms,

    /// <summary>A driver with one switching table (Open_drain): its coefficient from the waveforms by least squares, one equation each.</summary>
    OneSided,
}
