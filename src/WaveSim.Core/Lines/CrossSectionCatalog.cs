using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

/// <summary>
/// The line kinds and their key names, shared by the scenario loader and the command line so both accept the
/// same words. Lengths are read with units ("8 mil", "0.2 mm"); er and tand are plain numbers; at is a frequency;
/// resistivity is a plain number in ohm m (an "ohm m" suffix is accepted).
/// </summary>
public static class CrossSectionCatalog
{
    /// <summary>Surface microstrip (Hammerstad and Jensen 1980).</summary>
    public const string Microstrip = "microstrip";
    /// <summary>Stripline between two planes, centred or offset (Cohn 1954, Wheeler 1978).</summary>
    public const string Stripline = "stripline";
    /// <summary>Coaxial line (Pozar Table 2.1).</summary>
    public const string Coax = "coax";
    /// <summary>Two parallel round wires (Pozar Table 2.1).</summary>
    public const string Wires = "wires";
    /// <summary>Twisted pair (Lefferson 1971).</summary>
    public const string Twisted = "twisted";
    /// <summary>Edge-coupled pair of surface microstrips (Kirschning and Jansen 1984).</summary>
    public const string CoupledMicrostrip = "coupled-microstrip";
    /// <summary>Edge-coupled pair of striplines centred between two planes (Cohn 1955).</summary>
    public const string CoupledStripline = "coupled-stripline";

    static DimensionInfo Len(string name, bool required, string text) => new(name, Dimension.Length, required, text);
    static DimensionInfo Er(string text) => new("er", Dimension.Number, true, text);

    /// <summary>Keys every kind accepts: loss tangent, evaluation frequency, conductor resistivity.</summary>
    public static IReadOnlyList<DimensionInfo> Common { get; } =
    [
        new("tand", Dimension.Number, false, "dielectric loss tangent, plain number (default 0)"),
        new("at", Dimension.Frequency, false, "frequency for the AC resistance and G, e.g. 1 GHz (default: none, DC only)"),
        new("resistivity", Dimension.Number, false, "conductor resistivity in ohm m (default 1.7241e-8, annealed copper)"),
    ];

    /// <summary>All line kinds.</summary>
    public static IReadOnlyList<LineKindInfo> Kinds { get; } =
    [
        new(Microstrip, "surface microstrip (Hammerstad and Jensen 1980)",
        [
            Len("width", true, "strip width w"),
            Len("height", true, "substrate height h (strip to plane)"),
            Len("thickness", false, "strip thickness t (default 0: no conductor loss)"),
            Er("substrate relative permittivity"),
        ], ["width", "height", "er"]),
        new(Stripline, "stripline between two planes (Cohn 1954 exact, Wheeler 1978 thickness)",
        [
            Len("width", true, "strip width w"),
            Len("spacing", true, "plane-to-plane spacing b"),
            Len("thickness", false, "strip thickness t (default 0: no conductor loss)"),
            Er("relative permittivity"),
            Len("offset", false, "strip centre line's distance from the mid-plane (default 0)"),
        ], ["width", "spacing", "er"]),
        new(Coax, "coaxial line (Pozar Table 2.1)",
        [
            Len("inner", true, "inner conductor diameter d"),
            Len("outer", true, "outer conductor inner diameter D (R_dc counts the inner conductor only)"),
            Er("relative permittivity of the dielectric"),
        ], ["inner", "outer", "er"]),
        new(Wires, "two parallel round wires (Pozar Table 2.1)",
        [
            Len("diameter", true, "wire diameter d"),
            Len("spacing", true, "centre-to-centre spacing s"),
            Er("relative permittivity of the surrounding medium"),
        ], ["diameter", "spacing", "er"]),
        new(Twisted, "twisted pair (Lefferson 1971 filling factor)",
        [
            Len("diameter", true, "conductor diameter d"),
            Len("spacing", true, "centre-to-centre spacing s (d plus twice the insulation for touching wires)"),
            Er("insulation relative permittivity"),
            Len("pitch", false, "length of one full twist (default: untwisted)"),
        ], ["diameter", "spacing", "er"]),
        new(CoupledMicrostrip, "edge-coupled pair of surface microstrips (Kirschning and Jansen 1984); synthesis targets Zdiff",
        [
            Len("width", true, "strip width w (each strip)"),
            Len("gap", true, "edge-to-edge gap s between the strips"),
            Len("height", true, "substrate height h (strip to plane)"),
            Len("thickness", false, "strip thickness t (default 0: no conductor loss; impedances are for t = 0)"),
            Er("substrate relative permittivity"),
        ], ["width"]) { Pair = true },
        new(CoupledStripline, "edge-coupled pair centred between two planes (Cohn 1955 exact, thick-strip correction); synthesis targets Zdiff",
        [
            Len("width", true, "strip width w (each strip)"),
            Len("gap", true, "edge-to-edge gap s between the strips"),
            Len("spacing", true, "plane-to-plane spacing b"),
            Len("thickness", false, "strip thickness t (default 0: no conductor loss)"),
            Er("relative permittivity"),
        ], ["width"]) { Pair = true },
    ];

    /// <summary>Every key any kind accepts, each once, in catalogue order (for building command-line options).</summary>
    public static IReadOnlyList<DimensionInfo> AllKeys { get; } =
        Kinds.SelectMany(k => k.Dimensions).Concat(Common).GroupBy(d => d.Name).Select(g => g.First()).ToList();

    /// <summary>Finds a kind by name (case-insensitive).</summary>
    /// <param name="kind">The kind name.</param>
    /// <param name="context">Where the name came from, for the error message ("xsection", "board.yaml line 4").</param>
    /// <exception cref="InputException">Unknown kind; the message lists the known ones.</exception>
    public static LineKindInfo Find(string kind, string context) =>
        Kinds.FirstOrDefault(k => string.Equals(k.Name, kind?.Trim(), StringComparison.OrdinalIgnoreCase))
        ?? throw new InputException($"{context}: unknown line kind '{kind}'; expected one of {string.Join(", ", Kinds.Select(k => k.Name))}");
}
