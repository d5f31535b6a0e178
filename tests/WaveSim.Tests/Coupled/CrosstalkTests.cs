using WaveSim.Core.Coupled;
using static WaveSim.Tests.Coupled.CoupledNets;

namespace WaveSim.Tests.Coupled;

/// <summary>
/// Near- and far-end crosstalk of a symmetric pair against two independent references: the exact even/odd-mode solution
/// (standard even/odd analysis, e.g. Pozar, Microwave Engineering, 4th ed. 2012, sec. 7.6; from memory) and the
/// weak-coupling coefficients Kb = (Lm/L + Cm/C)/4, Kf = (Lm/L − Cm/C)/2 (Paul, Transmission Lines in Digital Systems for
/// EMC Practitioners, Wiley 2012, ch. 5; from memory). Matrices: the example of ReferenceData/published-checks.md §13: L11 = 9.9 nH/in,
/// L12 = 1.5 nH/in, C11 = 3.6 pF/in, C12 = −0.4 pF/in, giving Kb = 0.0657 and Lm/L − Cm/C = 0.0404.
/// </summary>
public class CrosstalkTests
{
    static readonly ConductorMatrix L = Scaled(M([9.9, 1.5], [1.5, 9.9]), NanoHenryPerInch);
    static readonly ConductorMatrix C = Scaled(M([3.6, -0.4], [-0.4, 3.6]), PicoFaradPerInch);
    const double Length = 10 * Inch, Vs = 2, Rise = 200e-12, Delay = 0.5e-9;
    static readonly double R = Math.Sqrt(L[0, 0] / C[0, 0]);   // each line matched to its own impedance (weak-coupling set-up)

    static CoupledResult Pair(ConductorMatrix l, ConductorMatrix c, double r, double duration = 6e-9, double resolution = 20) =>
        Solve(Net([CoupledSection.Lossless(Length, l, c)], [Driver(0, Step(Vs, Rise, Delay, r)), Resistor(1, r)],
            [Resistor(0, r), Resistor(1, r)], duration, resolution: resolution));

    [Fact]
    public void Coupling_coefficients_of_the_example_match_the_published_values()
    {
        var (kb, kf) = SectionModes.Coupling(CoupledSection.Lossless(Length, L, C));
        Assert.Equal(0.0657, kb, 4e-4);          // ReferenceData/published-checks.md §13 example: (0.1515 + 0.1111)/4
        Assert.Equal(0.0404 / 2, kf, 2e-4);      // (Lm/L − Cm/C)/2
    }

    [Fact]
    public void Near_end_plateau_matches_the_even_odd_dividers_and_the_backward_coefficient()
    {
        var r = Pair(L, C, R);
        var eo = SectionModes.Pair(CoupledSection.Lossless(Length, L, C))!;
        // Before any wave returns (t < 2·TD of the fastest mode) the near ends are the modal dividers exactly:
        // V_quiet = ½[Ze/(Ze+R) − Zo/(Zo+R)]·Vs, V_aggr = ½[Ze/(Ze+R) + Zo/(Zo+R)]·Vs.
        double exactQuiet = 0.5 * (eo.Z0e / (eo.Z0e + R) - eo.Z0o / (eo.Z0o + R)) * Vs;
        double exactAggr = 0.5 * (eo.Z0e / (eo.Z0e + R) + eo.Z0o / (eo.Z0o + R)) * Vs;
        double td = Length / eo.Ve, t = Delay + 1.25 * Rise + 0.5 * (2 * td - 1.25 * Rise);
        var q = r.Probe("c0_near"); var next = r.Probe("c1_near");
        Assert.Equal(exactAggr, At(r.Time, q.Volts, t), 2e-3 * Vs);
        Assert.Equal(exactQuiet, At(r.Time, next.Volts, t), 2e-3 * Vs);
        // Weak coupling: Kb·V_incident with V_incident = Vs/2 (matched source): 0.0657 V, within 2 % of it here.
        var (kb, _) = SectionModes.Coupling(CoupledSection.Lossless(Length, L, C));
        Assert.Equal(kb * Vs / 2, At(r.Time, next.Volts, t), 0.02 * kb * Vs / 2);
    }

    [Fact]
    public void Far_end_waveform_follows_the_two_modes_arriving_at_their_own_delays()
    {
        // 40 steps per edge: the odd mode runs below Courant number 1 and its dispersion is second order in the step.
        var r = Pair(L, C, R, resolution: 40);
        var eo = SectionModes.Pair(CoupledSection.Lossless(Length, L, C))!;
        double tde = Length / eo.Ve, tdo = Length / eo.Vo;
        // Each mode launches ½·Vs·Z/(Z+R), arrives after its own delay and is transmitted by (1 + Γ), Γ = (R − Z)/(R + Z);
        // nothing else arrives before 3·TD of the faster mode.
        double ae = 0.5 * Vs * eo.Z0e / (eo.Z0e + R) * (1 + (R - eo.Z0e) / (R + eo.Z0e));
        double ao = 0.5 * Vs * eo.Z0o / (eo.Z0o + R) * (1 + (R - eo.Z0o) / (R + eo.Z0o));
        var src = r.Scenario.Near[0].Source!.Spec;
        double F(double t) => (src.Value(t) - src.Low) / (src.High - src.Low);
        double worstQuiet = 0, worstAggr = 0, peak = 0;
        var fext = r.Probe("c1_far"); var rx = r.Probe("c0_far");
        for (int i = 0; i < r.Time.Length; i++)
        {
            double t = r.Time[i];
            if (t > 3 * Math.Min(tde, tdo)) break;
            worstQuiet = Math.Max(worstQuiet, Math.Abs(fext.Volts[i] - (ae * F(t - tde) - ao * F(t - tdo))));
            worstAggr = Math.Max(worstAggr, Math.Abs(rx.Volts[i] - (ae * F(t - tde) + ao * F(t - tdo))));
            peak = Math.Min(peak, fext.Volts[i]);
        }
        // The odd mode runs at Courant number below 1 (the grid is the even mode's), hence a little numerical dispersion.
        Assert.True(worstQuiet < 0.005 * Vs / 2, $"quiet far end off the modal solution by {worstQuiet:E3} V");
        Assert.True(worstAggr < 0.005 * Vs / 2, $"driven far end off the modal solution by {worstAggr:E3} V");
        // Weak coupling: a pulse of −Kf·(TD/t_ramp)·V_incident; the coupling here is not weak (Kf·TD/t_ramp = 0.15), so within 15 %.
        var (_, kf) = SectionModes.Coupling(CoupledSection.Lossless(Length, L, C));
        double td = Length * Math.Sqrt(L[0, 0] * C[0, 0]);
        double predicted = -kf * td / (1.25 * Rise) * Vs / 2;
        Assert.True(peak < 0, "microstrip-like coupling (Lm/L > Cm/C) gives a negative far-end pulse");
        Assert.Equal(predicted, peak, Math.Abs(0.15 * predicted));
    }

