using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// A segment given by its cross-section (<c>geometry: { kind: microstrip, width: 8 mil, … }</c>): L and C from the
/// closed-form formulas of <see cref="CrossSection"/>, R as a constant and the dielectric loss as a causal wideband model.
/// </summary>
/// <remarks>
/// R is the DC resistance of the copper unless <c>at</c> is given, in which case it is the skin-effect resistance at that
/// frequency (a constant-R model must choose one; DC keeps the settled levels right). A <c>tand</c> is carried by the
/// Djordjevic-Sarkar wideband dielectric (Djordjevic, Biljic, Likar-Smiljanic and Sarkar, IEEE Trans. EMC 43(4), 2001),
/// fitted to er and tan δ at <c>at</c> (1 GHz without it): its loss is G = ωC·tan δ at that frequency and it conducts
/// nothing at DC (G(0) = 0), as a loss tangent must. A constant G (which would leak at DC) is used only when the user writes
/// <c>g</c>; an explicit <c>r</c> or <c>g</c> beside the geometry overrides the derived value.
/// With <c>loss: frequency</c> the segment also carries the cross-section's skin effect
/// (<see cref="FrequencyLoss"/>: R_dc·√(1 + s/ω0)); <c>loss: constant</c> (the default) keeps the constant R.
/// A coupled pair (<c>kind: coupled-microstrip</c> or <c>coupled-stripline</c>) stands as one line in the mode given by
/// <c>mode</c>: <c>differential</c> (the default; Z0 = Zdiff = 2 Z0o, odd-mode eps_eff, R of both strips in series) or
/// <c>common</c> (Z0 = Zcomm = Z0e/2, even-mode eps_eff, the strips in parallel); see <see cref="CoupledLineParameters"/>.
/// </remarks>
internal static class SegmentGeometry
{
    /// <summary>
    /// The <c>geometry</c> mapping of <paramref name="m"/> as key → text, and the "file:line:column: key" prefix its errors
    /// carry; <paramref name="example"/> is shown when it is not a mapping of single values.
    /// </summary>
    public static (Dictionary<string, string> Raw, string Context) Raw(YamlMap m, string example)
    {
        var node = m.Node("geometry")!;
        if (node is not YamlMappingNode map) throw m.Error(node, m.Join("geometry"), "expected a mapping such as " + example);
        var raw = new Dictionary<string, string>();
        foreach (var (k, v) in map.Children)
        {
            string key = ((YamlScalarNode)k).Value ?? "";
            if (v is not YamlScalarNode sv) throw m.Error(v, m.Join("geometry." + key), "expected a single value");
            raw[key] = sv.Value ?? "";
        }
        return (raw, $"{m.File}:{node.Start.Line}:{node.Start.Column}: {m.Join("geometry")}");
    }

