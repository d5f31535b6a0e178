using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// A 1,000-cell line with buffer-model ends (the demo 3.3 V I/O driving, the demo input receiving: switching pullup and
/// pulldown, clamps, C_comp and package at each end) against resistor ends on the same grid (a Thevenin source with the
/// buffer's edge time and a 50 ohm load, the baseline). Target: the buffers add at most 20 % to the run.
/// </summary>
[MemoryDiagnoser]
public class BufferEndBenchmarks
{
    Scenario _resistors = null!, _buffers = null!;

    static string Demo33 => Path.Combine(Root(), "scenarios", "buffers", "demo33.ibs");

    static string Root()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
            if (File.Exists(Path.Combine(d.FullName, "WaveSim.sln"))) return d.FullName;
        throw new InvalidOperationException("the repository (WaveSim.sln) is not above the benchmark's folder");
    }

    static Scenario Net(string source, string load) => ScenarioLoader.Parse($@"
title: buffer ends
source: {source}
line: [ {{ segment: {{ length: 4.5 m, z0: 50 ohm, delay: 30 ns }} }} ]
load: {load}
probes: [ {{ name: src, at: source }}, {{ name: rx, at: load }} ]
simulation: {{ duration: 1000 ns, resolution: 10 }}
", "ends.yaml");

    /// <summary>Builds both scenarios outside the timing and checks that both run on the same 1,000-cell grid.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _buffers = Net($"{{ buffer: {{ file: '{Demo33}', model: demo33_io }}, waveform: pulse, delay: 5 ns, width: 400 ns }}",
            $"{{ buffer: {{ file: '{Demo33}', model: demo33_in }} }}");
        string rise = _buffers.Source.Rise.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        _resistors = Net($"{{ waveform: pulse, low: 0 V, high: 3.3 V, rise: {rise} s, delay: 5 ns, width: 400 ns, resistance: 20 ohm }}", "{ r: 50 ohm }");
        var (a, b) = (Simulate.Plan(_resistors), Simulate.Plan(_buffers));
        if (a.TotalCells < 900 || a.TotalCells > 1100 || a.TotalCells != b.TotalCells || a.Steps != b.Steps)
            throw new InvalidOperationException($"the grids differ or are not about 1,000 cells: {a.TotalCells}/{a.Steps} and {b.TotalCells}/{b.Steps}");
    }

    /// <summary>Resistor ends: a Thevenin source and a resistor load.</summary>
    [Benchmark(Baseline = true)]
    public double ResistorEnds() => Simulate.Solve(_resistors).Probe("rx").Volts[^1];

    /// <summary>Buffer ends: a buffer driver and a buffer receiver.</summary>
    [Benchmark]
    public double BufferEnds() => Simulate.Solve(_buffers).Probe("rx").Volts[^1];
}
