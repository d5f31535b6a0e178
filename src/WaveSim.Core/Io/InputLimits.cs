namespace WaveSim.Core.Io;

/// <summary>
/// The largest input WaveSim reads, in one place (docs/limits.md explains each). A file beyond a limit is refused with a
/// one-line error naming the limit, never read into memory first: a table named <c>/dev/zero</c> or a 100 MB title took
/// gigabytes before these existed.
/// </summary>
public static class InputLimits
{
    /// <summary>
    /// A scenario file: 16 MiB. The loader accepts at most 2,000 line items; written out with comments they take well under
    /// 1 MiB, so the limit leaves ample room while keeping the YAML tree small (a 16 MiB title peaks at about 180 MiB resident).
    /// </summary>
    public const long ScenarioBytes = 16L << 20;

    /// <summary>A source waveform table (<c>source.file</c>): 64 MiB, about 2 million time,voltage rows.</summary>
    public const long TableBytes = 64L << 20;

    /// <summary>A capture file: 1 GiB. It is read row by row, so memory follows <see cref="CaptureRows"/>, not the file size.</summary>
    public const long CaptureBytes = 1L << 30;

    /// <summary>
    /// Data rows kept from a capture: 8,000,000, twice the comparison grid's limit (WaveformComparison.MaxGridPoints, in
    /// Measurements, which Io does not use; a test keeps the two in step). At least half of a capture must overlap the simulation and the
    /// comparison grid is never coarser than the capture's step, so an evenly sampled capture with more rows could not be compared
    /// anyway. Beyond it the file is refused, not decimated (docs/measurements.md says why).
    /// </summary>
    public const int CaptureRows = 8_000_000;

    /// <summary>The longest line of a table or capture file: 1 Mi characters (a data row is some tens).</summary>
    public const int LineChars = 1 << 20;

    /// <summary>Longest excerpt of a file's contents quoted in a message: 40 characters (<see cref="EchoText.Excerpt"/>).</summary>
    public const int ExcerptChars = 40;
}
