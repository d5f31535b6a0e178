using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// The level each probe's first edge settles to comes from the network's DC solution with the driver held high, so a pulse
/// or a clock that never settles within its record is still measured against the right level.
/// </summary>
public class SettledLevelTests
{
    // A 2 ns pulse into a load capacitor with a time constant of at least (25 ∥ 100 ohm)·200 pF = 4 ns: the record never settles.
    const string SlowLoad = @"
source: { waveform: pulse, low: 0 V, high: 1 V, rise: 100 ps, width: 2 ns, delay: 0.5 ns, resistance: 25 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 5 ns/m }
load: { r: 100 ohm, c: 200 pF }
probes:
  - { name: near, at: source }
  - { name: far, at: load }
simulation: { duration: 8 ns, resolution: 10 }
";

    [Fact]
    public void A_pulse_that_never_settles_is_measured_against_the_resistive_divider_level()
    {
        var r = TestScenarios.Run(SlowLoad);
        // DC: the capacitor is open and the lossless line a short, so every node sits at 1 V · 100/(25 + 100) = 0.8 V
        // (voltage divider, Ohm's law).
        Assert.All(r.Probes, p => Assert.Equal(0.8, p.SettledVolts!.Value, 1e-9));
        var figures = RunAnalysis.Figures(r);
        Assert.All(figures, f => Assert.Equal(0.8, f.Figures.HighV!.Value, 1e-9));
        // Within the 2 ns pulse the far end charges to at most 1 − e^(−2/4) = 39 % of 0.8 V (first-order RC charging), so
        // against the true level its edge never reaches half way and has no edge figures, instead of figures of a false plateau.
        var far = figures.Single(f => f.Probe.Name == "far").Figures;
        Assert.True(r.Probe("far").Volts.Max() < 0.4 * 0.8, $"far end peaks at {r.Probe("far").Volts.Max()} V");
        Assert.Null(far.OvershootPct);
        Assert.Null(far.Rise1090S);
    }

    [Fact]
    public void Along_a_lossy_line_the_settled_level_follows_the_series_resistance()
    {
        const string yaml = @"
source: { waveform: step, low: 0 V, high: 2 V, rise: 100 ps, delay: 0.2 ns, resistance: 15 ohm }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns/m, r: 10 ohm/m }
load: { r: 75 ohm }
probes:
  - { name: near, at: source }
  - { name: far, at: load }
simulation: { duration: 4 ns, resolution: 10 }
";
        var r = TestScenarios.Run(yaml);
        // DC divider 15 + 10 + 75 ohm: the line's input sits at 2 V · 85/100, its end at 2 V · 75/100 (Ohm's law).
        Assert.Equal(1.7, r.Probe("near").SettledVolts!.Value, 1e-9);
        Assert.Equal(1.5, r.Probe("far").SettledVolts!.Value, 1e-9);
    }

    [Fact]
    public void Shapes_without_a_held_level_leave_the_level_to_the_record()
    {
        const string yaml = @"
source: { waveform: gaussian, low: 0 V, high: 1 V, width: 200 ps, delay: 0.2 ns, resistance: 50 ohm }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: far, at: load }
simulation: { duration: 3 ns, resolution: 10 }
";
        var r = TestScenarios.Run(yaml);
        Assert.Null(r.Probe("far").SettledVolts);
    }
}
