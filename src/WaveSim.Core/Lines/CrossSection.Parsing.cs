using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

public static partial class CrossSection
{
    [GeneratedRegex(@"\s*(ohm|Ohm|Ω|Ω)\s*[·*.]?\s*m\s*$")]
    private static partial Regex OhmMetreSuffix();

    /// <summary>
    /// Reads a geometry written as text, e.g. { kind: microstrip, width: 8 mil, height: 5 mil, er: 4.2 }. The
    /// "kind" key names the line kind; the other keys are those of <see cref="CrossSectionCatalog"/>.
    /// </summary>
    /// <param name="rawTextValues">Key to value text, including "kind".</param>
    /// <param name="context">Leads every error message, e.g. "board.yaml line 12 geometry".</param>
    /// <exception cref="InputException">No kind, an unknown or missing key, or unreadable value text.</exception>
    public static CrossSectionSpec FromDictionary(IDictionary<string, string> rawTextValues, string context)
    {
        string? kind = rawTextValues.FirstOrDefault(p => string.Equals(p.Key, "kind", StringComparison.OrdinalIgnoreCase)).Value;
        if (string.IsNullOrWhiteSpace(kind))
            throw new InputException($"{context}: missing 'kind'; expected one of {string.Join(", ", CrossSectionCatalog.Kinds.Select(k => k.Name))}");
        var rest = rawTextValues.Where(p => !string.Equals(p.Key, "kind", StringComparison.OrdinalIgnoreCase))
                                .ToDictionary(p => p.Key, p => p.Value);
        return FromDictionary(kind, rest, context);
    }

    /// <summary>Reads the values of one kind written as text (without a "kind" key).</summary>
    /// <param name="kind">The line kind name.</param>
    /// <param name="rawTextValues">Key to value text: lengths with units ("8 mil"), er and tand plain, at a frequency,
    /// resistivity a plain number in ohm m (an "ohm m" suffix is accepted); a bare 0 needs no unit.</param>
    /// <param name="context">Leads every error message.</param>
    /// <param name="keyName">How keys are named in messages (<see cref="CrossSectionSpec.KeyName"/>); null for the keys as they are.</param>
    /// <param name="freeDimension">A required key that may be missing because it will be solved for; null for none.</param>
    /// <exception cref="InputException">Unknown or missing key, or unreadable value text.</exception>
    public static CrossSectionSpec FromDictionary(string kind, IDictionary<string, string> rawTextValues, string context,
                                                  Func<string, string>? keyName = null, string? freeDimension = null)
    {
        LineKindInfo info = CrossSectionCatalog.Find(kind, context);
        keyName ??= k => k;
        var byName = info.AllKeys.ToDictionary(k => k.Name, StringComparer.OrdinalIgnoreCase);
        var values = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var text = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (var (key, raw) in rawTextValues)
        {
            if (!byName.TryGetValue(key.Trim(), out DimensionInfo? dim))
                throw new InputException($"{context}: unknown key '{keyName(key)}' for {info.Name}; accepted: {SpecReader.AcceptedList(info, keyName)}");
            values[dim.Name] = ParseValue(dim, raw, context, keyName);
            text[dim.Name] = raw;
        }
        foreach (DimensionInfo d in info.Dimensions.Where(d => d.Required))
            if (!values.ContainsKey(d.Name) && !string.Equals(d.Name, freeDimension, StringComparison.OrdinalIgnoreCase))
                throw new InputException($"{context}: missing '{keyName(d.Name)}' for {info.Name} (required: {string.Join(", ", info.Dimensions.Where(x => x.Required).Select(x => keyName(x.Name)))})");
        return new CrossSectionSpec(info.Name, values) { Context = context, KeyName = keyName, SourceText = text };
    }

    static double ParseValue(DimensionInfo dim, string raw, string context, Func<string, string> keyName)
    {
        string t = raw ?? "";
        if (dim.Name == "resistivity") t = OhmMetreSuffix().Replace(t, "");
        // A bare zero needs no unit ("thickness: 0", "offset: 0").
        if (double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double z) && z == 0) return 0;
        try
        {
            return Quantity.Parse(t, dim.Dimension);
        }
        catch (UnitException ex)
        {
            string hint = dim.Name == "resistivity" ? " (resistivity is a plain number in ohm m, e.g. 1.7241e-8)" : "";
            throw new InputException($"{context}: {keyName(dim.Name)}: {ex.Message}{hint}");
        }
    }

    /// <summary>Formats an SI value of key <paramref name="key"/> for display ("8 mil" comes back as "203.2 µm").</summary>
    /// <param name="key">A key name from the catalogue.</param>
    /// <param name="value">The SI value.</param>
    public static string FormatValue(string key, double value) => key switch
    {
        "er" or "tand" or "resistivity" => value.ToString("G6", CultureInfo.InvariantCulture),
        "at" => Quantity.Format(value, "Hz"),
        _ => Quantity.Format(value, "m"),
    };
}
