using CsCheck;
using WaveSim.Core;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Properties;

/// <summary>
/// Properties of random valid nets (CsCheck; a failure prints the seed to replay it with). The case counts are kept
/// small for CI; set WAVESIM_SOAK=N to multiply them for a longer soak (see DEVELOPERS.md).
/// </summary>
public class RandomScenarioProperties
{
    /// <summary>A fixed seed for CI, so a run is repeatable; a soak (WAVESIM_SOAK set) draws fresh cases every time.</summary>
    internal static string? Seed => Environment.GetEnvironmentVariable("WAVESIM_SOAK") is null ? "4aYKXIh7kn24" : null;

    internal static int Iter(int n) => n * (int.TryParse(Environment.GetEnvironmentVariable("WAVESIM_SOAK"), out int k) && k > 0 ? k : 1);

    static Core.Solver.SimulationResult Run(RandomNet net, double duration, string waveform = "step") =>
        Simulate.Run(ScenarioLoader.Parse(net.Yaml(duration, waveform), "random.yaml"));

    [Fact]
    public void Every_random_net_runs_without_exception_or_NaN_and_never_gives_back_more_energy_than_it_took()
    {
        // Passivity (Tellegen / conservation of energy): a passive net starting at rest can never have delivered
        // net energy back to the driver, so ∫ v_src·i_src dt ≥ 0 at every instant (common practice, no source).
        RandomNet.Gen_.Sample(net =>
        {
            var r = Run(net, 4 * 2 * net.AllSegments().Sum(s => s.Delay) + 2e-9, "pulse");
            var src = r.Probe("src");
            double e = 0, eMax = 0;
            for (int k = 0; k < r.Time.Length; k++)
            {
                foreach (var p in r.Probes)
                    if (!double.IsFinite(p.Volts[k]) || !double.IsFinite(p.Amps[k])) return false;
                if (k > 0)
                {
                    double dt = r.Time[k] - r.Time[k - 1];
                    e += 0.5 * dt * (src.Volts[k] * src.Amps[k] + src.Volts[k - 1] * src.Amps[k - 1]);
                    eMax = Math.Max(eMax, e);
                    if (e < -1e-3 * eMax - 1e-24) return false;
                }
            }
            return true;
        }, iter: Iter(300), seed: Seed);
    }

    [Fact]
    public void The_settled_voltage_equals_the_DC_solution_of_the_resistive_network()
    {
        // Kirchhoff's and Ohm's laws solved apart from the product (IndependentDc, MathNet.Numerics LU).
        RandomNet.Gen_.Sample(net =>
        {
            var r = Run(net, net.SettleDuration());
            var (vSrc, vLoad) = IndependentDc.Solve(net, 1.0);
            return Math.Abs(r.Probe("src").Volts[^1] - vSrc) < 5e-3 && Math.Abs(r.Probe("rx").Volts[^1] - vLoad) < 5e-3;
        }, iter: Iter(80), seed: Seed);
    }
}
