using WaveSim.Core.Measurements;
using WaveSim.Core.Units;
using static WaveSim.Tests.Measurements.LumpedCircuitTrace;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Series-L/shunt-C pairs and capacitive or inductive ends, recovered from traces synthesised with known truth by
/// <see cref="LumpedCircuitTrace"/> (the parts' circuit equations integrated numerically). Relations: ReferenceData/tdr-lumped.md
/// and ReferenceData/published-checks.md §11 (distance = v·t/2). Tolerances as the task set them: position within one
/// rise-time distance v·t_r/2, values within 10 %.
/// </summary>
public class TdrLumpedPairTests
{
    const double Z = 75;
    static readonly double V = 0.66 * Quantity.SpeedOfLight;

    static void Near(double truth, double value, double fraction, string what) =>
        Assert.True(Math.Abs(value - truth) <= fraction * truth, $"{what}: {value:G4} against {truth:G4}");

    [Fact]
    public void The_pair_model_matches_the_circuit_and_its_moments_give_L_and_C_in_closed_form()
    {
        // tdr-lumped.md: for series L then shunt C on a matched line, with a = L/Z and b = C·Z, ∫ρ dt = (a − b)/2 and
        // ∫t·ρ dt = (a² − b² − 2ab)/4 about the arrival; so with d = 2·M0, a + b = d + sqrt(2d² − 8·M1). 12 nH, 2.5 pF,
        // 75 Ω: a = 160 ps, b = 187.5 ps, M0 = −13.75 ps, M1 = −17 389 ps², a + b = 347.5 ps.
        double a = 12e-9 / Z, b = 2.5e-12 * Z, rise = 100e-12, dt = 10e-12;
        var trace = Make(Part.SeriesLThenShuntC, Z, l: 12e-9, c: 2.5e-12, atM: 0.3, V, rise, after: 4e-9);
        double arrival = trace.ReferenceTimeS + 2 * 0.3 / V;
        double m0 = 0, m1 = 0;
        for (int k = 1; k < trace.Time.Length; k++)
        {
            double t = trace.Time[k], h = t - trace.Time[k - 1];
            double rho = trace.Volts[k] - trace.Incident(t);
            m0 += rho * h;
            m1 += rho * (t - arrival) * h;
        }
        Assert.Equal((a - b) / 2, m0, 0.2e-12);
        Assert.Equal((a * a - b * b - 2 * a * b) / 4, m1, 0.01 * Math.Abs(m1));
        double d = 2 * m0, sum = d + Math.Sqrt(2 * d * d - 8 * m1);
        Near(a, (sum + d) / 2, 0.02, "a from the moments");
        Near(b, (sum - d) / 2, 0.02, "b from the moments");

        // The closed-form model the analysis fits (LumpedResponse) against the integrated circuit, layer by layer.
        int first = (int)Math.Floor((arrival - trace.ReferenceTimeS - 2 * rise) / dt), count = 200;
        double[] model = LumpedResponse.Layers(LumpedResponse.Pair(a, b, seriesFirst: true), arrival - trace.ReferenceTimeS, trace.RampS, dt, first, count);
        for (int i = 0; i < count; i++)
        {
            double centre = trace.ReferenceTimeS + (first + i) * dt, mean = 0;
            for (int j = 0; j < 10; j++)
            {
                double t = centre - dt / 2 + (j + 0.5) * dt / 10;
                int k = (int)Math.Round(t / 1e-12);
                mean += (trace.Volts[k] - trace.Incident(trace.Time[k])) / 10;
            }
            Assert.True(Math.Abs(model[i] - mean) < 0.005, $"layer {first + i}: model {model[i]:G4}, circuit {mean:G4}");
        }
    }

    [Theory]
    [InlineData(200e-12, 0.0)]
    [InlineData(200e-12, 0.001)]
    [InlineData(35e-12, 0.0)]
    public void A_12_nH_and_2_5_pF_connector_at_2_5_m_on_75_ohm_is_reported_as_both_parts_at_its_place(double rise, double noise)
    {
        // The area of the pair is L/(2Z) − ZC/2 = 80 ps − 93.75 ps = −13.75 ps (tdr-lumped.md, pair area), which an area
        // alone reads as a shunt C of 2·13.75 ps/75 Ω = 0.37 pF; the two lobes must be told apart instead.
        var trace = Make(Part.SeriesLThenShuntC, Z, l: 12e-9, c: 2.5e-12, atM: 2.5, V, rise, noise: noise, seed: 12);
        var r = TdrAnalysis.Analyse(trace, V);

        Assert.Equal(2, r.Lumped.Count);
        Assert.All(r.Lumped, p => Assert.True(p.Paired));
        Assert.Equal(LumpedKind.SeriesInductance, r.Lumped[0].Kind);   // in the order the step meets them
        Assert.Equal(LumpedKind.ShuntCapacitance, r.Lumped[1].Kind);
        Near(12e-9, r.Lumped[0].Value, 0.10, "L");
        Near(2.5e-12, r.Lumped[1].Value, 0.10, "C");
        double riseDistance = V * rise / 2;
        Assert.All(r.Lumped, p => Assert.InRange(p.AtM, 2.5 - riseDistance, 2.5 + riseDistance));
        var seg = Assert.Single(r.Segments);
        Assert.InRange(seg.Z0Ohm, Z - 1, Z + 1);
    }

