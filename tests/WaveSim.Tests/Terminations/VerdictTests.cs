using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Reports;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Terminations;

/// <summary>
/// The receiver verdict shared by <c>terminations</c> and <c>report</c>: settled levels against the thresholds, and every edge
/// judged on its own. The rules are common practice, no source (docs/verdicts.md); the levels they are judged on come from
/// Ohm's law and the lattice-diagram method, derived here by hand.
/// </summary>
public class VerdictTests
{
    // A bus driven by an 18 ohm driver, 50 ohm trace with a tap stub to a first receiver, parallel-terminated at the far end by
    // 50 ohm to VTT = 1.65 V (the net as drawn). Both receivers read VIH 2.0 V, VIL 0.8 V.
    internal const string VttBus = @"title: VTT bus
source: { waveform: step, low: 0 V, high: 3.3 V, rise: 500 ps, delay: 1 ns, resistance: 18 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 6.8 ns/m }
  - branch:
      name: stub
      line:
        - segment: { length: 15 mm, z0: 50 ohm, delay: 6.8 ns/m }
      load: { c: 2 pF, receiver: { vih: 2.0 V, vil: 0.8 V } }
  - segment: { length: 100 mm, z0: 50 ohm, delay: 6.8 ns/m }
load: { r: 50 ohm, to: 1.65 V, c: 2 pF, receiver: { vih: 2.0 V, vil: 0.8 V } }
probes:
  - { name: rx1, at: stub/load }
  - { name: rx2, at: load }
simulation: { duration: 20 ns, resolution: 10 }
";

    [Fact]
    public void The_series_resistor_that_lifts_the_low_level_above_VIL_fails_at_every_receiver()
    {
        var study = TerminationStudy.Run(TestScenarios.Parse(VttBus));
        var series = study.Outcomes.Single(o => o.Design.Kind == TerminationKind.Series);
        // R = Z0 − R_driver = 50 − 18 = 32 ohm (common practice, no source); nearest E96 value 32.4 ohm (IEC 60063).
        Assert.Equal(32.4, series.Design.Parts[0].Used, 1e-9);

        // Ohm's law, resistive divider at DC (capacitors open, lossless line): with the driver held at 0 V, the load node sits
        // between VTT through the 50 ohm termination and ground through 18 + 32.4 ohm: V = VTT·(18 + 32.4)/(18 + 32.4 + 50)
        // = 1.65·50.4/100.4 = 0.8283 V. The stub carries no DC current, so both receivers sit at it. VIL − V = −28.3 mV.
        // (ReferenceData/termination-verdicts.md, "Settled levels of a bus terminated to VTT".)
        double low = 1.65 * (18 + 32.4) / (18 + 32.4 + 50);
        Assert.Equal(0.828, low, 1e-3);
        foreach (string probe in new[] { "rx1", "rx2" })
        {
            var v = series.Verdicts.Single(x => x.Probe == probe);
            Assert.Equal(low, v.LowV!.Value, 1e-9);
            Assert.Equal(0.8 - low, v.MarginLowV!.Value, 1e-9);
            Assert.False(v.Pass);
            var f = Assert.Single(v.Failures, x => x.Rule == VerdictRule.Levels);
            Assert.Contains("settled low", f.Detail);
            Assert.Contains(probe, f.ToString());
        }
        Assert.False(series.MeetsLimits);
        Assert.DoesNotContain(study.Outcomes, o => o.Design.Kind == TerminationKind.Series && o.Verdict == "ok");

        // The net as drawn: V_low = VTT·18/(18 + 50) = 0.437 V ≤ VIL, V_high = VTT + (3.3 − VTT)·50/68 = 2.863 V ≥ VIH (same law).
        var drawn = study.Outcomes[0];
        Assert.Equal(TerminationKind.AsDrawn, drawn.Design.Kind);
        var rx2 = drawn.Verdicts.Single(x => x.Probe == "rx2");
        Assert.Equal(1.65 * 18 / 68, rx2.LowV!.Value, 1e-9);
        Assert.Equal(1.65 + 1.65 * 50 / 68, rx2.HighV!.Value, 1e-9);
        Assert.DoesNotContain(drawn.Failures, x => x.Rule == VerdictRule.Levels);
    }

