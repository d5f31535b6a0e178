using WaveSim.Core.Model;
using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Where each source edge starts, as the verdict's edge windows use it. The expected instants come from the source's own
/// definition (SourceSpec and docs/scenario-format.md): an edge starts at source.delay, a linear edge is a 0-100 % ramp of
/// 1.25 × its 10-90 time, a pulse holds `width` at high between its ramps, and an edge shorter than the run's minimum edge
/// (a zero one included) is a Gaussian-filtered step cut at ±4σ, σ = minimum / 2.5631 (ReferenceData/source-edges.md,
/// "Gaussian-filtered step"). Nothing here is taken from the code under test.
/// </summary>
public class SourceEdgeStartTests
{
    const double Sigma10To90 = 2.5631031310892;   // 2√2·erf⁻¹(0.8), ReferenceData/source-edges.md

    static double[] Grid(double stop, double step) => Enumerable.Range(0, (int)Math.Round(stop / step) + 1).Select(k => k * step).ToArray();

    [Fact]
    public void A_pulse_with_fall_0_starts_its_widened_falling_edge_where_the_high_time_ends()
    {
        double rise = 1e-9, width = 5e-9, delay = 1e-9, minimum = 60e-12;
        var src = new SourceSpec { Waveform = WaveformKind.Pulse, Low = 0, High = 1, Rise = rise, Fall = 0, Delay = delay, Width = width, MinimumEdge = minimum };
        var edges = SourceEdgeFinder.Find(src, Grid(12e-9, 0.5e-12));
        Assert.Equal(2, edges.Count);
        Assert.True(edges[0].Rising);
        Assert.Equal(delay, edges[0].StartS, 1e-12);
        // The fall is widened (0 < minimum): it starts after the 1.25·rise ramp and the width, and its middle is 4σ later.
        double fallStart = delay + 1.25 * rise + width;
        Assert.False(edges[1].Rising);
        Assert.Equal(fallStart, edges[1].StartS, 1e-12);
        Assert.Equal(fallStart + 4 * minimum / Sigma10To90, edges[1].SourceMidS, 1e-12);
    }

    [Fact]
    public void A_step_whose_rise_is_widened_starts_its_edge_at_the_source_delay()
    {
        double delay = 2e-9, minimum = 60e-12;
        var src = new SourceSpec { Waveform = WaveformKind.Step, Low = 0, High = 3.3, Rise = 10e-12, Delay = delay, MinimumEdge = minimum };
        var edges = SourceEdgeFinder.Find(src, Grid(5e-9, 0.5e-12));
        Assert.Single(edges);
        Assert.Equal(delay, edges[0].StartS, 1e-12);
        Assert.Equal(delay + 4 * minimum / Sigma10To90, edges[0].SourceMidS, 1e-12);
    }

    /// <summary>
    /// A 1 ns pulse with `fall: 0 ps` on a matched 1 ns line: the first-edge figures end where the fall starts at the far end,
    /// source.delay + 1.25 × rise + width + the line's delay (the definitions above; the line delay is the segment's own).
    /// </summary>
    [Fact]
    public void The_first_edge_window_of_a_pulse_with_fall_0_ends_where_its_fall_starts_at_the_probe()
    {
        var r = TestScenarios.Run(@"
source: { waveform: pulse, high: 1 V, rise: 1 ns, fall: 0 ps, width: 5 ns, delay: 1 ns, resistance: 50 ohm }
line: [ { segment: { length: 100 mm, z0: 50 ohm, delay: 1 ns } } ]
load: { r: 50 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 12 ns, resolution: 10 }
");
        var f = RunAnalysis.Figures(r).Single().Figures;
        Assert.Equal(1e-9 + 1.25e-9 + 5e-9 + 1e-9, f.FirstEdgeWindowEndS!.Value, 1e-12);
    }
}
