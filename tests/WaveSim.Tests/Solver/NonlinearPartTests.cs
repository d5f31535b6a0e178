using WaveSim.Core.Buffers;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// <c>iv:</c> parts (piecewise-linear I-V tables) in the time loop and the DC start, against Ohm's law, the graphical
/// (Bergeron) solution of a lossless line between nonlinear ends, load-line intersections and the energy balance. Sources are
/// named beside each check; the values are in ReferenceData/nonlinear.md and ReferenceData/published-checks.md §14.
/// </summary>
public class NonlinearPartTests
{
    const string Probes = "probes: [ { name: src, at: source }, { name: mid, at: 0.3 m }, { name: rx, at: load } ]";

    static void SameRun(string linear, string table, double swing)
    {
        var a = TestScenarios.Run(linear);
        var b = TestScenarios.Run(table);
        Assert.Equal(a.Time.Length, b.Time.Length);
        double worst = 0;
        for (int p = 0; p < a.Probes.Count; p++)
            for (int k = 0; k < a.Time.Length; k++)
                worst = Math.Max(worst, Math.Abs(a.Probes[p].Volts[k] - b.Probes[p].Volts[k]));
        Assert.True(worst <= 1e-9 * swing, $"largest difference {worst:E3} V");
        // The load probe's current includes the table's current, as it includes a resistor's.
        double worstI = 0;
        for (int k = 0; k < a.Time.Length; k++) worstI = Math.Max(worstI, Math.Abs(a.Probe("rx").Amps[k] - b.Probe("rx").Amps[k]));
        Assert.True(worstI <= 1e-9 * swing / 50, $"largest current difference {worstI:E3} A");
    }

    [Theory]
    // A table I = V/R (two points, extrapolated with its slope) is the resistor R (Ohm's law), at a load (also returning to
    // a voltage), as a shunt in the line, and as a series part: the runs agree to 1e-9 of the swing.
    [InlineData("load: { r: 100 ohm }", "load: { iv: [[-1 V, -10 mA], [1 V, 10 mA]] }", "", "")]
    [InlineData("load: { r: 100 ohm, to: 1 V, c: 1 pF }", "load: { to: 1 V, c: 1 pF, iv: [[-2 V, -20 mA], [0 V, 0 A], [2 V, 20 mA]] }", "", "")]
    [InlineData("load: open", "load: open", "- { shunt: { r: 200 ohm } }", "- { shunt: { iv: [[0 V, 0 A], [1 V, 5 mA]] } }")]
    [InlineData("load: { r: 1 kohm }", "load: { r: 1 kohm }", "- { series: { r: 33 ohm } }", "- { series: { iv: [[-1 V, -30.303030303030305 mA], [1 V, 30.303030303030305 mA]] } }")]
    public void A_linear_table_reproduces_the_resistor(string linearLoad, string tableLoad, string linearPart, string tablePart)
    {
        string Net(string load, string part) => $@"
source: {{ waveform: step, low: 0 V, high: 3.3 V, rise: 300 ps, delay: 0.5 ns, resistance: 20 ohm }}
line:
  - segment: {{ length: 0.5 m, z0: 50 ohm, delay: 2.5 ns }}
  {part}
  - segment: {{ length: 0.5 m, z0: 60 ohm, delay: 2.5 ns, r: 2 ohm/m }}
{load}
{Probes}
simulation: {{ duration: 30 ns }}
";
        SameRun(Net(linearLoad, linearPart), Net(tableLoad, tablePart), 3.3);
    }

    // The driver's pull-down table (at the source node, beside the 25 ohm Thevenin source) and the receiver's clamps
    // (no current from −0.6 V to 3.9 V, 8 ohm beyond 3.9 V and 8 ohm below −0.6 V): invented for the test, passive.
    static readonly (double V, double I)[] DriverTable = [(0, 0), (2, 0.010), (4, 0.040)];
    static readonly (double V, double I)[] ClampTable = [(-1.0, -0.050), (-0.6, 0), (0, 0), (3.9, 0), (4.3, 0.050)];

    static string Table((double V, double I)[] t) =>
        "[" + string.Join(", ", t.Select(p => FormattableString.Invariant($"[{p.V} V, {p.I * 1000} mA]"))) + "]";

