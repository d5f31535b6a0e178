using WaveSim.Core;
using WaveSim.Core.Coupled;
using WaveSim.Core.Model;
using static WaveSim.Tests.Coupled.CoupledNets;

namespace WaveSim.Tests.Coupled;

/// <summary>
/// Conductors with diagonal matrices are independent lines: each must reproduce the existing single-line solver's run of
/// the same line, ends and source (an independent implementation: Solver/LeapfrogSolver with its junction system).
/// </summary>
public class DecoupledConductorTests
{
    [Fact]
    public void Diagonal_matrices_reproduce_independent_single_line_runs_across_two_sections_with_loss()
    {
        // Two sections; in each both conductors share a velocity and both sources an edge time (so both runs choose the same dt)
        // but not an impedance.
        double len1 = 0.1, len2 = 0.06;
        double l0 = 300e-9, c0 = 120e-12;                 // 50 ohm, 5 ns/m
        var s1 = new CoupledSection(len1, ConductorMatrix.Diagonal([l0, 1.4 * l0]), ConductorMatrix.Diagonal([c0, c0 / 1.4]),
            ConductorMatrix.Diagonal([5, 8]), ConductorMatrix.Diagonal([0, 1e-3]));
        var s2 = new CoupledSection(len2, ConductorMatrix.Diagonal([0.8 * l0, 1.1 * l0]), ConductorMatrix.Diagonal([0.8 * c0, c0 / 1.1 * 0.64]),
            ConductorMatrix.Diagonal([2, 0]), ConductorMatrix.Diagonal([0, 0]));
        var srcA = Step(high: 1, rise: 100e-12, delay: 0.2e-9, r: 25);
        var srcB = Step(high: 0.5, rise: 100e-12, delay: 0.3e-9, r: 60) with { Low = 0.2 };
        var net = Net([s1, s2], [Driver(0, srcA), Driver(1, srcB)], [Resistor(0, 75), Resistor(1, 30)], 6e-9,
            [.. EndProbes(2), new CoupledProbe("c0_mid", 0, null, CoupledAnchor.Distance, len1), new CoupledProbe("c1_in", 1, null, CoupledAnchor.Distance, 0.05)]);
        var r = Solve(net);

        for (int k = 0; k < 2; k++)
        {
            var line = new Scenario
            {
                Source = k == 0 ? srcA : srcB,
                Line = [new Segment(len1, s1.R[k, k], s1.L[k, k], s1.G[k, k], s1.C[k, k]), new Segment(len2, s2.R[k, k], s2.L[k, k], s2.G[k, k], s2.C[k, k])],
                Load = new LoadSpec(R: k == 0 ? 75 : 30),
                Probes = k == 0
                    ? [new ProbeSpec("near", [], ProbeAnchor.Source), new ProbeSpec("far", [], ProbeAnchor.Load), new ProbeSpec("mid", [], ProbeAnchor.Distance, len1)]
                    : [new ProbeSpec("near", [], ProbeAnchor.Source), new ProbeSpec("far", [], ProbeAnchor.Load), new ProbeSpec("mid", [], ProbeAnchor.Distance, 0.05)],
                Simulation = new SimulationSpec(6e-9),
            };
            var single = Simulate.Solve(line);
            Assert.Equal(single.Plan.Dt, r.Plan.Dt, 1e-18);
            Assert.Equal(single.Time.Length, r.Time.Length);
            double swing = k == 0 ? 1 : 0.3, worst = 0;
            foreach (var (mine, theirs) in new[] { ($"c{k}_near", "near"), ($"c{k}_far", "far"), (k == 0 ? "c0_mid" : "c1_in", "mid") })
            {
                var a = r.Probe(mine); var b = single.Probe(theirs);
                Assert.Equal(b.Position, a.Position, 1e-12);
                for (int i = 0; i < a.Volts.Length; i++)
                {
                    worst = Math.Max(worst, Math.Abs(a.Volts[i] - b.Volts[i]) / swing);
                    worst = Math.Max(worst, Math.Abs(a.Amps[i] - b.Amps[i]) * 50 / swing);
                }
            }
            Assert.True(r.Probe($"c{k}_far").Volts.Max() - r.Probe($"c{k}_far").Volts[0] > 0.1 * swing, "the edge reached the far end");
            Assert.True(worst < 1e-12, $"conductor {k}: largest difference {worst:E3} of the swing");
        }
    }
}
