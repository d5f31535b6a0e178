using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Model;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// A scenario file as read: its path, its YAML text and the validated <see cref="Model.Scenario"/>, with what only the text
/// knows: how a value was written (<c>1 ns</c> or <c>5 ns/m</c>), where (line and column), and the text with new values
/// spliced in, comments and layout kept (<c>fitted.yaml</c>). Variants are made on the model (<see cref="ScenarioValues"/>),
/// never by editing this text.
/// </summary>
/// <param name="FilePath">The file it was read from (or the name given to text).</param>
/// <param name="Text">The YAML text.</param>
/// <param name="Scenario">The validated scenario.</param>
public sealed partial record ScenarioDocument(string FilePath, string Text, Scenario Scenario)
{
    /// <summary>The value at <paramref name="keyPath"/> as written (e.g. "1 ns"); null when the scenario does not write it (its default applies).</summary>
    /// <exception cref="InputException">The text is not a key path.</exception>
    public string? Written(string keyPath) => Find(keyPath) is { } n ? n.Value : null;

    /// <summary>The line and column (from 1) of the value at <paramref name="keyPath"/>; null when it is not written.</summary>
    public (int Line, int Column)? Position(string keyPath) =>
        Find(keyPath) is { } n ? ((int)n.Start.Line, (int)n.Start.Column) : null;

    /// <summary>The text with the values at the key paths replaced by SI values with their units, round-trip exact.</summary>
    public string Edited(IEnumerable<KeyChange> changes) =>
        Edited(changes.Select(c => (c.KeyPath, ScenarioKeys.Format(c.Value, c.Dimension))));

    /// <summary>
    /// The text with the values at the key paths replaced by the given texts. An existing value is replaced in place, keeping the
    /// author's comments and layout; an absent key is added to its mapping (and the text written out again).
    /// </summary>
    /// <exception cref="InputException">A key path does not lead to a mapping in the text.</exception>
    public string Edited(IEnumerable<(string KeyPath, string Value)> changes)
    {
        ArgumentNullException.ThrowIfNull(changes);
        string text = Text;
        foreach (var (path, value) in changes) text = Set(text, path, value);
        return text;
    }

    YamlScalarNode? Find(string keyPath)
    {
        var (parent, key) = Navigate(Root(Text).Root, KeyPath.Parse(keyPath), create: false);
        return parent is not null && parent.Children.TryGetValue(new YamlScalarNode(key), out var n) && n is YamlScalarNode sc ? sc : null;
    }

    static (YamlStream Stream, YamlMappingNode Root) Root(string text)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(text));
        return (stream, (YamlMappingNode)stream.Documents[0].RootNode);
    }

    static string Set(string text, string keyPath, string value)
    {
        var (stream, root) = Root(text);
        var (parent, key) = Navigate(root, KeyPath.Parse(keyPath), create: true);
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

    [GeneratedRegex(@"^[A-Za-z0-9 .+\-/µμΩΩ%]+$")]
    private static partial Regex Plain();

    static string Quote(string v) => Plain().IsMatch(v) ? v : "\"" + v.Replace("\"", "\\\"") + "\"";

    static (YamlMappingNode? Parent, string Key) Navigate(YamlMappingNode root, KeyPath path, bool create)
    {
        YamlNode node = root;
        for (int i = 0; i < path.Parts.Length; i++)
        {
            var (name, index) = path.Parts[i];
            string walked = path.Prefix(i + 1);
            if (node is not YamlMappingNode map)
            {
                if (!create) return (null, name);
                throw new InputException($"{path}: '{path.Prefix(i)}' is not a mapping in the scenario text");
            }
            bool last = i == path.Parts.Length - 1;
            if (last && index is null) return (map, name);
            var key = new YamlScalarNode(name);
            if (!map.Children.TryGetValue(key, out var child))
            {
                if (create && name == "load" && index is null) { child = new YamlMappingNode(); map.Children[key] = child; }
                else if (!create) return (null, name);
                else throw new InputException($"{path}: no '{walked}' in the scenario text");
            }
            if (child is YamlScalarNode s && name == "load" && create)
            {
                if (s.Value is "short") throw new InputException($"{path}: the load is a short; write it as a mapping to vary its parts");
                child = new YamlMappingNode(); map.Children[key] = child;
            }
            if (index is { } idx)
            {
                if (child is not YamlSequenceNode seq || idx >= seq.Children.Count)
                {
                    if (!create) return (null, name);
                    throw new InputException($"{path}: '{name}' has no item [{idx.ToString(CultureInfo.InvariantCulture)}] in the scenario text");
                }
                child = seq.Children[idx];
                if (last) throw new InputException($"{path}: names a whole item; add the key to change, e.g. {path}.segment.z0");
            }
            node = child;
        }
        throw new InputException($"'{path}' is not a scenario key path");
    }
}
