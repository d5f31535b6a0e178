using WaveSim.Core.Analysis;
using WaveSim.Core.Reports;
using WaveSim.Core.Units;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Verdicts and the report's min/max come from the figure record, not the thinned output samples. The net of
/// <see cref="FigureRecordTests"/>: a 1 V step with a 500 ps ramp through Rs = Z0/3 (Γs = −1/2) into a 50 ohm open line with
/// Td = 200 ps. Lattice diagram (Johnson and Graham, High-Speed Digital Design, 1993, ch. 4; from memory; Γ from Pozar,
/// Microwave Engineering, 4th ed. 2012, eq. 2.35; ReferenceData/published-checks.md §10): the far end is
/// 1.5·r(t − Td) − 0.75·r(t − 3Td) + 0.375·r(t − 5Td) − ..., r the 0-1 ramp; it peaks at 1.5 − 0.75 × 100/500 = 1.35 V at the
/// end of its first ramp, between the samples of a 1 ns output record.
/// </summary>
public class FigureRecordVerdictTests
{
    const string Net = @"title: coarse output
source: { waveform: step, low: 0 V, high: 1 V, rise: 400 ps, delay: 0.5 ns, resistance: 16.666666666666668 ohm }
line:
  - segment: { length: 40 mm, z0: 50 ohm, delay: 5 ns/m }
load: { receiver: { vih: 0.7 V, vil: 0.3 V } }
probes:
  - { name: rx, at: load }
simulation: { duration: 12 ns, output_step: 1 ns }
";

    const double Peak = 1.35;

    [Fact]
    public void The_verdict_overshoot_is_the_lattice_peak_not_the_peak_of_the_output_samples()
    {
        var r = TestScenarios.Run(Net);
        // The 1 ns output samples miss the peak: their largest value is well below 1.35 V (1.0875 V at 2 ns by the same sum; ReferenceData/edge-windows.md §3).
        Assert.True(r.Probe("rx").Volts.Max() < Peak - 0.1);
        var edge = RunAnalysis.Analyse(r, AnalysisOptions.Full).Verdicts.Single().Edges.Single();
        // Settled high is the open end's DC level, 1 V: overshoot 35 % of the 1 V swing, to 0.05 % (exact leapfrog at Courant 1,
        // Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2).
        Assert.Equal((Peak - 1) * 100, edge.OvershootPct!.Value, 0.05);
    }

    [Fact]
    public void The_report_shows_the_peak_of_the_figure_record_as_its_max()
    {
        var s = TestScenarios.Parse(Net);
        var report = HtmlReport.Build(ReportInput.For(Core.Simulate.Run(s, HtmlReport.RunOptions()), Net));
        var doc = Reports.HtmlReportTests.Parse(report.Html);
        var table = doc.Descendants().Single(e => (string?)e.Attribute("id") == "figures");
        int max = table.Elements("tr").First().Elements("th").Select(th => th.Value).ToList().IndexOf("max");
        var row = table.Elements("tr").First(tr => tr.Elements("td").Any()).Elements("td").ToList();
        Assert.Equal(Quantity.Format(Peak, "V", 3), row[max].Value);
    }
}
