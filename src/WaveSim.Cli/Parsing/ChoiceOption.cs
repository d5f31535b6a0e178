using System.CommandLine;

namespace WaveSim.Cli.Parsing;

/// <summary>Options holding one of a few named choices ("--series E96"), each mapped to its value while the command line is parsed.</summary>
public static class ChoiceOption
{
    /// <summary>An option accepting the names of <paramref name="choices"/> (case-insensitive), in the order shown in messages.</summary>
    /// <typeparam name="T">The value a name stands for.</typeparam>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="choices">The names and their values.</param>
    /// <param name="defaultName">The name used when the option is not given.</param>
    public static Option<T> Create<T>(string name, string description, IReadOnlyList<(string Name, T Value)> choices, string defaultName)
        => OptionValue.Create(name, description, t => Read(t, choices), defaultName, string.Join("|", choices.Select(c => c.Name)));

    static T Read<T>(string text, IReadOnlyList<(string Name, T Value)> choices)
    {
        foreach (var (n, v) in choices)
            if (string.Equals(n, text.Trim(), StringComparison.OrdinalIgnoreCase)) return v;
        string names = choices.Count == 2 ? $"{choices[0].Name} or {choices[1].Name}"
            : string.Join(", ", choices.Take(choices.Count - 1).Select(c => c.Name)) + " or " + choices[^1].Name;
        throw new OptionValueException($"expected {names}, got '{text}'");
    }
}
