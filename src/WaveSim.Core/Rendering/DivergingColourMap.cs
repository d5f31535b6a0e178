using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// A diverging colour map for voltages around a reference level: near-white at the reference, darkening blue
/// below it, orange turning to deep red above it. Built in CIELAB so lightness falls evenly and equally on both
/// sides (a voltage step reads as the same contrast up or down); chroma grows with distance from the reference.
/// </summary>
/// <remarks>
/// CIELAB → XYZ (D65) → linear sRGB → sRGB by the CIE 15:2004 and IEC 61966-2-1 (sRGB) formulas; colours
/// outside the sRGB gamut are clipped per channel.
/// </remarks>
public static class DivergingColourMap
{
    const int Entries = 513; // odd, so the reference level has its own entry

    static readonly SKColor[] Table = Enumerable.Range(0, Entries).Select(i => Compute(2.0 * i / (Entries - 1) - 1)).ToArray();

    /// <summary>Lightness at the reference level and at either end (CIELAB L*).</summary>
    public const double CentreLightness = 97, EndLightness = 33;

    /// <summary>The colour at signed position <paramref name="s"/>: −1 lowest, 0 reference, +1 highest (clamped).</summary>
    public static SKColor At(double s)
    {
        if (double.IsNaN(s)) return new SKColor(0x80, 0x80, 0x80);
        s = Math.Clamp(s, -1, 1);
        return Table[(int)Math.Round((s + 1) / 2 * (Entries - 1))];
    }

    /// <summary>
    /// The colour of voltage <paramref name="v"/>: <paramref name="reference"/> maps to the centre,
    /// <paramref name="vMin"/> to the low end and <paramref name="vMax"/> to the high end (each side scaled on its own).
    /// </summary>
    public static SKColor Map(double v, double reference, double vMin, double vMax) => At(Position(v, reference, vMin, vMax));

    /// <summary>The signed map position −1..1 of <paramref name="v"/> (see <see cref="Map"/>).</summary>
    public static double Position(double v, double reference, double vMin, double vMax)
    {
        if (double.IsNaN(v)) return double.NaN;
        if (v >= reference) return vMax > reference ? (v - reference) / (vMax - reference) : 1;
        return reference > vMin ? (v - reference) / (reference - vMin) : -1;
    }

    static SKColor Compute(double s)
    {
        double a = Math.Abs(s);
        double lightness = CentreLightness - (CentreLightness - EndLightness) * a;
        double chroma = 68 * Math.Sin(Math.PI / 2 * a);
        double hueDeg = s < 0 ? 250 + 15 * a : 78 - 48 * a; // blue side; orange → red side
        double h = hueDeg * Math.PI / 180;
        return LabToSrgb(lightness, chroma * Math.Cos(h), chroma * Math.Sin(h));
    }

    static SKColor LabToSrgb(double l, double a, double b)
    {
        double fy = (l + 16) / 116, fx = fy + a / 500, fz = fy - b / 200;
        static double F(double t) => t > 6.0 / 29 ? t * t * t : 3 * (6.0 / 29) * (6.0 / 29) * (t - 4.0 / 29);
        double x = 0.95047 * F(fx), y = F(fy), z = 1.08883 * F(fz);
        double r = 3.2404542 * x - 1.5371385 * y - 0.4985314 * z;
        double g = -0.9692660 * x + 1.8760108 * y + 0.0415560 * z;
        double bl = 0.0556434 * x - 0.2040259 * y + 1.0572252 * z;
        static byte Encode(double c)
        {
            c = Math.Clamp(c, 0, 1);
            double e = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.Pow(c, 1 / 2.4) - 0.055;
            return (byte)Math.Round(255 * e);
        }
        return new SKColor(Encode(r), Encode(g), Encode(bl));
    }
}
