namespace WaveSim.Core.Measurements;

/// <summary>How to read a capture file. Every member has a default that suits a plain two-column export.</summary>
public sealed class CaptureOptions
{
    /// <summary>
    /// Number of physical lines to skip before the header or the first data row. Null (default): find the
    /// block of numeric rows automatically (see <see cref="CaptureReader"/>).
    /// </summary>
    public int? Skip { get; init; }

    /// <summary>
    /// The time column: a header name (case-insensitive) or a 1-based column number ("1" is the first column).
    /// Null (default): the first column holding a number in the first data row.
    /// </summary>
    public string? TimeColumn { get; init; }

    /// <summary>
    /// The voltage column: a header name (case-insensitive) or a 1-based column number.
    /// Null (default): the next numeric column after the time column.
    /// </summary>
    public string? VoltColumn { get; init; }

    /// <summary>Seconds per time unit in the file, e.g. 1e-9 for a file in ns. Default 1. Must be positive and finite.</summary>
    public double TimeScale { get; init; } = 1.0;

    /// <summary>Volts per voltage unit in the file, e.g. 1e-3 for mV or -1 for an inverted probe. Default 1. Must be non-zero and finite.</summary>
    public double VoltScale { get; init; } = 1.0;
}
