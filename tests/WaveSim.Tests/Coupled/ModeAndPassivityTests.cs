using WaveSim.Core;
using WaveSim.Core.Coupled;
using WaveSim.Core.Model;
using static WaveSim.Tests.Coupled.CoupledNets;

namespace WaveSim.Tests.Coupled;

/// <summary>
/// Even and odd drive of a symmetric pair against the single-line solver run on the mode's line (standard even/odd
/// analysis, e.g. Pozar, Microwave Engineering, 4th ed. 2012, sec. 7.6; from memory), the matrices from Z0e/Z0o and back,
/// and passivity: the discrete energy of lossy random nets never grows once the sources are still.
/// </summary>
public class ModeAndPassivityTests
{
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Equal_and_opposite_drive_of_a_symmetric_pair_equals_single_lines_of_the_even_and_odd_modes(bool opposite)
    {
        // A homogeneous pair (ve = vo) from Z0e = 65 ohm, Z0o = 40 ohm, v = 1.5e8 m/s: both modes sit at Courant number 1
        // on the grid the single line also chooses.
        var (l, c) = SectionModes.FromModes(65, 40, 1.5e8, 1.5e8);
        var eo = SectionModes.Pair(CoupledSection.Lossless(0.2, l, c))!;
        Assert.Equal(65, eo.Z0e, 1e-9); Assert.Equal(40, eo.Z0o, 1e-9);
        Assert.Equal(1.5e8, eo.Ve, 1e-3); Assert.Equal(1.5e8, eo.Vo, 1e-3);
        var src = Step(high: 1, rise: 100e-12, delay: 0.2e-9, r: 30);
        var net = Net([CoupledSection.Lossless(0.2, l, c)], [Driver(0, src), Driver(1, src, invert: opposite)],
            [Resistor(0, 90), Resistor(1, 90)], 8e-9);
        var r = Solve(net);
        double z = opposite ? 40 : 65;
        var line = new Scenario
        {
            Source = src,
            Line = [new Segment(0.2, 0, z / 1.5e8, 0, 1 / (z * 1.5e8))],
            Load = new LoadSpec(R: 90),
            Probes = [new ProbeSpec("near", [], ProbeAnchor.Source), new ProbeSpec("far", [], ProbeAnchor.Load)],
            Simulation = new SimulationSpec(8e-9),
        };
        var single = Simulate.Solve(line);
        double worst = 0;
        for (int i = 0; i < r.Time.Length; i++)
        {
            double t = r.Time[i];
            // Conductor 0 carries the mode's waveform; conductor 1 the same (even) or its mirror about the mid level (odd).
            double far = At(single.Time, single.Probe("far").Volts, t), near = At(single.Time, single.Probe("near").Volts, t);
            worst = Math.Max(worst, Math.Abs(r.Probe("c0_far").Volts[i] - far));
            worst = Math.Max(worst, Math.Abs(r.Probe("c0_near").Volts[i] - near));
            double mirrorFar = opposite ? 90.0 / (90 + 30) * 1 - far : far;   // the odd mode about the DC level of the inverted source
            if (!opposite) worst = Math.Max(worst, Math.Abs(r.Probe("c1_far").Volts[i] - mirrorFar));
        }
        Assert.True(worst < 1e-9, $"largest difference {worst:E3} V");
    }

    [Fact]
    public void Even_odd_impedances_give_the_published_matrix_relations()
    {
        // ReferenceData/published-checks.md §13: Le = Z0e/ve = L11 + L12, Lo = Z0o/vo = L11 − L12, Ce = 1/(Z0e·ve) = C11 + C12, Co = 1/(Z0o·vo) = C11 − C12.
        var (l, c) = SectionModes.FromModes(60, 42, 1.6e8, 1.75e8);
        Assert.Equal(60 / 1.6e8, l[0, 0] + l[0, 1], 1e-18);
        Assert.Equal(42 / 1.75e8, l[0, 0] - l[0, 1], 1e-18);
        Assert.Equal(1 / (60 * 1.6e8), c[0, 0] + c[0, 1], 1e-22);
        Assert.Equal(1 / (42 * 1.75e8), c[0, 0] - c[0, 1], 1e-22);
        Assert.True(c[0, 1] < 0, "Maxwell form");
        var modes = SectionModes.Of(CoupledSection.Lossless(1, l, c));
        Assert.Equal(1.75e8, modes.Velocities[0], 1e-2);   // eigenvalues of L·C are 1/v² of the modes
        Assert.Equal(1.6e8, modes.Velocities[1], 1e-2);
    }

