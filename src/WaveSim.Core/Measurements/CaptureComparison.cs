using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Measurements;

/// <summary>Simulates a scenario and compares one probe with a measured capture (the workflow behind <c>wavesim compare</c>).</summary>
public static class CaptureComparison
{
    /// <summary>Runs <paramref name="scenario"/>, aligns <paramref name="capture"/> with probe <paramref name="probe"/> and compares them.</summary>
    /// <param name="scenario">The scenario to simulate.</param>
    /// <param name="capture">The measured waveform.</param>
    /// <param name="probe">Name of the scenario probe the capture was taken at.</param>
    /// <param name="mode">How to find the capture's time offset.</param>
    /// <param name="options">Run options (progress, force); null for the defaults. Its analysis is replaced by
    /// <see cref="AnalysisOptions.WaveformsOnly"/>: the comparison computes its own figures on the aligned grid.</param>
    /// <param name="ct">Cancels the simulation.</param>
    /// <returns>The comparison and the figures of both waveforms.</returns>
    /// <exception cref="InputException">No such probe, too little overlap (see <see cref="CaptureTimeSpan"/>), or the waveforms cannot
    /// be compared (see <see cref="WaveformComparison.Compare"/>).</exception>
    public static CaptureComparisonResult Run(Scenario scenario, Capture capture, string probe, AlignMode mode,
        RunOptions? options = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(capture);
        RequireProbe(scenario, probe);
        var run = (options ?? new RunOptions()) with { Analysis = AnalysisOptions.WaveformsOnly };
        SimulationResult sim = Simulate.Run(scenario, run, ct).Result;
        return Compare(sim, capture, probe, mode);
    }

    /// <summary>Compares an existing simulation's probe with a capture.</summary>
    /// <param name="sim">A finished simulation.</param>
    /// <param name="capture">The measured waveform.</param>
    /// <param name="probe">Probe name.</param>
    /// <param name="mode">How to find the capture's time offset.</param>
    /// <returns>The comparison and the figures of both waveforms.</returns>
    /// <exception cref="InputException">Less than half of the capture's time span overlaps the simulated record after alignment
    /// (see <see cref="CaptureTimeSpan"/>), or the waveforms cannot be compared.</exception>
    public static CaptureComparisonResult Compare(SimulationResult sim, Capture capture, string probe, AlignMode mode)
    {
        ProbeTrace trace = sim.Probe(probe);
        CaptureTimeSpan.RequireFits(capture, sim.Time[^1] - sim.Time[0]);
        AlignedWaveforms c = WaveformComparison.Compare(sim.Time, trace.Volts, capture.Time, capture.Volts, mode);
        CaptureTimeSpan.RequireOverlap(capture, c.OffsetS, sim.Time[0], sim.Time[^1]);
        // Both sets of figures on the same grid and with the same options, so that their difference is the capture's doing.
        // The simulation's edge heads for its DC level, as in `wavesim run` (a clock's record tail is no settled level).
        SignalQualityOptions simOptions = FigureOptions(sim.Scenario, probe) with { FinalLevelV = trace.SettledVolts };
        SignalFigures simulated = SignalQuality.Compute(c.Time, c.Simulated, simOptions);
        SignalFigures captured = SignalQuality.Compute(c.Time, c.Captured, CaptureLevels(simOptions, c));
        var figures = SignalFigures.FigureNames
            .Where(name => simulated.HasThresholds || !name.StartsWith("noise_margin", StringComparison.Ordinal))
            .Select(name =>
            {
                double? a = simulated.GetNumber(name), b = captured.GetNumber(name);
                return new FigureDifference(name, a, b, a is { } x && b is { } y ? y - x : null);
            })
            .ToList();
        return new CaptureComparisonResult(probe, c, simulated, captured, figures);
    }

    /// <summary>
    /// The capture's levels: the simulation's, moved by the mean residual over the first 2 % and the last 5 % of the grid
    /// (the windows the figures take their levels from). A level offset of the capture shows in its figures, and one noisy
    /// first sample does not pass for a low level.
    /// </summary>
    static SignalQualityOptions CaptureLevels(SignalQualityOptions simOptions, AlignedWaveforms c)
    {
        int n = c.Residual.Length;
        double head = c.Residual.Take(Math.Max(1, n / 50)).Average();
        double tail = c.Residual.Skip(n - Math.Max(1, (int)Math.Ceiling(0.05 * n))).Average();
        return simOptions with
        {
            InitialLevelV = c.Simulated[0] + head,
            FinalLevelV = simOptions.FinalLevelV is { } f ? f + tail : null,
        };
    }

    /// <summary>The figure options <c>wavesim run</c> uses for this probe: receiver thresholds at a load that has them, delays from the
    /// source edge, settling from the edge's arrival at the probe.</summary>
    /// <param name="s">The scenario.</param>
    /// <param name="probe">Probe name (must exist).</param>
    /// <returns>The options.</returns>
    public static SignalQualityOptions FigureOptions(Scenario s, string probe)
    {
        ProbeSpec spec = s.Probes.First(p => p.Name == probe);
        ReceiverThresholds? rx = NetPaths.ReceiverAt(s, spec);
        return new SignalQualityOptions
        {
            VihV = rx?.Vih, VilV = rx?.Vil, SourceEdgeTimeS = s.Source.FirstEdgeMidpoint, LineDelayS = NetPaths.DelayTo(s, spec),
        };
    }

    /// <summary>Throws a one-line error naming the probes when <paramref name="probe"/> is not one of the scenario's.</summary>
    /// <param name="s">The scenario.</param>
    /// <param name="probe">Probe name.</param>
    /// <exception cref="InputException">No such probe (naming the <c>probe</c> parameter).</exception>
    public static void RequireProbe(Scenario s, string probe)
    {
        if (!s.Probes.Any(p => p.Name == probe))
            throw new InputException($"the scenario has no probe named '{probe}'; probes: {string.Join(", ", s.Probes.Select(p => p.Name))}") { Parameter = "probe" };
    }
}
