using System.CommandLine;
using System.Globalization;

namespace WaveSim.Cli.Parsing;

/// <summary>Options holding a whole number within bounds ("--frames 40"), checked while the command line is parsed.</summary>
public static class IntegerOption
{
    /// <summary>A whole number from <paramref name="min"/> to <paramref name="max"/>.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="min">The smallest accepted.</param>
    /// <param name="max">The largest accepted.</param>
    /// <param name="defaultValue">The value when the option is not given.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<int> Create(string name, string description, int min, int max, int defaultValue, string? helpName = null) =>
        OptionValue.Create(name, description, t => Read(t, min, max), defaultValue.ToString(CultureInfo.InvariantCulture), helpName);

    /// <summary>Like <see cref="Create"/>, without a default: null when the option is not given.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="min">The smallest accepted.</param>
    /// <param name="max">The largest accepted.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<int?> Optional(string name, string description, int min, int max, string? helpName = null) =>
        OptionValue.Create<int?>(name, description, t => Read(t, min, max), null, helpName);

    static int Read(string text, int min, int max)
    {
        if (int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int x) && x >= min && x <= max) return x;
        string range = max == int.MaxValue ? $"at least {min}" : $"{min} to {max}";
        throw new OptionValueException($"expected a whole number of {range}, got '{text}'");
    }
}