    [Fact]
    public void A_shunt_C_before_a_series_L_is_reported_in_that_order()
    {
        // Γ(s) = s(a − b − ab·s)/(ab·s² + (a + b)s + 2) (tdr-lumped.md): the dip comes first.
        var trace = Make(Part.ShuntCThenSeriesL, 50, l: 5e-9, c: 1.5e-12, atM: 0.3, 2e8, 100e-12, after: 3e-9);
        var r = TdrAnalysis.Analyse(trace, 2e8);

        Assert.Equal(2, r.Lumped.Count);
        Assert.Equal(LumpedKind.ShuntCapacitance, r.Lumped[0].Kind);
        Assert.Equal(LumpedKind.SeriesInductance, r.Lumped[1].Kind);
        Near(1.5e-12, r.Lumped[0].Value, 0.10, "C");
        Near(5e-9, r.Lumped[1].Value, 0.10, "L");
        Assert.InRange(r.Lumped[0].AtM, 0.3 - 2e8 * 100e-12 / 2, 0.3 + 2e8 * 100e-12 / 2);
    }

    [Theory]
    [InlineData(200e-12)]
    [InlineData(35e-12)]
    public void A_22_pF_far_end_is_a_capacitive_end_not_a_chain_of_segments(double rise)
    {
        // A C at the end: ρ = 1 − 2·exp(−t/τ), τ = Z·C = 1.65 ns (tdr-lumped.md, reactive ends).
        var trace = Make(Part.EndC, Z, l: 0, c: 22e-12, atM: 2.5, V, rise);
        var r = TdrAnalysis.Analyse(trace, V);

        Assert.Equal(TdrEnd.Capacitive, r.End);
        Near(22e-12, r.EndValue ?? double.NaN, 0.10, "end C");
        double riseDistance = V * rise / 2;
        Assert.InRange(r.EndM, 2.5 - riseDistance, 2.5 + riseDistance);
        var seg = Assert.Single(r.Segments);
        Assert.InRange(seg.Z0Ohm, Z - 1, Z + 1);
        Assert.InRange(seg.EndM, 2.5 - riseDistance, 2.5 + riseDistance);
        Assert.Empty(r.Lumped);
    }

    [Theory]
    [InlineData(35e-12)]
    [InlineData(100e-12)]
    public void Behind_the_connector_the_22_pF_end_is_still_recognised_on_the_solvers_trace(double rise)
    {
        // The truth is the scenario's own values. The edge reaching the end has passed the connector and is slowed by it
        // (each part delays it by its τ each way), which the end fit models by the parts' own transmission, out and back.
        var s = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 100 ps }
line:
  - segment: { length: 2.5 m, z0: 75 ohm, velocity: 0.66 c }
  - series: { l: 12 nH }
  - shunt: { c: 2.5 pF }
  - segment: { length: 2.5 m, z0: 75 ohm, velocity: 0.66 c }
load: { c: 22 pF }
simulation: { duration: 60 ns, resolution: 10 }
");
        var r = TdrAnalysis.Analyse(Reflectometer.Simulate(s, rise, Z), V);

        double riseDistance = V * rise / 2;
        Assert.Equal(2, r.Lumped.Count);
        Near(12e-9, r.Lumped[0].Value, 0.10, "L");
        Near(2.5e-12, r.Lumped[1].Value, 0.10, "C");
        Assert.All(r.Lumped, p => Assert.InRange(p.AtM, 2.5 - riseDistance, 2.5 + riseDistance));
        Assert.Equal(TdrEnd.Capacitive, r.End);
        Near(22e-12, r.EndValue ?? double.NaN, 0.10, "end C");
        Assert.InRange(r.EndM, 5 - riseDistance, 5 + riseDistance);
        Assert.InRange(Assert.Single(r.Segments).Z0Ohm, Z - 1, Z + 1);
    }

    [Fact]
    public void A_40_nH_far_end_to_ground_is_an_inductive_end()
    {
        // An L at the end: ρ = −1 + 2·exp(−t/τ), τ = L/Z = 533 ps (tdr-lumped.md, reactive ends).
        var trace = Make(Part.EndL, Z, l: 40e-9, c: 0, atM: 2.5, V, 100e-12, after: 5e-9);
        var r = TdrAnalysis.Analyse(trace, V);

        Assert.Equal(TdrEnd.Inductive, r.End);
        Near(40e-9, r.EndValue ?? double.NaN, 0.10, "end L");
        Assert.InRange(r.EndM, 2.5 - V * 100e-12 / 2, 2.5 + V * 100e-12 / 2);
        Assert.InRange(Assert.Single(r.Segments).Z0Ohm, Z - 1, Z + 1);
    }

    [Fact]
    public void A_single_shunt_C_stays_a_single_part()
    {
        // 1 pF on 50 Ω: area −Z0·C/2 = −25 ps (published-checks.md §11); no second part may be invented beside it.
        var trace = Make(Part.ShuntC, 50, l: 0, c: 1e-12, atM: 0.1, 2e8, 35e-12, after: 2e-9);
        var r = TdrAnalysis.Analyse(trace, 2e8);

        var c = Assert.Single(r.Lumped);
        Assert.False(c.Paired);
        Assert.Equal(LumpedKind.ShuntCapacitance, c.Kind);
        Near(1e-12, c.Value, 0.10, "C");
        Assert.InRange(c.AtM, 0.1 - 2e8 * 35e-12 / 2, 0.1 + 2e8 * 35e-12 / 2);
    }

    [Fact]
    public void An_open_end_is_still_an_open()
    {
        // No capacitance at the end: ρ steps to +1 (published-checks.md §11, Z → ∞); nothing reactive may be read into it.
        var trace = Make(Part.Open, Z, l: 0, c: 0, atM: 0.5, V, 100e-12, after: 2e-9);
        var r = TdrAnalysis.Analyse(trace, V);

        Assert.Equal(TdrEnd.Open, r.End);
        Assert.Null(r.EndValue);
    }
}
