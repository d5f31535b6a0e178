using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>Microstrip checks against Pozar Sec. 3.8, Hammerstad and Jensen 1980, Wheeler 1977 and IPC-2141A, as restated in ReferenceData/published-checks.md §1.</summary>
public class MicrostripTests
{
    const double Mm = 1e-3;

    /// <summary>Pozar, Microwave Engineering, 4th ed. 2012, Sec. 3.8 (about 1 %): analysis formulas, as an independent reference.</summary>
    static (double Z0, double Ee) Pozar(double u, double er)
    {
        double ee = (er + 1) / 2 + (er - 1) / 2 / Math.Sqrt(1 + 12 / u);
        double z0 = u <= 1 ? 60 / Math.Sqrt(ee) * Math.Log(8 / u + u / 4)
                           : 120 * Math.PI / (Math.Sqrt(ee) * (u + 1.393 + 0.667 * Math.Log(u + 1.444)));
        return (z0, ee);
    }

    /// <summary>IPC-2141A (2004): Z0 = 87/sqrt(er+1.41) ln(5.98h/(0.8w+t)).</summary>
    static double Ipc(double w, double h, double t, double er) => 87 / Math.Sqrt(er + 1.41) * Math.Log(5.98 * h / (0.8 * w + t));

    [Fact]
    public void M1_Pozar_design_example_is_matched_by_Hammerstad_Jensen()
    {
        // M1: Pozar worked example "microstrip line design" (Example 3.7 in the 4th ed., number from memory):
        // er = 2.20, d = 1.27 mm, 50 ohm, 90 deg at 2.5 GHz.
        // Hammerstad-Jensen at u = 3.081: 50.02 ohm, ee = 1.881.
        var at3081 = Microstrip.Analyse(3.081 * 1.27 * Mm, 1.27 * Mm, 0, 2.20);
        Close.Check(50.02, at3081.Z0, 1e-4, 2, "HJ Z0 at u = 3.081");
        Close.Check(1.881, at3081.EpsEff, 1e-4, 3, "HJ ee at u = 3.081");

        // Book answer (from memory): W/d = 3.081, W = 3.91 mm, ee = 1.87, length 21.9 mm. Recomputed: W/d = 3.0812,
        // ee = 1.8712, length 21.92 mm. Tolerance 0.2 % on W/d; the ee and length come from Pozar's own formula,
        // which agrees with Hammerstad-Jensen to 0.6 % ("pair consistent to 0.6 %").
        var spec = new CrossSectionSpec("microstrip", new Dictionary<string, double> { ["height"] = 1.27 * Mm, ["er"] = 2.20 });
        SynthesisResult s = CrossSection.Solve(spec, "width", 50);
        Close.Rel(3.081, s.Value / (1.27 * Mm), 2e-3, "W/d");
        Close.Rel(3.91e-3, s.Value, 2e-3, "W");
        Close.Rel(1.8712, s.Line.EpsEff, 6e-3, "ee");
        double quarterWave = 1 / (4 * 2.5e9 * s.Line.DelayPerLength);
        Close.Rel(21.92e-3, quarterWave, 6e-3, "90 deg length");

        // Pozar's analysis formula at the book's u: 50.28 ohm (pair consistent to 0.6 %).
        Close.Check(50.28, Pozar(3.081, 2.20).Z0, 1e-4, 2, "Pozar formula");
        Close.Rel(Pozar(3.081, 2.20).Z0, at3081.Z0, 6e-3, "HJ vs Pozar");
    }

    [Fact]
    public void M2_air_line_at_u_1_agrees_with_Pozar_and_Wheeler()
    {
        // M2: Air, u = 1: Hammerstad-Jensen Z01 = 126.42 ohm; Wheeler 126.23, Pozar 126.61. Tol 0.5 % between formulas.
        double z01 = Microstrip.AirImpedance(1);
        Close.Check(126.42, z01, 1e-4, 2, "HJ Z01");
        Close.Rel(126.23, z01, 5e-3, "vs Wheeler");
        Close.Rel(126.61, z01, 5e-3, "vs Pozar");
        Close.Rel(Pozar(1, 1).Z0, z01, 5e-3, "vs Pozar formula");
        // er = 1 with the full model gives the air impedance (ee = 1).
        var air = Microstrip.Analyse(1e-3, 1e-3, 0, 1);
        Assert.Equal(1, air.EpsEff, 12);
        Assert.Equal(z01, air.Z0, 9);
    }

