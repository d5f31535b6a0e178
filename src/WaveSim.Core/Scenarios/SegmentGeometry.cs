using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// A segment given by its cross-section (<c>geometry: { kind: microstrip, width: 8 mil, … }</c>): L and C from the
/// closed-form formulas of <see cref="CrossSection"/>, R and G as constants.
/// </summary>
/// <remarks>
/// R is the DC resistance of the copper unless <c>at</c> is given, in which case it is the skin-effect resistance at that
/// frequency (a constant-R model must choose one; DC keeps the settled levels right). G = ωC·tan δ at <c>at</c>, or at the
/// source edge's bandwidth 0.35/t_r (exact for one pole, ln 9/2π; common practice) when <c>at</c> is not given.
/// An explicit <c>r</c> or <c>g</c> beside the geometry overrides the derived value.
/// With <c>loss: frequency</c> the segment instead carries the cross-section's frequency-dependent loss
/// (<see cref="FrequencyLoss"/>: skin effect R_dc·√(1 + s/ω0) and the Djordjevic-Sarkar dielectric fitted to er and tan δ at
/// <c>at</c>, or at 1 GHz without it); <c>loss: constant</c> (the default) keeps the constant R and G.
/// A coupled pair (<c>kind: coupled-microstrip</c> or <c>coupled-stripline</c>) stands as one line in the mode given by
/// <c>mode</c>: <c>differential</c> (the default; Z0 = Zdiff = 2 Z0o, odd-mode eps_eff, R of both strips in series) or
/// <c>common</c> (Z0 = Zcomm = Z0e/2, even-mode eps_eff, the strips in parallel); see <see cref="CoupledLineParameters"/>.
/// </remarks>
internal static class SegmentGeometry
{
    public static Segment Read(YamlMap m, double length, double? r, double? g, double rise)
    {
        foreach (string k in new[] { "z0", "delay", "velocity", "eps_eff", "l", "c" })
            if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "a segment given by geometry takes its impedance and delay from it: remove this key");
        var node = m.Node("geometry")!;
        if (node is not YamlMappingNode map) throw m.Error(node, m.Join("geometry"), "expected a mapping such as { kind: microstrip, width: 8 mil, height: 5 mil, er: 4.2 }");
        var raw = new Dictionary<string, string>();
        foreach (var (k, v) in map.Children)
        {
            string key = ((YamlScalarNode)k).Value ?? "";
            if (v is not YamlScalarNode sv) throw m.Error(v, m.Join("geometry." + key), "expected a single value");
            raw[key] = sv.Value ?? "";
        }
        string context = $"{m.File}:{node.Start.Line}:{node.Start.Column}: {m.Join("geometry")}";
        var spec = CrossSection.FromDictionary(raw, context);
        var p = ReadPairMode(m, spec) is PairMode pairMode ? CrossSection.ComputePair(spec).For(pairMode) : CrossSection.Compute(spec);
        if (m.Node("loss") is { } lossNode)
        {
            string? mode = (lossNode as YamlScalarNode)?.Value;
            if (mode == "frequency")
            {
                foreach (string k in new[] { "r", "g" })
                    if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "with 'loss: frequency' the resistance and conductance come from the geometry: remove this key");
                double er = spec.Dimensions.TryGetValue("er", out double e) ? e : 1;
                double tand = spec.Dimensions.TryGetValue("tand", out double td) ? td : 0;
                var loss = SegmentLoss.FromGeometry(p, er, tand)
                    ?? throw m.Error(lossNode, m.Join("loss"), "the geometry has neither a conductor thickness nor a tand, so there is no loss to make frequency-dependent");
                return new Segment(length, loss.SkinCorner is null ? 0 : p.RDc, p.L, 0, p.C) { Derived = p, Loss = loss };
            }
            if (mode != "constant")
                throw m.Error(lossNode, m.Join("loss"), "beside a geometry, expected 'frequency' (skin effect and wideband dielectric from the cross-section) or 'constant'");
        }
        double at = p.FrequencyHz ?? (rise > 0 ? 0.35 / rise : 0);
        double rDerived = p.FrequencyHz is { } f ? p.ResistanceAt(f) : p.RDc;
        return new Segment(length, r ?? rDerived, p.L, g ?? p.ConductanceAt(at), p.C) { Derived = p };
    }

    /// <summary>The segment's <c>mode</c> for a coupled-pair geometry (default differential); null for a single line.</summary>
    static PairMode? ReadPairMode(YamlMap m, CrossSectionSpec spec)
    {
        bool pair = CrossSectionCatalog.Find(spec.Kind, spec.Context).Pair;
        if (m.Node("mode") is not { } node) return pair ? PairMode.Differential : null;
        if (!pair)
            throw m.Error(node, m.Join("mode"), $"'{spec.Kind}' is a single line; only the coupled kinds ({string.Join(", ", CrossSectionCatalog.Kinds.Where(k => k.Pair).Select(k => k.Name))}) take a mode");
        return (node as YamlScalarNode)?.Value switch
        {
            "differential" => PairMode.Differential,
            "common" => PairMode.Common,
            _ => throw m.Error(node, m.Join("mode"), "expected 'differential' (Z0 = 2 Z0 odd, odd-mode delay; the default) or 'common' (Z0 = Z0 even/2, even-mode delay)"),
        };
    }
}
