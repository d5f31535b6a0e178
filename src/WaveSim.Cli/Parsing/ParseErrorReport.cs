using System.CommandLine;
using System.CommandLine.Parsing;

namespace WaveSim.Cli.Parsing;

/// <summary>
/// Turns the parse errors of a command line into the tool's one error line: "error: …" on stderr, exit 2 for a value an
/// option could not read (the option was given, its text is wrong) and exit 1 for a line that is wrong as such (an unknown
/// option, a missing argument or required option), never the usage screen.
/// </summary>
public static class ParseErrorReport
{
    /// <summary>Writes the first error and returns its exit code, or returns null when the line parsed cleanly.</summary>
    /// <param name="pr">The parse result.</param>
    public static int? Write(ParseResult pr)
    {
        var usage = pr.UnmatchedTokens.Select(t => $"unknown option or argument '{t}'")
            .Concat(pr.Errors.Where(e => !IsValueError(e)).Select(e => e.Message)).ToList();
        var values = pr.Errors.Where(IsValueError).Select(e => e.Message).ToList();
        if (usage.Count == 0 && values.Count == 0) return null;
        var error = pr.InvocationConfiguration.Error;
        if (usage.Count > 0)
        {
            string command = string.Join(" ", Path(pr.CommandResult));
            error.WriteLine($"error: {usage[0]}{More(usage.Count + values.Count)} (wavesim {command} --help lists the options)");
            return ExitCodes.Usage;
        }
        error.WriteLine($"error: {values[0]}{More(values.Count)}");
        return ExitCodes.BadInput;
    }

    /// <summary>An error in a value the user gave (a token was read), as opposed to one about the shape of the line.</summary>
    static bool IsValueError(ParseError e) => e.SymbolResult switch
    {
        ArgumentResult a => a.Tokens.Count > 0,
        OptionResult o => o.Tokens.Count > 0,
        _ => false,
    };

    static string More(int count) => count > 1 ? $" (and {count - 1} more)" : "";

    static IEnumerable<string> Path(CommandResult c)
    {
        var names = new Stack<string>();
        for (SymbolResult? s = c; s is CommandResult cr && cr.Parent is not null; s = cr.Parent) names.Push(cr.Command.Name);
        return names;
    }
}
