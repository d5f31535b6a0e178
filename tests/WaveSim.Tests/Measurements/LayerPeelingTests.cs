using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Layer peeling against an independent forward model: the lattice (bounce) diagram of equal-delay layers
/// (<see cref="BounceLattice"/>). Conversion Z = Z0*(1+rho)/(1-rho) and distance = v*t_roundtrip/2 (Pozar eq. 2.35 solved for Z): ReferenceData/published-checks.md
/// §11, "TDR relations".
/// </summary>
public class LayerPeelingTests
{
    const double Z0 = 50;
    // 50 / 75 / 35 / 50 ohm staircase: 4, 8, 8 and 12 layers, the last section ending in a matched 50 ohm line.
    static readonly (double Ohms, int Layers)[] Staircase = [(50, 4), (75, 8), (35, 8), (50, 12)];

    static double[] Layers() => Staircase.SelectMany(s => Enumerable.Repeat(s.Ohms, s.Layers)).ToArray();

    [Fact]
    public void Peeling_recovers_a_50_75_35_50_staircase_within_1_ohm_where_the_direct_formula_does_not()
    {
        double[] truth = Layers();
        double[] rho = BounceLattice.StepResponse(Z0, truth, terminationOhms: 50);

        ImpedanceProfile p = LayerPeeling.Profile(rho, Z0);
        double[] naive = rho.Select(r => StepReflectometry.ImpedanceOf(r, Z0)).ToArray();

        for (int k = 0; k < truth.Length; k++)
            Assert.True(Math.Abs(p.Impedance[k] - truth[k]) < 1.0, $"layer {k}: {p.Impedance[k]} vs {truth[k]}");

        // The direct formula is right on the first step (no earlier discontinuity to correct for) ...
        int first75 = 4;
        Assert.Equal(75.0, naive[first75], 1e-9);
        // ... but off by more than 1 ohm over the 35 ohm section (it reads about 37) and the start of the final
        // 50 ohm one (about 47.3): transmission loss through the earlier steps. Later samples of the last section
        // drift back towards 50 as the multiple reflections arrive, which the direct formula cannot tell apart.
        for (int k = 12; k < 28; k++)
            Assert.True(Math.Abs(naive[k] - truth[k]) > 1.0, $"layer {k}: direct {naive[k]} vs {truth[k]}");
    }

    [Fact]
    public void Peeling_returns_the_interface_reflection_coefficients()
    {
        double[] rho = BounceLattice.StepResponse(Z0, Layers(), terminationOhms: 50);
        ImpedanceProfile p = LayerPeeling.Profile(rho, Z0);

        // Gamma = (Z2 - Z1)/(Z2 + Z1) at each step (Pozar eq. 2.35), zero inside a section.
        Assert.Equal(0.2, p.Reflection[4], 1e-12);
        Assert.Equal((35.0 - 75) / (35 + 75), p.Reflection[12], 1e-12);
        Assert.Equal((50.0 - 35) / (50 + 35), p.Reflection[20], 1e-12);
        Assert.Equal(0.0, p.Reflection[8], 1e-12);
    }

    [Fact]
    public void Grouping_turns_layers_into_sections_with_distances()
    {
        double[] rho = BounceLattice.StepResponse(Z0, Layers(), terminationOhms: 50);
        ImpedanceProfile p = LayerPeeling.Profile(rho, Z0);

        // Round trip 10 ps per layer at 2e8 m/s: each layer is 2e8 * 10e-12 / 2 = 1 mm long.
        IReadOnlyList<ImpedanceSegment> s = ImpedanceSegments.Group(p, 10e-12, 2e8, toleranceOhm: 1.0);

        Assert.Equal(4, s.Count);
        double[] starts = [0, 4e-3, 12e-3, 20e-3], ends = [4e-3, 12e-3, 20e-3, 32e-3], ohms = [50, 75, 35, 50];
        for (int i = 0; i < 4; i++)
        {
            Assert.Equal(starts[i], s[i].StartM, 1e-12);
            Assert.Equal(ends[i], s[i].EndM, 1e-12);
            Assert.Equal(ohms[i], s[i].Z0Ohm, 1e-6);
        }
    }

    [Fact]
    public void An_open_end_stops_the_peeling_with_a_numerical_error()
    {
        double[] rho = [0.0, 0.0, 1.0, 1.0];   // a 50 ohm line open after two layers
        var ex = Assert.Throws<NumericalException>(() => LayerPeeling.Profile(rho, Z0));
        Assert.Contains("layer 2", ex.Message);
    }
}
