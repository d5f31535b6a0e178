using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Model;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Makes variants of a scenario by changing values at key paths such as <c>line[2].segment.z0</c>, <c>load.r</c> or
/// <c>source.resistance</c>, then reading the edited text again, so a variant is validated exactly like a file and there is
/// no second code path. Existing values are replaced in place, which keeps the author's comments and layout.
/// </summary>
public static partial class ScenarioEditor
{
    [GeneratedRegex(@"^([A-Za-z_][A-Za-z0-9_]*)(?:\[([0-9]+)\])?\z")]
    private static partial Regex PathPart();

    /// <summary>The scenario with the values at <paramref name="changes"/> replaced by the given texts (e.g. "33 ohm").</summary>
    /// <exception cref="InputException">A key path does not exist in the scenario, or the result is not a valid scenario.</exception>
    public static Scenario With(Scenario s, IEnumerable<(string KeyPath, string Value)> changes)
    {
        string text = EditedText(s, changes);
        return ScenarioLoader.Parse(text, s.FilePath ?? "scenario.yaml");
    }

    /// <summary>The scenario's YAML text with the changes applied.</summary>
    public static string EditedText(Scenario s, IEnumerable<(string KeyPath, string Value)> changes)
    {
        string text = s.SourceText ?? throw new InputException("this scenario was not read from text, so it cannot be edited by key path");
        foreach (var (path, value) in changes) text = Set(text, path, value);
        return text;
    }

    /// <summary>The text of the value at <paramref name="keyPath"/>, or null when the final key is absent (its default applies).</summary>
    public static string? Get(Scenario s, string keyPath)
    {
        var root = Root(s.SourceText ?? "");
        var (parent, key) = Navigate(root, keyPath, create: false);
        if (parent is null) return null;
        return parent.Children.TryGetValue(new YamlScalarNode(key), out var n) && n is YamlScalarNode sc ? sc.Value : null;
    }

    /// <summary>The SI unit written for a value at <paramref name="keyPath"/> (e.g. "ohm", "F", "s/m"), given its current text.</summary>
    public static string SiUnit(string keyPath, string? currentText)
    {
        string key = keyPath[(keyPath.LastIndexOf('.') + 1)..];
        bool inSegment = keyPath.Contains(".segment.", StringComparison.Ordinal);
        bool perLength = currentText?.Contains('/') ?? inSegment;
        return key switch
        {
            "z0" or "resistance" => "ohm",
            "r" => inSegment ? "ohm/m" : "ohm",
            "l" => inSegment ? "H/m" : "H",
            "c" => inSegment ? "F/m" : "F",
            "g" => "S/m",
            "length" or "width" when inSegment || key == "length" => "m",
            "delay" when inSegment => perLength ? "s/m" : "s",
            "velocity" => "m/s",
            "eps_eff" or "resolution" or "er" or "tand" => "",
            "low" or "high" or "to" or "vih" or "vil" => "V",
            "frequency" => "Hz",
            _ => "s",
        };
    }

    /// <summary>Formats an SI value with its key's unit, round-trip exact.</summary>
    public static string Format(double value, string unit) =>
        value.ToString("R", CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : "");

    static YamlMappingNode Root(string text)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(text));
        return (YamlMappingNode)stream.Documents[0].RootNode;
    }

    static string Set(string text, string keyPath, string value)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(text));
        var root = (YamlMappingNode)stream.Documents[0].RootNode;
        var (parent, key) = Navigate(root, keyPath, create: true);
        var k = new YamlScalarNode(key);
        if (parent!.Children.TryGetValue(k, out var existing) && existing is YamlScalarNode sc && sc.Start.Index < sc.End.Index)
        {
            // Splice the new value over the old one's characters: comments and layout stay as the author wrote them.
            int start = (int)sc.Start.Index, end = (int)sc.End.Index;
            return text[..start] + Quote(value) + text[end..];
        }
        parent.Children[k] = new YamlScalarNode(value);
        var w = new StringWriter();
        stream.Save(w, assignAnchors: false);
        return w.ToString().TrimEnd('.', '\n', '\r', ' ') + "\n";
    }

    static string Quote(string v) => Regex.IsMatch(v, @"^[A-Za-z0-9 .+\-/µμΩΩ%]+$") ? v : "\"" + v.Replace("\"", "\\\"") + "\"";

    static (YamlMappingNode? Parent, string Key) Navigate(YamlMappingNode root, string keyPath, bool create)
    {
        var parts = keyPath.Split('.');
        YamlNode node = root;
        string walked = "";
        for (int i = 0; i < parts.Length; i++)
        {
            var m = PathPart().Match(parts[i]);
            if (!m.Success) throw new InputException($"'{keyPath}' is not a scenario key path (e.g. line[0].segment.z0, load.r, source.resistance)");
            string name = m.Groups[1].Value;
            walked = walked.Length == 0 ? parts[i] : walked + "." + parts[i];
            if (node is not YamlMappingNode map)
                throw new InputException($"scenario key '{keyPath}' does not exist: '{walked}' is not inside a mapping");
            bool last = i == parts.Length - 1;
            if (last && !m.Groups[2].Success) return (map, name);
            var key = new YamlScalarNode(name);
            if (!map.Children.TryGetValue(key, out var child))
            {
                if (create && name == "load" && !m.Groups[2].Success) { child = new YamlMappingNode(); map.Children[key] = child; }
                else if (!create) return (null, name);
                else throw new InputException($"scenario key '{keyPath}' does not exist: no '{walked}' in the scenario");
            }
            if (child is YamlScalarNode s && name == "load" && create)
            {
                if (s.Value is "short") throw new InputException($"scenario key '{keyPath}': the load is a short; write it as a mapping to vary its parts");
                child = new YamlMappingNode(); map.Children[key] = child;
            }
            if (m.Groups[2].Success)
            {
                int idx = int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture);
                if (child is not YamlSequenceNode seq || idx >= seq.Children.Count)
                    throw new InputException($"scenario key '{keyPath}' does not exist: '{name}' has no item [{idx}]");
                child = seq.Children[idx];
                if (last) throw new InputException($"'{keyPath}' names a whole item; add the key to change, e.g. {keyPath}.segment.z0");
            }
            node = child;
        }
        throw new InputException($"'{keyPath}' is not a scenario key path");
    }
}
