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
        var r = TdrAnalysis.Analyse(trace with { ReferenceOhms = 50 }, 2e8);

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
        var r = TdrAnalysis.Analyse(trace with { ReferenceOhms = 50 }, 2e8);

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
