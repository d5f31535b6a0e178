using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Where the parts of a line frame (or space-time map) go.</summary>
public sealed class FrameLayout
{
    internal FrameLayout(ChartGeometry geometry, SKRect headerBox, int labelRows, int[] labelRowOf, float fontSize,
                         IReadOnlyList<BranchAxis>? branches = null, IReadOnlyList<(NetMarkKind Kind, string Text, SKPoint At)>? legend = null)
    {
        Branches = branches ?? [];
        Legend = legend ?? [];
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

    /// <summary>The branches' own axes below the main one, in piece order (empty for an unbranched line or a space-time map).</summary>
    public IReadOnlyList<BranchAxis> Branches { get; }

    /// <summary>
    /// The marker legend: one entry per kind of element drawn (the symbol is centred at <c>At</c>, the text follows it).
    /// Empty on a space-time map.
    /// </summary>
    public IReadOnlyList<(NetMarkKind Kind, string Text, SKPoint At)> Legend { get; }

    /// <summary>Rows of element labels above the plot.</summary>
    public int LabelRows { get; }

    internal int[] LabelRowOf { get; }

    internal float FontSize { get; }
}
