namespace WaveSim.Cli;

/// <summary>
/// The name of the subcommand being run, for messages that must say which command refused something
/// (<see cref="CommandGuard"/>); set by the guarded actions and flowing into the command's tasks.
/// </summary>
public static class CurrentCommand
{
    static readonly AsyncLocal<string?> Name = new();

    /// <summary>The running subcommand's name, or null outside one.</summary>
    public static string? Value => Name.Value;

    /// <summary>Records <paramref name="name"/> as the running subcommand.</summary>
    public static void Set(string name) => Name.Value = name;
}
