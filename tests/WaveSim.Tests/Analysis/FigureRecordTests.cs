using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Figures do not depend on simulation.output_step, which only thins the CSV. The net: a 1 V step through Rs = Z0/3 into a
/// 50 ohm open line with Td = 200 ps and a 400 ps edge (a 500 ps ramp, longer than the 400 ps round trip, so the far end peaks
/// at a corner between samples of a coarse record). Expected values from the lattice diagram (Johnson and Graham, High-Speed
/// Digital Design, 1993, ch. 4; from memory) with Γs = (Rs − Z0)/(Rs + Z0) and ΓL = +1 for the open end (Pozar, Microwave
/// Engineering, 4th ed. 2012, eq. 2.35; ReferenceData/published-checks.md §10).
/// </summary>
public class FigureRecordTests
{
    const double Z0 = 50, Rs = 50.0 / 3, Td = 200e-12, Delay = 0.5e-9, Ramp = 1.25 * 400e-12;
    const double GammaS = (Rs - Z0) / (Rs + Z0), GammaL = 1;

    static string Net(string step) => $@"
source: {{ waveform: step, low: 0 V, high: 1 V, rise: 400 ps, delay: 0.5 ns, resistance: {Rs.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} ohm }}
line:
  - segment: {{ length: 40 mm, z0: 50 ohm, delay: 5 ns/m }}
probes:
  - {{ name: src, at: source }}
  - {{ name: rx, at: load }}
simulation: {{ duration: 12 ns, output_step: {step} }}
";

    /// <summary>Lattice diagram at the open end: Σk (1 − Γs)·(Γs·ΓL)^k · ramp(t − delay − (2k + 1)·Td), for a 1 V source.</summary>
    static double FarEnd(double t)
    {
        double v = 0;
        for (int k = 0; k < 60; k++)
            v += (1 - GammaS) * Math.Pow(GammaS * GammaL, k) * Math.Clamp((t - Delay - (2 * k + 1) * Td) / Ramp, 0, 1);
        return v;
    }

    /// <summary>The far end's peak: a sum of ramps is piecewise linear, so its maximum is at a ramp's start or end.</summary>
    static double FarEndPeak()
    {
        double peak = 0;
        for (int k = 0; k < 60; k++)
            foreach (double t in new[] { Delay + (2 * k + 1) * Td, Delay + (2 * k + 1) * Td + Ramp })
                peak = Math.Max(peak, FarEnd(t));
        return peak;
    }

    [Theory]
    [InlineData("10 ps")]
    [InlineData("500 ps")]
    [InlineData("1 ns")]
    public void Overshoot_and_delays_follow_the_lattice_diagram_whatever_the_output_step(string step)
    {
        var r = TestScenarios.Run(Net(step));
        var figures = RunAnalysis.Figures(r).ToDictionary(x => x.Probe.Name, x => x.Figures);

        // Far end: overshoot = peak − 1 of the lattice sum (35 % for these values), to 0.05 % of the swing (at Courant number 1
        // the leapfrog is exact on a lossless line, Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2).
        double expectedOvershoot = (FarEndPeak() - 1) * 100;
        Assert.Equal(expectedOvershoot, figures["rx"].OvershootPct!.Value, 0.05);
        // It first crosses 50 % on its first ramp, (1 − Γs)·x = 0.5, before the second arrival at 3·Td.
        double rxDelay = Td + Ramp * 0.5 / (1 - GammaS) - Ramp / 2;
        Assert.Equal(rxDelay, figures["rx"].Delay50S!.Value, 2e-12);

        // Source pin: the launch divider (1 − Γs)/2 of the source ramp until the reflection returns at 2·Td, so it crosses
        // half the swing at x = 1/(1 − Γs) of the ramp; the delay is that minus the source's own 50 % instant.
        double srcDelay = Ramp / (1 - GammaS) - Ramp / 2;
        Assert.True(Ramp / (1 - GammaS) < 2 * Td);
        Assert.Equal(srcDelay, figures["src"].Delay50S!.Value, 2e-12);
    }

    [Fact]
    public void A_coarse_output_step_thins_the_csv_but_not_the_figures()
    {
        var fine = TestScenarios.Run(Net("10 ps"));
        var coarse = TestScenarios.Run(Net("1 ns"));
        Assert.Equal(13, coarse.Time.Length);   // 0 to 12 ns in 1 ns: the CSV stays thin
        var a = RunAnalysis.Figures(fine).ToDictionary(x => x.Probe.Name, x => x.Figures);
        var b = RunAnalysis.Figures(coarse).ToDictionary(x => x.Probe.Name, x => x.Figures);
        foreach (string p in new[] { "src", "rx" })
        {
            // Both come from the same solver steps, so they agree far inside a solver step (10 ps here).
            Assert.Equal(a[p].OvershootPct!.Value, b[p].OvershootPct!.Value, 0.5);
            Assert.Equal(a[p].UndershootPct!.Value, b[p].UndershootPct!.Value, 0.5);
            Assert.Equal(a[p].Rise1090S!.Value, b[p].Rise1090S!.Value, 1e-12);
            Assert.Equal(a[p].Delay50S!.Value, b[p].Delay50S!.Value, 1e-12);
            Assert.Equal(a[p].SettlingS!.Value, b[p].SettlingS!.Value, 1e-12);
            Assert.Equal(a[p].AboveHighV!.Value, b[p].AboveHighV!.Value, 1e-6);
        }
    }

    [Fact]
    public void The_eye_does_not_depend_on_the_output_step()
    {
        // Matched lossless line (Pozar eq. 2.35, Γ = 0 at both ends): the load gets the source stream halved, so the eye opens to
        // the full 0.5 V at the bit centre, whatever output_step thins the CSV to (here 150 ps, under one 200 ps bit).
        string coarseYaml = TestScenarios.MatchedBits.Replace("resolution: 10", "resolution: 10, output_step: 150 ps");
        var fine = RunEyes.Compute(TestScenarios.Run(TestScenarios.MatchedBits)).Single(e => e.Probe.Name == "rx").Diagram!.Figures;
        var coarse = RunEyes.Compute(TestScenarios.Run(coarseYaml)).Single(e => e.Probe.Name == "rx").Diagram!.Figures;
        Assert.Equal(0.5, coarse.EyeHeightV!.Value, 1e-6);
        Assert.Equal(fine.EyeHeightV!.Value, coarse.EyeHeightV!.Value, 1e-9);
        Assert.Equal(fine.EyeWidthS!.Value, coarse.EyeWidthS!.Value, 1e-15);
    }
}
