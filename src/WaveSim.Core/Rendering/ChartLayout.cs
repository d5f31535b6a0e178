using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>Where the parts of a <see cref="ChartSpec"/> go in an image of a given size.</summary>
public sealed class ChartLayout
{
    internal ChartLayout(int width, int height, float fontSize, IReadOnlyList<PanelLayout> panels, SKRect titleBox, SKRect xTickLabelBox, SKRect xTitleBox)
    {
        Width = width;
        Height = height;
        FontSize = fontSize;
        Panels = panels;
        TitleBox = titleBox;
        XTickLabelBox = xTickLabelBox;
        XTitleBox = xTitleBox;
    }

    /// <summary>Image width, px.</summary>
    public int Width { get; }

    /// <summary>Image height, px.</summary>
    public int Height { get; }

    /// <summary>Base text size, px.</summary>
    public float FontSize { get; }

    /// <summary>Panels from top to bottom.</summary>
    public IReadOnlyList<PanelLayout> Panels { get; }

    /// <summary>The box holding the title.</summary>
    public SKRect TitleBox { get; }

    /// <summary>The box holding the X tick numbers (under the bottom panel).</summary>
    public SKRect XTickLabelBox { get; }

    /// <summary>The box holding the X axis title.</summary>
    public SKRect XTitleBox { get; }
}
