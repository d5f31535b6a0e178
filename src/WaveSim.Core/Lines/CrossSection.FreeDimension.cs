namespace WaveSim.Core.Lines;

public static partial class CrossSection
{
    /// <summary>
    /// Which dimension a synthesis for a target impedance solves for: the one asked for (<paramref name="solveFor"/>), whose given
    /// value, if any, is then dropped from <paramref name="rawTextValues"/>; otherwise the one required dimension not given.
    /// </summary>
    /// <param name="kind">The line kind name.</param>
    /// <param name="rawTextValues">The values given, by key; the solved key is removed from it.</param>
    /// <param name="solveFor">The key to solve for, or null to take the one left out.</param>
    /// <param name="context">Leads every error message.</param>
    /// <param name="keyName">How keys are named in messages; it also names the target ("z0") and the choice ("solve").
    /// Null for the keys as they are.</param>
    /// <returns>The key to solve for, as the catalogue spells it.</returns>
    /// <exception cref="InputException">The key cannot be solved for, or not exactly one required dimension is left out.</exception>
    public static string FreeDimension(string kind, IDictionary<string, string> rawTextValues, string? solveFor, string context,
                                       Func<string, string>? keyName = null)
    {
        keyName ??= k => k;
        LineKindInfo info = CrossSectionCatalog.Find(kind, context);
        string solvable = string.Join(", ", info.Solvable);
        if (solveFor is not null)
        {
            string free = info.Solvable.FirstOrDefault(s => string.Equals(s, solveFor.Trim(), StringComparison.OrdinalIgnoreCase))
                ?? throw new InputException($"{context}: cannot solve {info.Name} for '{solveFor}'; solvable: {solvable}");
            foreach (string k in rawTextValues.Keys.Where(k => string.Equals(k, free, StringComparison.OrdinalIgnoreCase)).ToList())
                rawTextValues.Remove(k);
            return free;
        }
        var given = rawTextValues.Keys.ToHashSet(StringComparer.OrdinalIgnoreCase);
        var missing = info.Dimensions.Where(d => d.Required && !given.Contains(d.Name)).Select(d => d.Name).ToList();
        return missing.Count switch
        {
            1 => missing[0],
            0 => throw new InputException($"{context}: {keyName("z0")} needs one dimension left out, or {keyName("solve")} KEY (solvable: {solvable})"),
            _ => throw new InputException($"{context}: {keyName("z0")} solves for one dimension, but {string.Join(", ", missing.Select(keyName))} are missing"),
        };
    }
}
