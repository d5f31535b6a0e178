using System.CommandLine;
using WaveSim.Cli.Commands;
using WaveSim.Cli.Parsing;

namespace WaveSim.Cli;

/// <summary>Entry point: composes the commands; each command lives in Commands/.</summary>
public static class Program
{
    /// <summary>Builds the root command with every subcommand.</summary>
    public static RootCommand BuildRoot()
    {
        var root = new RootCommand("wavesim - transmission-line wave simulator")
        {
            RunCommand.Create(),
            CheckCommand.Create(),
            SweepCommand.Create(),
            TerminationsCommand.Create(),
            CompareCommand.Create(),
            FitCommand.Create(),
            TdrCommand.Create(),
            ReportCommand.Create(),
            XSectionCommand.Create(),
            BenchCommand.Create(),
            AboutCommand.Create(),
        };
        // Parse errors become the tool's one error line (exit 2 for a bad value, 1 for a malformed line), not the usage screen.
        GuardedAction.Apply(root);
        return root;
    }

    /// <summary>
    /// How long a command may take, after Ctrl+C or SIGTERM cancels it, to stop and remove its staging folder before the
    /// process exits anyway. The library's default of 2 s cut off a run stopping between frames, leaving its staging folder
    /// and no message behind.
    /// </summary>
    public static readonly TimeSpan CancelGrace = TimeSpan.FromSeconds(30);

    /// <summary>Runs the command line and returns the exit code.</summary>
    public static async Task<int> Main(string[] args) =>
        await BuildRoot().Parse(args).InvokeAsync(new InvocationConfiguration { ProcessTerminationTimeout = CancelGrace });
}
