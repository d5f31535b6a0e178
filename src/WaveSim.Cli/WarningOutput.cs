using WaveSim.Core.Scenarios;

namespace WaveSim.Cli;

/// <summary>Prints library warnings the one way every command does: one line each on stderr, <c>warning: KEY: MESSAGE</c>.</summary>
public static class WarningOutput
{
    /// <summary>Writes each warning on its own line.</summary>
    public static void Write(TextWriter error, IEnumerable<ScenarioWarning> warnings)
    {
        foreach (var w in warnings) error.WriteLine("warning: " + w.ToString().ReplaceLineEndings(" "));
    }
}
