using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Tests;

/// <summary>Builds scenarios from YAML text and runs them, for tests.</summary>
internal static class TestScenarios
{
    public static Scenario Parse(string yaml) => ScenarioLoader.Parse(yaml, "test.yaml");

    public static SimulationResult Run(string yaml, SimulationOptions? options = null) => Simulate.Run(Parse(yaml), options);

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
