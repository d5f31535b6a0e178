using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Benchmarks.Output;

/// <summary>
/// A run with 200 frames of a 1000-cell line: the simulation with its snapshots, then the frames rendered in parallel at
/// 1280x720. Target: a few seconds in all.
/// </summary>
public class FrameBenchmarks
{
    const int Frames = 200;
    SimulationResult _result = null!;
    string _dir = "";

    /// <summary>Runs the scenario once with the frame snapshots, outside the timing of <see cref="RenderFrames"/>.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _result = RunWithSnapshots();
        _dir = Directory.CreateTempSubdirectory("wavesim-frames-").FullName;
    }

    static SimulationResult RunWithSnapshots()
    {
        // 5 ns line at dt = 100 ps / 20 = 5 ps: 1000 cells.
        var s = ScenarioLoader.Parse(@"
source: { waveform: pulse, high: 1 V, rise: 100 ps, width: 1 ns, delay: 0.5 ns, resistance: 20 ohm }
line: [ { segment: { length: 1 m, z0: 50 ohm, delay: 5 ns } } ]
load: open
simulation: { duration: 30 ns }
", "frames.yaml");
        return Simulate.Solve(s, new SimulationOptions { SnapshotTimes = RunAnalysis.SnapshotTimes(s, new AnalysisOptions { Frames = Frames }) });
    }

    /// <summary>The simulation with 200 frame snapshots and the space-time rows.</summary>
    [Benchmark]
    public int SimulateWithSnapshots() => RunWithSnapshots().Snapshots.Count;

    /// <summary>Rendering the 200 frames (in parallel batches) and writing them into an output folder, committed.</summary>
    [Benchmark]
    public int RenderFrames()
    {
        var (lo, hi) = RunPictures.VoltageRange(_result);
        int n = 0;
        using var output = new OutputFolder(Path.Combine(_dir, "out"));
        foreach (var (name, png) in FrameSequence.Render(RunPictures.Layout(_result), RunPictures.Frames(_result, RunAnalysis.FrameTimes(_result.Scenario, Frames)), lo, hi, 1280, 720))
        {
            output.Write("frames/" + name, png);
            n++;
        }
        output.Commit();
        return n;
    }

    /// <summary>Removes the frames.</summary>
    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(_dir, recursive: true);
}
