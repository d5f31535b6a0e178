using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

/// <summary>Reads and checks one spec's values; every failure names the key and quotes the value.</summary>
internal sealed class SpecReader
{
    readonly CrossSectionSpec spec;
    readonly Dictionary<string, double> values;

    public LineKindInfo Kind { get; }

    public SpecReader(CrossSectionSpec spec)
    {
        this.spec = spec;
        Kind = CrossSectionCatalog.Find(spec.Kind, spec.Context);
        values = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var known = Kind.AllKeys.ToDictionary(k => k.Name, StringComparer.OrdinalIgnoreCase);
        foreach (var (key, value) in spec.Dimensions)
        {
            if (!known.TryGetValue(key, out DimensionInfo? info))
                throw new InputException($"{spec.Context}: unknown key '{spec.Label(key)}' for {Kind.Name}; accepted: {AcceptedList(Kind, spec.KeyName)}");
            values[info.Name] = value;
            Check(info.Name, value);
        }
    }

    public static string AcceptedList(LineKindInfo kind, Func<string, string> keyName) => string.Join(", ", kind.AllKeys.Select(k => keyName(k.Name)));

    public double Required(string key) => values.TryGetValue(key, out double v) ? v
        : throw new InputException($"{spec.Context}: missing '{spec.Label(key)}' for {Kind.Name} (required: {string.Join(", ", Kind.Dimensions.Where(d => d.Required).Select(d => spec.Label(d.Name)))})");

    public double Optional(string key, double fallback) => values.TryGetValue(key, out double v) ? v : fallback;

    public double? OptionalOrNull(string key) => values.TryGetValue(key, out double v) ? v : null;

    /// <summary>The value as the user wrote it, or formatted from SI.</summary>
    public string Text(string key)
    {
        if (spec.SourceText is { } src)
            foreach (var (k, t) in src)
                if (string.Equals(k, key, StringComparison.OrdinalIgnoreCase)) return t.Trim();
        double v = values.GetValueOrDefault(key);
        return key switch
        {
            "er" or "tand" or "resistivity" => v.ToString("G6", CultureInfo.InvariantCulture),
            "at" => Quantity.Format(v, "Hz"),
            _ => Quantity.Format(v, "m"),
        };
    }

    public InputException Error(string key, string requirement) =>
        new($"{spec.Context}: {spec.Label(key)} {requirement} (got {Text(key)})");

    void Check(string key, double v)
    {
        if (!double.IsFinite(v)) throw Error(key, "must be a finite number");
        string? need = key switch
        {
            "thickness" => v < 0 ? "must be >= 0" : null,
            "offset" => null,
            "er" => v < 1 ? "must be >= 1" : null,
            "tand" => v < 0 ? "must be >= 0" : null,
            _ => v <= 0 ? "must be > 0" : null,
        };
        if (need != null) throw Error(key, need);
    }
}
