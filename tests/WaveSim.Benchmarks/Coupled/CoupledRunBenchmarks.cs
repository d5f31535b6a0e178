using BenchmarkDotNet.Attributes;
using WaveSim.Core.Coupled;
using WaveSim.Core.Model;

namespace WaveSim.Benchmarks.Coupled;

/// <summary>
/// A whole coupled run of N = 1 to 4 conductors on the same cells and steps (N = 1 through the single-line solver, the
/// baseline): the cost of the matrix-form leapfrog and its end networks per conductor.
/// </summary>
[MemoryDiagnoser]
public class CoupledRunBenchmarks
{
    /// <summary>Number of conductors (1: the single-line solver).</summary>
    [Params(1, 2, 3, 4)]
    public int Conductors { get; set; }

    CoupledScenario _coupled = null!;
    Scenario _single = null!;

    /// <summary>A 1 m homogeneous bus, neighbours coupled 10 %, the first conductor driven, every end 50 ohm.</summary>
    [GlobalSetup]
    public void Setup()
    {
        const double l = 300e-9, c = 120e-12;
        var src = new SourceSpec { Waveform = WaveformKind.Step, High = 1, Rise = 100e-12, Delay = 0.1e-9, Resistance = 50 };
        var sim = new SimulationSpec(20e-9);
        _single = new Scenario
        {
            Source = src, Line = [new Segment(1, 0, l, 0, c)], Load = new LoadSpec(R: 50),
            Probes = [new ProbeSpec("far", [], ProbeAnchor.Load)], Simulation = sim,
        };
        int n = Math.Max(2, Conductors);
        double[][] Rows(double self, double mutual) => Enumerable.Range(0, n).Select(i => Enumerable.Range(0, n)
            .Select(j => i == j ? self : Math.Abs(i - j) == 1 ? mutual : 0).ToArray()).ToArray();
        var lm = new ConductorMatrix(Rows(l, 0.1 * l));
        var cm = new ConductorMatrix(Rows(c, -0.1 * c));
        _coupled = new CoupledScenario
        {
            Conductors = Enumerable.Range(0, n).Select(k => $"c{k}").ToList(),
            Sections = [CoupledSection.Lossless(1, lm, cm)],
            Near = [new EndBranch(0, null, 50, Source: new CoupledSource(src)), .. Enumerable.Range(1, n - 1).Select(k => new EndBranch(k, null, 50))],
            Far = Enumerable.Range(0, n).Select(k => new EndBranch(k, null, 50)).ToList(),
            Probes = [new CoupledProbe("far", n - 1, null, CoupledAnchor.Far)],
            Simulation = sim,
        };
    }

    /// <summary>One run; returns the last far-end voltage.</summary>
    [Benchmark]
    public double Run() => Conductors == 1
        ? WaveSim.Core.Simulate.Solve(_single).Probes[0].Volts[^1]
        : WaveSim.Core.Simulate.RunCoupled(_coupled).Result.Probes[0].Volts[^1];
}
