using WaveSim.Core.Pictures;

namespace WaveSim.Core.Output;

/// <summary>What <see cref="RunFiles.Write"/> writes beyond the files every run gets.</summary>
public sealed record RunFileOptions
{
    /// <summary>What waveforms.png shows (its window, probes and the currents panel).</summary>
    public WaveformOptions Waveforms { get; init; } = new();

    /// <summary>Also write waveforms.svg.</summary>
    public bool Svg { get; init; }

    /// <summary>The size of each frame (the other pictures' sizes are fixed in <see cref="PictureSizes"/>).</summary>
    public PixelSize FrameSize { get; init; } = PictureSizes.Frame;

    /// <summary>Told the share of the frames written so far (0 to 1); rendering many frames takes a while.</summary>
    public IProgress<double>? FrameProgress { get; init; }
}
