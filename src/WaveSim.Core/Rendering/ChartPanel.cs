namespace WaveSim.Core.Rendering;

/// <summary>One panel of a chart: traces sharing a Y axis. Panels of a chart are stacked and share the X axis.</summary>
/// <param name="YLabel">Quantity name of the Y axis, e.g. "Voltage".</param>
/// <param name="YUnit">SI unit symbol of the Y axis, e.g. "V" (an engineering prefix is chosen from the data).</param>
/// <param name="Series">The traces; colours follow <see cref="Palette"/> in this order.</param>
public sealed record ChartPanel(string YLabel, string YUnit, IReadOnlyList<PlotSeries> Series)
{
    /// <summary>Fixed Y range; null fits the data with 5 % head-room above and below.</summary>
    public AxisRange? YRange { get; init; }

    /// <summary>
    /// Fixed Y tick positions inside <see cref="YRange"/> (e.g. every 90° of a phase); null picks 1-2-5 steps. Needs a
    /// <see cref="YRange"/>.
    /// </summary>
    public IReadOnlyList<double>? YTicks { get; init; }

    /// <summary>Labelled horizontal lines, e.g. receiver thresholds. Default none.</summary>
    public IReadOnlyList<ReferenceLine> ReferenceLines { get; init; } = [];

    /// <summary>Labelled point annotations. Default none.</summary>
    public IReadOnlyList<Marker> Markers { get; init; } = [];

    /// <summary>Share of the chart height relative to the other panels. Default 1; must be greater than 0.</summary>
    public double HeightWeight { get; init; } = 1;
}
