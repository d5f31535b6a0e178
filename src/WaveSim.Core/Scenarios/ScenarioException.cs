namespace WaveSim.Core.Scenarios;

/// <summary>A scenario that cannot be used. The message is one line: file:line:column: key: what was found and what was expected.</summary>
public class ScenarioException(string message) : InputException(message);
