using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// <c>load: { buffer: ... }</c>: a receiver from a buffer model (clamps and C_comp at the die pad, the package between pad and
/// pin) in the time loop and the loader. Sources are named beside each check; the files are invented (ReceiverFiles).
/// </summary>
public class BufferReceiverTests
{
    // A diode-like clamp to each rail: no current within the rails plus a 0.6 V knee, then 5 ohm (0.2 A per volt beyond).
    static readonly (double V, double I)[] GndClamp = [(-1.6, -0.2), (-0.6, 0), (0, 0), (3.3, 0)];
    static readonly (double V, double I)[] PowerClamp = [(-1.6, 0.2), (-0.6, 0), (0, 0), (3.3, 0)];   // supply minus pad

    static Scenario Load(ReceiverFiles files, string yaml)
    {
        File.WriteAllText(files.Scenario, yaml);
        return ScenarioLoader.Load(files.Scenario);
    }

    static string Error(ReceiverFiles files, string yaml) =>
        Assert.Throws<ScenarioException>(() => Load(files, yaml)).Message;

    const string Net = """
source: { waveform: step, low: 0 V, high: 3.3 V, rise: 200 ps, delay: 0.5 ns, resistance: 10 ohm }
line: [ { segment: { length: 0.2 m, z0: 50 ohm, delay: 1 ns } } ]
load: LOAD
probes: [ { name: rx, at: load } ]
simulation: { duration: 20 ns }
""";

    [Fact]
    public void Clamps_hold_the_overshoot_of_an_open_line()
    {
        // An unterminated 50 ohm line driven 0 → 3.3 V through 10 ohm: the 2.75 V incident wave doubles to 5.5 V at an open end
        // (Pozar, Microwave Engineering, eq. 2.35, Γ = 1). The receiver's clamp to 3.3 V (0.6 V knee, 5 ohm beyond) holds the
        // pin below 3.3 V + knee + 5 ohm · I at the peak; and the current there is at most where the line's Thevenin equivalent
        // on arrival (5.5 V behind 50 ohm) meets the clamp's line 3.9 V + 5 ohm · I: I ≤ 1.6 V / 55 ohm (Bergeron's graphical
        // method, from memory), an independent bound on the peak of 3.9 V + 5 ohm · 29.1 mA = 4.045 V.
        using var files = new ReceiverFiles();
        // C_comp small (0.2 pF): a lumped C on the line's last cell rings a little on the grid (1 pF adds 20 mV here at the
        // default resolution), which the static bound does not know.
        files.Write("rx.ibs", GndClamp, PowerClamp, cComp: 0.2e-12);
        var s = Load(files, Net.Replace("LOAD", "{ buffer: { file: rx.ibs, model: rx } }"));
        var r = Simulate.Solve(s);
        var v = r.Probe("rx").Volts; var i = r.Probe("rx").Amps;
        int peak = Array.IndexOf(v, v.Max());
        double iBound = (5.5 - 3.9) / 55;
        Assert.True(v[peak] <= 3.3 + 0.6 + 5 * Math.Max(i[peak], 0) + 0.01, $"peak {v[peak]:F4} V, current there {i[peak] * 1000:F2} mA");
        Assert.True(v[peak] <= (3.3 + 0.6 + 5 * iBound) * 1.005, $"peak {v[peak]:F4} V above the load-line bound");
        Assert.True(v[peak] > 3.95, $"the clamp conducts: peak {v[peak]:F4} V");   // not vacuous: the open end would reach 5.5 V
        // The buffer's Vinh and Vinl are the receiver's thresholds.
        Assert.Equal(new ReceiverThresholds(2.0, 0.8), s.Load.Receiver);
    }

