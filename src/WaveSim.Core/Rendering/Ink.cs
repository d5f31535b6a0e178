using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Paints and text helpers shared by the renderers.</summary>
internal static class Ink
{
    /// <summary>The base text size for an image: readable at small sizes, not shouting at large ones.</summary>
    public static float BaseFontSize(int width, int height) => Math.Clamp(Math.Min(width / 62f, height / 30f), 9f, 15f);

    public static SKPaint Stroke(SKColor colour, float width, float[]? dash = null)
    {
        var paint = new SKPaint { Color = colour, IsAntialias = true, Style = SKPaintStyle.Stroke, StrokeWidth = width, StrokeJoin = SKStrokeJoin.Round };
        if (dash is { Length: > 0 }) paint.PathEffect = SKPathEffect.CreateDash(dash.Select(d => d * Math.Max(1f, width / 1.5f)).ToArray(), 0);
        return paint;
    }

    public static SKPaint Fill(SKColor colour) => new() { Color = colour, IsAntialias = true, Style = SKPaintStyle.Fill };

    /// <summary>A pixel coordinate moved to a pixel centre, so 1 px lines are crisp.</summary>
    public static float Snap(float v) => MathF.Floor(v) + 0.5f;

    public static float Width(SKFont font, string text) => font.MeasureText(text);

    /// <summary>Draws text with its vertical centre at <paramref name="cy"/>.</summary>
    public static void TextCentredV(SKCanvas canvas, string text, float x, float cy, SKTextAlign align, SKFont font, SKPaint paint)
    {
        SKFontMetrics m = font.Metrics;
        canvas.DrawText(text, x, cy - (m.Ascent + m.Descent) / 2, align, font, paint);
    }

    /// <summary>Draws text rotated a quarter turn anticlockwise, centred on (cx, cy).</summary>
    public static void TextVertical(SKCanvas canvas, string text, float cx, float cy, SKFont font, SKPaint paint)
    {
        canvas.Save();
        canvas.RotateDegrees(-90, cx, cy);
        TextCentredV(canvas, text, cx, cy, SKTextAlign.Center, font, paint);
        canvas.Restore();
    }

    /// <summary>
    /// One path through the finite points of a trace (gaps at non-finite points), clamped far outside the plot
    /// so huge values do not overflow float coordinates.
    /// </summary>
    public static SKPath TracePath(ChartGeometry g, double[] x, double[] y)
    {
        var builder = new SKPathBuilder();
        SKRect r = g.PlotArea;
        float limit = 4 * Math.Max(r.Width, r.Height);
        bool penDown = false;
        int n = Math.Min(x.Length, y.Length);
        for (int i = 0; i < n; i++)
        {
            if (!double.IsFinite(x[i]) || !double.IsFinite(y[i])) { penDown = false; continue; }
            float px = Math.Clamp(g.XToPixel(x[i]), r.Left - limit, r.Right + limit);
            float py = Math.Clamp(g.YToPixel(y[i]), r.Top - limit, r.Bottom + limit);
            if (penDown) builder.LineTo(px, py); else builder.MoveTo(px, py);
            penDown = true;
        }
        return builder.Detach();
    }

    /// <summary>A legend sample: a short bar in the trace colour, broken like its dash pattern (drawn as rectangles).</summary>
    public static void LegendSwatch(SKCanvas canvas, float x, float cy, float length, SKColor colour, float[] dash, float thickness = 3f)
    {
        using SKPaint fill = Fill(colour);
        if (dash.Length == 0) { canvas.DrawRect(x, cy - thickness / 2, length, thickness, fill); return; }
        float pos = 0;
        for (int k = 0; pos < length; k++)
        {
            float seg = dash[k % dash.Length] * 1.3f;
            if (k % 2 == 0) canvas.DrawRect(x + pos, cy - thickness / 2, Math.Min(seg, length - pos), thickness, fill);
            pos += seg;
        }
    }
}
