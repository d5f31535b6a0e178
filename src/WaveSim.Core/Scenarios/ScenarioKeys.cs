using System.Collections.Frozen;
using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>What sign a scenario value may have, as the loader checks it.</summary>
public enum KeySign
{
    /// <summary>Any sign (levels, the voltage a resistor returns to).</summary>
    Any,
    /// <summary>Zero or more ("must not be negative").</summary>
    NonNegative,
    /// <summary>More than zero ("must be greater than zero").</summary>
    Positive,
}

/// <summary>One numeric scenario key: where it sits, the dimensions its value may be written in (preferred first) and its sign.</summary>
/// <param name="Scope">The mapping it sits in: source, segment, shunt, series, load, receiver, simulation or loss.</param>
/// <param name="Key">The key as written, e.g. <c>z0</c>.</param>
/// <param name="Dimensions">One or two dimensions; a segment's delay is per length (ns/m) or the whole segment's (ns).</param>
/// <param name="Sign">The sign the loader accepts.</param>
public sealed record ScenarioKey(string Scope, string Key, IReadOnlyList<Dimension> Dimensions, KeySign Sign)
{
    /// <summary>The preferred dimension (the first).</summary>
    public Dimension Preferred => Dimensions[0];
}

/// <summary>
/// The one table of numeric scenario keys and their quantities, used by the loader (<see cref="ScenarioLoader"/>), the key-path
/// API (<see cref="ScenarioValues"/>), sweeps and fits, so that a value means the same thing wherever it is written.
/// </summary>
public static class ScenarioKeys
{
    static readonly Dimension[] V = [Dimension.Voltage], T = [Dimension.Time], Ohm = [Dimension.Resistance], Num = [Dimension.Number];

    /// <summary>Every numeric key, by scope.</summary>
    public static readonly IReadOnlyList<ScenarioKey> All =
    [
        new("source", "low", V, KeySign.Any),
        new("source", "high", V, KeySign.Any),
        new("source", "rise", T, KeySign.NonNegative),
        new("source", "fall", T, KeySign.NonNegative),
        new("source", "delay", T, KeySign.NonNegative),
        new("source", "width", T, KeySign.NonNegative),     // a Gaussian's width must be positive: ScenarioRules
        new("source", "period", T, KeySign.Positive),
        new("source", "frequency", [Dimension.Frequency], KeySign.Positive),
        new("source", "bit_time", T, KeySign.Positive),
        new("source", "resistance", Ohm, KeySign.NonNegative),
        new("segment", "length", [Dimension.Length], KeySign.Positive),
        new("segment", "z0", Ohm, KeySign.Positive),
        new("segment", "delay", [Dimension.DelayPerLength, Dimension.Time], KeySign.Positive),
        new("segment", "velocity", [Dimension.Velocity], KeySign.Positive),
        new("segment", "eps_eff", Num, KeySign.Positive),
        new("segment", "r", [Dimension.ResistancePerLength], KeySign.NonNegative),
        new("segment", "g", [Dimension.ConductancePerLength], KeySign.NonNegative),
        new("segment", "l", [Dimension.InductancePerLength], KeySign.Positive),
        new("segment", "c", [Dimension.CapacitancePerLength], KeySign.Positive),
        new("loss", "r_dc", [Dimension.ResistancePerLength], KeySign.Positive),
        new("loss", "skin_at", [Dimension.Frequency], KeySign.Positive),
        new("loss", "r_skin", [Dimension.ResistancePerLength], KeySign.Positive),
        new("loss", "tand", Num, KeySign.NonNegative),
        new("loss", "er", Num, KeySign.Positive),
        new("loss", "at", [Dimension.Frequency], KeySign.Positive),
        .. Lumped("shunt"),
        .. Lumped("series"),
        new("load", "r", Ohm, KeySign.NonNegative),
        new("load", "to", V, KeySign.Any),
        new("load", "c", [Dimension.Capacitance], KeySign.Positive),
        new("load", "l", [Dimension.Inductance], KeySign.Positive),
        new("receiver", "vih", V, KeySign.Any),
        new("receiver", "vil", V, KeySign.Any),
        new("simulation", "duration", T, KeySign.Positive),
        new("simulation", "output_step", T, KeySign.Positive),
        new("simulation", "resolution", Num, KeySign.Positive),
    ];

    static IEnumerable<ScenarioKey> Lumped(string scope) =>
    [
        new(scope, "r", Ohm, KeySign.NonNegative),
        new(scope, "l", [Dimension.Inductance], KeySign.Positive),
        new(scope, "c", [Dimension.Capacitance], KeySign.Positive),
    ];

    static readonly FrozenDictionary<(string, string), ScenarioKey> ByScope = All.ToFrozenDictionary(k => (k.Scope, k.Key));

    /// <summary>The key <paramref name="key"/> inside the mapping <paramref name="scope"/>; null when it is not a numeric key there.</summary>
    /// <param name="scope">source, segment, shunt, series, load, receiver, simulation or loss.</param>
    /// <param name="key">The key as written.</param>
    public static ScenarioKey? Find(string scope, string key) => ByScope.GetValueOrDefault((scope, key));

    /// <summary>The numeric key a key path ends in (<c>line[2].segment.z0</c> → segment z0); null when it is none.</summary>
    /// <param name="keyPath">A key path such as <c>load.c</c> or <c>line[0].branch.line[1].shunt.c</c>.</param>
    public static ScenarioKey? ForPath(string keyPath)
    {
        ArgumentNullException.ThrowIfNull(keyPath);
        var parts = keyPath.Split('.');
        if (parts.Length < 2) return null;
        return Find(ScopeOf(parts[^2]), parts[^1]);
    }

    /// <summary>The scope named by one path part: <c>line[0]</c>'s items are named by their kind, so the index is dropped.</summary>
    internal static string ScopeOf(string part)
    {
        int bracket = part.IndexOf('[');
        return bracket < 0 ? part : part[..bracket];
    }

    /// <summary>The SI unit a value of <paramref name="d"/> is written with (e.g. "ohm", "s/m"; "" for a plain number).</summary>
    public static string Unit(Dimension d) => d.SiUnit;

    /// <summary>An SI value written with its unit, round-trip exact (e.g. "4.7e-12 F"; a percentage as "12.5 %").</summary>
    /// <param name="value">The SI value (a fraction for a percentage).</param>
    /// <param name="d">Its dimension.</param>
    public static string Format(double value, Dimension d) => d == Dimension.Percent
        ? (value * 100).ToString("R", CultureInfo.InvariantCulture) + " %"
        : Format(value, d.SiUnit);

    /// <summary>An SI value with a unit text, round-trip exact (e.g. "33 ohm"; no unit for a plain number).</summary>
    public static string Format(double value, string unit) =>
        value.ToString("R", CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : "");
}
