namespace WaveSim.Core.Measurements;

/// <summary>How <see cref="WaveformComparison"/> shifts the capture's time axis onto the simulation's.</summary>
public enum AlignMode
{
    /// <summary>Use the capture's time axis as it is.</summary>
    None,

    /// <summary>Make the first 50 % crossings coincide (see <see cref="WaveformComparison.Crossing50"/>).</summary>
    Edge50,

    /// <summary>Maximise the cross-correlation of the two mean-removed waveforms, refined to a fraction of a sample.</summary>
    CrossCorrelation,
}
