using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// A 200-point sweep of the load resistor on a 1000-cell line (4000 steps each), run one after another and with Parallel.For.
/// Target: parallel ≤ 0.6 of serial on two cores (read it from the Ratio column).
/// </summary>
[MemoryDiagnoser]
public class SweepBenchmarks
{
    /// <summary>Points in the sweep.</summary>
    public const int Points = 200;

    Scenario[] _scenarios = [];

    /// <summary>Builds the 200 scenarios, load 10 to 209 ohm, outside the timing.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _scenarios = new Scenario[Points];
        for (int p = 0; p < Points; p++)
        {
            // 5 ns line at dt = 100 ps / 20 = 5 ps: 1000 cells; 20 ns: 4000 steps.
            string yaml = $@"
source: {{ waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 50 ohm }}
line: [ {{ segment: {{ length: 1 m, z0: 50 ohm, delay: 5 ns }} }} ]
load: {{ r: {10 + p} ohm }}
probes: [ {{ name: rx, at: load }} ]
simulation: {{ duration: 20 ns }}
";
            _scenarios[p] = ScenarioLoader.Parse(yaml, $"sweep{p}.yaml");
        }
        long cells = Simulate.Plan(_scenarios[0]).TotalCells;
        if (cells != 1000) throw new InvalidOperationException($"the sweep line has {cells} cells, expected 1000");
    }

    /// <summary>All points on the calling thread.</summary>
    [Benchmark(Baseline = true)]
    public double Serial()
    {
        var settled = new double[Points];
        for (int p = 0; p < Points; p++) settled[p] = Settled(p);
        return settled.Sum();
    }

    /// <summary>All points with Parallel.For over the independent runs.</summary>
    [Benchmark]
    public double Parallel()
    {
        var settled = new double[Points];
        System.Threading.Tasks.Parallel.For(0, Points, p => settled[p] = Settled(p));
        return settled.Sum();
    }

    double Settled(int p) => Simulate.Solve(_scenarios[p]).Probe("rx").Volts[^1];
}
