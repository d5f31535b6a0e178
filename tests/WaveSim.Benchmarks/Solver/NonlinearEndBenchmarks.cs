using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// A 1,000-cell line for 10,000 steps with linear ends (a 50 ohm load, the baseline) against nonlinear ends (an I-V table at
/// the source node and a clamp table at the load). Target: the tables add at most 20 % to the run.
/// </summary>
[MemoryDiagnoser]
public class NonlinearEndBenchmarks
{
    Scenario _linear = null!, _tables = null!;

    static Scenario Net(string sourceEnd, string load) => ScenarioLoader.Parse($@"
title: ends
source: {{ waveform: step, low: 0 V, high: 3.3 V, rise: 10 ns, delay: 5 ns, resistance: 25 ohm }}
line:
{sourceEnd}
  - segment: {{ length: 1.5 m, z0: 50 ohm, delay: 10 ns }}
load: {load}
probes: [ {{ name: src, at: source }}, {{ name: rx, at: load }} ]
simulation: {{ duration: 100 ns, resolution: 1000 }}
", "ends.yaml");

    /// <summary>Builds both scenarios outside the timing and checks the line has 1,000 cells.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _linear = Net("  - shunt: { r: 1 kohm }", "{ r: 50 ohm }");
        _tables = Net("  - shunt: { iv: [[0 V, 0 A], [2 V, 10 mA], [4 V, 40 mA]] }",
            "{ iv: [[-1 V, -50 mA], [-0.6 V, 0 A], [0 V, 0 A], [3.9 V, 0 A], [4.3 V, 50 mA]] }");
        long cells = Simulate.Plan(_linear).TotalCells;
        if (cells < 900 || cells > 1100) throw new InvalidOperationException($"the benchmark line has {cells} cells, not about 1,000");
    }

    /// <summary>Resistor ends: a shunt resistor at the source node and a resistor load.</summary>
    [Benchmark(Baseline = true)]
    public double ResistorEnds() => Simulate.Solve(_linear).Probe("rx").Volts[^1];

    /// <summary>Table ends: an I-V table at the source node and a clamp table load.</summary>
    [Benchmark]
    public double TableEnds() => Simulate.Solve(_tables).Probe("rx").Volts[^1];
}
