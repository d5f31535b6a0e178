using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Where one chart panel and its parts were placed.</summary>
public sealed class PanelLayout
{
    internal PanelLayout(ChartPanel panel, ChartGeometry geometry, SKRect legendBox, SKRect yTickLabelBox, SKRect yTitleBox,
                         IReadOnlyList<(SKPoint At, int Series)> legendEntries, IReadOnlyList<TraceStyle> styles)
    {
        Styles = styles;
        Panel = panel;
        Geometry = geometry;
        LegendBox = legendBox;
        YTickLabelBox = yTickLabelBox;
        YTitleBox = yTitleBox;
        LegendEntries = legendEntries;
    }

    /// <summary>The panel drawn here.</summary>
    public ChartPanel Panel { get; }

    /// <summary>The plot area and the data→pixel mapping of this panel.</summary>
    public ChartGeometry Geometry { get; }

    /// <summary>The box holding the legend entries (swatches and names).</summary>
    public SKRect LegendBox { get; }

    /// <summary>The box holding the Y tick numbers.</summary>
    public SKRect YTickLabelBox { get; }

    /// <summary>The box holding the rotated Y axis title.</summary>
    public SKRect YTitleBox { get; }

    internal IReadOnlyList<(SKPoint At, int Series)> LegendEntries { get; }

    /// <summary>Each series' stroke and legend text, in series order.</summary>
    internal IReadOnlyList<TraceStyle> Styles { get; }

    /// <summary>The legend text of each series, in series order (its name, plus a note when it coincides with an earlier one).</summary>
    public IReadOnlyList<string> LegendTexts => Styles.Select(s => s.Legend).ToList();
}
