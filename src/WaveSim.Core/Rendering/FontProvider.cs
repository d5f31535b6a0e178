using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// The one typeface every renderer draws with: DejaVu Sans, embedded in this assembly so output does not
/// depend on the fonts installed on the machine (SkiaSharp's default typeface has no glyphs).
/// </summary>
public static class FontProvider
{
    /// <summary>The manifest name of the embedded font.</summary>
    public const string ResourceName = "WaveSim.Fonts.DejaVuSans.ttf";

    static readonly Lazy<SKTypeface> Loaded = new(Load, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>The embedded typeface, loaded once and shared (Skia typefaces are immutable and thread-safe).</summary>
    /// <exception cref="InvalidOperationException">The resource is missing or holds no glyphs (a broken build).</exception>
    public static SKTypeface Typeface => Loaded.Value;

    /// <summary>A new font of the embedded typeface; the caller disposes it.</summary>
    /// <param name="size">Text size in pixels. Must be greater than 0.</param>
    public static SKFont CreateFont(float size)
    {
        if (!(size > 0)) throw new ArgumentOutOfRangeException(nameof(size), "Must be greater than zero.");
        return new SKFont(Typeface, size) { Subpixel = true, Edging = SKFontEdging.Antialias };
    }

    static SKTypeface Load()
    {
        using Stream stream = typeof(FontProvider).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"Embedded font '{ResourceName}' is missing from {typeof(FontProvider).Assembly.GetName().Name}.");
        SKTypeface typeface = SKTypeface.FromStream(stream)
            ?? throw new InvalidOperationException($"Embedded font '{ResourceName}' could not be read.");
        if (typeface.GlyphCount <= 0)
            throw new InvalidOperationException($"Embedded font '{ResourceName}' has no glyphs.");
        return typeface;
    }
}
