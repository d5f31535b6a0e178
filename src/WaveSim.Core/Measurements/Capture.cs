namespace WaveSim.Core.Measurements;

/// <summary>A measured waveform read from a file: samples in SI units, time strictly increasing.</summary>
/// <param name="Time">Sample times, s (after <see cref="CaptureOptions.TimeScale"/>); strictly increasing, need not start at zero or be evenly spaced.</param>
/// <param name="Volts">Sample values, V (after <see cref="CaptureOptions.VoltScale"/>), one per time.</param>
/// <param name="Source">The path the capture was read from.</param>
public sealed record Capture(double[] Time, double[] Volts, string Source)
{
    /// <summary>Rows left out because a selected cell was blank or NaN.</summary>
    public int DroppedRows { get; init; }

    /// <summary>The time column as messages name it: its header in quotes (<c>'time_ns'</c>) or its 1-based number.</summary>
    public string TimeColumn { get; init; } = "1";

    /// <summary>One-line warnings for the user (dropped rows, with their line numbers). Empty when the file was clean.</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];
}
