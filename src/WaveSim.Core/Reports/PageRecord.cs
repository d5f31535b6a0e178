using WaveSim.Core.Analysis;
using WaveSim.Core.Pictures;

namespace WaveSim.Core.Reports;

/// <summary>One trace the page draws: a probe of a run, or one run's probe in an overlay.</summary>
/// <param name="Name">The label in the toggles and the readout.</param>
/// <param name="At">Where it was recorded, in words.</param>
/// <param name="Volts">Voltage at each instant of <see cref="PageRecord.Time"/>, V (NaN where the trace has no sample).</param>
/// <param name="Amps">Current at the same instants, A, or null when the trace has none.</param>
/// <param name="Shown">Drawn when the page opens.</param>
public sealed record PageTrace(string Name, string At, double[] Volts, double[]? Amps, bool Shown = true)
{
    /// <summary>The receiver's thresholds at this trace (Vih, Vil), drawn on the voltage chart; null for none.</summary>
    public (double Vih, double Vil)? Thresholds { get; init; }
}

/// <summary>What the interactive page draws: traces on one time axis, the window first shown, and the frames along the line.</summary>
/// <param name="Title">The page's title.</param>
/// <param name="StepS">The finest time step, s.</param>
/// <param name="Time">Ascending instants, s.</param>
/// <param name="Traces">The traces, each sampled at <paramref name="Time"/>.</param>
/// <param name="Window">The span first shown, s.</param>
public sealed record PageRecord(string Title, double StepS, double[] Time, IReadOnlyList<PageTrace> Traces, TimeWindow Window)
{
    /// <summary>Open the page with the current chart shown.</summary>
    public bool CurrentsShown { get; init; }

    /// <summary>Positions along the main line, m, for the frames; null for none.</summary>
    public double[]? FramePositions { get; init; }

    /// <summary>The frames' instants, s.</summary>
    public double[]? FrameTimes { get; init; }

    /// <summary>V(z) at each frame instant, one row per instant matching <see cref="FramePositions"/>.</summary>
    public IReadOnlyList<double[]>? FrameVolts { get; init; }

    /// <summary>
    /// The record of an analysed run: every probe with its current and its receiver's thresholds, the main line's snapshots as
    /// frames; <paramref name="picture"/> gives the window first shown and <paramref name="plot"/> the probes first drawn.
    /// </summary>
    public static PageRecord Of(RunOutcome run, WaveformPicture picture, IReadOnlyList<string>? plot, bool currents = false)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(picture);
        var r = run.Result;
        var thresholds = run.Verdicts.ToDictionary(v => v.Probe, v => v.Judged ? v.Thresholds : null);
        var traces = r.Probes.Select(p => new PageTrace(p.Name, p.Location, p.Volts, p.Amps, plot is null || plot.Contains(p.Name))
        {
            Thresholds = thresholds.GetValueOrDefault(p.Name) is { } th ? (th.Vih, th.Vil) : null,
        }).ToList();
        bool frames = r.Snapshots.Count >= 2 && r.Lines.Count > 0;
        return new PageRecord(r.Scenario.Title, r.Plan.Dt, r.Time, traces, picture.Shown)
        {
            CurrentsShown = currents,
            FramePositions = frames ? r.Lines[0].Positions : null,
            FrameTimes = frames ? r.Snapshots.Select(s => s.Time).ToArray() : null,
            FrameVolts = frames ? r.Snapshots.Select(s => s.Volts[0]).ToArray() : null,
        };
    }
}
