namespace WaveSim.Core.Output;

/// <summary>A picture's size in pixels.</summary>
/// <param name="Width">Width, px.</param>
/// <param name="Height">Height, px.</param>
public readonly record struct PixelSize(int Width, int Height);

/// <summary>The sizes of the pictures the commands write, in one place (the report's own are in Reports.ReportImages).</summary>
public static class PictureSizes
{
    /// <summary>waveforms.png and waveforms.svg.</summary>
    public static readonly PixelSize Waveforms = new(1200, 600);

    /// <summary>waveforms.png with the extra panel of probe currents.</summary>
    public static readonly PixelSize WaveformsWithCurrents = new(1200, 900);

    /// <summary>spacetime.png.</summary>
    public static readonly PixelSize SpaceTime = new(1000, 800);

    /// <summary>eye_&lt;probe&gt;.png.</summary>
    public static readonly PixelSize Eye = new(1000, 700);

    /// <summary>frequency.png (gain, phase and input impedance).</summary>
    public static readonly PixelSize Frequency = new(1200, 960);

    /// <summary>terminations.png.</summary>
    public static readonly PixelSize Terminations = new(1200, 650);

    /// <summary>compare.png, fit.png and tdr.png: an overlay above a smaller panel.</summary>
    public static readonly PixelSize Overlay = new(1200, 800);

    /// <summary>The default size of a frame of the line.</summary>
    public static readonly PixelSize Frame = new(1280, 720);

    /// <summary><see cref="Frame"/> written as WIDTHxHEIGHT.</summary>
    public const string DefaultFrame = "1280x720";

    /// <summary>A sweep chart with <paramref name="panels"/> panels: 300 px of height each, plus the title and axis.</summary>
    public static PixelSize Sweep(int panels) => new(1200, 300 + 300 * panels);
}
