namespace WaveSim.Core.Tolerances;

/// <summary>One varied key of a tolerance run, read from <c>KEY=DIST</c> (see <see cref="ToleranceDistribution"/>).</summary>
/// <param name="KeyPath">The scenario key path, any path <see cref="Scenarios.ScenarioValues"/> takes (e.g. <c>load.r</c>).</param>
/// <param name="Distribution">What its values are drawn from.</param>
public sealed record ToleranceKey(string KeyPath, ToleranceDistribution Distribution)
{
    /// <summary>Reads <c>KEY=DIST</c>; an error names the <c>text</c> parameter.</summary>
    /// <exception cref="InputException">Not KEY=DIST, or a malformed or impossible distribution.</exception>
    public static ToleranceKey Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int eq = text.IndexOf('=');
        if (eq <= 0 || eq == text.Length - 1)
            throw new InputException($"'{text}': expected KEY=DIST, e.g. load.r=tol(5%), line[0].segment.z0=normal(50ohm, 2ohm) or load.c=uniform(1..3 pF)") { Parameter = "text" };
        string key = text[..eq].Trim();
        // A buffer's corner is a name: its values are a list of corners, drawn (or taken as corners) like a numeric choice.
        return new ToleranceKey(key, Scenarios.BufferCorners.IsCornerKey(key)
            ? ToleranceDistribution.ParseNames(text[(eq + 1)..], text, Scenarios.BufferCorners.Names, "corner")
            : ToleranceDistribution.Parse(text[(eq + 1)..], text));
    }

    /// <summary>The key as written back, KEY=DIST with SI values.</summary>
    public override string ToString() => KeyPath + "=" + Distribution;
}
