using WaveSim.Core.Analysis;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// First-edge figures of a clock stop where the next source edge reaches the probe; they never run across later edges, and
/// an edge that has not settled by then is "not settled before next edge", not a settling time spanning edges. Expected values
/// from the lattice diagram (Johnson and Graham, High-Speed Digital Design, 1993, ch. 4; from memory) with
/// Γ = (R − Z0)/(R + Z0) (Pozar, Microwave Engineering, 4th ed. 2012, eq. 2.35; ReferenceData/published-checks.md §10);
/// the derived values are restated in ReferenceData/edge-windows.md §1 and §2.
/// </summary>
public class FirstEdgeWindowTests
{
    // Matched at both ends: the load is half the source, delayed by Td = 0.5 ns (Γs = ΓL = 0). The record ends high (25 ns:
    // rises at 1, 11 and 21 ns), so a figure taken over the whole record would run through the falling edges.
    const string MatchedClock = @"title: matched clock
source: { waveform: trapezoid, low: 0 V, high: 1 V, rise: 100 ps, fall: 100 ps, delay: 1 ns, width: 4 ns, period: 10 ns, resistance: 50 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: rx, at: load }
simulation: { duration: 25 ns, output_step: 100 ps }
";

    [Fact]
    public void A_clean_clock_that_ends_high_has_no_undershoot_and_settles_on_its_first_edge()
    {
        var f = RunAnalysis.Figures(TestScenarios.Run(MatchedClock)).Single().Figures;
        // Linear 0-100 % ramp of 1.25 × 100 ps = 125 ps (docs/scenario-format.md). The load enters ±5 % of 0.5 V when its ramp is
        // 95 % done: at 1 ns + Td + 0.95 × 125 ps; settling counts from the edge's arrival at the load, the source's 50 % instant
        // plus the line delay, 1 ns + 62.5 ps + Td (ReferenceData/settling.md §3).
        const double Td = 0.5e-9, Ramp = 125e-12;
        double settling = 0.95 * Ramp - 0.5 * Ramp;   // 56.25 ps; from the source's 50 % instant it was Td more, 556.25 ps
        Assert.Equal(settling, f.SettlingS!.Value, 2e-12);
        Assert.Equal(0, f.UndershootPct!.Value, 0.05);      // was 100 %: the falling edges taken for a ring-down
        Assert.Equal(0, f.OvershootPct!.Value, 0.05);
        Assert.False(f.UnsettledAtNextEdge);
        // The window ends where the source's fall starts (1 ns + 125 ps + 4 ns), delayed by Td to the load.
        Assert.Equal(1e-9 + Ramp + 4e-9 + Td, f.FirstEdgeWindowEndS!.Value, 1e-12);
    }

    // Rs = 10 ohm into a 50 ohm open line, Td = 1 ns: Γs = −2/3, ΓL = +1. The load steps to 5/3, 5/9, 35/27, ... V every 2 ns;
    // it is within ±5 % of 1 V only after the 7th arrival (15 ns), long after the fall reaches it at 4.125 + 1 ns.
    const string RingingClock = @"title: ringing clock
source: { waveform: trapezoid, low: 0 V, high: 1 V, rise: 100 ps, fall: 100 ps, width: 4 ns, period: 10 ns, resistance: 10 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
probes:
  - { name: rx, at: load }
simulation: { duration: 18 ns, output_step: 200 ps }
";

    [Fact]
    public void A_ringing_clock_edge_is_measured_up_to_the_next_edge_and_reported_not_settled()
    {
        var f = RunAnalysis.Figures(TestScenarios.Run(RingingClock)).Single().Figures;
        const double GammaS = -2.0 / 3;
        double first = 1 - GammaS, second = first * (1 + GammaS);   // 5/3 V and 5/9 V (open end doubles the launched wave)
        Assert.Equal((first - 1) * 100, f.OvershootPct!.Value, 0.1);   // 66.7 %
        // Undershoot is the ring-down to 5/9 V inside the window (44.4 %), not the later falls below 0 V (over 100 %).
        Assert.Equal((1 - second) * 100, f.UndershootPct!.Value, 0.1);
        Assert.Null(f.SettlingS);
        Assert.True(f.UnsettledAtNextEdge);
    }

    [Fact]
    public void The_run_summary_says_plainly_that_an_edge_did_not_settle_before_the_next()
    {
        using var cli = new CliRunner();
        var (code, stdout, _) = CliRunner.Run("run", cli.Write("clock.yaml", RingingClock), "--out", cli.PathOf("out"));
        Assert.Equal(0, code);
        Assert.Contains("rx: not settled before next edge", stdout);
    }
}
