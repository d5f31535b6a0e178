namespace WaveSim.Core.Scenarios;

/// <summary>
/// A coupled scenario (<c>conductors:</c>) handed to a reader of single-line scenarios. <see cref="Where"/> keeps the
/// place so a caller can say which of its commands refused it (<see cref="ForCommand"/>).
/// </summary>
/// <param name="where">file:line:column of the <c>conductors</c> key.</param>
public sealed class CoupledFormRefused(string where) : ScenarioException(Text(where, "this command"))
{
    /// <summary>file:line:column of the <c>conductors</c> key.</summary>
    public string Where { get; } = where;

    /// <summary>The message with <paramref name="command"/> named as the one that takes single-line scenarios only.</summary>
    public string ForCommand(string command) => Text(Where, $"{command}: this command");

    static string Text(string where, string who) =>
        $"{where}: conductors: a coupled scenario (several conductors); {who} takes single-line scenarios (line:) only so far; 'run' and 'check' take coupled ones";
}
