using System.CommandLine;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Parsing;

/// <summary>Options holding one quantity with its unit ("50 ohm", "35 ps"), read into SI while the command line is parsed.</summary>
public static class QuantityOption
{
    /// <summary>An option read as <paramref name="dimension"/>, with an optional check of the SI value.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="dimension">What the value is.</param>
    /// <param name="description">The help text.</param>
    /// <param name="defaultText">The default as written, e.g. "50 ohm"; null for none.</param>
    /// <param name="check">Returns why an SI value is refused (e.g. "expected a positive value"), or null to accept it.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<double> Create(string name, Dimension dimension, string description, string? defaultText = null,
        Func<double, string?>? check = null, string? helpName = null) =>
        OptionValue.Create(name, description, t => Read(t, [dimension], check).Value, defaultText, helpName);

    /// <summary>Like <see cref="Create"/>, without a default: null when the option is not given.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="dimension">What the value is.</param>
    /// <param name="description">The help text.</param>
    /// <param name="check">Returns why an SI value is refused, or null to accept it.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<double?> Optional(string name, Dimension dimension, string description, Func<double, string?>? check = null, string? helpName = null) =>
        OptionValue.Create<double?>(name, description, t => Read(t, [dimension], check).Value, null, helpName);

    /// <summary>An option that accepts any of <paramref name="accepted"/> ("10 %" or "0.1"); the value keeps the dimension it was read as.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="accepted">The dimensions accepted, the first matching the unit wins.</param>
    /// <param name="description">The help text.</param>
    /// <param name="defaultText">The default as written.</param>
    /// <param name="check">Returns why a value is refused, or null.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<(double Value, Dimension Dimension)> AnyOf(string name, Dimension[] accepted, string description, string? defaultText = null,
        Func<(double Value, Dimension Dimension), string?>? check = null, string? helpName = null) =>
        OptionValue.Create(name, description, t =>
        {
            var v = Quantity.ParseAny(t, accepted);
            if (check?.Invoke(v) is { } why) throw new OptionValueException($"{why}, got '{t}'");
            return v;
        }, defaultText, helpName);

    /// <summary>Refuses zero, negative and infinite values.</summary>
    public static string? Positive(double x) => x > 0 && double.IsFinite(x) ? null : "expected a positive value";

    static (double Value, Dimension Dimension) Read(string text, Dimension[] accepted, Func<double, string?>? check)
    {
        var v = Quantity.ParseAny(text, accepted);
        if (check?.Invoke(v.Value) is { } why) throw new OptionValueException($"{why}, got '{text}'");
        return v;
    }
}
