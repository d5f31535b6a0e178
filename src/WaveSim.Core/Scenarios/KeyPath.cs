using System.Collections.Immutable;
using System.Globalization;
using System.Text.RegularExpressions;

namespace WaveSim.Core.Scenarios;

/// <summary>One part of a key path: a key, and a list index after it (<c>line[2]</c>) or none.</summary>
/// <param name="Name">The key.</param>
/// <param name="Index">The item counted from 0, or null.</param>
public readonly record struct KeyPathPart(string Name, int? Index)
{
    /// <inheritdoc/>
    public override string ToString() => Index is { } i ? $"{Name}[{i.ToString(CultureInfo.InvariantCulture)}]" : Name;
}

/// <summary>
/// A scenario key path such as <c>source.rise</c>, <c>line[2].segment.z0</c>, <c>line[1].branch.load.c</c> or
/// <c>load.receiver.vih</c>: the keys of the scenario file from the top, list items counted from 0.
/// </summary>
/// <param name="Text">The path as written.</param>
/// <param name="Parts">Its parts, from the top.</param>
public sealed partial record KeyPath(string Text, ImmutableArray<KeyPathPart> Parts)
{
    [GeneratedRegex(@"\A([A-Za-z_][A-Za-z0-9_]*)(?:\[([0-9]{1,9})\])?\z")]
    private static partial Regex PartPattern();

    /// <summary>Reads a key path.</summary>
    /// <exception cref="InputException">The text is not a key path.</exception>
    public static KeyPath Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        string trimmed = text.Trim();
        var parts = ImmutableArray.CreateBuilder<KeyPathPart>();
        foreach (string p in trimmed.Split('.'))
        {
            var m = PartPattern().Match(p);
            if (!m.Success)
                throw new InputException($"'{text}' is not a scenario key path (e.g. line[0].segment.z0, load.r, source.resistance)");
            parts.Add(new KeyPathPart(m.Groups[1].Value,
                m.Groups[2].Success ? int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture) : null));
        }
        return new KeyPath(trimmed, parts.ToImmutable());
    }

    /// <summary>The path of the first <paramref name="count"/> parts, as written in messages.</summary>
    public string Prefix(int count) => string.Join(".", Parts.Take(count));

    /// <inheritdoc/>
    public override string ToString() => Text;
}
