using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Tests;

/// <summary>Builds scenarios from YAML text and runs them, for tests.</summary>
internal static class TestScenarios
{
    /// <summary>
    /// PRBS7 (ITU-T O.150) through a matched lossless line: 50 ohm driver, 50 ohm line, 50 ohm load. The line only delays and
    /// halves the waveform (Pozar, Microwave Engineering, 4th ed., eq. 2.35 with Γ = 0 at both ends), so the eye at the load opens
    /// to the full 0.5 V swing, and against Vih 0.35 V / Vil 0.15 V it is open.
    /// </summary>
    public const string MatchedBits = @"title: bits net
source: { waveform: bits, prbs: 7, bit_time: 200 ps, low: 0 V, high: 1 V, rise: 40 ps, resistance: 50 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm, receiver: { vih: 0.35 V, vil: 0.15 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 27 ns, resolution: 10 }
";

    public static Scenario Parse(string yaml) => ScenarioLoader.Parse(yaml, "test.yaml");

    /// <summary>The scenario with its text, as the loader reads a file.</summary>
    public static ScenarioDocument Document(string yaml) => ScenarioLoader.ReadText(yaml, "test.yaml");

    public static SimulationResult Run(string yaml, SimulationOptions? options = null) => Simulate.Solve(Parse(yaml), options);

    /// <summary>The value of a waveform at time t by linear interpolation on the output grid.</summary>
    public static double At(this SimulationResult r, string probe, double t, bool current = false)
    {
        var p = r.Probe(probe);
        double[] y = current ? p.Amps : p.Volts, x = r.Time;
        int i = Array.BinarySearch(x, t);
        if (i >= 0) return y[i];
        i = ~i;
        if (i == 0) return y[0];
        if (i >= x.Length) return y[^1];
        double f = (t - x[i - 1]) / (x[i] - x[i - 1]);
        return y[i - 1] + f * (y[i] - y[i - 1]);
    }

    /// <summary>The first time the waveform reaches <paramref name="level"/> (linear interpolation between samples).</summary>
    public static double FirstCrossing(this SimulationResult r, string probe, double level)
    {
        var v = r.Probe(probe).Volts; var t = r.Time;
        bool rising = level >= v[0];
        for (int i = 1; i < v.Length; i++)
            if (rising ? v[i] >= level : v[i] <= level)
                return t[i - 1] + (level - v[i - 1]) / (v[i] - v[i - 1]) * (t[i] - t[i - 1]);
        return double.NaN;
    }
}
