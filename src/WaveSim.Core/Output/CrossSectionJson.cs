using System.Text.Json.Nodes;
using WaveSim.Core.Lines;

namespace WaveSim.Core.Output;

/// <summary>
/// The JSON form of a cross-section's figures (SI values, each key ending in its unit's symbol), with the solved dimension
/// first when there is one.
/// </summary>
public static class CrossSectionJson
{
    /// <summary>One line: kind, the solved dimension, Z0, εeff, delay, L, C, R and G per length, warnings.</summary>
    /// <param name="p">The line's figures.</param>
    /// <param name="solved">The synthesis result, or null.</param>
    public static JsonObject Line(LineParameters p, SynthesisResult? solved)
    {
        var o = Head(p.Kind, solved);
        foreach (var (key, value) in Figures(p).ToList()) o[key] = value?.DeepClone();
        o["warnings"] = Warnings(p.Warnings);
        return o;
    }

    /// <summary>A coupled pair: even and odd figures, Zdiff, Zcomm, coupling, then the pair as a differential and a common-mode line.</summary>
    /// <param name="p">The pair's figures.</param>
    /// <param name="solved">The synthesis result, or null.</param>
    public static JsonObject Pair(CoupledLineParameters p, SynthesisResult? solved)
    {
        var o = Head(p.Kind, solved);
        o["z0_even_ohm"] = p.Z0Even;
        o["z0_odd_ohm"] = p.Z0Odd;
        o["eps_eff_even"] = p.Even.EpsEff;
        o["eps_eff_odd"] = p.Odd.EpsEff;
        o["z_diff_ohm"] = p.Zdiff;
        o["z_comm_ohm"] = p.Zcomm;
        o["coupling"] = p.Coupling;
        o["differential"] = Figures(p.Differential);
        o["common"] = Figures(p.Common);
        o["warnings"] = Warnings(p.Warnings);
        return o;
    }

    static JsonObject Head(string kind, SynthesisResult? solved)
    {
        var o = new JsonObject { ["kind"] = kind };
        // er is a plain number; every other solvable key is a length.
        if (solved is not null) o[solved.Dimension == "er" ? "er" : solved.Dimension + "_m"] = solved.Value;
        return o;
    }

    static JsonObject Figures(LineParameters p)
    {
        var o = new JsonObject
        {
            ["z0_ohm"] = p.Z0, ["eps_eff"] = p.EpsEff, ["delay_s_per_m"] = p.DelayPerLength,
            ["l_H_per_m"] = p.L, ["c_F_per_m"] = p.C, ["r_dc_ohm_per_m"] = p.RDc,
        };
        if (p.FrequencyHz is double f)
        {
            o["frequency_Hz"] = f;
            o["r_ac_ohm_per_m"] = p.RAc;
            o["g_S_per_m"] = p.G;
        }
        return o;
    }

    static JsonArray Warnings(IEnumerable<string> warnings) => new(warnings.Select(w => (JsonNode?)JsonValue.Create(w)).ToArray());
}
