namespace WaveSim.Core.Scenarios;

/// <summary>
/// Something in a scenario (or in what it is run against) that does not stop a command but is likely to spoil its answer.
/// Every command prints each one on stderr as one line, <c>warning: KEY: MESSAGE</c>.
/// </summary>
/// <param name="Key">The key it concerns, as a key path (<c>source.rise</c>, <c>simulation.output_step</c>, <c>line[1]</c>).</param>
/// <param name="Message">What is wrong and what it does to the results, in one sentence.</param>
public sealed record ScenarioWarning(string Key, string Message)
{
    /// <summary>"KEY: MESSAGE".</summary>
    public override string ToString() => $"{Key}: {Message}";
}
