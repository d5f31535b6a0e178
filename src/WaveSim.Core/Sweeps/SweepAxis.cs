using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Units;

namespace WaveSim.Core.Sweeps;

/// <summary>
/// One varied scenario key and its values, read from <c>KEY=RANGE</c>. RANGE is <c>start..stop:count</c> (evenly spaced),
/// <c>start..stop:count:log</c> (evenly spaced in the logarithm) or a list <c>a,b,c</c>. Every value carries a unit
/// (<c>10ohm..200ohm:20</c>, <c>1pF,2pF,5pF</c>), or the unit is written once after the last value and applies to the
/// values written without one (<c>10..200 ohm:20</c>, <c>1,2,5 pF</c>). Keys whose values are plain numbers take none.
/// </summary>
/// <param name="KeyPath">The scenario key path, e.g. <c>load.r</c> or <c>line[0].segment.z0</c>.</param>
/// <param name="Dimension">The dimension the values were written in.</param>
/// <param name="Values">The values in SI units, in sweep order.</param>
public sealed partial record SweepAxis(string KeyPath, Dimension Dimension, IReadOnlyList<double> Values)
{
    /// <summary>Largest number of values one axis may hold.</summary>
    public const int MaxCount = 10_000;

    internal static readonly Dimension[] AllDimensions =
    [
        Dimension.Number, Dimension.Voltage, Dimension.Current, Dimension.Time, Dimension.Frequency, Dimension.Resistance,
        Dimension.Conductance, Dimension.Capacitance, Dimension.Inductance, Dimension.Length, Dimension.Power,
        Dimension.Velocity, Dimension.Percent, Dimension.ResistancePerLength, Dimension.ConductancePerLength,
        Dimension.CapacitancePerLength, Dimension.InductancePerLength, Dimension.DelayPerLength,
    ];

    [GeneratedRegex(@"^\s*([+-]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*(.*?)\s*$")]
    private static partial Regex NumberAndUnit();

    /// <summary>How the values were given. Default <see cref="SweepSpacing.List"/> (values as listed).</summary>
    public SweepSpacing Spacing { get; init; } = SweepSpacing.List;

    /// <summary>Smallest ratio of largest to smallest value for which a list is charted on a logarithmic axis: two decades.</summary>
    public const double LogListRatio = 100;

    /// <summary>
    /// True when charts against this axis use a logarithmic scale: for a <c>:log</c> range, and for a list whose values are
    /// all greater than 0 and span at least two decades (largest / smallest ≥ <see cref="LogListRatio"/>, e.g. 1pF,10pF,100pF).
    /// An evenly spaced range always charts linearly, as do lists with a value of 0 or less.
    /// </summary>
    public bool ChartsOnLogAxis => Spacing switch
    {
        SweepSpacing.Logarithmic => true,
        SweepSpacing.List => Values.Count > 0 && Values.All(v => v > 0 && double.IsFinite(v)) && Values.Max() >= LogListRatio * Values.Min() * (1 - 1e-12),
        _ => false,
    };

    /// <summary>The SI unit symbol of the values as the scenario reader accepts it (e.g. "ohm", "F", "s/m"; "" for plain numbers).</summary>
    public string Unit => Scenarios.ScenarioKeys.Unit(Dimension);

    /// <summary>The SI unit symbol for axis labels (Ω instead of ohm).</summary>
    public string DisplayUnit => Unit == "ohm" ? "\u03a9" : Unit == "ohm/m" ? "\u03a9/m" : Unit;

    /// <summary>Value <paramref name="index"/> written as scenario text, round-trip exact (e.g. "4.7e-12 F").</summary>
    public string Text(int index) => Choices is { } c ? c[(int)Values[index]] : Scenarios.ScenarioKeys.Format(Values[index], Dimension);

    /// <summary>A value of this axis for a listing: the choice's name for a discrete key, else the value with its unit (4 digits).</summary>
    public string Show(double value) => Choices is { } c ? c[(int)value] : Quantity.Format(value, DisplayUnit, 4);

    /// <summary>The names of a discrete key's values (a buffer's corner: the values are indices into it); null for a number.</summary>
    public IReadOnlyList<string>? Choices { get; init; }

