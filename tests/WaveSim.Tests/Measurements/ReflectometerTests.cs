using WaveSim.Core.Measurements;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Measurements;

/// <summary>The simulated reflectometer and its analysis, run on the real solver.</summary>
public class ReflectometerTests
{
    internal const string Staircase = @"title: staircase
source: { waveform: step, high: 1 V, rise: 35 ps }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
  - segment: { length: 0.1 m, z0: 75 ohm, delay: 0.5 ns }
  - segment: { length: 0.1 m, z0: 35 ohm, delay: 0.5 ns }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
load: { r: 50 ohm }
simulation: { duration: 5 ns, resolution: 10 }
";

    static double At(TdrResult r, double[] values, double metres) =>
        values[Array.FindIndex(r.DistanceM, d => d >= metres)];

    [Fact]
    public void Layer_peeling_recovers_a_50_75_35_50_staircase_within_1_ohm_where_the_naive_formula_is_off()
    {
        var s = TestScenarios.Parse(Staircase);
        var trace = Reflectometer.Simulate(s, 35e-12, 50);
        var r = TdrAnalysis.Analyse(trace, ((Segment)s.Line[0]).Velocity);

        // Incident 1 V into 50 ohm from 2 V behind 50 ohm: v_inc = V Z0/(Z0 + Rs) (voltage divider).
        Assert.Equal(1.0, r.IncidentV, 1e-12);
        double[] truth = [50, 75, 35, 50];
        for (int i = 0; i < truth.Length; i++)
            Assert.InRange(At(r, r.LayerOhms, 0.1 * i + 0.05), truth[i] - 1, truth[i] + 1);

        // Naive Z0(1+ρ)/(1-ρ) (ReferenceData/published-checks.md §11) on the first round trip through each section: ρ is the lattice sum
        // r1 + (1 - r1²)·r2 + ..., with Γ = (Z2 - Z1)/(Z2 + Z1) and transmission 1 ± Γ (Pozar eq. 2.35), so it misreads the
        // 35 ohm section as 37.03 ohm and the last 50 ohm one as 47.33 ohm.
        double r1 = (75 - 50) / 125.0, r2 = (35 - 75) / 110.0;
        double rho3 = r1 + (1 - r1 * r1) * r2;
        double naive3 = 50 * (1 + rho3) / (1 - rho3);
        Assert.Equal(naive3, At(r, r.NaiveOhms, 0.25), 0.05);
        Assert.True(Math.Abs(At(r, r.NaiveOhms, 0.25) - 35) > 1.5, "naive on the 35 ohm section");
        Assert.True(Math.Abs(At(r, r.NaiveOhms, 0.35) - 50) > 1.5, "naive on the last 50 ohm section");
        Assert.True(Math.Abs(At(r, r.LayerOhms, 0.25) - 35) < Math.Abs(At(r, r.NaiveOhms, 0.25) - 35));

        // Segments: distance = v·t_roundtrip/2 (ReferenceData/published-checks.md §11); the edges at 0.1, 0.2, 0.3 m within one layer (1.75 mm).
        Assert.Equal(4, r.Segments.Count);
        for (int i = 0; i < 3; i++)
            Assert.InRange(r.Segments[i].EndM, 0.1 * (i + 1) - 0.00175, 0.1 * (i + 1) + 0.00175);
        for (int i = 0; i < 4; i++)
            Assert.InRange(r.Segments[i].Z0Ohm, truth[i] - 1, truth[i] + 1);
        Assert.Empty(r.Lumped);
    }

    [Fact]
    public void A_shunt_capacitance_is_sized_from_the_area_of_its_dip()
    {
        // ReferenceData/published-checks.md §11 (Laplace transform, as in Bogatin's TDR chapter): shunt C on a matched line, area of ρ(t) = -Z0·C/2, so C = -2A/Z0; 1 pF in 50 ohm: A = -25 ps,
        // whatever the rise time. Tolerance 10 %.
        var s = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 35 ps }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
  - shunt: { c: 1 pF }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
load: { r: 50 ohm }
simulation: { duration: 3 ns, resolution: 10 }
");
        var r = TdrAnalysis.Analyse(Reflectometer.Simulate(s, 35e-12, 50), ((Segment)s.Line[0]).Velocity);

        var c = Assert.Single(r.Lumped);
        Assert.Equal(LumpedKind.ShuntCapacitance, c.Kind);
        Assert.InRange(c.Value, 0.9e-12, 1.1e-12);
        Assert.InRange(c.AreaS, -27.5e-12, -22.5e-12);
        Assert.InRange(c.AtM, 0.1 - 0.00175, 0.1 + 0.00175);
        var seg = Assert.Single(r.Segments);
        Assert.InRange(seg.Z0Ohm, 49, 51);
    }
}
