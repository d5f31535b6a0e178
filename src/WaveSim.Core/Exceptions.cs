namespace WaveSim.Core;

/// <summary>Bad input from a user: a scenario, a capture file or an option value. The message is one line, ready to print:
/// control characters are taken out and a very long one is shortened (<see cref="Io.EchoText.Message"/>).</summary>
/// <param name="message">What is wrong; when <see cref="Parameter"/> is set, without naming it (the caller names it in its own terms).</param>
public class InputException(string message) : Exception(Io.EchoText.Message(message))
{
    /// <summary>
    /// The name of the method parameter or options property whose value is wrong (e.g. "axes", "MaxSimulations"), or null when
    /// the message names its source itself (a file, a line, a key). The library knows no command line: a caller maps this name
    /// to its own (a flag) and puts it before the message.
    /// </summary>
    public string? Parameter { get; init; }
}

/// <summary>The computation broke down (NaN, infinity, no convergence). The message names where.</summary>
public class NumericalException(string message) : Exception(message);
