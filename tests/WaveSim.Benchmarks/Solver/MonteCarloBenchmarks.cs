using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// 64 Monte Carlo samples of the clock example (scenarios/clock-on-board.yaml: driver resistance and trace impedance
/// within tolerance). Three ways: the bare runs (each sample's variant through <see cref="Simulate.Run"/> with the
/// figures-only analysis, one after another: the baseline), the tolerance runner on one thread, and the runner on every
/// core. Targets: the runner's overhead outside Simulate.Run under 10 % (Serial against Bare) and at least 1.8 times the
/// single-thread rate on two cores (Parallel against Serial).
/// </summary>
[MemoryDiagnoser]
public class MonteCarloBenchmarks
{
    /// <summary>Samples per run.</summary>
    public const int Samples = 64;

    ToleranceSet _set = null!;

    static string Root()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
            if (File.Exists(Path.Combine(d.FullName, "WaveSim.sln"))) return d.FullName;
        throw new InvalidOperationException("the repository (WaveSim.sln) is not above the benchmark's folder");
    }

    /// <summary>Draws the samples (outside the timing); the variants are built and checked once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var scenario = ScenarioLoader.Load(Path.Combine(Root(), "scenarios", "clock-on-board.yaml"));
        ToleranceKey[] keys = [ToleranceKey.Parse("source.resistance=tol(20%)"), ToleranceKey.Parse("line[0].segment.z0=tol(10%, normal)")];
        _set = ToleranceSet.Build(scenario, keys, new ToleranceSetOptions { Samples = Samples, Seed = 7 });
    }

    /// <summary>Each variant through Simulate.Run, figures only, on the calling thread: what the runner cannot avoid.</summary>
    [Benchmark(Baseline = true)]
    public double Bare()
    {
        var run = new RunOptions { Analysis = AnalysisOptions.FiguresOnly(SignalQualityOptions.DefaultSettleBand) };
        double sum = 0;
        foreach (var p in _set.Points) sum += Simulate.Run(p.Scenario, run with { Plan = p.Plan }).Figures.Count;
        return sum;
    }

    /// <summary>The tolerance runner on one thread.</summary>
    [Benchmark]
    public int Serial() => ToleranceRunner.Run(_set, [], new SweepRunOptions { Serial = true }).Points.Count;

    /// <summary>The tolerance runner on every core.</summary>
    [Benchmark]
    public int Parallel() => ToleranceRunner.Run(_set, [], new SweepRunOptions()).Points.Count;
}
