using WaveSim.Core.Measurements;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// What `wavesim compare` reports for a capture sampled more coarsely than the simulation, and the levels its figures are
/// measured against on a ringing clock. Check values: ReferenceData/compare-levels.md §1 (definition of RMS) and §2
/// (Ohm's law at DC).
/// </summary>
public class ComparisonLevelsTests
{
    [Fact]
    public void The_RMS_difference_is_taken_at_the_capture_samples_not_on_a_finer_interpolated_grid()
    {
        // Simulation on 10 ps, capture on 20 ps: the simulation's own values at the capture instants plus ±a alternately.
        // Every measured sample is off by exactly a, so RMS = peak = a (definition of the root mean square). On the 10 ps
        // grid the midpoints interpolate +a and −a to 0, which would read a/√2.
        const double a = 0.010;
        int n = 2001;
        var simT = new double[n];
        var simV = new double[n];
        for (int k = 0; k < n; k++)
        {
            simT[k] = k * 10e-12;
            simV[k] = SyntheticCapture.Step(simT[k], 10e-9, 200e-12, 1.0);
        }
        int m = (n + 1) / 2;
        var capT = new double[m];
        var capV = new double[m];
        for (int k = 0; k < m; k++)
        {
            capT[k] = simT[2 * k];
            capV[k] = simV[2 * k] + (k % 2 == 0 ? a : -a);
        }

        AlignedWaveforms r = WaveformComparison.Compare(simT, simV, capT, capV, AlignMode.None);

        Assert.Equal(a, r.RmsV, 1e-9);
        Assert.Equal(a, r.PeakV, 1e-9);
    }

    const string Clock = @"title: ringing clock into an open end
source: { waveform: trapezoid, low: 0 V, high: 3.3 V, rise: 500 ps, delay: 1 ns, width: 3.75 ns, period: 10 ns, resistance: 15 ohm }
line:
  - segment: { length: 150 mm, z0: 55 ohm, delay: 6.1 ns/m }
load: { c: 3 pF, receiver: { vih: 2.0 V, vil: 0.8 V } }
probes:
  - { name: rx, at: load }
simulation: { duration: 30 ns, output_step: 10 ps }
";

    [Fact]
    public void A_clock_is_measured_against_its_DC_levels_and_a_capture_offset_shows_as_a_level_difference()
    {
        // The open end draws no DC current, so no volt drops across the driver's 15 ohm (Ohm's law): the edge settles at
        // the driver's 3.3 V and 0 V. The record ends mid-ringing, so its tail is no settled level. The capture is the
        // simulation plus a 50 mV offset and ±20 mV alternating noise: its levels are 3.35 V and 50 mV, and one noisy first
        // sample (70 mV) is not its low level. Tolerance 2 mV: the alternating noise averages out over the level windows.
        SimulationResult sim = TestScenarios.Run(Clock);
        double[] v = sim.Probe("rx").Volts;
        var capV = new double[v.Length];
        for (int k = 0; k < v.Length; k++)
            capV[k] = v[k] + 0.050 + (k % 2 == 0 ? 0.020 : -0.020);
        var capture = new Capture((double[])sim.Time.Clone(), capV, "synthetic");

        CaptureComparisonResult r = CaptureComparison.Compare(sim, capture, "rx", AlignMode.None);

        Assert.Equal(3.3, r.SimulatedFigures.HighV!.Value, 1e-6);
        Assert.Equal(0.0, r.SimulatedFigures.LowV!.Value, 1e-6);
        Assert.InRange(r.CapturedFigures.HighV!.Value, 3.35 - 0.002, 3.35 + 0.002);
        Assert.InRange(r.CapturedFigures.LowV!.Value, 0.050 - 0.002, 0.050 + 0.002);
    }
}
