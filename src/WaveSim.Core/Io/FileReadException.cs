namespace WaveSim.Core.Io;

/// <summary>A user file that cannot be read as text within its limit (<see cref="BoundedText"/>). The message is one line.</summary>
/// <param name="label">How the message names the file.</param>
/// <param name="reason">What is wrong, without the file's name, for callers that name the file their own way (a scenario key).</param>
public sealed class FileReadException(string label, string reason) : InputException($"{label}: {reason}")
{
    /// <summary>What is wrong, without the file's name.</summary>
    public string Reason { get; } = reason;
}
