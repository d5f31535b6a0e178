using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Fitting;
using WaveSim.Core.Measurements;
using WaveSim.Core.Reports;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;
using WaveSim.Tests.Reports;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// <c>compare</c>, <c>fit</c> and <c>report</c> on a net between buffer models (the invented demo models of
/// scenarios/buffers/demo33.ibs): known answers from captures made by running the net itself.
/// </summary>
public class BufferCaptureTests
{
    // The demo's clock net, shortened to one edge pair so each of the fit's runs is short.
    const string Net = """
title: buffer capture net
source:
  buffer: { file: buffers/demo33.ibs, model: demo33_io, corner: max }
  waveform: trapezoid
  delay: 1 ns
  width: 8 ns
  period: 20 ns
line:
  - segment: { length: 150 mm, z0: 55 ohm, delay: 6.1 ns/m }
load:
  buffer: { file: buffers/demo33.ibs, model: demo33_in, corner: min }
probes:
  - { name: drv, at: source }
  - { name: rx,  at: load }
simulation:
  duration: 16 ns
  output_step: 10 ps
""";

    // The buffer files are found beside the scenario, as for a file in scenarios/.
    static ScenarioDocument Document(string yaml) => ScenarioLoader.ReadText(yaml, Repository.PathOf("scenarios", "buffer-capture.yaml"));

    /// <summary>The probe rx of a run as a capture whose clock reads <paramref name="shift"/> less than the simulation's.</summary>
    static Capture Shifted(SimulationResult sim, double shift) =>
        new(sim.Time.Select(t => t - shift).ToArray(), sim.Probe("rx").Volts.ToArray(), "synthetic.csv") { TimeColumn = "'time'" };

    [Fact]
    public void Compare_aligns_a_buffer_nets_own_waveform_and_leaves_no_difference()
    {
        // Known answer: the capture is the net's own receiver waveform with its clock 0.4 ns behind, so the alignment is +0.4 ns
        // and nothing is left but interpolation; 1 ps and 1 mV (ours) are far below an edge's 0.5 ns and the 3.6 V swing.
        var s = Document(Net).Scenario;
        var sim = Simulate.Run(s, new RunOptions { Analysis = AnalysisOptions.WaveformsOnly }).Result;
        var r = CaptureComparison.Run(s, Shifted(sim, 0.4e-9), "rx", AlignMode.CrossCorrelation);
        Assert.Equal(0.4e-9, r.Comparison.OffsetS, 1e-12);
        Assert.True(r.Comparison.RmsV < 1e-3, $"RMS {r.Comparison.RmsV} V");
    }

    [Fact]
    public void Fit_recovers_the_lines_delay_from_a_capture_of_the_buffer_net()
    {
        // Known answer: the capture is the net run with 6.1 ns/m (0.915 ns over 150 mm) on the simulation's own clock, fitted without
        // an offset (a free offset would trade against the delay at the receiver: both move its edges); the fit starts at 5 ns/m.
        // The tolerance (ours) is 1 % of the delay: a changed delay moves the solver's grid, so a few ps of the 0.915 ns are the
        // grid's, while a fit that did not move would be 18 % off.
        var truth = Document(Net).Scenario;
        var sim = Simulate.Run(truth, new RunOptions { Analysis = AnalysisOptions.WaveformsOnly }).Result;
        var document = Document(Net.Replace("delay: 6.1 ns/m", "delay: 5 ns/m"));
        var free = new[] { FreeParameter.Parse(document, "line[0].segment.delay") };
        var r = ScenarioFit.Run(document.Scenario, Shifted(sim, 0), "rx", free, new ScenarioFitOptions { Align = AlignMode.None });
        Assert.True(Math.Abs(r.Parameters[0].Value - 6.1e-9) <= 0.01 * 6.1e-9, $"delay {r.Parameters[0].Value:E4} s/m");
        Assert.True(r.RmsV < 5e-3, $"RMS {r.RmsV} V");
        Assert.NotNull(r.Fitted.Source.Buffer);   // the fitted net keeps its buffers
    }

    [Fact]
    public void The_report_lists_each_buffers_model_and_corner()
    {
        var s = Document(Net).Scenario;
        var report = HtmlReport.Build(ReportInput.For(Simulate.Run(s, HtmlReport.RunOptions()), Net));
        var doc = HtmlReportTests.Parse(report.Html);
        var table = doc.Descendants().Single(e => (string?)e.Attribute("id") == "buffers");
        var header = table.Elements("tr").First().Elements("th").Select(th => th.Value).ToList();
        var rows = table.Elements("tr").Where(tr => tr.Elements("td").Any()).Select(tr => tr.Elements("td").Select(td => td.Value).ToList()).ToList();
        Assert.Equal(2, rows.Count);
        string Cell(List<string> row, string column) => row[header.IndexOf(column)];
        Assert.Equal(["demo33_io", "demo33_in"], rows.Select(r => Cell(r, "model")));
        Assert.Equal(["max", "min"], rows.Select(r => Cell(r, "corner")));
        Assert.All(rows, r => Assert.EndsWith("demo33.ibs", Cell(r, "file")));
    }
}
