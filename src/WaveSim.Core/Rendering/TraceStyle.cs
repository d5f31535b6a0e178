using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>How one trace of a panel is stroked and named in the legend, worked out once for the layout and the drawing.</summary>
/// <param name="Legend">The legend text: the series name, plus a note when the trace coincides with an earlier one.</param>
/// <param name="Colour">Stroke colour.</param>
/// <param name="Width">Stroke width, px.</param>
/// <param name="Dash">Dash pattern (empty: solid).</param>
/// <param name="Beneath">Drawn before the other traces (a <see cref="TraceLook.Reference"/> band).</param>
internal sealed record TraceStyle(string Legend, SKColor Colour, float Width, float[] Dash, bool Beneath)
{
    /// <summary>Width of a plain trace, px.</summary>
    public const float LineWidth = 2f;

    /// <summary>Width of a reference band, px: wide enough that a plain trace on it leaves a visible rim each side.</summary>
    public const float BandWidth = 7f;

    /// <summary>A trace drawn on one it coincides with is broken into these dashes, so the one beneath shows in the gaps.</summary>
    public static readonly float[] OverlapDash = [5f, 4f];

    /// <summary>The dash of <see cref="TraceLook.Dashed"/>: long dashes, unlike every pattern of <see cref="Palette.Dashes"/>.</summary>
    public static readonly float[] SecondaryDash = [10f, 5f];

    /// <summary>
    /// The styles of a panel's traces. Colours follow <see cref="Palette"/> by index (a reference keeps its index, so the
    /// other traces' colours do not depend on it) and a reference band is <see cref="Palette.ReferenceBand"/>. A trace that coincides with an earlier one (<see cref="TraceOverlap"/>) says so in the legend, and
    /// when the earlier one is a plain line the later one is dashed, so both colours stay on the page.
    /// </summary>
    /// <param name="panel">The panel.</param>
    /// <param name="yRange">The panel's Y range, whose span sets the coincidence tolerance.</param>
    public static IReadOnlyList<TraceStyle> For(ChartPanel panel, (double Min, double Max) yRange)
    {
        var series = panel.Series;
        double tolerance = TraceOverlap.SpanFraction * (yRange.Max - yRange.Min);
        var styles = new TraceStyle[series.Count];
        for (int s = 0; s < series.Count; s++)
        {
            SKColor colour = Palette.TraceColour(s);
            var look = series[s].Look;
            int same = -1;
            for (int e = 0; e < s && same < 0; e++)
                if (TraceOverlap.Coincide(series[e], series[s], tolerance)) same = e;
            string legend = same < 0 ? series[s].Name : $"{series[s].Name} (coincides with {series[same].Name})";
            styles[s] = look switch
            {
                TraceLook.Reference => new TraceStyle(legend, Palette.ReferenceBand, BandWidth, [], true),
                TraceLook.Dashed => new TraceStyle(legend, colour, LineWidth, SecondaryDash, false),
                _ when same >= 0 && series[same].Look != TraceLook.Reference => new TraceStyle(legend, colour, LineWidth, OverlapDash, false),
                _ => new TraceStyle(legend, colour, LineWidth, Palette.TraceDash(s, series.Count), false),
            };
        }
        return styles;
    }
}
