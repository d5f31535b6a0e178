using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>Coaxial line (Pozar Table 2.1, as restated in ReferenceData/published-checks.md §3) and parallel-wire checks.</summary>
public class CoaxAndWireTests
{
    const double Mm = 1e-3, Inch = 0.0254;

    static LineParameters Coax(double d, double dd, double er) =>
        CrossSection.Compute(new CrossSectionSpec("coax", new Dictionary<string, double> { ["inner"] = d, ["outer"] = dd, ["er"] = er }));

    [Theory]
    // C1 (H formula; dimensions M, from memory): 7 mm precision air line (IEEE Std 287, GPC-7), D = 7.000 mm,
    // d = 3.040 mm: Z0 = 50.01 ohm, L = 166.8 nH/m, C = 66.70 pF/m, v = c; same for 3.50/1.52 mm. Tol 0.05 %.
    [InlineData(3.040, 7.000)]
    [InlineData(1.52, 3.50)]
    public void C1_precision_air_lines(double d, double dd)
    {
        var p = Coax(d * Mm, dd * Mm, 1);
        Close.Rel(50.01, p.Z0, 5e-4, "Z0");
        Close.Rel(166.8e-9, p.L, 5e-4, "L");
        Close.Rel(66.70e-12, p.C, 5e-4, "C");
        Close.Rel(LineConstants.SpeedOfLight, 1 / p.DelayPerLength, 1e-12, "v");
        // Pozar Table 2.1: L = mu0/(2 pi) ln(D/d), C = 2 pi eps0 er/ln(D/d).
        Close.Rel(LineConstants.Mu0 / (2 * Math.PI) * Math.Log(dd / d), p.L, 1e-12, "L formula");
        Close.Rel(2 * Math.PI * LineConstants.Eps0 / Math.Log(dd / d), p.C, 1e-12, "C formula");
    }

    [Fact]
    public void C1_fifty_ohm_air_line_ratio()
    {
        // C1: 50 ohm in air needs D/d = 2.3023. Tol 0.05 %.
        var spec = new CrossSectionSpec("coax", new Dictionary<string, double> { ["inner"] = Mm, ["er"] = 1 });
        Close.Rel(2.3023, CrossSection.Solve(spec, "outer", 50).Value / Mm, 5e-4, "D/d");
    }

    [Theory]
    // C2 (M): RG-58, solid conductor and polyethylene, MIL-C-17 nominal dimensions from common cable tables:
    // d = 0.032 in (0.81 mm), D = 0.116 in (2.95 mm). er = 2.25: Z0 = 51.48 ohm, C = 97.2 pF/m, L = 257.6 nH/m,
    // VF 0.667. er = 2.30: 50.92 ohm, 99.4 pF/m. Tol 0.1 % on the formula, 4 % vs the 50 ohm nominal.
    [InlineData(2.25, 51.48, 97.2e-12)]
    [InlineData(2.30, 50.92, 99.4e-12)]
    public void C2_RG58_nominal(double er, double z0, double c)
    {
        var p = Coax(0.032 * Inch, 0.116 * Inch, er);
        Close.Rel(z0, p.Z0, 1e-3, "Z0");
        Close.Rel(c, p.C, 1e-3, "C");
        Close.Rel(50, p.Z0, 0.04, "vs nominal");
        if (er == 2.25)
        {
            Close.Rel(257.6e-9, p.L, 1e-3, "L");
            Close.Rel(0.667, 1 / (p.DelayPerLength * LineConstants.SpeedOfLight), 1e-3, "VF");
        }
    }

    [Fact]
    public void Coax_skin_resistance_follows_Pozar_Table_2_1()
    {
        // Pozar Table 2.1: R = Rs/(2 pi) (1/a + 1/b).
        var p = CrossSection.Compute(new CrossSectionSpec("coax", new Dictionary<string, double>
            { ["inner"] = 1 * Mm, ["outer"] = 3.5 * Mm, ["er"] = 2.25 }), 1e9);
        double rs = SkinEffect.SurfaceResistance(1e9, LineConstants.AnnealedCopperResistivity);
        Close.Rel(rs / (2 * Math.PI) * (1 / 0.5e-3 + 1 / 1.75e-3), p.RAc, 1e-12);
    }

    [Fact]
    public void Parallel_wires_follow_the_acosh_formula()
    {
        // Pozar, Microwave Engineering, 4th ed., Table 2.1, two-wire line (from memory): L = mu/pi acosh(D/2a),
        // C = pi eps/acosh(D/2a), so Z0 = eta0/(pi sqrt(er)) acosh(s/d).
        var p = CrossSection.Compute(new CrossSectionSpec("wires", new Dictionary<string, double>
            { ["diameter"] = 1 * Mm, ["spacing"] = 4 * Mm, ["er"] = 1 }));
        Close.Rel(LineConstants.Mu0 / Math.PI * Math.Acosh(4), p.L, 1e-12, "L");
        Close.Rel(Math.PI * LineConstants.Eps0 / Math.Acosh(4), p.C, 1e-12, "C");
        // Far apart, acosh(x) -> ln(2x): Z0 -> 120 ln(2 s/d) (common practice, no source; limit of the same formula).
        Close.Rel(LineConstants.Eta0 / Math.PI * Math.Log(2 * 1000), ParallelWires.Impedance(1, 1000, 1), 1e-6);
    }

    [Fact]
    public void Twisted_pair_untwisted_is_wires_in_a_quarter_filled_dielectric()
    {
        // Lefferson 1971 (from memory): q = 0.25 + 0.0004 theta^2, ee = 1 + q (er - 1). Untwisted: q = 0.25.
        var tp = TwistedPair.Analyse(0.5 * Mm, 0.9 * Mm, 3.0, null);
        Close.Rel(1 + 0.25 * 2.0, tp.EpsEff, 1e-12);
        Close.Rel(ParallelWires.Impedance(0.5 * Mm, 0.9 * Mm, 1.5), tp.Z0, 1e-12);
        // A tighter twist fills more of the field with insulation: ee rises, Z0 falls.
        var tight = TwistedPair.Analyse(0.5 * Mm, 0.9 * Mm, 3.0, 10 * Mm);
        Assert.True(tight.EpsEff > tp.EpsEff && tight.Z0 < tp.Z0);
    }
}