    public static Segment Read(YamlMap m, double length, double? r, double? g)
    {
        foreach (string k in new[] { "z0", "delay", "velocity", "eps_eff", "l", "c" })
            if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "a segment given by geometry takes its impedance and delay from it: remove this key");
        var (raw, context) = Raw(m, "{ kind: microstrip, width: 8 mil, height: 5 mil, er: 4.2 }");
        var spec = CrossSection.FromDictionary(raw, context);
        var pairMode = ReadPairMode(m, spec);
        bool frequency = false;
        if (m.Node("loss") is { } lossNode)
        {
            string? mode = (lossNode as YamlScalarNode)?.Value;
            if (mode == "frequency")
            {
                foreach (string k in new[] { "r", "g" })
                    if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "with 'loss: frequency' the resistance and conductance come from the geometry: remove this key");
                frequency = true;
            }
            else if (mode != "constant")
                throw m.Error(lossNode, m.Join("loss"), "beside a geometry, expected 'frequency' (skin effect and wideband dielectric from the cross-section) or 'constant'");
        }
        return Build(length, spec, pairMode, frequency, r, g,
            why => m.Error(m.Node("geometry")!, m.Join("geometry"), why), why => m.Error(m.Node("loss")!, m.Join("loss"), why));
    }

    /// <summary>
    /// The geometry segment <paramref name="seg"/> with one of its inputs replaced (<c>geometry.width</c>, or its explicit
    /// <c>r</c> or <c>g</c>) and everything derived again, as the loader derives it; errors start with <paramref name="path"/>.
    /// </summary>
    public static Segment Rebuild(Segment seg, KeyPath path, string key, double value)
    {
        var origin = seg.Derived!;
        var inputs = new Dictionary<string, double>(origin.Inputs, StringComparer.OrdinalIgnoreCase);
        double? r = origin.R, g = origin.G;
        if (key == "r") r = value;
        else if (key == "g") g = value;
        else inputs[key] = value;
        var spec = new CrossSectionSpec(origin.Kind, inputs) { Context = path.Text };
        PairMode? mode = origin.Mode switch { "differential" => PairMode.Differential, "common" => PairMode.Common, _ => null };
        return Build(seg.Length, spec, mode, origin.FrequencyLoss, r, g,
            why => new InputException($"{path}: {why}"), why => new InputException($"{path}: {why}"));
    }

    /// <summary>The dimension of a geometry input of this segment's kind; null when the kind has no such key.</summary>
    public static Units.Dimension? InputDimension(Segment seg, string key) =>
        CrossSectionCatalog.Find(seg.Derived!.Kind, "geometry").AllKeys.FirstOrDefault(k => string.Equals(k.Name, key, StringComparison.OrdinalIgnoreCase))?.Dimension;

    /// <summary>The keys a geometry of this segment's kind accepts.</summary>
    public static IEnumerable<string> InputKeys(Segment seg) => CrossSectionCatalog.Find(seg.Derived!.Kind, "geometry").AllKeys.Select(k => k.Name);

    static Segment Build(double length, CrossSectionSpec spec, PairMode? pairMode, bool frequency, double? r, double? g,
        Func<string, Exception> geometryError, Func<string, Exception> lossError)
    {
        var p = pairMode is PairMode mode ? CrossSection.ComputePair(spec).For(mode) : CrossSection.Compute(spec);
        // Each dimension may lie in its range while their ratios are absurd (a 100 km wide strip 1 nm above its plane):
        // the L and C the formulas give must lie in the ranges a scenario could write directly.
        Derived(geometryError, p.L, Units.Dimension.InductancePerLength, "L");
        Derived(geometryError, p.C, Units.Dimension.CapacitancePerLength, "C");
        var origin = Figures(p, spec, pairMode, frequency, r, g);
        if (frequency)
        {
            double er = spec.Dimensions.TryGetValue("er", out double e) ? e : 1;
            double tand = spec.Dimensions.TryGetValue("tand", out double td) ? td : 0;
            var loss = SegmentLoss.FromGeometry(p, er, tand)
                ?? throw lossError("the geometry has neither a conductor thickness nor a tand, so there is no loss to make frequency-dependent");
            return new Segment(length, loss.SkinCorner is null ? 0 : p.RDc, p.L, 0, p.C) { Derived = origin, Loss = loss };
        }
        double rDerived = p.FrequencyHz is { } f ? p.ResistanceAt(f) : p.RDc;
        var seg = new Segment(length, r ?? rDerived, p.L, g ?? 0, p.C) { Derived = origin };
        if (g is null && spec.Dimensions.TryGetValue("tand", out double tanD) && tanD > 0)
            seg = seg with { Loss = SegmentLoss.DielectricFromGeometry(p, spec.Dimensions.TryGetValue("er", out double er1) ? er1 : 1, tanD) };
        return seg;
    }

    /// <summary>What a segment keeps of its cross-section: the figures shown and warned about, as plain numbers.</summary>
    static GeometryFigures Figures(LineParameters p, CrossSectionSpec spec, PairMode? mode, bool frequency, double? r, double? g) =>
        new(p.Kind, p.Z0, p.EpsEff, p.FrequencyHz, p.Warnings)
        {
            Inputs = spec.Dimensions, FrequencyLoss = frequency, R = r, G = g,
            Mode = mode switch { PairMode.Differential => "differential", PairMode.Common => "common", _ => null },
        };

    static void Derived(Func<string, Exception> error, double value, Units.Dimension dim, string name)
    {
        if (value > 0 && double.IsFinite(value) && Units.Quantity.InRange(value, dim)) return;
        string text = $"{name} = {value.ToString("G4", System.Globalization.CultureInfo.InvariantCulture)} {dim.SiUnit}";
        throw error($"the cross-section's dimensions give {text}, outside the range accepted for {dim.Describe()} "
            + $"({Units.Quantity.RangeText(dim)}); check its dimensions and units");
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
