namespace WaveSim.Core.Rendering;

/// <summary>A line chart: a title and one or more stacked panels over a shared X axis.</summary>
/// <param name="Title">Title above the chart.</param>
/// <param name="XLabel">Quantity name of the X axis, e.g. "Time".</param>
/// <param name="XUnit">SI unit symbol of the X axis, e.g. "s".</param>
/// <param name="Panels">Panels from top to bottom; at least one.</param>
public sealed record ChartSpec(string Title, string XLabel, string XUnit, IReadOnlyList<ChartPanel> Panels)
{
    /// <summary>Fixed X range; null spans the data exactly.</summary>
    public AxisRange? XRange { get; init; }

    /// <summary>
    /// How X values are placed. Default <see cref="AxisKind.Linear"/>; <see cref="AxisKind.Logarithmic"/> needs every
    /// finite X value (series, markers, <see cref="XRange"/>) greater than 0.
    /// </summary>
    public AxisKind XKind { get; init; } = AxisKind.Linear;
}
