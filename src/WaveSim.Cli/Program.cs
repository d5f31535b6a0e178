using System.CommandLine;
using WaveSim.Cli.Commands;

namespace WaveSim.Cli;

/// <summary>Entry point: composes the commands; each command lives in Commands/.</summary>
public static class Program
{
    /// <summary>Builds the root command with every subcommand.</summary>
    public static RootCommand BuildRoot() => new("wavesim - transmission-line wave simulator")
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

    /// <summary>Runs the command line and returns the exit code.</summary>
    public static async Task<int> Main(string[] args) => await BuildRoot().Parse(args).InvokeAsync();
}
