namespace WaveSim.Core;

/// <summary>Bad input from a user: a scenario, a capture file or an option value. The message is one line, ready to print.</summary>
public class InputException(string message) : Exception(message);

/// <summary>The computation broke down (NaN, infinity, no convergence). The message names where.</summary>
public class NumericalException(string message) : Exception(message);
