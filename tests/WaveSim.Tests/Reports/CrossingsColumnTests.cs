using WaveSim.Core;
using WaveSim.Core.Reports;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Reports;

/// <summary>
/// The crossings column counts the first edge's crossings of the threshold band and shows a settled level that misses its
/// threshold beside the count, where a count of 0 over the record used to read as "never switched". Net: a 0 to 3.3 V step
/// through 50 ohm into a matched 50 ohm line, terminated by 50 ohm to VTT = 1.65 V. Voltage divider (superposition): settled
/// low = 1.65 × 50/100 = 0.825 V, settled high = (3.3 + 1.65)/2 = 2.475 V; Γ = 0 at both ends (Pozar, Microwave Engineering,
/// 4th ed. 2012, eq. 2.35), so the edge goes 0.825 → 2.475 V once. Against Vil 0.8 V the low is 25 mV too high
/// (ReferenceData/edge-windows.md §4).
/// </summary>
public class CrossingsColumnTests
{
    const string VttNet = @"title: vtt net
source: { waveform: step, low: 0 V, high: 3.3 V, rise: 200 ps, resistance: 50 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm, to: 1.65 V, receiver: { vih: 2.0 V, vil: 0.8 V } }
probes:
  - { name: rx, at: load }
simulation: { duration: 5 ns, resolution: 10 }
";

    [Fact]
    public void The_report_column_counts_the_first_edge_and_names_the_low_level_that_misses_VIL()
    {
        var report = ReportScenarios.Build(VttNet);
        var doc = HtmlReportTests.Parse(report.Html);
        var table = doc.Descendants().Single(e => (string?)e.Attribute("id") == "figures");
        int col = table.Elements("tr").First().Elements("th").Select(th => th.Value).ToList().IndexOf("first-edge crossings");
        Assert.True(col >= 0);
        var cell = table.Elements("tr").First(tr => tr.Elements("td").Any()).Elements("td").ToList()[col];
        // One crossing into the high region (from the region the edge comes from), and the level failure beside it.
        Assert.Equal("1; low 825 mV above VIL 800 mV", cell.Value);
        Assert.False(report.Checks[0].Pass);
    }

    [Fact]
    public void The_terminations_table_shows_the_same_cell_for_the_net_as_drawn()
    {
        var study = TerminationStudy.Run(TestScenarios.Parse(VttNet), new TerminationOptions { Serial = true });
        var asDrawn = study.Outcomes.First(o => o.Design.Kind == TerminationKind.AsDrawn);
        Assert.Equal("1; low 825 mV above VIL 800 mV", asDrawn.VerdictAt(study.ReceiverProbe)!.FirstEdgeCrossingsText());
        // The record-wide count of transitions between the regions is 0: the probe never goes below VIL.
        Assert.Equal(0, asDrawn.Receiver!.ThresholdCrossings);
    }
}
