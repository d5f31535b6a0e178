namespace WaveSim.Core.Lines;

/// <summary>
/// A cross-section to analyse: the kind and its values in SI (lengths in m, er and tand plain, at in Hz,
/// resistivity in ohm m), keyed by the names in <see cref="CrossSectionCatalog"/>.
/// </summary>
/// <param name="Kind">A kind name from <see cref="CrossSectionCatalog.Kinds"/>.</param>
/// <param name="Dimensions">Values by key name (case-insensitive lookup is done by <see cref="CrossSection"/>).</param>
public sealed record CrossSectionSpec(string Kind, IReadOnlyDictionary<string, double> Dimensions)
{
    /// <summary>Where the values came from, leading every error message (default "geometry").</summary>
    public string Context { get; init; } = "geometry";

    /// <summary>How a key is named in messages: as it is in a scenario by default; a caller with its own names for the keys
    /// (a command line's options) passes its mapping.</summary>
    public Func<string, string> KeyName { get; init; } = k => k;

    /// <summary>The values as the user wrote them, to quote in error messages; optional.</summary>
    public IReadOnlyDictionary<string, string>? SourceText { get; init; }

    /// <summary>A copy with one value set (or replaced).</summary>
    /// <param name="key">The key name.</param>
    /// <param name="value">The SI value.</param>
    public CrossSectionSpec With(string key, double value)
    {
        var d = new Dictionary<string, double>(Dimensions, StringComparer.OrdinalIgnoreCase) { [key] = value };
        return this with { Dimensions = d };
    }

    /// <summary>The key as shown to the user, through <see cref="KeyName"/>.</summary>
    /// <param name="key">The key name.</param>
    public string Label(string key) => KeyName(key);
}