    /// <summary>Reads <c>KEY=RANGE</c>; an error names the <c>text</c> parameter (<see cref="InputException.Parameter"/>).</summary>
    /// <exception cref="InputException">The text is not KEY=RANGE, the range is malformed, or its values mix dimensions.</exception>
    public static SweepAxis Parse(string text)
    {
        int eq = text.IndexOf('=');
        if (eq <= 0 || eq == text.Length - 1)
            throw Bad(text, "expected KEY=RANGE, e.g. load.r=10ohm..200ohm:20, load.c=1pF,2pF,5pF or load.r=10..200 ohm:20:log");
        string key = text[..eq].Trim(), range = text[(eq + 1)..].Trim();
        if (Scenarios.BufferCorners.IsCornerKey(key))
        {
            var idx = range.Split(',').Select(c => Scenarios.BufferCorners.IndexOf(c) ?? throw Bad(text, $"'{c.Trim()}' is not a corner; expected typ, min or max")).ToArray();
            return new SweepAxis(key, Dimension.Number, [.. idx.Select(i => (double)i)]) { Choices = Scenarios.BufferCorners.Names };
        }
        int dots = range.IndexOf("..", StringComparison.Ordinal);
        return dots >= 0 ? ParseRange(text, key, range, dots) : ParseList(text, key, range);
    }

    static SweepAxis ParseRange(string text, string key, string range, int dots)
    {
        string startText = range[..dots], rest = range[(dots + 2)..];
        var parts = rest.Split(':');
        if (parts.Length is < 2 or > 3)
            throw Bad(text, "a range is start..stop:count or start..stop:count:log, e.g. 10ohm..200ohm:20");
        bool log = parts.Length == 3;
        if (log && parts[2].Trim() != "log")
            throw Bad(text, $"'{parts[2].Trim()}' after the count: expected 'log' or nothing");
        if (!int.TryParse(parts[1].Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count < 2 || count > MaxCount)
            throw Bad(text, $"the count '{parts[1].Trim()}' must be a whole number from 2 to {MaxCount}");
        var (values, dim) = ReadValues(text, [startText, parts[0]]);
        double a = values[0], b = values[1];
        if (log && !(a > 0 && b > 0))
            throw Bad(text, "a :log range needs start and stop greater than zero");
        var list = new double[count];
        for (int i = 0; i < count; i++)
        {
            double f = (double)i / (count - 1);
            list[i] = i == count - 1 ? b : log ? a * Math.Pow(b / a, f) : a + (b - a) * f;
        }
        return new SweepAxis(key, dim, list) { Spacing = log ? SweepSpacing.Logarithmic : SweepSpacing.Linear };
    }

    static SweepAxis ParseList(string text, string key, string range)
    {
        var items = range.Split(',');
        if (items.Length > MaxCount) throw Bad(text, $"more than {MaxCount} values");
        var (values, dim) = ReadValues(text, items);
        return new SweepAxis(key, dim, values) { Spacing = SweepSpacing.List };
    }

    /// <summary>Reads number-with-unit texts; those without a unit take the unit of the last one.</summary>
    internal static (double[] Values, Dimension Dim) ReadValues(string text, IReadOnlyList<string> items)
    {
        var split = new (string Number, string Unit)[items.Count];
        for (int i = 0; i < items.Count; i++)
        {
            var m = NumberAndUnit().Match(items[i]);
            if (!m.Success) throw Bad(text, $"'{items[i].Trim()}' is not a number with a unit");
            split[i] = (m.Groups[1].Value, m.Groups[2].Value);
        }
        string lastUnit = split[^1].Unit;
        var values = new double[items.Count];
        Dimension? dim = null;
        for (int i = 0; i < split.Length; i++)
        {
            string unit = split[i].Unit.Length > 0 ? split[i].Unit : lastUnit;
            (double v, Dimension d) = (0, default);
            try { (v, d) = Quantity.ParseAny(split[i].Number + " " + unit, AllDimensions); }
            catch (UnitException ex) { throw Bad(text, ex.Message); }
            if (dim is { } first && d != first)
                throw Bad(text, $"'{items[i].Trim()}' is {d.Describe()} but the first value is {first.Describe()}");
            dim = d;
            values[i] = v;
        }
        return (values, dim!.Value);
    }

    // The message names the text as given (KEY=RANGE); the command line adds its option.
    static InputException Bad(string text, string why) => new($"'{text}': {why}") { Parameter = "text" };
}
