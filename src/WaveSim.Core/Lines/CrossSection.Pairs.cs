using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

public static partial class CrossSection
{
    /// <summary>
    /// Analyses an edge-coupled pair (<see cref="CoupledMicrostrip"/>, <see cref="CoupledStripline"/>): each strip in the
    /// even and odd mode, with Zdiff, Zcomm and the coupling coefficient. <see cref="Compute"/> on a pair kind returns
    /// this result's <see cref="CoupledLineParameters.Differential"/> line, so synthesis on a pair targets Zdiff.
    /// </summary>
    /// <param name="spec">A pair kind and its SI values.</param>
    /// <param name="frequencyHz">Frequency for R_ac and G, Hz; null uses the spec's "at" value, or DC only without it.</param>
    /// <exception cref="InputException">Not a pair kind, an unknown or missing key, or an impossible value (named in the message).</exception>
    /// <exception cref="NumericalException">The formula broke down for extreme (but valid) values.</exception>
    public static CoupledLineParameters ComputePair(CrossSectionSpec spec, double? frequencyHz = null)
    {
        return Guarded(spec, () => ComputePairChecked(spec, frequencyHz));
    }

    static CoupledLineParameters ComputePairChecked(CrossSectionSpec spec, double? frequencyHz)
    {
        var r = new SpecReader(spec);
        if (!r.Kind.Pair)
            throw new InputException($"{spec.Context}: {r.Kind.Name} is a single line, not a coupled pair; pair kinds: {string.Join(", ", CrossSectionCatalog.Kinds.Where(k => k.Pair).Select(k => k.Name))}");
        double rho = r.Optional("resistivity", LineConstants.AnnealedCopperResistivity);
        double tand = r.Optional("tand", 0);
        double? f = frequencyHz ?? r.OptionalOrNull("at");
        if (f is double ff && !(ff > 0 && double.IsFinite(ff)))
            throw new InputException($"{spec.Context}: the frequency must be > 0 Hz (got {ff.ToString(CultureInfo.InvariantCulture)} Hz)");
        Func<string, string> label = spec.Label;
        var warnings = new List<string>();
        double w = r.Required("width"), s = r.Required("gap"), t = r.Optional("thickness", 0), er = r.Required("er");
        CoupledModes modes;
        double skin, tandEven, tandOdd, extent;
        if (r.Kind.Name == CrossSectionCatalog.CoupledMicrostrip)
        {
            double h = r.Required("height");
            modes = CoupledMicrostrip.Analyse(w, s, h, er);
            warnings.AddRange(CoupledMicrostrip.RangeWarnings(w, s, h, t, er, label));
            skin = t > 0 ? 1 / w : 0;
            tandEven = CoupledMicrostrip.EffectiveLossTangent(modes.Even.EpsEff, er, tand);
            tandOdd = CoupledMicrostrip.EffectiveLossTangent(modes.Odd.EpsEff, er, tand);
            extent = Math.Max(2 * w + s, h);
        }
        else
        {
            double b = r.Required("spacing");
            if (t >= b)
                throw r.Error("thickness", $"must be less than {label("spacing")} ({r.Text("spacing")})");
            modes = CoupledStripline.Analyse(w, s, b, t, er);
            warnings.AddRange(CoupledStripline.RangeWarnings(w, b, t, label));
            skin = Stripline.SkinResistanceFactor(w, b, t, er, Stripline.Centred(w, b, t, er));
            tandEven = tandOdd = tand;
            extent = Math.Max(2 * w + s, b);
        }

        if (skin == 0)
            warnings.Add($"{label("thickness")} is 0 or not given: the strips are treated as perfect conductors (R = 0)");
        double eeMax = Math.Max(modes.Even.EpsEff, modes.Odd.EpsEff);
        if (f is double fq && extent > LineConstants.SpeedOfLight / (fq * Math.Sqrt(eeMax)) / 10)
            warnings.Add($"at {Quantity.Format(fq, "Hz")} the cross-section ({Quantity.Format(extent, "m")}) exceeds a tenth of the wavelength; the quasi-static formula loses accuracy (common practice, no source)");
        foreach (QuasiTemResult q in new[] { modes.Even, modes.Odd })
            if (!double.IsFinite(q.Z0) || !(q.Z0 > 0) || !double.IsFinite(q.EpsEff) || !(q.EpsEff >= 1 - 1e-9))
                throw new NumericalException($"{spec.Context}: the {r.Kind.Name} formula gave no finite impedance for these dimensions");

        LineParameters Mode(QuasiTemResult q, double lossTangent) => new()
        {
            Kind = r.Kind.Name, Z0 = q.Z0, EpsEff = q.EpsEff, RDc = t > 0 ? rho / (w * t) : 0, Resistivity = rho, SkinFactor = skin,
            LossTangent = lossTangent, FrequencyHz = f, Warnings = warnings,
        };
        return new CoupledLineParameters { Even = Mode(modes.Even, tandEven), Odd = Mode(modes.Odd, tandOdd) };
    }
}
