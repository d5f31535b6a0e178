using System.Globalization;
using System.Numerics;
using WaveSim.Core;
using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Output;

namespace WaveSim.Tests.Output;

/// <summary>The sweep's spacing and the frequency.csv / frequency.png outputs.</summary>
public class FrequencySweepOutputTests
{
    const string Yaml = @"
title: sweep
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }
load: { r: 100 ohm }
probes:
  - { name: near, at: source }
  - { name: far, at: load }
simulation: { duration: 20 ns }
";

    [Fact]
    public void Logarithmic_sweep_spans_the_range_in_even_ratios_and_matches_single_points()
    {
        var s = TestScenarios.Parse(Yaml);
        var r = FrequencySweep.Compute(s, 1e6, 1e9, 4, log: true);
        Assert.Equal([1e6, 1e7, 1e8, 1e9], r.F.Select(f => Math.Round(f)).ToArray());
        for (int k = 0; k < r.F.Length; k++)
        {
            var pt = FrequencyDomainSolver.At(s, r.F[k]);
            Assert.Equal(pt.Zin, r.Zin[k]);
            Assert.Equal(pt.Load, r.Probes[1].Volts[k]);
        }
        // Quarter-wave point (Pozar section 2.5): 50 MHz on a 5 ns line, Zin = Z0²/ZL = 25 ohm.
        var lin = FrequencySweep.Compute(s, 0, 100e6, 3, log: false);
        Assert.Equal(50e6, lin.F[1]);
        Assert.True((lin.Zin[1] - new Complex(25, 0)).Magnitude < 1e-9);
    }

    [Fact]
    public void Zero_hertz_is_the_dc_limit()
    {
        // Ohm's law: at 0 Hz a shorted line of 20 ohm/m over 0.5 m is 10 ohm; a section behind a series capacitor is cut off
        // (capacitor open) and must not make the solve singular.
        var shorted = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 0.5 m, z0: 50 ohm, delay: 5 ns/m, r: 20 ohm/m }
load: short
simulation: { duration: 5 ns }
");
        Assert.True((FrequencyDomainSolver.At(shorted, 0).Zin - new Complex(10, 0)).Magnitude < 1e-9);
        var blocked = TestScenarios.Parse(@"
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 0.5 m, z0: 50 ohm, delay: 5 ns/m }
  - series: { c: 1 nF }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 5 ns/m }
load: open
simulation: { duration: 5 ns }
");
        var pt = FrequencyDomainSolver.At(blocked, 0);
        Assert.Equal(0, pt.Load.Magnitude, 12);
        Assert.Equal(1, pt.Volts[0].Real, 12); // no current flows, so the driver's resistance drops nothing
    }

    [Theory]
    [InlineData(0, 1e9, 10, true)]
    [InlineData(1e9, 1e6, 10, false)]
    [InlineData(1e6, 1e9, 1, true)]
    public void Bad_sweep_ranges_are_refused_with_one_line(double start, double stop, int points, bool log)
    {
        var ex = Assert.Throws<InputException>(() => FrequencySweep.Compute(TestScenarios.Parse(Yaml), start, stop, points, log));
        Assert.DoesNotContain('\n', ex.Message);
        Assert.StartsWith("frequency sweep:", ex.Message);
    }

    [Fact]
    public void Outputs_write_the_table_and_the_chart_whole()
    {
        var s = TestScenarios.Parse(Yaml);
        var r = FrequencySweep.Compute(s, 1e6, 1e9, 31, log: true);
        string dir = Path.Combine(Path.GetTempPath(), "wavesim-freq-" + Guid.NewGuid().ToString("N"));
        try
        {
            using (var output = new OutputFolder(dir))
            {
                FrequencyOutputs.Write(output, r, "sweep");
                output.Commit();
            }
            // Besides the two files, only the folder's own records (names starting with a dot, docs/outputs.md).
            Assert.Equal(["frequency.csv", "frequency.png"], Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).Where(f => f[0] != '.').Order().ToArray());
            string[] lines = File.ReadAllLines(Path.Combine(dir, "frequency.csv"));
            Assert.Equal("f_Hz,zin_re_ohm,zin_im_ohm,zin_mag_ohm,near_gain_dB,near_phase_deg,far_gain_dB,far_phase_deg", lines[0]);
            Assert.Equal(32, lines.Length);
            double[] first = lines[1].Split(',').Select(x => double.Parse(x, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(1e6, first[0], 1e-3);
            Assert.Equal(r.Zin[0].Magnitude, first[3], 1e-9);
            Assert.Equal(20 * Math.Log10(r.Load[0].Magnitude), first[6], 1e-9);
            byte[] png = File.ReadAllBytes(Path.Combine(dir, "frequency.png"));
            Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, png[..4]);
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    [Fact]
    public void The_chart_has_a_prefixed_log_frequency_axis_and_the_phase_in_degrees()
    {
        var s = TestScenarios.Parse(Yaml);
        var r = FrequencySweep.Compute(s, 1e6, 1e9, 31, log: true);
        var chart = FrequencyOutputs.Chart(r, "sweep");
        Assert.Equal(Core.Rendering.AxisKind.Logarithmic, chart.XKind);
        Assert.Equal(("Frequency", "Hz"), (chart.XLabel, chart.XUnit));
        Assert.Equal(["Gain", "Phase", "Input impedance"], chart.Panels.Select(p => p.YLabel));
        var x = Core.Rendering.XyChart.Layout(chart, 1200, 960).Panels[0].Geometry.X;
        Assert.Equal(["1 M", "10 M", "100 M", "1 G"], x.Ticks.Select(x.FormatTick));
        Assert.Equal("Frequency [Hz]", x.Title);

        var phase = chart.Panels[1];
        Assert.Equal("\u00b0", phase.YUnit);
        Assert.Equal([-180.0, -90, 0, 90, 180], phase.YTicks!);
        // Far end of a lossless line fed from a matched source (Rs = Z0): V(l) = (Vs/2)(1 + ΓL)·e^(−jβl) with ΓL real
        // (Pozar, Microwave Engineering, 4th ed., Sec. 2.3, from memory), so the phase is −360°·f·τ, wrapped, with τ = 5 ns.
        var far = phase.Series[1];
        Assert.Equal("far", far.Name);
        int checkedPoints = 0;
        for (int i = 0; i < far.X.Length; i++)
        {
            if (!double.IsFinite(far.Y[i])) continue;
            double hand = -360 * far.X[i] * 5e-9;
            double diff = Math.IEEERemainder(far.Y[i] - hand, 360);
            Assert.True(Math.Abs(diff) < 1e-6, $"{far.X[i]} Hz: {far.Y[i]}° against {hand}°");
            Assert.InRange(far.Y[i], -180, 180);
            checkedPoints++;
        }
        Assert.Equal(31, checkedPoints);
        // Each wrap (a jump of more than 180° between neighbours) is a gap, never a stroke across the panel.
        for (int i = 1; i < far.Y.Length; i++)
            if (double.IsFinite(far.Y[i]) && double.IsFinite(far.Y[i - 1])) Assert.True(Math.Abs(far.Y[i] - far.Y[i - 1]) <= 180);
        Assert.Contains(far.Y, double.IsNaN);
    }
}