    [Theory]
    [InlineData(1, 2)]
    [InlineData(2, 3)]
    [InlineData(3, 3)]
    [InlineData(4, 4)]
    public void Energy_never_grows_on_random_lossy_nets_once_the_sources_are_still(int seed, int n)
    {
        var rng = new Random(seed);
        double Rand(double a, double b) => a + (b - a) * rng.NextDouble();
        // Random symmetric positive definite L (diagonally dominant) and Maxwell C; lossy R (with mutual terms) and G.
        double[][] Sym(Func<int, int, double> f)
        {
            // Each entry drawn once, on and above the diagonal, and mirrored.
            var a = new double[n][];
            for (int i = 0; i < n; i++) a[i] = new double[n];
            for (int i = 0; i < n; i++) for (int j = i; j < n; j++) a[i][j] = a[j][i] = f(i, j);
            return a;
        }
        var off = new double[n, n];
        for (int i = 0; i < n; i++) for (int j = i + 1; j < n; j++) off[i, j] = Rand(0, 0.3);
        var l = new ConductorMatrix(Sym((i, j) => i == j ? Rand(250e-9, 400e-9) : off[i, j] * 200e-9));
        var c = new ConductorMatrix(Sym((i, j) => i == j ? Rand(100e-12, 150e-12) : -off[i, j] * 60e-12));
        var rm = new ConductorMatrix(Sym((i, j) => i == j ? Rand(5, 40) : Rand(0, 2)));
        var g = new ConductorMatrix(Sym((i, j) => i == j ? Rand(1e-3, 2e-3) : -Rand(0, 2e-4)));
        var s = new CoupledSection(Rand(0.05, 0.2), l, c, rm, g);
        Assert.Null(MatrixChecks.Inductance(l, n)); Assert.Null(MatrixChecks.Capacitance(c, n));
        Assert.Null(MatrixChecks.Resistance(rm, n)); Assert.Null(MatrixChecks.Conductance(g, n));
        var pulse = new SourceSpec { Waveform = WaveformKind.Pulse, High = 1, Rise = 80e-12, Width = 0.3e-9, Delay = 0.1e-9, Resistance = Rand(10, 60) };
        var near = new List<EndBranch> { Driver(0, pulse) };
        var far = new List<EndBranch>();
        for (int k = 1; k < n; k++) near.Add(new EndBranch(k, null, Rand(10, 200), Rand(0, 5e-9), rng.Next(2) == 0 ? null : Rand(1e-12, 5e-12)));
        for (int k = 0; k < n; k++) far.Add(new EndBranch(k, null, Rand(10, 200), Rand(0, 3e-9)));
        far.Add(new EndBranch(0, n - 1, Rand(50, 150)));
        var r = Solve(Net([s, s with { Length = Rand(0.02, 0.1) }], near, far, 5e-9), energy: true);
        var e = r.Energy!;
        double quietFrom = 0.1e-9 + 1.25 * 80e-12 * 2 + 0.3e-9;
        int start = (int)Math.Ceiling(quietFrom / r.Plan.Dt) + 1;
        Assert.True(e[start] > 0, "the pulse left energy in the net");
        for (int k = start + 1; k < e.Length; k++)
            Assert.True(e[k] <= e[k - 1] * (1 + 1e-12), $"energy grew at step {k}: {e[k - 1]:E6} → {e[k]:E6} J");
        Assert.True(e[^1] < 0.5 * e[start], "losses took energy out");
    }

    [Theory]
    [InlineData("[[1, 0.5], [0.4, 1]]", "symmetric")]
    [InlineData("[[1, 2], [2, 1]]", "positive definite")]
    public void Inductance_matrix_checks_name_the_fault(string rows, string fault)
    {
        var m = Parse(rows);
        Assert.Contains(fault, MatrixChecks.Inductance(m, 2));
    }

    [Fact]
    public void Capacitance_with_a_positive_mutual_entry_is_refused_as_not_in_maxwell_form()
    {
        Assert.Contains("Maxwell", MatrixChecks.Capacitance(Parse("[[3, 0.4], [0.4, 3]]"), 2));
        Assert.Contains("must be 3 × 3", MatrixChecks.Capacitance(Parse("[[3, -0.4], [-0.4, 3]]"), 3));
        Assert.Null(MatrixChecks.Capacitance(Parse("[[3, -0.4], [-0.4, 3]]"), 2));
    }

    static ConductorMatrix Parse(string rows) =>
        new(System.Text.Json.JsonSerializer.Deserialize<double[][]>(rows)!);
}
