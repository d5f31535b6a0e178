using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using WaveSim.Core.Lines;
using WaveSim.Core.Output;

namespace WaveSim.Tests.Output;

/// <summary>
/// The cross-section's JSON (it used to be built inside the xsection command): SI values under keys that end in their
/// unit's symbol as written (_H, _F, _S, _Hz …), the convention of every other JSON output (docs/command-line.md).
/// </summary>
public partial class CrossSectionJsonTests
{
    static readonly HashSet<string> PlainNumbers = ["kind", "eps_eff", "eps_eff_even", "eps_eff_odd", "coupling", "er", "warnings", "differential", "common"];

    static IEnumerable<string> Keys(JsonObject o) =>
        o.SelectMany(p => p.Value is JsonObject inner ? Keys(inner).Prepend(p.Key) : [p.Key]);

    static Dictionary<string, string> Geometry(params (string K, string V)[] kv) => kv.ToDictionary(x => x.K, x => x.V);

    [Fact]
    public void Every_key_ends_in_its_units_symbol_and_holds_the_SI_value()
    {
        var line = CrossSection.Compute(CrossSection.FromDictionary("microstrip",
            Geometry(("width", "8mil"), ("height", "5mil"), ("er", "4.2"), ("thickness", "1.4mil"), ("tand", "0.02"), ("at", "1GHz")), "g"));
        var pair = CrossSection.ComputePair(CrossSection.FromDictionary("coupled-microstrip",
            Geometry(("width", "0.12mm"), ("gap", "0.15mm"), ("height", "0.1mm"), ("er", "4.2"), ("tand", "0.02"), ("at", "1GHz")), "g"));
        var one = CrossSectionJson.Line(line, null);
        var two = CrossSectionJson.Pair(pair, null);
        var bad = Keys(one).Concat(Keys(two)).Where(k => !PlainNumbers.Contains(k) && !Suffix().IsMatch(k.EndsWith("_per_m", StringComparison.Ordinal) ? k[..^6] : k)).Distinct().ToList();
        Assert.True(bad.Count == 0, "keys without a unit symbol: " + string.Join(", ", bad));
        // The values are the SI figures themselves (L in H/m, C in F/m, the frequency in Hz).
        Assert.Equal(line.L, one["l_H_per_m"]!.GetValue<double>());
        Assert.Equal(line.C, one["c_F_per_m"]!.GetValue<double>());
        Assert.Equal(1e9, one["frequency_Hz"]!.GetValue<double>());
        Assert.Equal(line.G, one["g_S_per_m"]!.GetValue<double>());
        Assert.Equal(pair.Zdiff, two["z_diff_ohm"]!.GetValue<double>());
    }

    [GeneratedRegex(@"_(s|V|A|W|F|H|S|Hz|m|ohm|pct)$")]
    private static partial Regex Suffix();
}
