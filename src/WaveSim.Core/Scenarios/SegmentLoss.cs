using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using WaveSim.Core.Units;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Reads a segment's frequency-dependent loss: <c>loss: { r_dc, skin_at, r_skin, tand, er, at }</c> beside z0/delay or l/c,
/// or <c>loss: frequency</c> beside a geometry (the cross-section's own skin-effect and wideband dielectric models).
/// </summary>
internal static class SegmentLoss
{
    /// <summary>The keys accepted under a segment's <c>loss</c> mapping.</summary>
    public static readonly string[] Keys = ["r_dc", "skin_at", "r_skin", "tand", "er", "at"];

    /// <summary>Default reference frequency of a geometry's er and tan δ when it gives no <c>at</c>, Hz (common practice, no source).</summary>
    public const double DefaultReferenceFrequency = FrequencyLoss.DefaultReferenceFrequency;

    /// <summary>The segment with its <c>loss</c> mapping applied; unchanged when there is none.</summary>
    public static Segment Apply(YamlMap m, Segment seg, bool rGiven, bool gGiven)
    {
        var node = m.Node("loss");
        if (node is null) return seg;
        if (node is not YamlMappingNode)
            throw m.Error(node, m.Join("loss"), "expected a mapping such as { r_dc: 5 ohm/m, skin_at: 1 GHz, r_skin: 40 ohm/m, tand: 0.02, er: 4.3, at: 1 GHz } ('loss: frequency' is for geometry segments)");
        var l = m.Map("loss", Keys)!;
        string[] skin = ["r_dc", "skin_at", "r_skin"], diel = ["tand", "er", "at"];
        bool hasSkin = skin.Any(l.Has), hasDiel = diel.Any(l.Has);
        if (!hasSkin && !hasDiel) throw l.Error("give the conductor part (r_dc, skin_at, r_skin), the dielectric part (tand, er, at), or both");
        if (hasSkin)
        {
            foreach (string k in skin)
                if (!l.Has(k)) throw l.Error($"missing '{l.Join(k)}': the conductor part needs all of r_dc, skin_at and r_skin");
            if (rGiven) throw m.Error(m.Node("r")!, m.Join("r"), "give the resistance either as 'r' or in 'loss' (r_dc, r_skin), not both");
        }
        if (hasDiel)
        {
            foreach (string k in diel)
                if (!l.Has(k)) throw l.Error($"missing '{l.Join(k)}': the dielectric part needs all of tand, er and at");
            if (gGiven) throw m.Error(m.Node("g")!, m.Join("g"), "give the dielectric loss either as 'g' or in 'loss' (tand, er, at), not both");
        }
        var inputs = new Dictionary<string, double>();
        foreach (string k in Keys)
            if (l.Has(k)) inputs[k] = (k == "tand" ? l.NonNegative(k) : l.Positive(k))!.Value;
        return WithLoss(seg, inputs, (k, why) => l.Error(l.Node(k) ?? l.Node(Keys.First(l.Has))!, l.Join(k), why));
    }

    /// <summary>The segment with one value of its <c>loss</c> mapping replaced and the loss model fitted again; errors start with <paramref name="path"/>.</summary>
    public static Segment Rebuild(Segment seg, KeyPath path, string key, double value)
    {
        var inputs = new Dictionary<string, double>(seg.Loss!.Inputs) { [key] = value };
        return WithLoss(seg, inputs, (_, why) => new InputException($"{path}: {why}"));
    }

    /// <summary>
    /// The segment with the loss model of <paramref name="inputs"/> (the <c>loss</c> mapping's values, SI): R becomes r_dc with a
    /// conductor part, G becomes 0 with a dielectric part; otherwise the segment's constant R and G stay.
    /// </summary>
    static Segment WithLoss(Segment seg, IReadOnlyDictionary<string, double> inputs, Func<string, string, Exception> fail)
    {
        string[] skin = ["r_dc", "skin_at", "r_skin"], diel = ["tand", "er", "at"];
        var loss = new FrequencyLoss { Inputs = inputs };
        double r = seg.R, g = seg.G;
        if (skin.Any(inputs.ContainsKey))
        {
            foreach (string k in skin)
                if (!inputs.ContainsKey(k)) throw fail(k, $"missing 'loss.{k}': the conductor part needs all of r_dc, skin_at and r_skin");
            double rdc = inputs["r_dc"], f = inputs["skin_at"], rs = inputs["r_skin"];
            if (!(rs > rdc * (1 + 1e-9)))
                throw fail("r_skin", $"must be greater than r_dc ({Quantity.Format(rdc, "Ω")}/m): the skin effect raises the resistance");
            loss = loss with { RDc = rdc, SkinCorner = FrequencyLoss.CornerFromResistance(rdc, rs, f) };
            r = rdc;
        }
        if (diel.Any(inputs.ContainsKey))
        {
            foreach (string k in diel)
                if (!inputs.ContainsKey(k)) throw fail(k, $"missing 'loss.{k}': the dielectric part needs all of tand, er and at");
            double tand = inputs["tand"], er = inputs["er"], at = inputs["at"];
            if (er < 1) throw fail("er", ScenarioRules.AtLeastOne(er));
            if (tand >= 1) throw fail("tand", $"must be below 1 (got {tand.ToString(System.Globalization.CultureInfo.InvariantCulture)})");
            loss = loss with { Dielectric = DjordjevicSarkar.Fit(er, tand, at), ReferencePermittivity = er, Filling = 1 };
            g = 0;
        }
        return seg with { R = r, G = g, Loss = loss };
    }

    /// <summary>The frequency-dependent loss of a cross-section (its skin-effect corner and a wideband dielectric); null when it has neither.</summary>
    /// <param name="p">The cross-section's parameters.</param>
    /// <param name="er">The substrate's er.</param>
    /// <param name="tand">The substrate's tan δ.</param>
    public static FrequencyLoss? FromGeometry(LineParameters p, double er, double tand)
    {
        bool skin = p.RDc > 0 && p.SkinFactor > 0, diel = tand > 0;
        if (!skin && !diel) return null;
        var loss = new FrequencyLoss();
        if (skin) loss = loss with { RDc = p.RDc, SkinCorner = SkinEffect.CornerFromGeometry(p) };
        if (diel) loss = loss with { Dielectric = DielectricFromGeometry(p, er, tand).Dielectric, ReferencePermittivity = er, Filling = Filling(p, er, tand) };
        return loss;
    }

    /// <summary>
    /// The wideband dielectric alone of a cross-section with a loss tangent: the Djordjevic-Sarkar model fitted to er and tan δ at
    /// the geometry's <c>at</c> (1 GHz without it), no conductor model. G(0) = 0, and at the reference frequency the loss is
    /// G = ωC·tan δ_eff exactly.
    /// </summary>
    /// <param name="p">The cross-section's parameters.</param>
    /// <param name="er">The substrate's er.</param>
    /// <param name="tand">The substrate's tan δ, &gt; 0.</param>
    public static FrequencyLoss DielectricFromGeometry(LineParameters p, double er, double tand) => new()
    {
        Dielectric = DjordjevicSarkar.Fit(er, tand, p.FrequencyHz ?? DefaultReferenceFrequency),
        ReferencePermittivity = er, Filling = Filling(p, er, tand),
    };

    /// <summary>The filling factor q from the cross-section's own effective loss tangent, tan δ_eff = tan δ·er·q/ε_eff.</summary>
    static double Filling(LineParameters p, double er, double tand) => Math.Min(1, p.LossTangent * p.EpsEff / (tand * er));
}
