using SkiaSharp;

namespace WaveSim.Tests.Rendering;

/// <summary>Reads rendered PNGs back (SkiaSharp's decoder) and looks for colours in them.</summary>
internal static class PngProbe
{
    public static SKBitmap Decode(byte[] png) => SKBitmap.Decode(png) ?? throw new InvalidOperationException("Not a decodable PNG.");

    public static int Distance(SKColor a, SKColor b) =>
        Math.Abs(a.Red - b.Red) + Math.Abs(a.Green - b.Green) + Math.Abs(a.Blue - b.Blue);

    public static bool Near(SKColor a, SKColor b, int tolerance) => Distance(a, b) <= tolerance;

    /// <summary>Mean row of the pixels of column <paramref name="x"/> within [top, bottom) near <paramref name="colour"/>; NaN if none.</summary>
    public static double MeanRowOf(SKBitmap bmp, int x, SKColor colour, int top, int bottom, int tolerance = 60)
    {
        double sum = 0; int count = 0;
        for (int y = Math.Max(0, top); y < Math.Min(bmp.Height, bottom); y++)
            if (Near(bmp.GetPixel(x, y), colour, tolerance)) { sum += y; count++; }
        return count == 0 ? double.NaN : sum / count;
    }

    /// <summary>How many pixels in the box are clearly not white (text, lines).</summary>
    public static int InkCount(SKBitmap bmp, SKRect box)
    {
        int n = 0;
        for (int y = Math.Max(0, (int)box.Top); y < Math.Min(bmp.Height, (int)Math.Ceiling(box.Bottom)); y++)
            for (int x = Math.Max(0, (int)box.Left); x < Math.Min(bmp.Width, (int)Math.Ceiling(box.Right)); x++)
                if (Distance(bmp.GetPixel(x, y), SKColors.White) > 150) n++;
        return n;
    }
}
