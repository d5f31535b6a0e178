using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// A pass over the YAML events before any tree is built. YamlDotNet builds its tree, resolves aliases and hashes keys
/// recursively, so deep nesting, an alias used as a key or a key that is itself a list or mapping can overflow the stack
/// (a crash no handler can catch). The event parser keeps its own stack, so walking its events is safe at any depth.
/// </summary>
internal static class YamlShape
{
    /// <summary>
    /// The deepest nesting of lists and mappings accepted. A scenario needs about ten levels (branches inside branches add
    /// three each); 64 leaves room for deeply nested branches (common practice, no source).
    /// </summary>
    public const int MaxDepth = 64;

    /// <summary>Refuses nesting deeper than <see cref="MaxDepth"/>, keys that are aliases, lists or mappings, and an alias to an anchor still open.</summary>
    /// <exception cref="ScenarioException">The text has one of those shapes (errors of YAML syntax are left to the loader).</exception>
    public static void Check(string yaml, string file)
    {
        var parser = new Parser(new StringReader(yaml));
        // One frame per open list or mapping: whether it is a mapping, whether its next node is a key, its anchor.
        var frames = new Stack<(bool Mapping, bool KeyNext, string? Anchor)>();
        try
        {
            while (parser.MoveNext())
            {
                var ev = parser.Current!;
                switch (ev)
                {
                    case MappingEnd or SequenceEnd:
                        if (frames.Count > 0) frames.Pop();
                        continue;
                    case not (Scalar or AnchorAlias or MappingStart or SequenceStart):
                        continue;
                }
                if (frames.Count > 0 && frames.Peek() is { Mapping: true } parent)
                {
                    frames.Pop();
                    if (parent.KeyNext && ev is not Scalar)
                        throw Error(file, ev, ev is AnchorAlias
                            ? "an alias ('*name') used as a key; scenario keys are plain words"
                            : "a list or mapping used as a key; scenario keys are plain words");
                    frames.Push(parent with { KeyNext = !parent.KeyNext });
                }
                if (ev is AnchorAlias alias && frames.Any(f => f.Anchor == alias.Value.Value))
                    throw Error(file, ev, $"the alias '*{alias.Value.Value}' refers to the list or mapping that holds it");
                if (ev is MappingStart or SequenceStart)
                {
                    if (frames.Count >= MaxDepth)
                        throw Error(file, ev, $"lists and mappings nested more than {MaxDepth} deep; a scenario needs far fewer");
                    string? anchor = ((NodeEvent)ev).Anchor is { IsEmpty: false } a ? a.Value : null;
                    frames.Push((ev is MappingStart, true, anchor));
                }
            }
        }
        catch (Exception ex) when (ex is YamlException or InvalidOperationException)
        {
            // A syntax error: the loader reads the text again and reports it with its position.
        }
    }

    static ScenarioException Error(string file, ParsingEvent ev, string message) =>
        new($"{file}:{ev.Start.Line}:{ev.Start.Column}: not a valid scenario: {message}");
}
