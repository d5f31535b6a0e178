using BenchmarkDotNet.Attributes;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Benchmarks.Solver;

/// <summary>
/// Nets of many short segments, where the junction step and the DC operating point, not the cells, set the cost: 1,000
/// identical 10 mm segments (10 cells each) for 10 ns, the plan of 100,000 distinct segments, and the frequency-domain check of
/// 300 segments. Target: the 1,000-segment run in seconds (it took 73 s with the dense junction inverse).
/// </summary>
[MemoryDiagnoser]
public class NetSizeBenchmarks
{
    Scenario _thousand = null!, _distinct = null!, _three = null!;

    static Scenario Chain(int segments, Func<int, string> length, string sim)
    {
        var sb = new System.Text.StringBuilder("title: chain\nsource: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 25 ohm }\nline:\n");
        for (int i = 0; i < segments; i++) sb.Append($"  - segment: {{ length: {length(i)}, z0: 50 ohm, delay: 6.6 ps/mm }}\n");
        sb.Append("load: { r: 50 ohm }\nprobes:\n  - { name: rx, at: load }\nsimulation: ").Append(sim).Append('\n');
        return ScenarioLoader.Parse(sb.ToString(), "chain.yaml");
    }

    /// <summary>Builds the scenarios outside the timing.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _thousand = Chain(1000, _ => "10 mm", "{ duration: 10 ns, resolution: 10 }");
        _distinct = Chain(100_000, i => FormattableString.Invariant($"{10 + i * 1e-4:F5} mm"), "{ duration: 1 ns, resolution: 10 }");
        _three = Chain(300, i => FormattableString.Invariant($"{10 + i * 0.01:F3} mm"), "{ duration: 10 ns, resolution: 10 }");
    }

    /// <summary>1,000 segments, 10,000 cells, about 1,500 steps.</summary>
    [Benchmark]
    public double ThousandSegmentRun() => Simulate.Solve(_thousand).Probe("rx").Volts[^1];

    /// <summary>The grid plan of 100,000 distinct segments (the step choice and the estimates).</summary>
    [Benchmark]
    public double HundredThousandSegmentPlan() => Simulate.Plan(_distinct).Dt;

    /// <summary>The time-domain run and the frequency-domain check of 300 distinct segments.</summary>
    [Benchmark]
    public double ThreeHundredSegmentCheck() =>
        WaveSim.Core.FrequencyDomain.FrequencyDomainCheck.Compare(Simulate.Solve(_three))[0].MaxDiffV;
}
