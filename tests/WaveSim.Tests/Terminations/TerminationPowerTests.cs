using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Terminations;

/// <summary>The mean power of each strategy over the record, from the simulated v·i of its resistors.</summary>
public class TerminationPowerTests
{
    // A 50 MHz square wave (period T = 20 ns, 1 V, 20 ps rise and fall) from an ideal driver (0 ohm) down a 1 ps stretch of
    // 50 ohm line: the line is electrically short (its L = 50 pH and C = 0.02 pF are negligible), so the end node follows the
    // driver's open-circuit voltage. The record holds exactly four periods.
    const string Clock = @"title: square wave into a short line
source: { waveform: trapezoid, low: 0 V, high: 1 V, rise: 20 ps, width: 9.975 ns, period: 20 ns, resistance: 0 ohm }
line:
  - segment: { length: 0.2 mm, z0: 50 ohm, delay: 1 ps }
load: open
probes:
  - { name: rx, at: load }
simulation: { duration: 80 ns, resolution: 2 }
";

    [Fact]
    public void The_RC_termination_on_a_clock_burns_C_V_squared_f_and_the_parallel_one_V_squared_over_R_for_the_time_high()
    {
        // R·C ≈ 1.1 ns: 500 round trips of the 1 ps line, far longer than the 25 ps ramp and far shorter than the 10 ns half period.
        var study = TerminationStudy.Run(TestScenarios.Parse(Clock), new TerminationOptions { RcRoundTrips = 500 });
        TerminationOutcome Get(TerminationKind k) => study.Outcomes.Single(o => o.Design.Kind == k);
        var rc = Get(TerminationKind.Rc);
        double r = rc.Design.Parts[0].Used, c = rc.Design.Parts[1].Used, a = r * c, v = 1, f = 1 / 20e-9, tau = 1.25 * 20e-12;
        Assert.InRange(a, 1e-9, 1.2e-9);

        // Common practice, no source: an RC termination dissipates C·V²·f. Derivation: each complete edge of height V charges
        // (or discharges) C through R; the current is i = C·dv_C/dt, and for a step it is (V/R)·e^(−t/RC), so the energy in R is
        // ∫ R·i² dt = (V²/R)·RC/2 = C·V²/2 whatever R is. A square wave has two edges per period: P = 2·(C·V²/2)·f = C·V²·f.
        // With the edge a ramp of duration τ instead of a step (i = (C·V/τ)(1 − e^(−t/RC)) during it, then decaying), the same
        // integral gives C·V²·(RC/τ)·[1 − (RC/τ)(1 − e^(−τ/RC))] per edge, which tends to C·V²/2 as τ/RC → 0 (here 0.8 % less).
        // (ReferenceData/termination-verdicts.md, "Power in an RC termination on a square wave".)
        double perEdge = c * v * v * (a / tau) * (1 - a / tau * (1 - Math.Exp(-tau / a)));
        double expected = 2 * perEdge * f;
        Assert.Equal(c * v * v * f, expected, c * v * v * f * 0.01);
        Assert.Equal(expected, rc.PowerAverageW!.Value, expected * 0.01);
        Assert.Equal(0, rc.PowerHighW!.Value);   // no DC current through the capacitor

        // Parallel R to 0 V: P = ⟨v²⟩/R (Joule's law). Over one period v² is V² for the width, and a linear ramp contributes
        // ∫₀^τ (V·t/τ)² dt = V²·τ/3 on each edge: ⟨v²⟩ = V²·(width + 2τ/3)/T.
        var par = Get(TerminationKind.Parallel);
        double rp = par.Design.Parts[0].Used, meanSquare = v * v * (9.975e-9 + 2 * tau / 3) / 20e-9;
        Assert.Equal(meanSquare / rp, par.PowerAverageW!.Value, meanSquare / rp * 0.005);

        // The net as drawn is an open end: no termination resistor, no power; "none" is the same net and does not apply.
        Assert.Equal(0, Get(TerminationKind.AsDrawn).PowerAverageW!.Value);
        Assert.Null(Get(TerminationKind.None).Result);
    }
}
