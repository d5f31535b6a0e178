namespace WaveSim.Core.Pictures;

/// <summary>What the waveform picture of a run shows.</summary>
public sealed record WaveformOptions
{
    /// <summary>Add a panel of probe currents below the voltages.</summary>
    public bool Currents { get; init; }

    /// <summary>
    /// The time span drawn. Null chooses one: the whole record, unless the source has more than
    /// <see cref="RunPictures.MaxEdgesDrawnWhole"/> edges, then the start-up and the first <see cref="RunPictures.EdgesShown"/>.
    /// </summary>
    public TimeWindow? Window { get; init; }

    /// <summary>The probes drawn, by name, in this order; null draws every probe.</summary>
    public IReadOnlyList<string>? Probes { get; init; }
}
