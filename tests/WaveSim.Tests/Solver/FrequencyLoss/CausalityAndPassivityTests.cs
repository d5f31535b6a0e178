using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>Causality and passivity of the frequency-dependent line in both solvers.</summary>
public class CausalityAndPassivityTests
{
    [Fact]
    public void Nothing_arrives_before_the_front_delay()
    {
        // Causality: the Djordjevic-Sarkar permittivity and √(1 + s/ω0) are analytic in Re s > 0 (Djordjevic et al., IEEE
        // Trans. EMC 43(4), 2001), so nothing travels faster than the front velocity 1/√(L∞·C0·κ(∞)) (Paley-Wiener; from memory).
        // Leapfrog: |v| < 1e-6 of the swing before the front minus two steps. Frequency domain (exact model): below 1e-4 of the
        // swing a little earlier (its transform's wrap-around and rounding floor; project's own tolerance, no source).
        var scenario = TestScenarios.Parse(LossScenarios.Microstrip());
        var seg = (Segment)scenario.Line[0];
        Assert.NotNull(seg.Loss);
        double start = scenario.Source.Delay, front = seg.FrontDelay;
        Assert.True(front < seg.Delay);
        var td = WaveSim.Core.Simulate.Solve(scenario);
        double dt = td.Plan.Dt;
        // The fit the run used (band 1/duration to 1/rise) is reported with its error; project target 0.1 % (no source).
        var fits = WaveSim.Core.Simulate.LossFits(scenario, td.Plan);
        Assert.Single(fits);
        Assert.Equal("line[0]", fits[0].Where);
        Assert.True(fits[0].Fit.InternalMaxError < 1e-3 && fits[0].Fit.DispersionMaxError < 1e-3);
        var rx = td.Probe("rx").Volts;
        double swing = rx.Max() - rx.Min();
        for (int k = 0; k < td.Time.Length && td.Time[k] < start + front - 2 * dt; k++)
            Assert.True(Math.Abs(rx[k]) < 1e-6 * swing, $"leapfrog precursor {rx[k]:E3} V at {td.Time[k]:E4} s");
        var early = td.Time.Where(t => t < start + 0.95 * front).ToArray();
        var fd = FrequencyDomainSolver.TimeResponse(scenario, early).Probe("rx").Volts;
        Assert.All(fd, v => Assert.True(Math.Abs(v) < 1e-4 * swing, $"frequency-domain precursor {v:E3} V"));
        // And the wave does arrive: half the final level within the run.
        Assert.True(rx[^1] > 0.4);
    }

    [Theory]
    [InlineData("microstrip")]
    [InlineData("coax")]
    public void The_line_never_delivers_more_energy_than_it_received(string line)
    {
        // Passivity of a two-port from rest: the energy absorbed, ∫(v1·i1 − v2·i2) dt, is never negative at any instant (the
        // definition of a passive network; Desoer and Kuh, Basic Circuit Theory, 1969, from memory). v1, i1: driver side into the
        // line; v2, i2: into the load.
        string yaml = line == "microstrip" ? LossScenarios.Microstrip() : LossScenarios.Coax();
        var r = TestScenarios.Run(yaml);
        double[] t = r.Time, v1 = r.Probe("src").Volts, i1 = r.Probe("src").Amps, v2 = r.Probe("rx").Volts, i2 = r.Probe("rx").Amps;
        double ein = 0, eout = 0, minNet = double.PositiveInfinity;
        for (int k = 1; k < t.Length; k++)
        {
            double h = t[k] - t[k - 1];
            ein += 0.5 * h * (v1[k] * i1[k] + v1[k - 1] * i1[k - 1]);
            eout += 0.5 * h * (v2[k] * i2[k] + v2[k - 1] * i2[k - 1]);
            minNet = Math.Min(minNet, ein - eout);
        }
        Console.WriteLine($"{line}: into line {ein:E4} J, into load {eout:E4} J, least net {minNet:E3} J");
        Assert.True(minNet >= -1e-9 * ein, $"net energy into the line went to {minNet:E3} J");
        Assert.True(eout < ein);
        Assert.True(eout > 0, "the wave reaches the load within the run");
    }
}
