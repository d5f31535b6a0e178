using System.Text;
using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Runs a drawing onto a raster surface (PNG bytes) or an SVG canvas (text).</summary>
internal static class ImageOutput
{
    public const int MinWidth = 160, MinHeight = 120, MaxSide = 16384;

    public static void CheckSize(int width, int height)
    {
        if (width < MinWidth || width > MaxSide)
            throw new ArgumentOutOfRangeException(nameof(width), $"Image width {width} px must be {MinWidth}..{MaxSide}.");
        if (height < MinHeight || height > MaxSide)
            throw new ArgumentOutOfRangeException(nameof(height), $"Image height {height} px must be {MinHeight}..{MaxSide}.");
    }

    public static byte[] Png(int width, int height, Action<SKCanvas> draw)
    {
        using SKSurface surface = SKSurface.Create(new SKImageInfo(width, height, SKColorType.Rgba8888, SKAlphaType.Premul))
            ?? throw new InvalidOperationException($"Could not create a {width}×{height} drawing surface.");
        draw(surface.Canvas);
        surface.Canvas.Flush();
        // Charts are flat colour: a light zlib level with the Sub filter is several times faster than the default and about as small.
        using SKPixmap pixels = surface.PeekPixels();
        using SKData png = pixels.Encode(new SKPngEncoderOptions(SKPngEncoderFilterFlags.Sub, 3))
            ?? throw new InvalidOperationException("Could not encode the PNG.");
        return png.ToArray();
    }

    public static string Svg(int width, int height, Action<SKCanvas> draw)
    {
        using var buffer = new MemoryStream();
        // The SVG document is only complete once the canvas is disposed.
        using (SKCanvas canvas = SKSvgCanvas.Create(SKRect.Create(width, height), buffer))
            draw(canvas);
        return Encoding.UTF8.GetString(buffer.ToArray());
    }
}
