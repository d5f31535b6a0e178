using System.Globalization;
using System.Text;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// A capture generated here (a smooth step, seeded Gaussian noise of known RMS, a time offset, metadata lines,
/// a header and semicolons) is written, read back and compared with the clean waveform.
/// Reference: the noise RMS the test itself drew; a time shift is recovered when the residual is only that noise.
/// </summary>
public class CaptureRoundTripTests
{
    const double Tau = 50e-12;          // edge time constant, s (10-90 % about 220 ps)
    const double Edge = 5e-9;           // 50 % point on the simulation's time axis, s
    const double Amplitude = 1.0;
    const double Sigma = 2e-3;          // noise standard deviation, V
    const double Shift = 3.456e-9;      // capture time = simulation time - Shift
    const double CaptureStep = 10e-12;  // s
    const int CaptureCount = 1751;      // covers simulation time 0.5 ns .. 18 ns

    sealed record Generated(double[] TimeNs, double[] Volts, double[] Noise, string Text);

    static Generated Generate()
    {
        var timeNs = new double[CaptureCount];
        var volts = new double[CaptureCount];
        double[] noise = SyntheticCapture.Noise(CaptureCount, Sigma, seed: 20240611);
        var text = new StringBuilder();
        text.Append("Instrument;bench scope\nSample interval;1e-11\nTrigger;rising edge;ch1\n\n");
        text.Append("Time (ns);Ch1 (V)\n");
        for (int k = 0; k < CaptureCount; k++)
        {
            double tSim = 0.5e-9 + k * CaptureStep;
            timeNs[k] = (tSim - Shift) * 1e9;
            volts[k] = SyntheticCapture.Step(tSim, Edge, Tau, Amplitude) + noise[k];
            text.Append(timeNs[k].ToString("R", CultureInfo.InvariantCulture)).Append(';')
                .Append(volts[k].ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        }
        return new Generated(timeNs, volts, noise, text.ToString());
    }

    static (double[] T, double[] V) Simulation()
    {
        // The simulation on its own, coarser grid (20 ps) from 0 to 20 ns; linear interpolation error of this
        // smooth edge at 20 ps is about 1e-4 V, far below the noise.
        int n = 1001;
        var t = new double[n];
        var v = new double[n];
        for (int k = 0; k < n; k++)
        {
            t[k] = k * 20e-12;
            v[k] = SyntheticCapture.Step(t[k], Edge, Tau, Amplitude);
        }
        return (t, v);
    }

    [Fact]
    public void Reader_returns_every_sample_of_a_semicolon_capture_with_metadata_and_header()
    {
        Generated g = Generate();
        using var file = new TempFile("capture.csv", g.Text);

        Capture c = CaptureReader.Read(file.Path, new CaptureOptions { TimeScale = 1e-9 });

        Assert.Equal(CaptureCount, c.Time.Length);
        Assert.Empty(c.Warnings);
        for (int k = 0; k < CaptureCount; k++)
        {
            Assert.Equal(g.TimeNs[k] * 1e-9, c.Time[k]);   // written with "R": round-trips exactly
            Assert.Equal(g.Volts[k], c.Volts[k]);
        }
    }

    [Fact]
    public void Reader_finds_columns_by_header_name_and_by_one_based_number()
    {
        Generated g = Generate();
        using var file = new TempFile("capture.csv", g.Text);

        Capture byName = CaptureReader.Read(file.Path, new CaptureOptions { TimeColumn = "time (ns)", VoltColumn = "Ch1 (V)" });
        Capture byNumber = CaptureReader.Read(file.Path, new CaptureOptions { TimeColumn = "1", VoltColumn = "2" });

        Assert.Equal(g.Volts, byName.Volts);
        Assert.Equal(g.Volts, byNumber.Volts);
        Assert.Equal(g.TimeNs, byNumber.Time);
    }

    [Theory]
    [InlineData(AlignMode.Edge50)]
    [InlineData(AlignMode.CrossCorrelation)]
    public void Comparison_recovers_the_shift_and_the_noise_rms(AlignMode mode)
    {
        Generated g = Generate();
        using var file = new TempFile("capture.csv", g.Text);
        Capture c = CaptureReader.Read(file.Path, new CaptureOptions { TimeScale = 1e-9 });
        (double[] simT, double[] simV) = Simulation();

        AlignedWaveforms r = WaveformComparison.Compare(simT, simV, c.Time, c.Volts, mode);

        // Within one capture sample of the applied shift.
        Assert.InRange(r.OffsetS, Shift - CaptureStep, Shift + CaptureStep);
        // The grid (10 ps, the finer interval) starts on the first shifted capture sample, so every grid point
        // is a capture sample and the residual is the drawn noise; RMS within 10 % of the drawn noise's RMS.
        double noiseRms = SyntheticCapture.Rms(g.Noise);
        Assert.InRange(r.RmsV, 0.9 * noiseRms, 1.1 * noiseRms);
        Assert.Equal(100 * r.RmsV / Amplitude, r.RmsPct, 1e-2);
        Assert.True(r.PeakV >= r.RmsV);
        Assert.Equal(r.Time.Length, r.Residual.Length);
    }

    [Fact]
    public void Comparison_without_alignment_keeps_the_capture_axis_and_shows_the_shift_as_a_large_residual()
    {
        Generated g = Generate();
        using var file = new TempFile("capture.csv", g.Text);
        Capture c = CaptureReader.Read(file.Path, new CaptureOptions { TimeScale = 1e-9 });
        (double[] simT, double[] simV) = Simulation();

        AlignedWaveforms r = WaveformComparison.Compare(simT, simV, c.Time, c.Volts, AlignMode.None);

        Assert.Equal(0.0, r.OffsetS);
        Assert.True(r.PeakV > 0.9, $"peak {r.PeakV}");   // a 3.5 ns misalignment of a 1 V step leaves ~1 V residual
    }
}
