using System.Text.Json.Nodes;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;

namespace WaveSim.Tests.Output;

/// <summary>The library writes a run's files from its outcome, the frequency-domain check included, with no command in between.</summary>
public class RunFilesTests
{
    /// <summary>
    /// A 1 V step through 50 ohm into a matched 50 ohm line: the load settles at V·Z0/(Z0 + Rs) = 0.5 V (Pozar, Microwave
    /// Engineering, 4th ed., eq. 2.35 with Γ = 0 at both ends; ReferenceData/published-checks.md §10).
    /// </summary>
    const string Matched = @"title: matched step
source: { waveform: step, high: 1 V, rise: 200 ps, delay: 0.5 ns, resistance: 50 ohm }
line: [ { segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m } } ]
load: { r: 50 ohm }
probes: [ { name: drv, at: source }, { name: rx, at: load } ]
simulation: { duration: 6 ns, resolution: 10 }
";

    [Fact]
    public void Every_file_of_the_outcome_is_written_and_the_summary_holds_the_frequency_domain_check()
    {
        var outcome = Simulate.Run(TestScenarios.Parse(Matched), new RunOptions { Analysis = new AnalysisOptions { Frames = 3, FrequencyCheck = true } });
        // Three frames evenly spaced from 0 to the duration, by the option's definition.
        Assert.Equal(3, outcome.FrameTimes.Count);
        foreach (var (t, k) in outcome.FrameTimes.Select((t, k) => (t, k))) Assert.Equal(k * 3e-9, t, 1e-18);
        string dir = Path.Combine(Path.GetTempPath(), "wavesim-runfiles-" + Guid.NewGuid().ToString("N"));
        try
        {
            RunFilesWritten written;
            using (var output = new OutputFolder(dir))
            {
                written = RunFiles.Write(outcome, output, new RunFileOptions { Svg = true });
                output.Commit();
            }
            string[] expected = ["probes.csv", "summary.json", "waveforms.png", "waveforms.svg", "spacetime.png",
                "frames/frame_00001.png", "frames/frame_00002.png", "frames/frame_00003.png", "frequency.csv", "frequency.png"];
            foreach (string f in expected) Assert.True(File.Exists(Path.Combine(dir, f)), f);
            Assert.False(File.Exists(Path.Combine(dir, "frames/frame_00004.png")));

            var summary = JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "summary.json")))!;
            Assert.Equal(written.Summary, File.ReadAllText(Path.Combine(dir, "summary.json")));
            Assert.Equal(0.5, summary["probes"]!["rx"]!["final_V"]!.GetValue<double>(), 2e-3);
            // Two independent methods on a lossless matched line agree within 1 % of the swing (common practice, no source).
            foreach (string p in new[] { "drv", "rx" })
                Assert.InRange(summary["frequency_domain_check"]![p]!["max_diff_pct"]!.GetValue<double>(), 0, 1.0);
        }
        finally { if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true); }
    }

    [Fact]
    public void Without_the_check_the_summary_has_no_frequency_domain_entry_and_no_frequency_files_are_written()
    {
        var outcome = Simulate.Run(TestScenarios.Parse(Matched));
        Assert.Null(outcome.FrequencyCheck);
        Assert.Null(RunSummary.Json(outcome)["frequency_domain_check"]);
        Assert.Empty(outcome.FrameTimes);
    }

    [Fact]
    public void Frame_progress_counts_each_frame_and_ends_at_one()
    {
        // No outside source: the progress contract (share of frames written, 1 after the last).
        var outcome = Simulate.Run(TestScenarios.Parse(Matched), new RunOptions { Analysis = new AnalysisOptions { Frames = 4 } });
        var seen = new List<double>();
        string dir = Path.Combine(Path.GetTempPath(), "wavesim-runfiles-" + Guid.NewGuid().ToString("N"));
        try
        {
            using var output = new OutputFolder(dir);
            RunFiles.Write(outcome, output, new RunFileOptions { FrameProgress = new Recorder(seen) });
        }
        finally { if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true); }
        Assert.Equal([0.25, 0.5, 0.75, 1.0], seen);
    }

    sealed class Recorder(List<double> seen) : IProgress<double>
    {
        public void Report(double value) => seen.Add(value);
    }
}
