using WaveSim.Core;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Properties;

/// <summary>
/// Properties of random valid nets. Every run replays the fixed seeds of <see cref="PropertySeeds"/>, one net per theory row;
/// WAVESIM_SOAK=N adds N fresh random nets per property (see DEVELOPERS.md).
/// </summary>
public class RandomScenarioProperties
{
    /// <summary>
    /// Seeds that once failed the DC check, replayed on every run. A seed a soak finds failing is added here with what it showed.
    /// </summary>
    static readonly string[] FormerlyFailingDc =
    [
        // 2026-12-02, soak of 2400 fresh nets with the old check (last sample within 5 mV): the only failure, shrunk by CsCheck
        // to a nearly lossless net (r ≈ 0, 24 ohm segments behind a 53 ohm one, open load, 2 pF and 3.4 pF) whose last sample
        // at 152 ns was not settled.
        "1cudQzPw5QE1",
    ];

    public static TheoryData<string> EnergySeeds => PropertySeeds.Rows();

    public static TheoryData<string> DcSeeds => PropertySeeds.Rows(FormerlyFailingDc);

    static Core.Solver.SimulationResult Run(RandomNet net, double duration, string waveform = "step") =>
        Simulate.Solve(ScenarioLoader.Parse(net.Yaml(duration, waveform), "random.yaml"));

    /// <summary>
    /// Passivity (Tellegen / conservation of energy): a passive net starting at rest can never have delivered net energy back
    /// to the driver, so ∫ v_src·i_src dt ≥ 0 at every instant (common practice, no source). Also: no exception, no NaN.
    /// </summary>
    static bool NeverGivesBackEnergy(RandomNet net)
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
    }

    /// <summary>Peak-to-peak over the tail below which a probe counts as settled, V (1 mV on a 1 V step).</summary>
    const double Settled = 1e-3;

    /// <summary>Allowed |tail mean − DC solution|, V. Derived in <see cref="SettlesToTheDcSolution"/>.</summary>
    const double DcTolerance = 2e-3;

    /// <summary>
    /// The settled voltage equals the DC solution of the resistive network (Kirchhoff's and Ohm's laws solved apart from the
    /// product: IndependentDc, MathNet.Numerics LU).
    /// </summary>
    /// <remarks>
    /// Run until settled, then compare the mean of the settled tail. On the grid the DC state is exact (with no time
    /// derivative left, each cell's update is Ohm's law over its series R), so the only error is what is left of the
    /// transient. Tail = the last quarter of the record (at least 25 ns: SettleDuration ≥ 100 ns). Settled = peak-to-peak
    /// over the tail ≤ 1 mV; the run doubles its duration, at most three times, until both probes are. Tolerance 2 mV: the
    /// tail mean lies within the tail's 1 mV spread of its last sample, and a transient that still moves by at most 1 mV over
    /// a window longer than its time constant (the nets' longest lumped one is 5 pF × 1 kΩ = 5 ns; round trips ≤ 2.4 ns)
    /// has at most 1 mV/(e − 1) = 0.6 mV left after the record; IndependentDc's 1 µΩ wires add under 1e-7 V. The one slower
    /// mode is a current circulating in a loop of inductors closed by nearly lossless segments (L/R up to microseconds); it
    /// does not show in the spread, but its voltage is that current times the same small R (seed 4aYKXIh7kn24: 0.16 mV).
    /// A single last sample, as the check used before, is not settled on a net still ringing ±8 mV (2 CI runs in 8 failed).
    /// </remarks>
    static (bool Ok, string Detail) SettlesToTheDcSolution(RandomNet net)
    {
        var (vSrc, vLoad) = IndependentDc.Solve(net, 1.0);
        double duration = net.SettleDuration();
        for (int attempt = 0; ; attempt++)
        {
            var r = Run(net, duration);
            var src = Tail(r, "src");
            var rx = Tail(r, "rx");
            bool settled = src.Spread <= Settled && rx.Spread <= Settled;
            if (settled || attempt == 3)
            {
                string detail = $"after {duration * 1e9:F1} ns: src tail mean {src.Mean:F5} V (spread {src.Spread * 1e3:F2} mV) vs DC {vSrc:F5} V, "
                    + $"rx tail mean {rx.Mean:F5} V (spread {rx.Spread * 1e3:F2} mV) vs DC {vLoad:F5} V";
                bool ok = settled && Math.Abs(src.Mean - vSrc) <= DcTolerance && Math.Abs(rx.Mean - vLoad) <= DcTolerance;
                return (ok, (settled ? "" : "never settled; ") + detail);
            }
            duration *= 2;
        }
    }

    static (double Mean, double Spread) Tail(Core.Solver.SimulationResult r, string probe)
    {
        double from = 0.75 * r.Time[^1];
        var tail = r.Probe(probe).Volts.Where((_, k) => r.Time[k] >= from).ToArray();
        return (tail.Average(), tail.Max() - tail.Min());
    }

    [Theory]
    [MemberData(nameof(EnergySeeds))]
    public void A_random_net_runs_without_exception_or_NaN_and_never_gives_back_more_energy_than_it_took(string seed)
    {
        var net = PropertySeeds.Replay(RandomNet.Gen_, seed);
        Assert.True(NeverGivesBackEnergy(net), $"seed {seed}: NaN, or net energy returned to the driver\n--- scenario ---\n{net}");
    }

    [Theory]
    [MemberData(nameof(DcSeeds))]
    public void The_settled_voltage_of_a_random_net_equals_the_DC_solution_of_the_resistive_network(string seed)
    {
        var net = PropertySeeds.Replay(RandomNet.Gen_, seed);
        var (ok, detail) = SettlesToTheDcSolution(net);
        Console.WriteLine($"DC seed {seed}: {detail}");
        Assert.True(ok, $"seed {seed}: {detail}\n--- scenario ---\n{net}");
    }

    [SkippableFact]
    public void Soak_fresh_random_nets_never_give_back_energy() =>
        PropertySeeds.Explore(RandomNet.Gen_, NeverGivesBackEnergy);

    [SkippableFact]
    public void Soak_fresh_random_nets_settle_to_the_DC_solution() =>
        PropertySeeds.Explore(RandomNet.Gen_, net =>
        {
            var (ok, detail) = SettlesToTheDcSolution(net);
            if (!ok) Console.WriteLine(detail);
            return ok;
        });
}