    [Fact]
    public void M3_FR4_line_with_thickness()
    {
        // M3 (H, derived): er = 4.4, h = 1.6 mm, w = 3.0 mm, t = 35 um: Hammerstad-Jensen with t 50.17 ohm, ee = 3.301
        // (L = 304.0 nH/m, C = 120.8 pF/m); Wheeler 50.09; IPC 49.39; Pozar (t = 0) 50.82, ee = 3.325.
        // Tolerance 2 % between methods, 3 % vs IPC.
        var p = CrossSection.Compute(new CrossSectionSpec("microstrip", new Dictionary<string, double>
            { ["width"] = 3.0 * Mm, ["height"] = 1.6 * Mm, ["thickness"] = 35e-6, ["er"] = 4.4 }));
        Close.Check(50.17, p.Z0, 1e-4, 2, "Z0");
        Close.Check(3.301, p.EpsEff, 1e-4, 3, "ee");
        Close.Check(304.0e-9, p.L, 1e-4, 10, "L");
        Close.Check(120.8e-12, p.C, 1e-4, 13, "C");
        Close.Rel(50.09, p.Z0, 0.02, "vs Wheeler");
        Close.Rel(50.82, p.Z0, 0.02, "vs Pozar t = 0");
        Close.Rel(3.325, p.EpsEff, 0.02, "ee vs Pozar t = 0");
        var pozar = Pozar(3.0 / 1.6, 4.4);
        Close.Check(50.82, pozar.Z0, 1e-4, 2, "Pozar formula");
        Close.Check(49.39, Ipc(3.0, 1.6, 0.035, 4.4), 1e-4, 2, "IPC formula");
        Close.Rel(Ipc(3.0, 1.6, 0.035, 4.4), p.Z0, 0.03, "vs IPC");
    }

    [Theory]
    // M6 (regression, Hammerstad-Jensen, t = 0, tolerance 1e-4). (er, u) -> Z0, ee.
    [InlineData(2.2, 1, 94.96, 1.7723)]
    [InlineData(4.3, 0.5, 96.40, 2.9901)]
    [InlineData(4.3, 2, 49.19, 3.2755)]
    [InlineData(10, 1, 48.82, 6.7053)]
    public void M6_regression_values(double er, double u, double z0, double ee)
    {
        var r = Microstrip.Analyse(u * Mm, Mm, 0, er);
        Close.Check(z0, r.Z0, 1e-4, 2, "Z0");
        Close.Check(ee, r.EpsEff, 1e-4, 4, "ee");
    }

    [Fact]
    public void M6_er_10_u_1_matches_textbook_chart_ratios()
    {
        // M6: (10, 1) -> ee/er = 0.67, Z0 sqrt(ee) = 126 ohm, as on textbook charts.
        var r = Microstrip.Analyse(Mm, Mm, 0, 10);
        Close.Check(0.67, r.EpsEff / 10, 0, 2, "ee/er");
        Close.Check(126, r.Z0 * Math.Sqrt(r.EpsEff), 0, 0, "Z0 sqrt(ee)");
    }

    [Theory]
    // M5 (derived): 50 ohm width, t = 0, Hammerstad-Jensen: er = 4.3: u = 1.947, ee = 3.268; er = 4.4: u = 1.914, ee = 3.331.
    [InlineData(4.3, 1.947, 3.268)]
    [InlineData(4.4, 1.914, 3.331)]
    public void M5_fifty_ohm_width(double er, double u, double ee)
    {
        var spec = new CrossSectionSpec("microstrip", new Dictionary<string, double> { ["height"] = Mm, ["er"] = er });
        var s = CrossSection.Solve(spec, "width", 50);
        Close.Check(u, s.Value / Mm, 1e-4, 3, "u");
        Close.Check(ee, s.Line.EpsEff, 1e-4, 3, "ee");
    }

    [Fact]
    public void Thickness_widens_the_strip_and_lowers_Z0()
    {
        // Law (Hammerstad and Jensen 1980): the thickness correction adds a positive width du, so Z0 falls with t
        // and t -> 0 recovers the zero-thickness formula.
        double z0 = Microstrip.Analyse(Mm, Mm, 0, 4.4).Z0;
        double zt = Microstrip.Analyse(Mm, Mm, 35e-6, 4.4).Z0;
        double zTiny = Microstrip.Analyse(Mm, Mm, 1e-12, 4.4).Z0;
        Assert.True(zt < z0);
        Close.Rel(z0, zTiny, 1e-6);
    }
}
