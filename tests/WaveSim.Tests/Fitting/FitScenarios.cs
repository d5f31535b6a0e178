using WaveSim.Core.Measurements;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Fitting;

/// <summary>The small net the fit tests work on, and captures made from its simulation.</summary>
internal static class FitScenarios
{
    /// <summary>A 50 Ω, 1 ns trace from a 25 Ω driver into 150 Ω ∥ 2 pF: an edge, a reflection off the load and its return.</summary>
    public const string Truth = @"title: fit target
source: { waveform: step, high: 1 V, rise: 200 ps, delay: 1 ns, resistance: 25 ohm }
line:
  - segment: { length: 0.15 m, z0: 50 ohm, delay: 1 ns }   # the trace
load: { r: 150 ohm, c: 2 pF }
probes:
  - { name: rx, at: load }
simulation: { duration: 10 ns, output_step: 10 ps, resolution: 10 }
";

    /// <summary>
    /// The probe's samples k in [<paramref name="first"/>, <paramref name="last"/>) as a capture whose clock reads
    /// <paramref name="shift"/> less than the simulation's (so the offset that aligns it is +shift), plus <paramref name="noise"/>.
    /// </summary>
    public static Capture Shifted(SimulationResult sim, double shift, int first, int last, double[]? noise = null)
    {
        double[] v = sim.Probe("rx").Volts;
        var t = new double[last - first];
        var y = new double[last - first];
        for (int k = first; k < last; k++)
        {
            t[k - first] = sim.Time[k] - shift;
            y[k - first] = v[k] + (noise?[k - first] ?? 0);
        }
        return new Capture(t, y, "synthetic.csv") { TimeColumn = "'time'" };
    }
}
