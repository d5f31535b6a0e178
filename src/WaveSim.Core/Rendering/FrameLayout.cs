using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Where the parts of a line frame (or space-time map) go.</summary>
public sealed class FrameLayout
{
    internal FrameLayout(ChartGeometry geometry, SKRect headerBox, int labelRows, int[] labelRowOf, float fontSize)
    {
        Geometry = geometry;
        HeaderBox = headerBox;
        LabelRows = labelRows;
        LabelRowOf = labelRowOf;
        FontSize = fontSize;
    }

    /// <summary>The plot area and data→pixel mapping (X: position in metres; Y: volts, or seconds on a space-time map).</summary>
    public ChartGeometry Geometry { get; }

    /// <summary>The box above the element labels holding the time stamp or title.</summary>
    public SKRect HeaderBox { get; }

    /// <summary>Rows of element labels above the plot.</summary>
    public int LabelRows { get; }

    internal int[] LabelRowOf { get; }

    internal float FontSize { get; }
}
