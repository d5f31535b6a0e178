using System.CommandLine;
using System.CommandLine.Help;
using System.CommandLine.Invocation;
using System.Text.RegularExpressions;

namespace WaveSim.Cli.Parsing;

/// <summary>
/// The library's help screen with each option's default as the user would write it ("5 %", "50 ohm") instead of the SI value
/// the option holds (0.05, 50), which the library would print in the current culture's number format; and the tool's name in
/// the usage line whatever process runs it (a test host, <c>dotnet run</c>).
/// </summary>
/// <param name="inner">The library's help action, which lays the screen out.</param>
public sealed partial class HelpWithDefaults(HelpAction inner) : SynchronousCommandLineAction
{
    /// <summary>The command's name as installed.</summary>
    public const string ToolName = "wavesim";

    /// <summary>True: help is shown even when the rest of the line has errors.</summary>
    public override bool ClearsParseErrors => true;

    /// <inheritdoc/>
    public override int Invoke(ParseResult parseResult)
    {
        var config = parseResult.InvocationConfiguration;
        var output = config.Output;
        var text = new StringWriter();
        config.Output = text;
        int code;
        try { code = inner.Invoke(parseResult); }
        finally { config.Output = output; }
        var options = parseResult.CommandResult.Command.Options
            .Select(o => (o.Name, Text: OptionValue.DefaultText(o))).Where(x => x.Text is not null).ToList();
        string usage = "  " + RootCommand.ExecutableName + " ";
        foreach (string line in text.ToString().ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'))
        {
            string shown = line.StartsWith(usage, StringComparison.Ordinal) ? "  " + ToolName + " " + line[usage.Length..] : line;
            foreach (var (name, defaultText) in options)
                if (Regex.IsMatch(line, $@"^\s+(-\w, )?{Regex.Escape(name)}[ ,]"))
                    shown = Default().Replace(shown, $"[default: {defaultText}]");
            output.WriteLine(shown);
        }
        return code;
    }

    [GeneratedRegex(@"\[default: [^\]]*\]")]
    private static partial Regex Default();
}
