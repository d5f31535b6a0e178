using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>Segments without frequency-dependent loss keys keep constant R and G, and the grid solves them correctly: checked
/// against an independent frequency-domain solution and against the closed form of a distortionless line.</summary>
public class ConstantLossTests
{
    /// <summary>
    /// The constant G this geometry segment carried before a tand became a wideband dielectric: ωC·tan δ_eff at 0.35/t_r
    /// (t_r = 150 ps). It is now written as an explicit <c>g</c>, the one way to ask for a constant G, with the same double,
    /// so this net keeps the constant-R/G arithmetic it was written to check.
    /// </summary>
    static readonly double FormerG = WaveSim.Core.Lines.CrossSection.Compute(new WaveSim.Core.Lines.CrossSectionSpec("microstrip",
        new Dictionary<string, double> { ["width"] = 0.3e-3, ["height"] = 0.17e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["tand"] = 0.02 })).ConductanceAt(0.35 / 150e-12);

    static readonly string Yaml = @"
source: { waveform: pulse, low: 0.1 V, high: 1.1 V, rise: 150 ps, width: 1 ns, delay: 0.3 ns, resistance: 22 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 6.7 ns/m, r: 20 ohm/m, g: 5 mS/m }
  - shunt: { c: 2 pF }
  - segment:
      length: 80 mm
      geometry: { kind: microstrip, width: 0.3 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02 }
      g: G_FORMER S/m
  - segment: { length: 0.15 m, l: 300 nH/m, c: 110 pF/m, r: 30 ohm/m }
load: { r: 75 ohm, c: 2 pF }
probes:
  - { name: src, at: source }
  - { name: mid, at: 0.25 m }
  - { name: rx, at: load }
simulation: { duration: 12 ns, resolution: 12 }
".Replace("G_FORMER", FormerG.ToString("R", System.Globalization.CultureInfo.InvariantCulture));

    [Fact]
    public void Constant_R_and_G_results_agree_with_the_frequency_domain_solution_of_the_same_net()
    {
        // An independent computation of the same net: per-frequency nodal analysis with each segment's exact two-port
        // (Z = R + jωL, Y = G + jωC, Pozar ch. 2; ReferenceData/published-checks.md §6) and a numerical Laplace transform of
        // the driver, against the time-stepped grid. Tolerance 1 % of each probe's swing, as for the frequency-dependent loss
        // (AgreementTests; common practice, no source): the grid's second-order error at resolution 12 is well inside it.
        var td = TestScenarios.Run(Yaml);
        foreach (var d in FrequencyDomainCheck.Compare(td))
        {
            Console.WriteLine($"constant loss {d.Probe}: {d.MaxDiffV:E3} V = {d.MaxDiffPct:F3} % of the swing");
            Assert.True(d.MaxDiffPct < 1, $"{d.Probe}: {d.MaxDiffV:E3} V = {d.MaxDiffPct:F3} % of the swing");
        }
    }

