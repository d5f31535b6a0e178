using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>above_high_V and below_low_V: the worst excursions beyond the settled levels over the whole record, every edge.</summary>
public class RecordExtremeTests
{
    // A strong driver (10 ohm) into an open 50 ohm line: a 1 V pulse long enough for the ringing to die out between edges.
    const string Yaml = @"
source: { waveform: pulse, low: 0 V, high: 1 V, rise: 100 ps, width: 60 ns, delay: 0.5 ns, resistance: 10 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 5 ns/m }
load: { r: 1 Mohm }
probes:
  - { name: far, at: load }
simulation: { duration: 130 ns, resolution: 10 }
";

    [Fact]
    public void An_open_line_overshoots_both_rails_by_the_first_reflection()
    {
        var r = TestScenarios.Run(Yaml);
        var f = RunAnalysis.Figures(r).Single().Figures;
        // Lattice diagram (Bewley, Traveling Waves on Transmission Systems, Wiley 1933, from memory): the launched wave is 1 V · 50/(10 + 50),
        // doubled by the open end, so the far end first reaches 2 · 5/6 = 1.667 V; every later peak is smaller, since the
        // source reflects with Γ = (10 − 50)/(10 + 50) = −2/3. The falling edge, from a settled 1 V plateau, mirrors it to
        // 1 − 1.667 = −0.667 V. The load's 1 Mohm moves the DC levels by about 1e-5 V.
        Assert.Equal(1.0, f.HighV!.Value, 1e-4);
        Assert.Equal(2.0 / 3, f.AboveHighV!.Value, 1e-3);
        Assert.Equal(2.0 / 3, f.BelowLowV!.Value, 1e-3);
        // The first-edge figures see only the rising edge's overshoot, the same 66.7 % of the 1 V swing.
        Assert.Equal(200.0 / 3, f.OvershootPct!.Value, 0.1);
    }
}
