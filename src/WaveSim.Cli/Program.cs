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
            MonteCarloCommand.Create(),
            MergeCommand.Create(),
            TerminationsCommand.Create(),
            CompareCommand.Create(),
            FitCommand.Create(),
            TdrCommand.Create(),
            ReportCommand.Create(),
            OverlayCommand.Create(),
            XSectionCommand.Create(),
            BuffersCommand.Create(),
            BenchCommand.Create(),
            AboutCommand.Create(),
        };
        // Parse errors become the tool's one error line (exit 2 for a bad value, 1 for a malformed line), not the usage screen.
        GuardedAction.Apply(root);
        return root;
    }

    /// <summary>
    /// How long a command may take, after Ctrl+C or SIGTERM cancels it, to stop and remove its staging folder before the
    /// process exits anyway.
    /// </summary>
    public static readonly TimeSpan CancelGrace = TimeSpan.FromSeconds(30);

    /// <summary>Runs the command line and returns the exit code (130 after SIGINT, 143 after SIGTERM).</summary>
    public static async Task<int> Main(string[] args)
    {
        // The signals are handled here rather than by the command-line library, which answers SIGTERM with 130 as well.
        using var signals = new SignalCancellation();
        var configuration = new InvocationConfiguration { ProcessTerminationTimeout = null };
        Task<int> command = BuildRoot().Parse(args).InvokeAsync(configuration, signals.Token);
        return await signals.ExitCodeAsync(command, CancelGrace, configuration.Error);
    }
}
