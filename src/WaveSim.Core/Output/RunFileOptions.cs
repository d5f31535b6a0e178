using WaveSim.Core.Pictures;

namespace WaveSim.Core.Output;

/// <summary>What <see cref="RunFiles.Write"/> writes beyond the files every run gets.</summary>
public sealed record RunFileOptions
{
    /// <summary>What waveforms.png shows (its window, probes and the currents panel).</summary>
    public WaveformOptions Waveforms { get; init; } = new();

    /// <summary>Also write waveforms.svg.</summary>
    public bool Svg { get; init; }

    /// <summary>The pictures' sizes.</summary>
    public PictureSizes Sizes { get; init; } = PictureSizes.Default;
}
