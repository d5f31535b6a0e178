using System.CommandLine;
using System.CommandLine.Invocation;

namespace WaveSim.Cli.Parsing;

/// <summary>
/// Wraps a command's action so that it also runs when the line has parse errors, and reports them itself
/// (<see cref="ParseErrorReport"/>) instead of the library's usage screen; a clean line runs the command.
/// </summary>
/// <param name="inner">The command's own action.</param>
public sealed class GuardedAction(AsynchronousCommandLineAction inner) : AsynchronousCommandLineAction
{
    /// <summary>True: the action sees the line's errors and reports them in the tool's one-line form.</summary>
    public override bool ClearsParseErrors => true;

    /// <inheritdoc/>
    public override Task<int> InvokeAsync(ParseResult parseResult, CancellationToken cancellationToken = default)
    {
        CurrentCommand.Set(parseResult.CommandResult.Command.Name);
        return ParseErrorReport.Write(parseResult) is int code ? Task.FromResult(code) : inner.InvokeAsync(parseResult, cancellationToken);
    }

    /// <summary>
    /// Guards every subcommand's action and replaces help with <see cref="HelpWithDefaults"/>, which shows each option's default
    /// as written ("5 %").
    /// </summary>
    /// <param name="root">The root command, with its subcommands added.</param>
    public static void Apply(RootCommand root)
    {
        var help = root.Options.OfType<System.CommandLine.Help.HelpOption>().Single();
        if (help.Action is System.CommandLine.Help.HelpAction library) help.Action = new HelpWithDefaults(library);
        foreach (Command c in root.Subcommands)
            c.Action = c.Action switch
            {
                // A synchronous command stays synchronous: only an asynchronous one arms the Ctrl+C handling that waits for it.
                SynchronousCommandLineAction s and not GuardedSyncAction => new GuardedSyncAction(s),
                AsynchronousCommandLineAction a and not GuardedAction => new GuardedAction(a),
                var same => same,
            };
    }
}

/// <summary>The synchronous form of <see cref="GuardedAction"/>.</summary>
/// <param name="inner">The command's own action.</param>
public sealed class GuardedSyncAction(SynchronousCommandLineAction inner) : SynchronousCommandLineAction
{
    /// <summary>True: the action sees the line's errors and reports them in the tool's one-line form.</summary>
    public override bool ClearsParseErrors => true;

    /// <inheritdoc/>
    public override int Invoke(ParseResult parseResult)
    {
        CurrentCommand.Set(parseResult.CommandResult.Command.Name);
        return ParseErrorReport.Write(parseResult) ?? inner.Invoke(parseResult);
    }
}