    [Fact]
    public void A_branch_receiver_is_its_package_C_comp_and_summed_clamps()
    {
        // The receiver as documented (docs/buffers.md): C_pkg at the pin, R_pkg + L_pkg in series to the pad, C_comp and the
        // clamps' sum at the pad. The same net written out of plain parts, with the clamps summed here on the union of their
        // points in pad voltage (the power clamp's table read as supply minus pad, IBIS convention), runs the same to 1e-9.
        using var files = new ReceiverFiles();
        files.Write("rx.ibs", GndClamp, PowerClamp, cComp: 2e-12, package: (0.5, 2e-9, 0.8e-12));
        const string Main = """
source: { waveform: pulse, low: 0 V, high: 3.3 V, rise: 200 ps, width: 3 ns, delay: 0.5 ns, resistance: 12 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 1 ns }
  - branch: { name: stub, line: [ { segment: { length: 0.1 m, z0: 60 ohm, delay: 0.6 ns } } STUBPARTS ], load: STUBLOAD }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
load: { r: 1 kohm }
probes: [ { name: pin, at: PIN }, { name: far, at: load } ]
simulation: { duration: 15 ns }
""";
        var withBuffer = Load(files, Main.Replace("STUBPARTS", "").Replace("STUBLOAD", "{ buffer: { file: rx.ibs, model: rx, corner: typ } }").Replace("PIN", "stub/load"));
        var points = GndClamp.Select(p => p.V).Concat(PowerClamp.Select(p => 3.3 - p.V)).Distinct().Order().ToArray();
        var gnd = IvCurve.Create(GndClamp, "gnd");
        var power = IvCurve.Create(PowerClamp, "power");
        string table = "[" + string.Join(", ", points.Select(v => FormattableString.Invariant($"[{v} V, {Math.Round((gnd.Current(v) + power.Current(3.3 - v)) * 1000, 9):R} mA]"))) + "]";
        var byHand = Load(files, Main.Replace("STUBPARTS", ", { shunt: { c: 0.8 pF } }, { series: { r: 0.5 ohm, l: 2 nH } }")
            .Replace("STUBLOAD", $"{{ c: 2 pF, iv: {table} }}").Replace("PIN", "stub/0.1 m"));
        var a = Simulate.Solve(withBuffer);
        var b = Simulate.Solve(byHand);
        double worst = 0, top = 0;
        foreach (string p in new[] { "pin", "far" })
            for (int k = 0; k < a.Time.Length; k++)
            {
                worst = Math.Max(worst, Math.Abs(a.Probe(p).Volts[k] - b.Probe(p).Volts[k]));
                top = Math.Max(top, a.Probe(p).Volts[k]);
            }
        Assert.True(worst <= 1e-9 * 3.3, $"largest difference {worst:E3} V");
        Assert.True(top > 3.9, $"the clamps conduct (peak {top:F3} V)");
        var stub = withBuffer.Line.OfType<Branch>().Single();
        Assert.Equal(new ReceiverThresholds(2.0, 0.8), stub.Load.Receiver);
    }

    [Fact]
    public void A_passive_receiver_pin_never_adds_energy()
    {
        // Passivity: clamps whose summed law has I·V ≥ 0 (IvCurve.IsPassive) with C_comp and a package store and dissipate but
        // never deliver energy, so after an ideal source's pulse is over (a short, absorbing nothing) the net's discrete energy
        // (the leapfrog's ½ΣC dz V² + ½ΣL dz I^{n−1/2} I^{n+1/2}, Taflove and Hagness 2005 ch. 2, from memory, plus ½CV² and
        // ½LI² of the lumped parts) never rises from one step to the next. 12 random clamp pairs, fixed seed.
        var rng = new Random(1516);
        using var files = new ReceiverFiles();
        for (int run = 0; run < 12; run++)
        {
            var g = new List<(double, double)> { (0, 0), (3, 0) };
            var pw = new List<(double, double)> { (0, 0), (3, 0) };
            double vg = 0, vp = 0, ig = 0, ip = 0;
            for (int k = 0, n = rng.Next(1, 4); k < n; k++)
            {
                vg -= 0.2 + rng.NextDouble(); ig -= 0.1 * rng.NextDouble(); g.Insert(0, (vg, ig));
                vp -= 0.2 + rng.NextDouble(); ip += 0.1 * rng.NextDouble(); pw.Insert(0, (vp, ip));
            }
            files.Write($"rx{run}.ibs", [.. g], [.. pw], cComp: (1 + 3 * rng.NextDouble()) * 1e-12,
                package: (0.1 + rng.NextDouble(), (1 + 3 * rng.NextDouble()) * 1e-9, rng.NextDouble() * 1e-12), supply: 1 + 2 * rng.NextDouble());
            var s = Load(files, $$"""
source: { waveform: pulse, high: 5 V, rise: 200 ps, width: 1 ns, delay: 0 ns }
line: [ { segment: { length: 0.4 m, z0: 50 ohm, delay: 2 ns } } ]
load: { buffer: { file: rx{{run}}.ibs, model: rx } }
probes: [ { name: rx, at: load } ]
simulation: { duration: 30 ns }
""");
            Assert.True(s.Load.Buffer!.ClampLaw()!.IsPassive, $"clamps {run} are passive");
            var r = Simulate.Solve(s, new SimulationOptions { TrackEnergy = true });
            var e = r.Energy!;
            int from = (int)Math.Ceiling(1.5e-9 / r.Plan.Dt);
            double e0 = e[from];
            Assert.True(e0 > 1e-13, "energy was put on the line");
            double worstRise = 0, worstTotal = 0;
            for (int n = from + 1; n < e.Length; n++) { worstRise = Math.Max(worstRise, (e[n] - e[n - 1]) / e0); worstTotal = Math.Max(worstTotal, e[n] / e0 - 1); }
            // Per step to 1e-7 of the energy put on (the parts' Newton solves stop at 1e-12 V, which leaves rises of a few 1e-9
            // at the clamps' knees); in total never above it, and most of it gone by the end.
            Assert.True(worstRise <= 1e-7, $"clamps {run}: the energy rose by {worstRise:E3} of E0 in one step");
            Assert.True(worstTotal <= 1e-9, $"clamps {run}: the energy exceeded E0 by {worstTotal:E3}");
            Assert.True(e[^1] < 0.05 * e0, $"clamps {run}: {e[^1] / e0:F4} of E0 left");
            double supply = s.Load.Buffer.Model.PowerClampReferenceAt(Corner.Typ);
            Assert.True(r.Probe("rx").Volts.Max() > supply, "the pin rose above the power clamp's reference");
        }
    }

