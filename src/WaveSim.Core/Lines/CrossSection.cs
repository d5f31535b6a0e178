using System.Globalization;
using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

/// <summary>
/// The cross-section calculator: turns a <see cref="CrossSectionSpec"/> into per-length R, L, G, C with the
/// closed-form formula of its kind (see <see cref="Microstrip"/>, <see cref="Stripline"/>, <see cref="CoaxialLine"/>,
/// <see cref="ParallelWires"/>, <see cref="TwistedPair"/>, and the coupled pairs <see cref="CoupledMicrostrip"/> and
/// <see cref="CoupledStripline"/>), reads specs from text and solves for a target Z0.
/// </summary>
/// <remarks>
/// Loss model: R_dc from the copper cross-section (strip w t, round wire pi d^2/4 each, coax inner conductor);
/// R_ac = max(R_dc, Rs F) with the kind's skin-effect factor F; G = omega C tan d. er and tan d are taken as
/// constant over frequency (use <see cref="Model.DjordjevicSarkar"/> for a wideband dielectric). Every kind also warns when
/// the evaluation frequency makes the cross-section larger than a tenth of the wavelength in the medium
/// (quasi-static limit; common practice, no source), and coax above its TE11 cutoff.
/// </remarks>
public static partial class CrossSection
{
    /// <summary>Analyses the cross-section; a coupled pair gives its differential line (<see cref="ComputePair"/> has both modes).</summary>
    /// <param name="spec">The kind and its SI values.</param>
    /// <param name="frequencyHz">Frequency for R_ac and G, Hz; null uses the spec's "at" value, or DC only without it.</param>
    /// <returns>The per-length parameters and any range warnings.</returns>
    /// <exception cref="InputException">Unknown kind or key, a missing key, or an impossible value (named in the message).</exception>
    /// <exception cref="NumericalException">The formula broke down for extreme (but valid) values.</exception>
    public static LineParameters Compute(CrossSectionSpec spec, double? frequencyHz = null)
    {
        if (CrossSectionCatalog.Find(spec.Kind, spec.Context).Pair) return ComputePair(spec, frequencyHz).Differential;
        return Guarded(spec, () => ComputeChecked(spec, frequencyHz));
    }

    /// <summary>Runs a formula, reporting a math routine's range failure on extreme (but valid) dimensions as a numerical error.</summary>
    static T Guarded<T>(CrossSectionSpec spec, Func<T> compute)
    {
        try
        {
            return compute();
        }
        catch (ArgumentOutOfRangeException ex)
        {
            throw new NumericalException($"{spec.Context}: the {spec.Kind} formula broke down for these dimensions ({ex.Message.ReplaceLineEndings(" ")})");
        }
    }