    [Fact]
    public void Every_edge_is_judged_and_a_falling_edge_that_rings_back_into_the_band_fails_where_the_first_edge_passes()
    {
        // ReferenceData/published-checks.md §10, case B1 (standard lattice-diagram method; Γ from Pozar, Microwave Engineering,
        // eq. 2.35): 1 V driver, RS = 10 ohm, Z0 = 50 ohm, open end, ΓS = −2/3, ΓL = +1.
        // The rising edge reaches 5/3, 5/9, 35/27, ... V at the load; by linearity the falling edge (after the first has died
        // down) reaches 1 − 5/3 = −2/3, then 1 − 5/9 = 4/9 V, ... With VIH 0.5 V and VIL 0.15 V the rising edge never comes back
        // below VIH (lowest 5/9 V: margin 1/18 V) but the falling one rings back to 4/9 V, inside the band (margin 0.15 − 4/9 V).
        // The crossing count over the whole record is 2 for 2 edges, so counting crossings alone passes this net.
        // (ReferenceData/termination-verdicts.md, "Ringing of a pulse on an open line".)
        const string yaml = @"title: pulse on a ringing line
source: { waveform: pulse, low: 0 V, high: 1 V, rise: 500 ps, width: 40 ns, delay: 1 ns, resistance: 10 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { receiver: { vih: 0.5 V, vil: 0.15 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 85 ns, resolution: 10 }
";
        var report = Reports.ReportScenarios.Build(yaml);
        var v = report.Checks.Single(c => c.Probe == "rx").Verdict;
        Assert.Equal(2, v.Edges.Count);
        Assert.True(v.Edges[0].Edge.Rising);
        Assert.Equal(1, v.Edges[0].Crossings);
        Assert.Equal(1, v.Edges[1].Crossings);
        Assert.Equal(5.0 / 9 - 0.5, v.Edges[0].RingbackMarginV!.Value, 2e-3);
        Assert.Equal(0.15 - 4.0 / 9, v.Edges[1].RingbackMarginV!.Value, 2e-3);
        var ring = Assert.Single(v.Failures, f => f.Rule == VerdictRule.Ringback);
        Assert.Equal(2, ring.Edge);
        Assert.False(ring.Rising);
        Assert.False(report.Checks.Single(c => c.Probe == "rx").Pass);
        Assert.False(report.Checks.Single(c => c.Probe == "rx").RingbackOk);
    }

    [Fact]
    public void A_step_that_re_crosses_the_band_fails_on_the_crossing_rule_at_its_edge()
    {
        // ReferenceData/published-checks.md §10, case B1 (lattice diagram), as in the report's ringing net: 0 → 5/3 → 5/9 → 35/27 V
        // with VIH 0.75 V, VIL 0.6 V crosses the band three times on its one edge.
        var report = Reports.ReportScenarios.Build(Reports.ReportScenarios.Ringing);
        var v = report.Checks.Single(c => c.Probe == "rx").Verdict;
        var edge = Assert.Single(v.Edges);
        Assert.Equal(3, edge.Crossings);
        var f = Assert.Single(v.Failures, x => x.Rule == VerdictRule.Crossings);
        Assert.Equal(1, f.Edge);
        Assert.Contains("3 times", f.Detail);
    }

    [Fact]
    public void Terminations_and_report_give_the_same_verdict_on_the_same_net()
    {
        // No outside source: both commands must judge through one rule set (docs/verdicts.md).
        var s = TestScenarios.Parse(VttBus);
        var study = TerminationStudy.Run(s);
        var report = HtmlReport.Build(ReportInput.For(Simulate.Run(s, HtmlReport.RunOptions()), VttBus));
        var drawn = study.Outcomes[0];
        foreach (var c in report.Checks)
        {
            var t = drawn.Verdicts.Single(v => v.Probe == c.Probe);
            Assert.Equal(t.Pass, c.Pass);
            Assert.Equal(t.Summary(), c.Verdict.Summary());
        }
    }

    [Fact]
    public void The_multi_drop_example_passes_as_drawn_and_fails_the_series_resistor_on_its_low_level()
    {
        var s = Core.Scenarios.ScenarioLoader.Load(Repository.PathOf("scenarios", "multidrop-vtt.yaml"));
        var study = TerminationStudy.Run(s);
        TerminationOutcome Get(TerminationKind k) => study.Outcomes.Single(o => o.Design.Kind == k);
        var drawn = Get(TerminationKind.AsDrawn);
        Assert.Equal(["u1", "u2", "u3"], drawn.Verdicts.Where(v => v.Judged).Select(v => v.Probe));
        // Four edges reach every receiver: the clock rises at 1 and 21 ns and falls at 11 and 31 ns in the 40 ns record.
        Assert.All(drawn.Verdicts.Where(v => v.Judged), v => Assert.Equal([true, false, true, false], v.Edges.Select(e => e.Edge.Rising)));
        // Ohm's law at DC, 18 ohm driver against 50 ohm to VTT = 1.65 V (stubs carry no DC current, the line is lossless):
        // low = 1.65·18/68 = 0.4368 V, high = 1.65 + 1.65·50/68 = 2.8632 V at every receiver.
        Assert.All(drawn.Verdicts.Where(v => v.Judged), v =>
        {
            Assert.Equal(1.65 * 18 / 68, v.LowV!.Value, 1e-9);
            Assert.Equal(1.65 + 1.65 * 50 / 68, v.HighV!.Value, 1e-9);
        });
        Assert.True(drawn.MeetsLimits, drawn.Verdict);
        // Series 32.4 ohm (E96 nearest 50 − 18, IEC 60063): low = 1.65·50.4/100.4 = 0.828 V > VIL 0.8 V at every receiver.
        var series = Get(TerminationKind.Series);
        Assert.All(series.Verdicts.Where(v => v.Judged), v => Assert.Contains(v.Failures, f => f.Rule == VerdictRule.Levels));
        Assert.False(Get(TerminationKind.None).MeetsLimits);
        Assert.False(Get(TerminationKind.Rc).MeetsLimits);
        Assert.True(Get(TerminationKind.Parallel).MeetsLimits, Get(TerminationKind.Parallel).Verdict);
    }
}