    [Fact]
    public void Homogeneous_medium_gives_no_far_end_crosstalk_and_runs_both_modes_at_courant_one()
    {
        // L·C = scalar·identity: L = [[10, 2], [2, 10]] nH/in, C = [[3, −0.6], [−0.6, 3]] pF/in (C ∝ L⁻¹, checked below).
        var l = Scaled(M([10, 2], [2, 10]), NanoHenryPerInch);
        var c = Scaled(M([3, -0.6], [-0.6, 3]), PicoFaradPerInch);
        var lc = l.ToMatrix() * c.ToMatrix();
        Assert.True(Math.Abs(lc[0, 1]) < 1e-12 * lc[0, 0] && Math.Abs(lc[0, 0] - lc[1, 1]) < 1e-12 * lc[0, 0]);
        var eo = SectionModes.Pair(CoupledSection.Lossless(Length, l, c))!;
        double rt = Math.Sqrt(eo.Z0e * eo.Z0o);   // the termination that the even and odd far-end transmissions share
        var r = Pair(l, c, rt);
        Assert.True(r.Plan.CarriesAnyEdge, "both modes at Courant number 1");
        double td = Length / eo.Ve, worst = 0;
        var fext = r.Probe("c1_far");
        for (int i = 0; i < r.Time.Length && r.Time[i] < 3 * td; i++) worst = Math.Max(worst, Math.Abs(fext.Volts[i]));
        Assert.True(worst < 1e-9 * Vs, $"far-end crosstalk {worst:E3} V");
        // …while the near end still couples: ½[Ze/(Ze+R) − Zo/(Zo+R)]·Vs.
        double next = 0.5 * (eo.Z0e / (eo.Z0e + rt) - eo.Z0o / (eo.Z0o + rt)) * Vs;
        Assert.Equal(next, At(r.Time, r.Probe("c1_near").Volts, Delay + td), 1e-9);
    }

    /// <summary>Largest deviation of the quiet far end from the modal solution before 3·TD, V.</summary>
    static double FarEndError(double resolution, double width)
    {
        var bump = new WaveSim.Core.Model.SourceSpec { Waveform = WaveSim.Core.Model.WaveformKind.Gaussian, High = Vs, Width = width, Delay = 0.1e-9, Resistance = R };
        var r = Solve(Net([CoupledSection.Lossless(Length, L, C)], [new EndBranch(0, null, R, Source: new CoupledSource(bump)), Resistor(1, R)],
            [Resistor(0, R), Resistor(1, R)], 4.5e-9, resolution: resolution));
        var eo = SectionModes.Pair(CoupledSection.Lossless(Length, L, C))!;
        double tde = Length / eo.Ve, tdo = Length / eo.Vo;
        double ae = 0.5 * Vs * eo.Z0e / (eo.Z0e + R) * (1 + (R - eo.Z0e) / (R + eo.Z0e));
        double ao = 0.5 * Vs * eo.Z0o / (eo.Z0o + R) * (1 + (R - eo.Z0o) / (R + eo.Z0o));
        var src = r.Scenario.Near[0].Source!.Spec;
        double F(double t) => (src.Value(t) - src.Low) / (src.High - src.Low);
        double worst = 0;
        var fext = r.Probe("c1_far");
        for (int i = 0; i < r.Time.Length && r.Time[i] < 3 * Math.Min(tde, tdo); i++)
            worst = Math.Max(worst, Math.Abs(fext.Volts[i] - (ae * F(r.Time[i] - tde) - ao * F(r.Time[i] - tdo))));
        return worst;
    }

    [Fact]
    public void Far_end_error_of_the_slower_mode_falls_with_the_square_of_the_step()
    {
        // The leapfrog is second-order accurate (Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2):
        // halving dt and dz should quarter the dispersion error of the mode below Courant number 1. A smooth (Gaussian) pulse
        // keeps a ramp's corners out of the measurement: with a linear ramp the error falls only about as dt^0.6.
        double e1 = FarEndError(10, 300e-12), e2 = FarEndError(20, 300e-12), e3 = FarEndError(40, 300e-12);
        double p1 = Math.Log2(e1 / e2), p2 = Math.Log2(e2 / e3);
        // Measured: 2.02e-3, 5.07e-4, 1.27e-4 V at 10, 20, 40 steps per width: order 1.99 twice.
        Assert.InRange(p1, 1.8, 2.2);
        Assert.InRange(p2, 1.8, 2.2);
    }
}
