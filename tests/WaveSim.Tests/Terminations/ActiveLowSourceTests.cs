using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Terminations;

/// <summary>
/// A driver that idles high and pulses low (source.low above source.high: "low" is the initial level) is judged on the same
/// voltages as the same net driven the other way up: the receiver's settled levels are the lower and the higher of its two
/// DC levels, and the Thevenin pair returns to the higher driver level. Derived by Ohm's law below
/// (ReferenceData/termination-verdicts.md, settled levels of a bus terminated to VTT).
/// </summary>
public class ActiveLowSourceTests
{
    // 18 ohm driver idling at 3.3 V, a 50 ohm line matched at its end by 50 ohm to VTT = 1.65 V: nothing reflects.
    const string ActiveLow = @"title: active-low clock into a VTT-matched line
source: { waveform: trapezoid, low: 3.3 V, high: 0 V, rise: 800 ps, delay: 1 ns, width: 9 ns, period: 20 ns, resistance: 18 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 6.8 ns/m }
load: { r: 50 ohm, to: 1.65 V, receiver: { vih: 2.0 V, vil: 0.8 V } }
probes:
  - { name: rx, at: load }
simulation: { duration: 40 ns, resolution: 10 }
";

    [Fact]
    public void The_matched_net_passes_with_the_levels_of_Ohms_law_whichever_level_the_driver_idles_at()
    {
        var study = TerminationStudy.Run(TestScenarios.Parse(ActiveLow));
        var drawn = study.Outcomes.Single(o => o.Design.Kind == TerminationKind.AsDrawn);
        var v = drawn.Verdicts.Single(x => x.Probe == "rx");
        // Ohm's law at DC (lossless line): driver at 0 V: VTT·18/(18 + 50) = 0.4368 V; driver at 3.3 V:
        // VTT + (3.3 − VTT)·50/68 = 2.8632 V. Margins VIL − 0.4368 = 0.3632 V and 2.8632 − VIH = 0.8632 V.
        Assert.Equal(1.65 * 18 / 68, v.LowV!.Value, 1e-9);
        Assert.Equal(1.65 + 1.65 * 50 / 68, v.HighV!.Value, 1e-9);
        Assert.Equal(0.8 - 1.65 * 18 / 68, v.MarginLowV!.Value, 1e-9);
        // A matched end reflects nothing (Γ = (50 − 50)/(50 + 50) = 0), so each ramp arrives clean: every rule holds.
        Assert.True(drawn.MeetsLimits, drawn.Verdict);
    }

    [Fact]
    public void The_Thevenin_pair_returns_to_the_higher_driver_level()
    {
        var study = TerminationStudy.Run(TestScenarios.Parse(ActiveLow));
        var thevenin = study.Outcomes.Single(o => o.Design.Kind == TerminationKind.Thevenin);
        // R1 = Z0·Vcc/Vt = 50·3.3/1.65 = 100 ohm, R2 = Z0·Vcc/(Vcc − Vt) = 100 ohm (common practice, no source), with
        // Vcc = 3.3 V, the higher of the two driver levels, and Vt halfway: 1.65 V. 100 ohm is an E96 value (IEC 60063).
        Assert.NotNull(thevenin.Design.Variant);
        Assert.Equal([100.0, 100.0], thevenin.Design.Parts.Select(p => p.Used));
        // Driver at 3.3 V: the pair is 50 ohm to 1.65 V, so the load sits at 2.8632 V (as above) and the pair burns
        // (3.3 − V)²/100 + V²/100 = 83.9 mW (P = V²/R).
        double vHigh = 1.65 + 1.65 * 50 / 68;
        double p = (3.3 - vHigh) * (3.3 - vHigh) / 100 + vHigh * vHigh / 100;
        Assert.Equal(p, thevenin.PowerHighW!.Value, 1e-6);
    }
}
