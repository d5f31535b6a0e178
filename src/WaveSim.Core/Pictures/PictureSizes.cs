namespace WaveSim.Core.Pictures;

/// <summary>The sizes of a run's pictures, px: one place for them, so no command carries its own.</summary>
public sealed record PictureSizes
{
    /// <summary>The sizes <c>run</c> writes unless told otherwise.</summary>
    public static PictureSizes Default { get; } = new();

    /// <summary>Width of waveforms.png and .svg.</summary>
    public int WaveformWidth { get; init; } = 1200;
    /// <summary>Height of waveforms.png and .svg with the voltages only.</summary>
    public int WaveformHeight { get; init; } = 600;
    /// <summary>Height of waveforms.png and .svg with a second panel of currents.</summary>
    public int WaveformWithCurrentsHeight { get; init; } = 900;
    /// <summary>Width of spacetime.png.</summary>
    public int SpaceTimeWidth { get; init; } = 1000;
    /// <summary>Height of spacetime.png.</summary>
    public int SpaceTimeHeight { get; init; } = 800;
    /// <summary>Width of each eye_PROBE.png.</summary>
    public int EyeWidth { get; init; } = 1000;
    /// <summary>Height of each eye_PROBE.png.</summary>
    public int EyeHeight { get; init; } = 700;
    /// <summary>Width of each frame.</summary>
    public int FrameWidth { get; init; } = 1280;
    /// <summary>Height of each frame.</summary>
    public int FrameHeight { get; init; } = 720;
    /// <summary>Width of the chart of a capture comparison or a fit (compare.png, fit.png).</summary>
    public int CaptureChartWidth { get; init; } = 1200;
    /// <summary>Height of the chart of a capture comparison or a fit.</summary>
    public int CaptureChartHeight { get; init; } = 800;
}
