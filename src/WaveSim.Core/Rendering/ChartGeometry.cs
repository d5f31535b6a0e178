using SkiaSharp;

namespace WaveSim.Core.Rendering;

/// <summary>
/// Where one plot area sits in the image and how data map onto it: X grows to the right, Y grows upwards
/// (or downwards when <see cref="YDown"/>, as for the time axis of a space-time map).
/// </summary>
public sealed class ChartGeometry
{
    /// <summary>Creates the mapping of <paramref name="x"/> and <paramref name="y"/> onto <paramref name="plotArea"/>.</summary>
    public ChartGeometry(SKRect plotArea, AxisScale x, AxisScale y, bool yDown = false)
    {
        if (plotArea.Width <= 0 || plotArea.Height <= 0)
            throw new ArgumentException("The image is too small for its margins: the plot area has no room.");
        PlotArea = plotArea;
        X = x;
        Y = y;
        YDown = yDown;
    }

    /// <summary>The plot area in pixels (left, top, right, bottom).</summary>
    public SKRect PlotArea { get; }

    /// <summary>The horizontal axis.</summary>
    public AxisScale X { get; }

    /// <summary>The vertical axis.</summary>
    public AxisScale Y { get; }

    /// <summary>True when Y grows downwards (Y.Min at the top edge).</summary>
    public bool YDown { get; }

    /// <summary>Pixel column (may be fractional) of data X <paramref name="x"/>, SI.</summary>
    public float XToPixel(double x) => (float)(PlotArea.Left + X.Fraction(x) * PlotArea.Width);

    /// <summary>Pixel row (may be fractional) of data Y <paramref name="y"/>, SI.</summary>
    public float YToPixel(double y) => YDown
        ? (float)(PlotArea.Top + Y.Fraction(y) * PlotArea.Height)
        : (float)(PlotArea.Bottom - Y.Fraction(y) * PlotArea.Height);

    /// <summary>Data X, SI, at pixel column <paramref name="px"/>.</summary>
    public double PixelToX(double px) => X.ValueAt((px - PlotArea.Left) / PlotArea.Width);

    /// <summary>Data Y, SI, at pixel row <paramref name="py"/>.</summary>
    public double PixelToY(double py) => YDown
        ? Y.ValueAt((py - PlotArea.Top) / PlotArea.Height)
        : Y.ValueAt((PlotArea.Bottom - py) / PlotArea.Height);
}
