using WaveSim.Core.Analysis;

namespace WaveSim.Core.Sweeps;

/// <summary>
/// Resolves figure names as users type them: the full name (<c>settling_s</c>), the name without its unit suffix
/// (<c>settling</c>, <c>overshoot</c>, <c>rise_10_90</c>) or its first word when that is unambiguous (<c>rise</c>, <c>delay</c>).
/// </summary>
public static class FigureSelector
{
    static readonly string[] UnitSuffixes = ["_V", "_s", "_pct"];

    /// <summary>The <see cref="SignalFigures.FigureNames"/> entry meant by <paramref name="name"/>.</summary>
    /// <exception cref="InputException">No figure, or more than one, matches.</exception>
    public static string Resolve(string name)
    {
        string n = name.Trim();
        var all = SignalFigures.FigureNames;
        if (all.Contains(n)) return n;
        var bare = all.Where(f => Stem(f) == n).ToList();
        if (bare.Count == 1) return bare[0];
        var firstWord = all.Where(f => f.Split('_')[0] == n).ToList();
        if (firstWord.Count == 1) return firstWord[0];
        throw new InputException($"'{name}' is not {(firstWord.Count > 1 ? "one" : "a")} signal figure{(firstWord.Count > 1 ? " (ambiguous)" : "")}; expected one of: {string.Join(", ", all.Select(Stem))}");
    }

    /// <summary>The figure's name without its unit suffix (overshoot_pct → overshoot).</summary>
    public static string Stem(string figure)
    {
        foreach (string s in UnitSuffixes)
            if (figure.EndsWith(s, StringComparison.Ordinal)) return figure[..^s.Length];
        return figure;
    }

    /// <summary>The SI unit symbol of a figure for axis labels: V, s, % or "" (counts and flags).</summary>
    public static string Unit(string figure) =>
        figure.EndsWith("_V", StringComparison.Ordinal) ? "V"
        : figure.EndsWith("_s", StringComparison.Ordinal) ? "s"
        : figure.EndsWith("_pct", StringComparison.Ordinal) ? "%" : "";

    /// <summary>Reads <c>PROBE.FIGURE</c> (e.g. <c>rx.settling</c>) against the probes of a sweep.</summary>
    /// <exception cref="InputException">No '.', an unknown probe or an unknown figure (naming the <c>text</c> parameter).</exception>
    public static ProbeFigure ProbeAndFigure(string text, IReadOnlyList<string> probes)
    {
        int dot = text.IndexOf('.');
        if (dot <= 0 || dot == text.Length - 1)
            throw new InputException($"'{text}': expected PROBE.FIGURE, e.g. {probes.FirstOrDefault() ?? "rx"}.settling") { Parameter = "text" };
        string probe = text[..dot].Trim();
        if (!probes.Contains(probe))
            throw new InputException($"'{text}': no probe named '{probe}'; probes: {string.Join(", ", probes)}") { Parameter = "text" };
        try { return new ProbeFigure(probe, Resolve(text[(dot + 1)..])); }
        catch (InputException ex) { throw new InputException($"'{text}': {ex.Message}") { Parameter = "text" }; }
    }
}

/// <summary>One figure of one probe.</summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="Figure">A name from <see cref="SignalFigures.FigureNames"/>.</param>
public sealed record ProbeFigure(string Probe, string Figure)
{
    /// <summary>The CSV column name, <c>&lt;probe&gt;.&lt;figure&gt;</c>.</summary>
    public string Column => Probe + "." + Figure;
}
