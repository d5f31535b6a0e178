using System.Numerics;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>
/// A geometry segment with a tand carries a dielectric loss that conducts nothing at DC: the Djordjevic-Sarkar wideband model
/// (Djordjevic, Biljic, Likar-Smiljanic and Sarkar, IEEE Trans. EMC 43(4), 2001), fitted so that at its reference frequency the
/// loss is G = ωC·tan δ (ReferenceData/published-checks.md §5). A constant G is used only when the user writes <c>g</c>.
/// </summary>
public class GeometryDielectricTests
{
    /// <summary>A 150 mm FR-4 microstrip with a loss tangent behind a 25 ohm driver; the load is filled in per test.</summary>
    static string Net(string load, string source = "waveform: step, high: 3.3 V, rise: 200 ps", string extra = "") => $@"
source: {{ {source}, resistance: 25 ohm }}
line:
  - segment:
      length: 150 mm
      geometry: {{ kind: microstrip, width: 0.3 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02 }}{extra}
load: {load}
probes:
  - {{ name: drv, at: source }}
  - {{ name: rx, at: load }}
simulation: {{ duration: 4 ns, resolution: 10 }}
";

    /// <summary>The copper's DC resistance per length, ρ/(w·t), annealed copper 1.7241e-8 ohm·m (ReferenceData/published-checks.md §4, IACS).</summary>
    const double RdcPerMetre = 1.7241e-8 / (0.3e-3 * 35e-6);

    [Fact]
    public void The_DC_level_is_the_resistive_divider_value_and_a_capacitive_load_draws_no_static_current()
    {
        // The driver rests at 3.3 V for the whole record (its only edge comes after the end), so every sample is the network's DC
        // operating point. Ohm's law for the series path 25 ohm + R_dc·l + 1 kohm (no dielectric conduction at DC):
        // V_load = 3.3·1000/(25 + R_dc·0.15 + 1000). Before the fix the constant G = ωC·tan δ at 0.35/t_r leaked to ground.
        const string held = "waveform: step, low: 3.3 V, high: 0 V, rise: 200 ps, delay: 10 ns";
        var r = TestScenarios.Run(Net("{ r: 1 kohm }", held));
        double expected = 3.3 * 1000 / (25 + RdcPerMetre * 0.15 + 1000);
        Assert.Equal(1, r.Probe("rx").Volts[0] / expected, 1e-9);
        Assert.Equal(1, r.Probe("rx").Volts[^1] / expected, 1e-9);

        // A capacitor at the end: no DC path at all, so the whole net sits at 3.3 V and the driver carries no current
        // (before the fix the line's constant G, 22.8 mS/m × 0.15 m = 3.4 mS, drew about 3.3 V/(25 ohm + 293 ohm) = 10 mA and held the
        // net at 3.04 V).
        var c = TestScenarios.Run(Net("{ c: 5 pF }", held));
        Assert.Equal(1, c.Probe("rx").Volts[0] / 3.3, 1e-9);
        Assert.True(Math.Abs(c.Probe("drv").Amps[0]) < 1e-12, $"static driver current {c.Probe("drv").Amps[0]} A");
    }

    [Fact]
    public void A_series_resistor_into_a_capacitor_draws_no_static_power()
    {
        // Ohm's law at DC with capacitors open: no current flows into a capacitive load, so a series resistor dissipates nothing
        // (the terminations table's rule; before the fix the line's constant G made it about 2.3 mW).
        var study = TerminationStudy.Run(TestScenarios.Parse(Net("{ c: 5 pF }")));
        var series = study.Outcomes.Single(o => o.Design.Kind == TerminationKind.Series);
        Assert.Equal(0, series.PowerHighW!.Value, 1e-15);
    }

    [Fact]
    public void The_loss_at_1_GHz_is_omega_C_tan_delta_within_the_fits_stated_error()
    {
        // A stripline fills its field with the substrate, so tan δ_eff = tan δ and G = ωC·tan δ at the reference frequency
        // (1 GHz when the geometry gives no 'at'; ReferenceData/published-checks.md §5, Pozar).
        string yaml = @"
source: { waveform: step, high: 1 V, rise: 50 ps, resistance: 50 ohm }
line:
  - segment:
      length: 100 mm
      geometry: { kind: stripline, width: 0.25 mm, spacing: 0.5 mm, er: 4.0, tand: 0.02 }
load: { r: 50 ohm }
simulation: { duration: 3 ns, resolution: 10 }
";
        var s = TestScenarios.Parse(yaml);
        var seg = (Segment)s.Line[0];
        Assert.Equal(0, seg.G);
        Assert.NotNull(seg.Loss!.Dielectric);
        Assert.Null(seg.Loss.SkinCorner);
        double w = 2 * Math.PI * 1e9, formula = w * seg.C * 0.02;
        var jw = new Complex(0, w);

        // The exact model meets the formula at 1 GHz, and conducts nothing at DC.
        Assert.Equal(1, seg.ShuntAdmittance(jw).Real / formula, 1e-9);
        Assert.Equal(0, seg.ShuntAdmittance(Complex.Zero).Real);

        // The solver's pole-residue fit: |ΔY| = ωC0·|Δκ_fit − Δκ| ≤ ωC0·|Δκ|·(its stated DispersionMaxError), Δκ = κ − κ(∞).
        var plan = Simulate.Plan(s);
        var (_, fit) = Assert.Single(Simulate.LossFits(s, plan));
        Assert.InRange(1e9, fit.BandLow, fit.BandHigh);
        double allowed = w * seg.C * (seg.Loss.PermittivityRatio(jw) - seg.Loss.HighFrequencyRatio).Magnitude * fit.DispersionMaxError;
        Assert.True(Math.Abs(fit.ShuntAdmittance(jw).Real - formula) <= allowed,
            $"fitted G {fit.ShuntAdmittance(jw).Real} S/m, formula {formula} S/m, stated error allows {allowed} S/m");
        Assert.Equal(0, fit.ShuntAdmittance(Complex.Zero).Real);
    }

    [Fact]
    public void The_dielectric_no_longer_depends_on_the_rise_time_and_an_explicit_g_keeps_a_constant_G()
    {
        // The model is fitted at the geometry's own reference frequency, not at the edge's bandwidth 0.35/t_r.
        var fast = (Segment)TestScenarios.Parse(Net("{ c: 5 pF }")).Line[0];
        var slow = (Segment)TestScenarios.Parse(Net("{ c: 5 pF }", "waveform: step, high: 3.3 V, rise: 2 ns")).Line[0];
        Assert.Equal(fast.Loss!.Dielectric!.EpsInfinity, slow.Loss!.Dielectric!.EpsInfinity);
        Assert.Equal(fast.Loss.Dielectric.DeltaEps, slow.Loss.Dielectric.DeltaEps);
        Assert.Equal((fast.R, fast.L, fast.G, fast.C), (slow.R, slow.L, slow.G, slow.C));

        // 'g' written by the user is the one way to a constant G (and then no wideband model is added).
        var given = (Segment)TestScenarios.Parse(Net("{ c: 5 pF }", extra: "\n      g: 20 mS/m")).Line[0];
        Assert.Null(given.Loss);
        Assert.Equal(20e-3, given.G, 1e-15);
    }
}
