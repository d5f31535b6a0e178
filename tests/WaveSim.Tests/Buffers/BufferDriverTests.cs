using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// <c>source: { buffer: ... }</c>: a driver from a buffer model, against Ohm's law (DC levels on the load line), the graphical
/// (Bergeron) solution of a lossless line between nonlinear ends, and the loader's rules. The model files are invented here.
/// </summary>
public class BufferDriverTests
{
    static string N(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    // A push-pull driver with curved (saturating) tables, no clamps, C_comp 0 and no package, so that the checks see the
    // tables alone: [Pulldown] against pin voltage, [Pullup] against 3.3 V minus pin voltage (the IBIS convention).
    static readonly (double V, double I)[] Pulldown = [(-1, -0.04), (0, 0), (0.5, 0.040), (1.0, 0.068), (2.0, 0.092), (3.3, 0.100), (5, 0.104)];
    static readonly (double V, double I)[] Pullup = [(-1, 0.036), (0, 0), (0.5, -0.036), (1.0, -0.060), (2.0, -0.082), (3.3, -0.090), (5, -0.094)];
    const double RampTime = 0.6e-9;   // the 20-80 % time of both edges; the ramp rule stretches it to 1 ns

    static string Table((double V, double I)[] t) => string.Join("\n", t.Select(r => $"  {N(r.V)}  {N(r.I)}  NA  NA"));

    static string DriverFile(string extra = "") => $"""
[IBIS Ver] 5.0
[File Name] drv.ibs
[Component] TESTDRV
[Manufacturer] Invented
[Pin] signal_name model_name
1 OUT drv
2 IN rx
[Model] drv
Model_type Output
C_comp 0pF NA NA
[Voltage Range] 3.3V NA NA
[Pulldown]
{Table(Pulldown)}
[Pullup]
{Table(Pullup)}
[Ramp]
dV/dt_r {N(0.6 * 3.3)}/{N(RampTime)} NA NA
dV/dt_f {N(0.6 * 3.3)}/{N(RampTime)} NA NA
R_load = 50
{extra}
[Model] rx
Model_type Input
C_comp 0pF NA NA
[Voltage Range] 3.3V NA NA
[GND Clamp]
  -1.6 -0.2 NA NA
  -0.6 0 NA NA
  0 0 NA NA
  3.3 0 NA NA
[POWER Clamp]
  -1.6 0.2 NA NA
  -0.6 0 NA NA
  0 0 NA NA
  3.3 0 NA NA
[End]
""";

    static Scenario Load(ReceiverFiles files, string yaml, string file = "")
    {
        File.WriteAllText(Path.Combine(files.Folder, "drv.ibs"), DriverFile(file));
        File.WriteAllText(files.Scenario, yaml);
        return ScenarioLoader.Load(files.Scenario);
    }

    [Theory]
    [InlineData(100.0)]
    [InlineData(33.0)]
    public void The_levels_are_the_load_lines_meeting_the_tables(double r)
    {
        // DC (Ohm's and Kirchhoff's laws): low, the pulldown sinks what R returns from 3.3 V: (3.3 − V)/R = I_pd(V); high, the
        // pullup sources what R takes to ground: V/R = −I_pu(3.3 − V), the table read in its own coordinate. Both by bisection
        // on the tables as written, here; the run starts low (before the step) and ends high, to 0.1 %.
        using var files = new ReceiverFiles();
        var pd = IvCurve.Create(Pulldown, "pd"); var pu = IvCurve.Create(Pullup, "pu");
        string Net(string to) => $$"""
source: { buffer: { file: drv.ibs, model: drv }, waveform: step, delay: 5 ns }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
load: { r: {{N(r)}} ohm, to: {{to}} }
probes: [ { name: drv, at: source }, { name: rx, at: load } ]
simulation: { duration: 60 ns }
""";
        double low = Bisection.Root(v => pd.Current(v) - (3.3 - v) / r, 0, 3.3);
        var s = Load(files, Net("3.3 V"));
        var run = Simulate.Solve(s);
        Assert.True(Math.Abs(run.Probe("rx").Volts[0] - low) <= 1e-3 * low, $"low {run.Probe("rx").Volts[0]:F5} V vs {low:F5} V");
        double high = Bisection.Root(v => v / r + pu.Current(3.3 - v), 0, 3.3);
        var up = Simulate.Solve(Load(files, Net("0 V")));
        Assert.True(Math.Abs(up.Probe("rx").Volts[^1] - high) <= 1e-3 * high, $"high {up.Probe("rx").Volts[^1]:F5} V vs {high:F5} V");
        Assert.True(Math.Abs(up.Probe("drv").Amps[^1] - high / r) <= 1e-3 * high / r, $"pin current {up.Probe("drv").Amps[^1]:E5} A vs {high / r:E5} A");
        Assert.True(Math.Abs(up.Probes[1].SettledVolts!.Value - high) <= 1e-3 * high, "the settled level of the verdicts");
    }

    [Fact]
    public void An_inverting_model_drives_high_before_the_step_and_low_after_it()
    {
        // Polarity Inverting: the pin takes the opposite state of the waveform's. Into R to ground the pin starts at the pullup's
        // load-line level (V/R = −I_pu(3.3 − V), by bisection here) and ends at the pulldown's, which is 0 V with nothing to
        // pull against (Ohm's law); the same file without the line does the opposite.
        using var files = new ReceiverFiles();
        var pu = IvCurve.Create(Pullup, "pu");
        const double r = 100;
        double high = Bisection.Root(v => v / r + pu.Current(3.3 - v), 0, 3.3);
        File.WriteAllText(Path.Combine(files.Folder, "drv.ibs"), DriverFile().Replace("Model_type Output\n", "Model_type Output\nPolarity Inverting\n", StringComparison.Ordinal));
        File.WriteAllText(files.Scenario, """
source: { buffer: { file: drv.ibs, model: drv }, waveform: step, delay: 5 ns }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
load: { r: 100 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 60 ns }
""");
        var s = ScenarioLoader.Load(files.Scenario);
        Assert.True(s.Source.Buffer!.Model.Inverts);
        var run = Simulate.Solve(s);
        Assert.True(Math.Abs(run.Probe("rx").Volts[0] - high) <= 1e-3 * high, $"start {run.Probe("rx").Volts[0]:F5} V vs {high:F5} V");
        Assert.True(Math.Abs(run.Probe("rx").Volts[^1]) <= 1e-3, $"end {run.Probe("rx").Volts[^1]:F5} V vs 0 V");
    }

    [Fact]
    public void A_lossless_line_between_a_buffer_driver_and_a_clamped_receiver_follows_the_graphical_solution()
    {
        // Bergeron's method (from memory; in most signal-integrity texts), with I counted from the driver end A to the receiver
        // end B: V_B(t) + Z0·I_B(t) = V_A(t − TD) + Z0·I_A(t − TD) and V_A(t) − Z0·I_A(t) = V_B(t − TD) − Z0·I_B(t − TD),
        // closed at A by I_A = −(Ku·I_pu + Kd·I_pd)(V_A) (the ramp rule: Ku rising linearly from 0 to 1 over the 20-80 % time
        // / 0.6 from the edge's start, Kd = 1 − Ku; common practice, no source) and at B by I_B = I_clamps(V_B); each instant by
        // bisection. Waveforms within 0.5 % of the 3.3 V swing.
        using var files = new ReceiverFiles();
        double z0 = 50, td = 2e-9, delay = 1e-9, span = RampTime / 0.6;
        var s = Load(files, """
source: { buffer: { file: drv.ibs, model: drv }, waveform: pulse, delay: 1 ns, width: 9 ns }
line: [ { segment: { length: 0.4 m, z0: 50 ohm, delay: 2 ns } } ]
load: { buffer: { file: drv.ibs, model: rx } }
probes: [ { name: src, at: source }, { name: rx, at: load } ]
simulation: { duration: 30 ns, resolution: 40 }
""");
        var r = Simulate.Solve(s);
        var pd = IvCurve.Create(Pulldown, "pd"); var pu = IvCurve.Create(Pullup, "pu");
        var gnd = IvCurve.Create([(-1.6, -0.2), (-0.6, 0), (0, 0), (3.3, 0)], "gnd");
        var power = IvCurve.Create([(-1.6, 0.2), (-0.6, 0), (0, 0), (3.3, 0)], "power");
        double fallStart = delay + 1.25 * RampTime + 9e-9;   // the pulse's fall ramp starts after its rise ramp and the width
        double Ku(double t) => t < fallStart ? Math.Clamp((t - delay) / span, 0, 1) : 1 - Math.Clamp((t - fallStart) / span, 0, 1);
        double Driver(double v, double t) => Ku(t) * pu.Current(3.3 - v) + (1 - Ku(t)) * pd.Current(v);
        int perDelay = 2000, steps = 14 * perDelay;
        double h = td / perDelay;
        var va = new double[steps + 1]; var ia = new double[steps + 1]; var vb = new double[steps + 1]; var ib = new double[steps + 1];
        for (int k = 0; k <= steps; k++)
        {
            double t = k * h;
            double kb = k >= perDelay ? va[k - perDelay] + z0 * ia[k - perDelay] : 0;   // the line starts at rest (all 0 V)
            double ka = k >= perDelay ? vb[k - perDelay] - z0 * ib[k - perDelay] : 0;
            va[k] = Bisection.Root(v => v + z0 * Driver(v, t) - ka, -20, 20);
            ia[k] = -Driver(va[k], t);
            vb[k] = Bisection.Root(v => v + z0 * (gnd.Current(v) + power.Current(3.3 - v)) - kb, -20, 20);
            ib[k] = gnd.Current(vb[k]) + power.Current(3.3 - vb[k]);
        }
        double worst = 0;
        for (int n = 0; n < r.Time.Length && r.Time[n] <= steps * h; n++)
        {
            int k = (int)Math.Round(r.Time[n] / h);
            worst = Math.Max(worst, Math.Abs(r.Probe("src").Volts[n] - va[k]));
            worst = Math.Max(worst, Math.Abs(r.Probe("rx").Volts[n] - vb[k]));
        }
        Assert.True(worst <= 0.005 * 3.3, $"largest difference from the graphical solution {worst * 1000:F2} mV");
        Assert.True(vb.Max() > 3.9, $"the receiver's clamp conducts (peak {vb.Max():F3} V)");
        Assert.True(vb.Min() < -0.6, $"and its ground clamp on the fall (low {vb.Min():F3} V)");
    }

    [Fact]
    public void Bad_buffer_sources_are_one_line_errors_naming_the_key()
    {
        using var files = new ReceiverFiles();
        string Err(string source) => Assert.Throws<ScenarioException>(() => Load(files, $$"""
source: {{source}}
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
simulation: { duration: 10 ns }
""")).Message;
        foreach (string key in new[] { "high: 3.3 V", "low: 0 V", "rise: 1 ns", "fall: 1 ns", "resistance: 20 ohm" })
        {
            string e = Err($"{{ buffer: {{ file: drv.ibs, model: drv }}, waveform: step, {key} }}");
            string name = key[..key.IndexOf(':')];
            Assert.Contains($"source.{name}", e);
            Assert.Contains("takes its levels and edges from its model", e);
            Assert.DoesNotContain('\n', e);
        }
        Assert.Contains("does not drive", Err("{ buffer: { file: drv.ibs, model: rx }, waveform: step }"));
        Assert.Contains("source.waveform", Err("{ buffer: { file: drv.ibs, model: drv }, waveform: sine, period: 2 ns }"));
        Assert.Contains("not 'sine'", Err("{ buffer: { file: drv.ibs, model: drv }, waveform: sine, period: 2 ns }"));
        Assert.Contains("source.buffer.corner", Err("{ buffer: { file: drv.ibs, model: drv, corner: max }, waveform: step }"));
        Assert.Contains("no such buffer model file", Err("{ buffer: { file: none.ibs, model: drv }, waveform: step }"));
    }

    [Fact]
    public void One_waveform_per_edge_falls_back_to_the_ramp_rule_with_a_warning()
    {
        // A [Rising Waveform] alone cannot give two equations per instant: the ramp rule is used, and the scenario says so.
        using var files = new ReceiverFiles();
        var s = Load(files, """
source: { buffer: { file: drv.ibs, model: drv }, waveform: step, delay: 1 ns }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
simulation: { duration: 10 ns }
""", "[Rising Waveform]\nR_fixture = 50\nV_fixture = 0\n0 0 NA NA\n1n 1.5 NA NA\n2n 1.5 NA NA");
        var warnings = ScenarioWarnings.For(s, Simulate.Plan(s));
        Assert.Contains(warnings, w => w.Key == "source.buffer" && w.Message.Contains("[Ramp] rule is used"));
        // The time step is chosen for the model's edge: the shorter 20-80 % time stands as the source's rise.
        Assert.Equal(RampTime, s.Source.Rise, 1e-20);
    }
}