    [Fact]
    public void Bad_buffer_loads_are_one_line_errors_naming_the_key()
    {
        using var files = new ReceiverFiles();
        files.Write("na.ibs", GndClamp, PowerClamp, cComp: 1e-12, naCorners: true);
        File.WriteAllText(Path.Combine(files.Folder, FullFeatureFile.Name), FullFeatureFile.Text);
        string Err(string load) => Error(files, Net.Replace("LOAD", load));

        string missing = Err("{ buffer: { file: nothere.ibs, model: rx } }");
        Assert.Contains("net.yaml:", missing);
        Assert.Contains("load.buffer.file", missing);
        Assert.Contains("no such buffer model file", missing);

        string model = Err("{ buffer: { file: na.ibs, model: rx2 } }");
        Assert.Contains("load.buffer.model", model);
        Assert.Contains("its models are rx", model);

        // Every min column NA: the corner is not in the file (NA means typ, entry by entry, but a corner of nothing but NA is refused).
        string corner = Err("{ buffer: { file: na.ibs, model: rx, corner: min } }");
        Assert.Contains("load.buffer.corner", corner);
        Assert.Contains("has no min corner", corner);
        Assert.Contains("corners given: typ", corner);
        Assert.Contains("is not a corner", Err("{ buffer: { file: na.ibs, model: rx, corner: slow } }"));

        string output = Err($"{{ buffer: {{ file: {FullFeatureFile.Name}, model: out_only }} }}");
        Assert.Contains("load.buffer.model", output);
        Assert.Contains("Model_type Output, which does not receive", output);

        string both = Err("{ buffer: { file: na.ibs, model: rx }, receiver: { vih: 2 V, vil: 0.8 V } }");
        Assert.Contains("load.receiver", both);
        Assert.Contains("not both", both);

        foreach (string e in new[] { missing, model, corner, output, both }) Assert.DoesNotContain('\n', e);
        // The typ corner of the same file loads, and a corner given in the file is taken with its own columns.
        Assert.NotNull(Load(files, Net.Replace("LOAD", "{ buffer: { file: na.ibs, model: rx } }")).Load.Buffer);
        files.Write("all.ibs", GndClamp, PowerClamp, cComp: 1e-12);
        var max = Load(files, Net.Replace("LOAD", "{ buffer: { file: all.ibs, model: rx, corner: max } }")).Load.Buffer!;
        Assert.Equal(Corner.Max, max.Corner);
        Assert.Equal(1.1 * -0.2, max.Curves.GndClamp!.Current(-1.6), 12);
    }

    [Fact]
    public void The_demo_clock_line_into_the_demo_input_is_clamped()
    {
        // The demo of scenarios/clock-buffer-receiver.yaml, measured: an open end would ring the first edge to about 5.6 V
        // (2 · 3.3 V · 55 / 65, Γ = 1 at the open end, Pozar eq. 2.35); the demo input's clamps hold it near 4.3 V.
        var s = ScenarioLoader.Load(Path.Combine(Repository.Root, "scenarios", "clock-buffer-receiver.yaml"));
        var clamped = Simulate.Solve(s);
        var open = Simulate.Solve(s with { Load = LoadSpec.Open });
        double firstEdgeEnd = 6e-9;
        double Peak(SimulationResult r) => r.Time.Select((t, k) => (t, v: r.Probe("rx").Volts[k])).Where(x => x.t < firstEdgeEnd).Max(x => x.v);
        Assert.InRange(Peak(open), 5.4, 5.7);
        Assert.InRange(Peak(clamped), 3.9, 4.5);
    }
}