    [Fact]
    public void A_lossless_line_between_nonlinear_ends_follows_the_graphical_solution()
    {
        // Bergeron's method (from memory; in most signal-integrity texts; ReferenceData/published-checks.md §14, written here in the
        // form derived in ReferenceData/nonlinear.md §1): with I counted from A (source) towards B (load),
        //   V_B(t) + Z0·I_B(t) = V_A(t − TD) + Z0·I_A(t − TD),   V_A(t) − Z0·I_A(t) = V_B(t − TD) − Z0·I_B(t − TD),
        // closed at A by I_A = (Vs − V_A)/Rs − f_drv(V_A) and at B by I_B = f_clamp(V_B), each solved by bisection.
        double z0 = 50, td = 2e-9, rs = 25, high = 3.3, rise = 300e-12, delay = 0.5e-9;
        var r = TestScenarios.Run($@"
source: {{ waveform: step, low: 0 V, high: 3.3 V, rise: 300 ps, delay: 0.5 ns, resistance: 25 ohm }}
line:
  - shunt: {{ iv: {Table(DriverTable)} }}
  - segment: {{ length: 0.4 m, z0: 50 ohm, delay: 2 ns }}
load: {{ iv: {Table(ClampTable)} }}
probes: [ {{ name: src, at: source }}, {{ name: rx, at: load }} ]
simulation: {{ duration: 30 ns, resolution: 40 }}
");
        var drv = IvCurve.Create(DriverTable, "driver");
        var clamp = IvCurve.Create(ClampTable, "clamp");
        double Vs(double t) => r.Scenario.Source.Value(t);
        int perDelay = 2000, steps = 15 * perDelay;
        double h = td / perDelay;
        var va = new double[steps + 1]; var ia = new double[steps + 1]; var vb = new double[steps + 1]; var ib = new double[steps + 1];
        for (int k = 0; k <= steps; k++)
        {
            double t = k * h;
            double kb = k >= perDelay ? va[k - perDelay] + z0 * ia[k - perDelay] : 0;   // the line starts at rest (all 0 V)
            double ka = k >= perDelay ? vb[k - perDelay] - z0 * ib[k - perDelay] : 0;
            double vsNow = Vs(t);
            va[k] = Bisection.Root(v => v - z0 * ((vsNow - v) / rs - drv.Current(v)) - ka, -20, 20);
            ia[k] = (vsNow - va[k]) / rs - drv.Current(va[k]);
            vb[k] = Bisection.Root(v => v + z0 * clamp.Current(v) - kb, -20, 20);
            ib[k] = clamp.Current(vb[k]);
        }
        double worst = 0;
        for (int n = 0; n < r.Time.Length; n++)
        {
            double t = r.Time[n];
            if (t > steps * h) break;
            int k = (int)Math.Round(t / h);
            worst = Math.Max(worst, Math.Abs(r.Probe("src").Volts[n] - va[k]));
            worst = Math.Max(worst, Math.Abs(r.Probe("rx").Volts[n] - vb[k]));
        }
        Assert.True(worst <= 0.005 * high, $"largest difference from the graphical solution {worst * 1000:F2} mV");
        // Not vacuous: the clamp conducts (the open line would double the 2.2 V incident wave to 4.4 V).
        Assert.True(vb.Max() > 3.9 && vb.Max() < 4.3, $"peak {vb.Max():F3} V");
        _ = rise; _ = delay;
    }

    [Fact]
    public void A_net_idling_high_starts_at_the_load_line_intersection()
    {
        // DC: the source level through Rs and the line's resistance, into the table: V = Vs − (Rs + R·l)·f(V), the load line
        // meeting the curve (Ohm's and Kirchhoff's laws), solved by bisection here; the run starts there and stays (to 0.1 %).
        var rxTable = new (double V, double I)[] { (0, 0), (0.5, 0.001), (1.5, 0.020), (3, 0.080) };
        var r = TestScenarios.Run($@"
source: {{ waveform: step, low: 3.3 V, high: 0 V, rise: 300 ps, delay: 8 ns, resistance: 30 ohm }}
line: [ {{ segment: {{ length: 1 m, z0: 50 ohm, delay: 5 ns, r: 5 ohm/m }} }} ]
load: {{ iv: {Table(rxTable)} }}
probes: [ {{ name: src, at: source }}, {{ name: rx, at: load }} ]
simulation: {{ duration: 10 ns }}
");
        var f = IvCurve.Create(rxTable, "rx");
        double v = Bisection.Root(x => x + 35 * f.Current(x) - 3.3, 0, 3.3);
        Assert.InRange(v, 1.5, 2.5);   // on the curve's steep part, away from the linear start
        foreach (string p in new[] { "src", "rx" })
        {
            double expected = p == "rx" ? v : 3.3 - 30 * f.Current(v);
            for (int k = 0; r.Time[k] < 8e-9; k++)
                Assert.True(Math.Abs(r.Probe(p).Volts[k] - expected) <= 1e-3 * expected, $"{p} at {r.Time[k]:E3} s: {r.Probe(p).Volts[k]:F6} V vs {expected:F6} V");
        }
    }

    [Fact]
    public void A_clamp_holds_the_overshoot_of_an_open_line()
    {
        // An unterminated 50 ohm line driven 0 → 3.3 V through 10 ohm: the 2.75 V incident wave would double to 5.5 V at an open
        // end (Pozar eq. 2.35, Γ = 1). A clamp to 3.3 V with a 0.6 V knee and 5 ohm series drop holds the end below
        // 3.3 V + 0.6 V + 5 ohm·I_peak; on arrival the end sits where the Thevenin line 5.5 V − 50 ohm·I meets the clamp's line
        // 3.9 V + 5 ohm·I: I = 1.6 V / 55 ohm, V = 4.0455 V (Bergeron; ReferenceData/nonlinear.md §3).
        var clamp = new (double V, double I)[] { (-1.6, -0.2), (-0.6, 0), (0, 0), (3.9, 0), (4.9, 0.2) };
        var r = TestScenarios.Run($@"
source: {{ waveform: step, low: 0 V, high: 3.3 V, rise: 200 ps, delay: 0.5 ns, resistance: 10 ohm }}
line: [ {{ segment: {{ length: 0.2 m, z0: 50 ohm, delay: 1 ns }} }} ]
load: {{ iv: {Table(clamp)} }}
probes: [ {{ name: rx, at: load }} ]
simulation: {{ duration: 20 ns }}
");
        var v = r.Probe("rx").Volts; var i = r.Probe("rx").Amps;
        int peak = Array.IndexOf(v, v.Max());
        double bound = 3.3 + 0.6 + 5 * i.Max();
        Assert.True(v[peak] <= bound + 1e-9, $"peak {v[peak]:F4} V above the bound {bound:F4} V");
        Assert.Equal(4.0455, v.Max(), 0.005 * 3.3);
        Assert.Equal(4.0455, r.At("rx", 0.5e-9 + 1e-9 + 0.8e-9), 0.005 * 3.3);   // the first plateau, before the source's reflection returns
    }

    [Fact]
    public void A_passive_table_never_adds_energy_to_the_line()
    {
        // Passivity (P = V·I ≥ 0 for the part; the leapfrog's discrete energy E^n = ½ Σ C dz V² + ½ Σ L dz I^{n−1/2} I^{n+1/2},
        // Taflove and Hagness 2005 ch. 2, from memory): a pulse from an ideal (0 ohm) source puts energy on a lossless line; once
        // the source is back at 0 V it is a short, which absorbs nothing, so with a passive table at the far end the line's energy
        // never rises from one step to the next (to 1e-9 of the energy put on). 20 random passive tables, fixed seed.
        var rng = new Random(1515);
        int tried = 0;
        for (int run = 0; run < 20; run++)
        {
            IvCurve curve;
            List<(double, double)> pts;
            do
            {
                tried++;
                pts = [(0, 0)];
                int neg = rng.Next(0, 3), pos = rng.Next(1, 4);
                double v = 0;
                for (int k = 0; k < neg; k++) { v -= 0.2 + 1.5 * rng.NextDouble(); pts.Insert(0, (v, -0.1 * rng.NextDouble())); }
                v = 0;
                for (int k = 0; k < pos; k++) { v += 0.2 + 1.5 * rng.NextDouble(); pts.Add((v, 0.1 * rng.NextDouble())); }
                curve = IvCurve.Create(pts, "random");
            } while (!curve.IsPassive);
            var r = TestScenarios.Run($@"
source: {{ waveform: pulse, high: 2 V, rise: 200 ps, width: 1 ns, delay: 0 ns }}
line: [ {{ segment: {{ length: 0.4 m, z0: 50 ohm, delay: 2 ns }} }} ]
load: {{ iv: {Table(pts.ToArray())} }}
probes: [ {{ name: rx, at: load }} ]
simulation: {{ duration: 30 ns, resolution: 20 }}
", new SimulationOptions { TrackEnergy = true });
            var e = r.Energy!;
            int from = (int)Math.Ceiling(1.5e-9 / r.Plan.Dt);
            double e0 = e[from];
            Assert.True(e0 > 1e-13, "energy was put on the line");
            for (int n = from + 1; n < e.Length; n++)
                Assert.True(e[n] <= e[n - 1] + 1e-9 * e0, $"table {run} ({string.Join(" ", pts)}): step {n}: {e[n]:E9} after {e[n - 1]:E9}");
        }
        Assert.True(tried >= 20);
    }
}