    [Fact]
    public void A_distortionless_lossy_line_delivers_the_pulse_unchanged_in_shape_scaled_by_exp_minus_R_len_over_Z0()
    {
        // Heaviside's condition R/L = G/C (Pozar section 2.7; ReferenceData/published-checks.md §7): Zc = sqrt(L/C) = 50 ohm at
        // every frequency down to DC (sqrt(R/G) = 50 ohm too) and γ = sqrt(RG) + jω sqrt(LC), so a line matched at both ends
        // passes the source's open-circuit voltage as v_rx(t) = exp(−R·len/Z0) · Vs(t − TD)/2 and v_src(t) = Vs(t)/2, exactly,
        // including the DC offset of the 0.1 V low level. L = 250 nH/m, C = 100 pF/m, R = 5 ohm/m, G = 2 mS/m, len = 4 m:
        // TD = 20 ns, exp(−0.4). Vs is the Gaussian pulse as docs/scenario-format.md defines it (FWHM = width, peak at delay + 2·width),
        // written out here; smooth, so the grid's error is second order (Taflove and Hagness 2005, ch. 2; §9).
        // Tolerance, derived: the trapezoidal time error is about (dt²/12)·max|v″| = 0.5 V·(dt/σ)²/12 = 1.4e-4 V at dt = 25 ps
        // (resolution 40), σ = 0.425 ns; the check allows 0.5 % of the far-end peak (the §7 tolerance), 1.7e-3 V, ten times that.
        // Measured: 1.4e-4 V at the far end, 2.1e-4 V at the source (2.2e-3 and 3.3e-3 V at resolution 10: 16× for 4× dt).
        var r = TestScenarios.Run(@"
source: { waveform: gaussian, low: 0.1 V, high: 1.1 V, width: 1 ns, delay: 0.5 ns, resistance: 50 ohm }
line: [ { segment: { length: 4 m, l: 250 nH/m, c: 100 pF/m, r: 5 ohm/m, g: 2 mS/m } } ]
load: { r: 50 ohm }
probes: [ { name: src, at: source }, { name: rx, at: load } ]
simulation: { duration: 30 ns, output_step: 20 ps, resolution: 40 }
");
        static double Vs(double t)
        {
            double sigma = 1e-9 / (2 * Math.Sqrt(2 * Math.Log(2))), d = t - 0.5e-9 - 2 * 1e-9;
            return 0.1 + 1.0 * Math.Exp(-d * d / (2 * sigma * sigma));
        }
        double a = Math.Exp(-5.0 * 4 / 50), tdelay = 4 * Math.Sqrt(250e-9 * 100e-12);
        double worstRx = 0, worstSrc = 0;
        for (int k = 0; k < r.Time.Length; k++)
        {
            double t = r.Time[k];
            worstRx = Math.Max(worstRx, Math.Abs(r.Probe("rx").Volts[k] - a * Vs(t - tdelay) / 2));
            worstSrc = Math.Max(worstSrc, Math.Abs(r.Probe("src").Volts[k] - Vs(t) / 2));
        }
        double peak = a * 1.0 / 2;
        Console.WriteLine($"distortionless pulse: worst far-end error {worstRx:E3} V ({100 * worstRx / peak:F3} % of {peak:F5} V), source {worstSrc:E3} V");
        Assert.True(worstRx < 0.005 * peak, $"far end off by {worstRx:E3} V, more than 0.5 % of {peak:F5} V");
        Assert.True(worstSrc < 0.005 * 0.5, $"source node off by {worstSrc:E3} V, more than 0.5 % of 0.5 V");
    }

    [Fact]
    public void Without_loss_keys_segments_keep_their_constant_R_and_G()
    {
        // R_dc = ρ/(w·t) with annealed copper 1.7241e-8 ohm·m (IACS; ReferenceData/published-checks.md §4); G = the explicit g, bit for bit.
        var s = TestScenarios.Parse(Yaml);
        var segs = s.Line.OfType<Segment>().ToArray();
        Assert.All(segs, x => Assert.Null(x.Loss));
        Assert.All(segs, x => Assert.Equal(x.Delay, x.FrontDelay));
        Assert.Equal(20, segs[0].R);
        Assert.Equal(5e-3, segs[0].G);
        Assert.Equal(1.7241e-8 / (0.3e-3 * 35e-6), segs[1].R, 1e-9);
        Assert.Equal(FormerG, segs[1].G);
        Assert.Equal(30, segs[2].R);
        Assert.Equal(0, segs[2].G);
        // An explicit 'loss: constant' beside a geometry is the same as leaving it out.
        var same = TestScenarios.Parse(Yaml.Replace("tand: 0.02 }", "tand: 0.02 }\n      loss: constant"));
        var again = (Segment)same.Line[2];
        Assert.Null(again.Loss);
        Assert.Equal((segs[1].R, segs[1].L, segs[1].G, segs[1].C), (again.R, again.L, again.G, again.C));
    }
}