    static LineParameters ComputeChecked(CrossSectionSpec spec, double? frequencyHz)
    {
        var r = new SpecReader(spec);
        double rho = r.Optional("resistivity", LineConstants.AnnealedCopperResistivity);
        double tand = r.Optional("tand", 0);
        double? f = frequencyHz ?? r.OptionalOrNull("at");
        if (f is double ff && !(ff > 0 && double.IsFinite(ff)))
            throw new InputException($"{spec.Context}: the frequency must be > 0 Hz (got {ff.ToString(CultureInfo.InvariantCulture)} Hz)");
        var warnings = new List<string>();
        Func<string, string> label = spec.Label;
        QuasiTemResult q;
        double rdc, skin, lossTangent, extent;

        switch (r.Kind.Name)
        {
            case CrossSectionCatalog.Microstrip:
            {
                double w = r.Required("width"), h = r.Required("height"), t = r.Optional("thickness", 0), er = r.Required("er");
                q = Microstrip.Analyse(w, h, t, er);
                warnings.AddRange(Microstrip.RangeWarnings(w, h, t, er, label));
                (rdc, skin) = t > 0 ? (rho / (w * t), 1 / w) : (0, 0);
                lossTangent = Microstrip.EffectiveLossTangent(w, h, t, er, tand);
                extent = Math.Max(w, h);
                break;
            }
            case CrossSectionCatalog.Stripline:
            {
                double w = r.Required("width"), b = r.Required("spacing"), t = r.Optional("thickness", 0), er = r.Required("er");
                double off = r.Optional("offset", 0);
                if (t >= b)
                    throw r.Error("thickness", $"must be less than {label("spacing")} ({r.Text("spacing")})");
                if (Math.Abs(off) >= (b - t) / 2)
                    throw r.Error("offset", $"must keep the strip between the planes: |offset| < ({label("spacing")} - {label("thickness")})/2 = {Quantity.Format((b - t) / 2, "m")}");
                q = Stripline.Analyse(w, b, t, er, off);
                warnings.AddRange(Stripline.RangeWarnings(w, b, t, label));
                rdc = t > 0 ? rho / (w * t) : 0;
                skin = Stripline.SkinResistanceFactor(w, b, t, er, Stripline.Centred(w, b, t, er));
                lossTangent = tand;
                extent = Math.Max(w, b);
                break;
            }
            case CrossSectionCatalog.Coax:
            {
                double d = r.Required("inner"), dd = r.Required("outer"), er = r.Required("er");
                if (dd <= d)
                    throw r.Error("outer", $"must be larger than {label("inner")} ({r.Text("inner")})");
                q = CoaxialLine.Analyse(d, dd, er);
                rdc = rho / (Math.PI * d * d / 4);
                skin = CoaxialLine.SkinResistanceFactor(d, dd);
                lossTangent = tand;
                extent = dd;
                if (f is double fc && fc > CoaxialLine.Te11Cutoff(d, dd, er))
                    warnings.Add($"{Quantity.Format(fc, "Hz")} is above the TE11 cutoff {Quantity.Format(CoaxialLine.Te11Cutoff(d, dd, er), "Hz")}; the line is no longer single-mode (Pozar Sec. 3.5, from memory)");
                break;
            }
            case CrossSectionCatalog.Wires:
            case CrossSectionCatalog.Twisted:
            {
                double d = r.Required("diameter"), s = r.Required("spacing"), er = r.Required("er");
                if (s <= d)
                    throw r.Error("spacing", $"must be larger than {label("diameter")} ({r.Text("diameter")}); it is centre to centre");
                rdc = ParallelWires.DcResistance(d, rho);
                skin = ParallelWires.SkinResistanceFactor(d);
                extent = s;
                if (r.Kind.Name == CrossSectionCatalog.Wires)
                {
                    q = ParallelWires.Analyse(d, s, er);
                    warnings.AddRange(ParallelWires.RangeWarnings(d, s, label));
                    lossTangent = tand;
                }
                else
                {
                    double? pitch = r.OptionalOrNull("pitch");
                    q = TwistedPair.Analyse(d, s, er, pitch);
                    warnings.AddRange(TwistedPair.RangeWarnings(d, s, pitch, label));
                    lossTangent = TwistedPair.EffectiveLossTangent(s, er, pitch, tand);
                }
                break;
            }
            default:
                throw new InputException($"{spec.Context}: line kind '{r.Kind.Name}' has no formula");
        }

        if (skin == 0)
            warnings.Add($"{label("thickness")} is 0 or not given: the strip is treated as a perfect conductor (R = 0)");
        if (f is double fq && extent > LineConstants.SpeedOfLight / (fq * Math.Sqrt(q.EpsEff)) / 10)
            warnings.Add($"at {Quantity.Format(fq, "Hz")} the cross-section ({Quantity.Format(extent, "m")}) exceeds a tenth of the wavelength; the quasi-static formula loses accuracy (common practice, no source)");
        if (!double.IsFinite(q.Z0) || !(q.Z0 > 0) || !double.IsFinite(q.EpsEff))
            throw new NumericalException($"{spec.Context}: the {r.Kind.Name} formula gave no finite impedance for these dimensions");

        return new LineParameters
        {
            Kind = r.Kind.Name, Z0 = q.Z0, EpsEff = q.EpsEff, RDc = rdc, Resistivity = rho, SkinFactor = skin,
            LossTangent = lossTangent, FrequencyHz = f, Warnings = warnings,
        };
    }
}
