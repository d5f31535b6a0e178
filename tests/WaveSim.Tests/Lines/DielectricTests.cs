using WaveSim.Core.Lines;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Lines;

/// <summary>Dielectric loss (Pozar) and the wideband dielectric model (Djordjevic et al., IEEE Trans. EMC 43(4), 2001), as restated in ReferenceData/published-checks.md §5.</summary>
public class DielectricTests
{
    [Fact]
    public void D1_fifty_ohm_stripline_dielectric_loss()
    {
        // D1: 50 ohm stripline, er = 4.0, tan d = 0.02, 1 GHz: C = 133.43 pF/m, G = 16.77 mS/m,
        // alpha_d = 0.4192 Np/m = 3.641 dB/m = 0.0925 dB/in (rule of thumb: 0.092).
        var spec = new CrossSectionSpec("stripline", new Dictionary<string, double> { ["spacing"] = 1e-3, ["er"] = 4.0, ["tand"] = 0.02 });
        var p = CrossSection.Solve(spec, "width", 50, 1e9).Line;
        Close.Check(133.43e-12, p.C, 1e-4, 14, "C");
        Close.Check(16.77e-3, p.G, 1e-4, 5, "G");
        double alpha = p.G * p.Z0 / 2;
        Close.Check(0.4192, alpha, 1e-4, 4, "alpha_d Np/m");
        Close.Check(3.641, alpha * 20 / Math.Log(10), 1e-4, 3, "dB/m");
        Close.Check(0.0925, alpha * 20 / Math.Log(10) * 0.0254, 1e-4, 4, "dB/in");
        // Homogeneous TEM line: alpha_d = pi f sqrt(er) tan d / c (Pozar).
        Close.Rel(Math.PI * 1e9 * 2 * 0.02 / LineConstants.SpeedOfLight, alpha, 1e-9, "Pozar alpha_d");
        // Rule of thumb (Bogatin, Signal and Power Integrity - Simplified, 2009; common practice):
        // alpha_d [dB/in] ~ 2.3 f[GHz] tan d sqrt(er) = 0.092.
        Close.Rel(2.3 * 1 * 0.02 * 2, alpha * 20 / Math.Log(10) * 0.0254, 0.01, "rule of thumb");
    }

    [Fact]
    public void D2_Djordjevic_Sarkar_fit_parameters()
    {
        // D2 (derived; m1 = 4, m2 = 12 chosen here, not from the paper). Fit to eps' = 4.3, tan d = 0.02 at 1 GHz,
        // tol 1e-4: d_eps = 1.01257, eps_inf = 4.02131, static 5.0339.
        var m = DjordjevicSarkar.Fit(4.3, 0.02, 1e9);
        Close.Check(1.01257, m.DeltaEps, 1e-4, 5, "d_eps");
        Close.Check(4.02131, m.EpsInfinity, 1e-4, 5, "eps_inf");
        Close.Check(5.0339, m.StaticPermittivity, 1e-4, 4, "static");
        // The fit point is reproduced.
        Close.Rel(4.3, m.Permittivity(1e9).Real, 1e-12);
        Close.Rel(0.02, m.LossTangent(1e9), 1e-12);
    }

    [Theory]
    // D2 table: f -> eps', tan d: 1 MHz 4.6797, 0.01843; 100 MHz 4.4266, 0.01950; 10 GHz 4.1735, 0.01986.
    [InlineData(1e6, 4.6797, 0.01843)]
    [InlineData(100e6, 4.4266, 0.01950)]
    [InlineData(10e9, 4.1735, 0.01986)]
    public void D2_Djordjevic_Sarkar_table(double f, double epsReal, double tanD)
    {
        var m = DjordjevicSarkar.Fit(4.3, 0.02, 1e9);
        Close.Check(epsReal, m.Permittivity(f).Real, 1e-4, 4, "eps'");
        Close.Check(tanD, m.LossTangent(f), 1e-4, 5, "tan d");
    }

    [Fact]
    public void Djordjevic_Sarkar_limits_and_mid_band_slope()
    {
        // Limits: eps_inf + d_eps below omega1, eps_inf above omega2. Mid-band: eps'' ~ 0.682 d_eps/(m2 - m1);
        // eps' falls d_eps/(m2 - m1) per decade.
        var m = DjordjevicSarkar.Fit(4.3, 0.02, 1e9);
        Close.Rel(m.StaticPermittivity, m.Permittivity(1e-3).Real, 1e-6, "low limit");
        Close.Rel(m.EpsInfinity, m.Permittivity(1e17).Real, 1e-6, "high limit");
        double perDecade = m.DeltaEps / 8;
        Close.Rel(0.682 * perDecade, -m.Permittivity(1e7).Imaginary, 2e-3, "mid-band eps''");
        Close.Rel(perDecade, m.Permittivity(1e7).Real - m.Permittivity(1e8).Real, 1e-3, "slope");
    }
}
