using System.CommandLine;
using System.CommandLine.Parsing;
using System.Runtime.CompilerServices;

namespace WaveSim.Cli.Parsing;

/// <summary>
/// The common part of every value option: reads the one token, turns a failure into a parse error named for the option
/// ("--flag: why"), and remembers a default as the user would write it ("5 %"), which help shows instead of its SI value.
/// </summary>
public static class OptionValue
{
    static readonly ConditionalWeakTable<Option, string> DefaultTexts = [];

    /// <summary>The default as written in help, when the option was made with one.</summary>
    /// <param name="option">The option.</param>
    public static string? DefaultText(Option option) => DefaultTexts.TryGetValue(option, out string? t) ? t : null;

    /// <summary>Makes an option whose value <paramref name="read"/> computes from its text while the line is parsed.</summary>
    /// <typeparam name="T">The value's type.</typeparam>
    /// <param name="name">The flag, e.g. "--rise".</param>
    /// <param name="description">The help text.</param>
    /// <param name="read">Reads the text; throws <see cref="OptionValueException"/> (or a library input exception) with why it is wrong.</param>
    /// <param name="defaultText">The default as the user would write it, read the same way; null for none.</param>
    /// <param name="helpName">The value's name in help, e.g. TIME.</param>
    public static Option<T> Create<T>(string name, string description, Func<string, T> read, string? defaultText = null, string? helpName = null)
    {
        var option = new Option<T>(name)
        {
            Description = description,
            HelpName = helpName,
            CustomParser = r => Read(r, name, read),
        };
        if (defaultText is not null)
        {
            T value = read(defaultText);
            option.DefaultValueFactory = _ => value;
            DefaultTexts.AddOrUpdate(option, defaultText);
        }
        return option;
    }

    /// <summary>Makes a repeatable option ("--vary A --vary B"); each value is read by <paramref name="read"/> while the line is parsed.</summary>
    /// <typeparam name="T">One value's type.</typeparam>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="read">Reads one text; throws with why it is wrong.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<T[]> Repeated<T>(string name, string description, Func<string, T> read, string? helpName = null) =>
        new(name)
        {
            Description = description,
            HelpName = helpName,
            AllowMultipleArgumentsPerToken = false,
            CustomParser = r =>
            {
                var values = new List<T>();
                foreach (var token in r.Tokens)
                {
                    try { values.Add(read(token.Value)); }
                    catch (Exception ex) when (ex is OptionValueException or Core.InputException or Core.Units.UnitException)
                    {
                        r.AddError($"{name}: {ex.Message.ReplaceLineEndings(" ")}");
                        return [];
                    }
                }
                return [.. values];
            },
        };

    /// <summary>Reads the token of <paramref name="r"/>, or records the failure as the option's parse error.</summary>
    static T Read<T>(ArgumentResult r, string name, Func<string, T> read)
    {
        string text = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        try { return read(text); }
        catch (Exception ex) when (ex is OptionValueException or Core.InputException or Core.Units.UnitException)
        {
            r.AddError($"{name}: {ex.Message.ReplaceLineEndings(" ")}");
            return default!;
        }
    }
}

/// <summary>A value that does not read as its option expects; the message says why, without the flag (which the parser adds).</summary>
/// <param name="message">What was expected and what was given.</param>
public sealed class OptionValueException(string message) : Exception(message);
