using System.Text.RegularExpressions;
using WaveSim.Core.Units;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// A YAML mapping read with its key path and source position, so that every error can name the file, line, column and key.
/// Keys are checked against an allowed list, so that a typo is an error rather than silently ignored.
/// </summary>
internal sealed partial class YamlMap
{
    readonly string _file;
    readonly YamlMappingNode _node;

    public string Path { get; }

    public YamlMap(string file, string path, YamlMappingNode node, params string[] allowed)
    {
        _file = file; Path = path; _node = node;
        foreach (var key in node.Children.Keys)
        {
            string k = (key as YamlScalarNode)?.Value ?? "";
            if (!allowed.Contains(k))
                throw Error(key, Join(k), $"unknown key '{k}'; expected one of: {string.Join(", ", allowed)}");
        }
    }

    public string Join(string key) => Path.Length == 0 ? key : Path + "." + key;

    public ScenarioException Error(YamlNode at, string key, string message) =>
        new($"{_file}:{at.Start.Line}:{at.Start.Column}: {key}: {message}");

    public ScenarioException Error(string message) => new($"{_file}:{_node.Start.Line}:{_node.Start.Column}: {(Path.Length == 0 ? "(top level)" : Path)}: {message}");

    public bool Has(string key) => _node.Children.ContainsKey(new YamlScalarNode(key));

    public YamlNode? Node(string key) => _node.Children.TryGetValue(new YamlScalarNode(key), out var n) ? n : null;

    public YamlNode Required(string key) => Node(key) ?? throw Error($"missing required key '{Join(key)}'");

    public string? Text(string key)
    {
        var n = Node(key);
        if (n is null) return null;
        if (n is not YamlScalarNode s) throw Error(n, Join(key), "expected a single value, found a list or mapping");
        return s.Value ?? "";
    }

    /// <summary>Reads a quantity with a unit; null when absent.</summary>
    public double? Quantity(string key, params Dimension[] dims) => QuantityWithDim(key, dims)?.Value;

    public (double Value, Dimension Dim)? QuantityWithDim(string key, params Dimension[] dims)
    {
        string? text = Text(key);
        if (text is null) return null;
        if (dims.Length == 0) dims = [.. TableDimensions(key)];
        try { return Units.Quantity.ParseAny(text, dims); }
        catch (UnitException ex) { throw Error(Node(key)!, Join(key), ex.Message); }
    }

    /// <summary>The dimensions of <paramref name="key"/> in this mapping, from the one key table (<see cref="ScenarioKeys"/>).</summary>
    IReadOnlyList<Dimension> TableDimensions(string key) =>
        ScenarioKeys.Find(ScenarioKeys.ScopeOf(Path[(Path.LastIndexOf('.') + 1)..]), key)?.Dimensions
        ?? throw new InvalidOperationException($"'{Join(key)}' is not in the key table");

    public double? Positive(string key, params Dimension[] dims)
    {
        double? v = Quantity(key, dims);
        if (v is { } x && !(x > 0)) throw Error(Node(key)!, Join(key), ScenarioRules.Positive(Text(key)!));
        return v;
    }

    public double? NonNegative(string key, params Dimension[] dims)
    {
        double? v = Quantity(key, dims);
        if (v is { } x && x < 0) throw Error(Node(key)!, Join(key), ScenarioRules.NonNegative(Text(key)!));
        return v;
    }

    public YamlMap? Map(string key, params string[] allowed)
    {
        var n = Node(key);
        if (n is null) return null;
        if (n is not YamlMappingNode m) throw Error(n, Join(key), "expected a mapping of keys");
        return new YamlMap(_file, Join(key), m, allowed);
    }

    public YamlSequenceNode? Sequence(string key)
    {
        var n = Node(key);
        if (n is null) return null;
        if (n is not YamlSequenceNode s) throw Error(n, Join(key), "expected a list (items starting with '-')");
        return s;
    }

    public string Identifier(string key)
    {
        string? name = Text(key);
        if (name is null) throw Error($"missing required key '{Join(key)}'");
        if (!IdentifierPattern().IsMatch(name))
            throw Error(Node(key)!, Join(key), $"'{Visible(name)}' is not a name: use letters, digits, '_' and '-' only (names become parts of file names)");
        return name;
    }

    /// <summary>The text with control characters written as escapes (rx\n), so that a message shows what is wrong.</summary>
    static string Visible(string text) => string.Concat(text.Select(ch => ch switch
    {
        '\n' => "\\n",
        '\r' => "\\r",
        '\t' => "\\t",
        _ when char.IsControl(ch) => $"\\u{(int)ch:x4}",
        _ => ch.ToString(),
    }));

    // \A and \z match the whole text: '$' would also match before a final newline and let "rx\n" through.
    [GeneratedRegex(@"\A[A-Za-z0-9_-]+\z")]
    public static partial Regex IdentifierPattern();

    public string File => _file;
}
