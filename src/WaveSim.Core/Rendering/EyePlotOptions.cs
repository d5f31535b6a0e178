namespace WaveSim.Core.Rendering;

/// <summary>Optional extras of an eye diagram.</summary>
public sealed record EyePlotOptions
{
    /// <summary>Labelled horizontal lines, e.g. receiver thresholds. Default none.</summary>
    public IReadOnlyList<ReferenceLine> Thresholds { get; init; } = [];

    /// <summary>The eye-opening box to draw; default none.</summary>
    public EyeOpening? Opening { get; init; }

    /// <summary>True (default) labels the time axis in unit intervals 0..2; false in seconds.</summary>
    public bool TimeInUnitIntervals { get; init; } = true;

    /// <summary>Fixed voltage range; null fits the traces with 5 % head-room.</summary>
    public AxisRange? VoltageRange { get; init; }
}
