namespace WaveSim.Core;

/// <summary>Bad input from a user: a scenario, a capture file or an option value. The message is one line, ready to print:
/// control characters are taken out and a very long one is shortened (<see cref="Io.EchoText.Message"/>).</summary>
public class InputException(string message) : Exception(Io.EchoText.Message(message));

/// <summary>The computation broke down (NaN, infinity, no convergence). The message names where.</summary>
public class NumericalException(string message) : Exception(message);
