using System.CommandLine;
using System.Globalization;
using WaveSim.Core.Output;
using WaveSim.Core.Pictures;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Parsing;

/// <summary>Options with a little syntax of their own: a time window, a picture size, a comma list.</summary>
public static class StructuredOption
{
    /// <summary>A time span "10ns..20ns" (each end with its unit) or "all"; null when not given.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    public static Option<TimeWindow?> Window(string name, string description) =>
        OptionValue.Create<TimeWindow?>(name, description, t => ReadWindow(t), null, "START..STOP|all");

    /// <summary>A size "WIDTHxHEIGHT" within <paramref name="min"/> and <paramref name="max"/>.</summary>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="defaultText">The default, e.g. "1280x720".</param>
    /// <param name="min">The smallest size accepted.</param>
    /// <param name="max">The largest size accepted.</param>
    public static Option<PixelSize> Size(string name, string description, string defaultText, PixelSize min, PixelSize max) =>
        OptionValue.Create(name, description, t => ReadSize(t, min, max), defaultText, "WIDTHxHEIGHT");

    /// <summary>A comma-separated list of names, at least one; empty when not given (<see cref="ParseResult.GetResult(Option)"/> tells).</summary>
    /// <param name="name">The flag.</param>
    /// <param name="description">The help text.</param>
    /// <param name="what">What the names are, for the message ("probe names").</param>
    /// <param name="defaultText">The default list as written; null for none.</param>
    /// <param name="helpName">The value's name in help.</param>
    public static Option<string[]> CommaList(string name, string description, string what, string? defaultText = null, string? helpName = null) =>
        OptionValue.Create<string[]>(name, description, t =>
        {
            string[] items = t.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
            return items.Length > 0 ? items : throw new OptionValueException($"expected one or more {what}");
        }, defaultText, helpName);

    /// <summary>Reads "10ns..20ns" or "all".</summary>
    /// <param name="text">The text.</param>
    public static TimeWindow ReadWindow(string text)
    {
        const string Expected = "expected START..STOP with time units and START before STOP (e.g. 10ns..20ns), or all";
        if (text.Trim().Equals("all", StringComparison.OrdinalIgnoreCase)) return TimeWindow.Whole;
        string[] ends = text.Split("..");
        if (ends.Length != 2 || !Quantity.TryParse(ends[0].Trim(), Dimension.Time, out double a) || !Quantity.TryParse(ends[1].Trim(), Dimension.Time, out double b))
            throw new OptionValueException($"{Expected}, got '{text}'");
        if (!(b > a)) throw new OptionValueException($"{Expected}; '{text}' ends before it starts");
        return new TimeWindow(a, b);
    }

    static PixelSize ReadSize(string text, PixelSize min, PixelSize max)
    {
        var parts = text.Split('x', 'X');
        if (parts.Length == 2 && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int w)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int h)
            && w >= min.Width && h >= min.Height && w <= max.Width && h <= max.Height)
            return new PixelSize(w, h);
        throw new OptionValueException($"expected WIDTHxHEIGHT between {min.Width}x{min.Height} and {max.Width}x{max.Height}, e.g. 1280x720, got '{text}'");
    }
}
