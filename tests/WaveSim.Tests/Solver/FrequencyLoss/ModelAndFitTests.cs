using System.Numerics;
using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using WaveSim.Tests.Lines;
using LossModel = WaveSim.Core.Model.FrequencyLoss;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>The exact loss functions against published values, and their pole-residue fit against the exact functions.</summary>
public class ModelAndFitTests
{
    static Complex J(double f) => new(0, 2 * Math.PI * f);

    [Fact]
    public void Skin_corner_from_a_trace_reproduces_the_surface_resistance_and_equal_internal_reactance()
    {
        // ReferenceData/published-checks.md §4 (Pozar; CRC Handbook): trace w = 0.2 mm, t = 35 um, rho = 1.678e-8 ohm m (CRC Handbook): Rdc = 2.397 ohm/m,
        // Rs/w = 12.87 (100 MHz), 40.7 (1 GHz), 128.7 (10 GHz) ohm/m, R(4f) = 2R(f). A good conductor's internal reactance equals
        // its internal resistance at high frequency (Pozar, Microwave Engineering, 4th ed. 2012, Sec. 1.7; Paul 2008).
        var p = CrossSection.Compute(new CrossSectionSpec("microstrip", new Dictionary<string, double>
        { ["width"] = 0.2e-3, ["height"] = 0.2e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["resistivity"] = 1.678e-8 }));
        var loss = new LossModel { RDc = p.RDc, SkinCorner = SkinEffect.CornerFromGeometry(p) };
        Complex Zint(double f) => loss.RDc + loss.InternalExcess(J(f));
        Assert.Equal(2.397, Zint(0).Real, 0.001);
        // At 100 MHz (δ = 6.5 um against t = 35 um) the one-corner form lies 0.9 % above the asymptote Rs/w: tolerance 1 %.
        Close.Rel(12.87, Zint(100e6).Real, 0.01, "R at 100 MHz");
        Close.Rel(40.7, Zint(1e9).Real, 0.002, "R at 1 GHz");
        Close.Rel(128.7, Zint(10e9).Real, 0.001, "R at 10 GHz");
        Close.Rel(2 * Zint(2.5e9).Real, Zint(10e9).Real, 0.001, "R(4f) = 2R(f)");
        Close.Rel(Zint(1e9).Real, Zint(1e9).Imaginary, 0.002, "X_int = R_int");
    }

    [Fact]
    public void Skin_corner_from_a_resistance_at_one_frequency_is_exact_there()
    {
        // Derived: Re[R_dc √(1 + jω/ω0)] = r_skin at skin_at by construction (closed-form inverse of Re √(1 + jx)).
        double w0 = LossModel.CornerFromResistance(5, 40, 1e9);
        var loss = new LossModel { RDc = 5, SkinCorner = w0 };
        Assert.Equal(40, (5 + loss.InternalExcess(J(1e9))).Real, 1e-9);
    }

    [Fact]
    public void Dielectric_ratio_follows_Djordjevic_Sarkar_in_the_Laplace_variable()
    {
        // ReferenceData/published-checks.md §5, case D2 (derived from Djordjevic, Biljic, Likar-Smiljanic, Sarkar, IEEE Trans. EMC 43(4), 2001;
        // m1 = 4, m2 = 12): fit to 4.3, tan d 0.02 at 1 GHz gives eps' 4.4266, tan d 0.01950 at 100 MHz; 4.1735, 0.01986 at 10 GHz.
        var loss = new LossModel { Dielectric = DjordjevicSarkar.Fit(4.3, 0.02, 1e9), ReferencePermittivity = 4.3 };
        Complex e100M = 4.3 * loss.PermittivityRatio(J(100e6)), e10G = 4.3 * loss.PermittivityRatio(J(10e9));
        Close.Check(4.4266, e100M.Real, 1e-4, 4, "eps' 100 MHz");
        Close.Check(0.01950, -e100M.Imaginary / e100M.Real, 1e-4, 5, "tan d 100 MHz");
        Close.Check(4.1735, e10G.Real, 1e-4, 4, "eps' 10 GHz");
        Close.Check(0.01986, -e10G.Imaginary / e10G.Real, 1e-4, 5, "tan d 10 GHz");
        // D2: eps_inf = 4.02131, so κ(∞) = 4.02131/4.3.
        Close.Check(4.02131 / 4.3, loss.HighFrequencyRatio, 1e-4, 6, "κ(∞)");
        // At the reference frequency the admittance is jωC0 + ωC0 tan d, as in the constant-G model (G = ωC tan d, Pozar).
        var seg = new Segment(1, 0, 300e-9, 0, 120e-12) { Loss = loss };
        Complex y = seg.ShuntAdmittance(J(1e9));
        Close.Rel(2 * Math.PI * 1e9 * 120e-12, y.Imaginary, 1e-12, "ωC0");
        Close.Rel(2 * Math.PI * 1e9 * 120e-12 * 0.02, y.Real, 1e-12, "ωC0 tan d");
    }

