using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Trace colours and dash patterns. The colours are the Okabe-Ito colour-blind-safe set
/// (Okabe &amp; Ito, "Color Universal Design", 2008); its yellow is left out because it is too faint on white.
/// </summary>
public static class Palette
{
    /// <summary>Trace colours in the order they are handed out.</summary>
    public static IReadOnlyList<SKColor> Traces { get; } =
    [
        new SKColor(0x00, 0x72, 0xB2), // blue
        new SKColor(0xD5, 0x5E, 0x00), // vermillion
        new SKColor(0x00, 0x9E, 0x73), // bluish green
        new SKColor(0xCC, 0x79, 0xA7), // reddish purple
        new SKColor(0xE6, 0x9F, 0x00), // orange
        new SKColor(0x56, 0xB4, 0xE9), // sky blue
        new SKColor(0x00, 0x00, 0x00), // black
    ];

    /// <summary>Dash patterns (on, off lengths in pixels); the first, empty, is a solid line.</summary>
    public static IReadOnlyList<float[]> Dashes { get; } =
    [
        [],
        [7f, 4f],
        [2f, 3f],
        [8f, 3f, 2f, 3f],
    ];

    /// <summary>Page background.</summary>
    public static SKColor Background { get; } = SKColors.White;

    /// <summary>Grid lines inside the plot area.</summary>
    public static SKColor Grid { get; } = new(0xE3, 0xE3, 0xE3);

    /// <summary>Minor grid lines (2..9 × each decade of a logarithmic axis), fainter than <see cref="Grid"/>.</summary>
    public static SKColor GridMinor { get; } = new(0xF0, 0xF0, 0xF0);

    /// <summary>Axis frame, ticks and all text.</summary>
    public static SKColor Ink { get; } = new(0x26, 0x26, 0x26);

    /// <summary>Secondary marks: reference lines, element positions.</summary>
    public static SKColor Muted { get; } = new(0x6E, 0x6E, 0x6E);

    /// <summary>The one emphasised mark of a chart (a sweep's best point): a deep magenta no trace colour is close to.</summary>
    public static SKColor Highlight { get; } = new(0xB0, 0x00, 0x5E);

    /// <summary>Receiver thresholds drawn across a waveform panel: a dark red-brown, apart from every trace colour.</summary>
    public static SKColor Threshold { get; } = new(0x9E, 0x2A, 0x2B);

    /// <summary>
    /// The band of a <see cref="TraceLook.Reference"/> trace (a capture, the net as drawn): a pale neutral grey, lighter than
    /// <see cref="Muted"/> and unlike every trace colour, so a coloured trace drawn on it stands out.
    /// </summary>
    public static SKColor ReferenceBand { get; } = new(0xB9, 0xB9, 0xB9);

    /// <summary>The colour of trace <paramref name="index"/> (cycles through <see cref="Traces"/>).</summary>
    public static SKColor TraceColour(int index) => Traces[Math.Abs(index) % Traces.Count];

    /// <summary>
    /// The dash pattern of trace <paramref name="index"/> in a panel of <paramref name="traceCount"/> traces:
    /// solid up to four traces, otherwise cycling so that colour and dash together stay distinct.
    /// </summary>
    public static float[] TraceDash(int index, int traceCount) =>
        traceCount <= 4 ? Dashes[0] : Dashes[Math.Abs(index) % Dashes.Count];
}