    [Theory]
    [InlineData(1 / 6e-9, 1 / 100e-12, 1e-3, 1e-5, 1e-3)]   // the 50 cm microstrip run: 1/duration to 1/rise, 10 poles
    [InlineData(1 / 110e-9, 1 / 1e-9, 1e-3, 1e-5, 1e-3)]    // the 10 m coax run, 10 poles
    [InlineData(1e6, 1e11, 0.01, 5e-4, 0.03)]              // five decades with the 12-pole cap
    public void Pole_residue_fit_matches_the_exact_functions_over_the_band(double fLow, double fHigh, double tolZ, double tolK, double tolD)
    {
        // The exact functions (√(1 + s/ω0), Djordjevic-Sarkar) against their fixed-pole non-negative least-squares fit
        // (Lawson and Hanson 1974), checked on a grid independent of the fit's own. Tolerances are this project's targets
        // (no source) on Z_int, on the permittivity ratio κ and on its dispersive part κ − κ(∞) alone.
        var p = CrossSection.Compute(new CrossSectionSpec("microstrip", new Dictionary<string, double>
        { ["width"] = 0.3e-3, ["height"] = 0.17e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["tand"] = 0.02 }));
        var loss = new LossModel
        {
            RDc = p.RDc, SkinCorner = SkinEffect.CornerFromGeometry(p), Dielectric = DjordjevicSarkar.Fit(4.3, 0.02, 1e9),
            ReferencePermittivity = 4.3, Filling = p.LossTangent * p.EpsEff / (0.02 * 4.3),
        };
        var fit = RationalLoss.Fit(loss, p.RDc, p.L, 0, p.C, fLow, fHigh);
        Console.WriteLine($"band {fLow:G3}-{fHigh:G3} Hz: Z_int {fit.InternalMaxError:P3}, κ {fit.PermittivityMaxError:P4}, κ−κ∞ {fit.DispersionMaxError:P3}");
        double eZ = 0, eK = 0, eD = 0;
        for (int k = 0; k <= 137; k++)
        {
            double f = fLow * Math.Pow(fHigh / fLow, k / 137.0);
            Complex s = J(f);
            Complex zExact = p.RDc + loss.InternalExcess(s), zFit = fit.SeriesImpedance(s) - s * p.L;
            Complex kExact = loss.PermittivityRatio(s), kFit = fit.ShuntAdmittance(s) / (s * p.C);
            eZ = Math.Max(eZ, (zFit - zExact).Magnitude / zExact.Magnitude);
            eK = Math.Max(eK, (kFit - kExact).Magnitude / kExact.Magnitude);
            eD = Math.Max(eD, (kFit - kExact).Magnitude / (kExact - loss.HighFrequencyRatio).Magnitude);
        }
        Assert.True(eZ < tolZ, $"Z_int error {eZ:P3}");
        Assert.True(eK < tolK, $"κ error {eK:P4}");
        Assert.True(eD < tolD, $"κ − κ∞ error {eD:P3}");
        Assert.True(Math.Abs(eZ - fit.InternalMaxError) < 0.2 * eZ + 1e-6, "the reported figure matches");
        // Passive, causal sections: every residue ≥ 0, and the instantaneous L and C no smaller than the exact model's.
        Assert.All(fit.SeriesResidues, a => Assert.True(a >= 0));
        Assert.All(fit.ShuntResidues, b => Assert.True(b >= 0));
        Assert.All(fit.SeriesPoles.Concat(fit.ShuntPoles), q => Assert.True(q > 0));
        Assert.True(fit.InstantInductance >= p.L);
        Assert.True(fit.InstantCapacitance >= p.C * loss.HighFrequencyRatio);
    }
}
