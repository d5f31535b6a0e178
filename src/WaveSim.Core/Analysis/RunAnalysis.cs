using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>
/// The one place a run is analysed: every command that simulates (run, report, sweep points, termination candidates, fit
/// evaluations, capture comparison) gets its figures, eyes, verdicts and checks from <see cref="Analyse"/> through
/// <see cref="Simulate.Run"/>, asking for less with <see cref="AnalysisOptions"/>.
/// </summary>
public static class RunAnalysis
{
    /// <summary>Rows of the space-time map recorded during a run: enough for a picture, bounded memory.</summary>
    public const int SpaceTimeRows = 480;

    /// <summary>The snapshot instants a run records for <paramref name="options"/>: the space-time rows and the frames.</summary>
    public static double[] SnapshotTimes(Scenario s, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        double d = s.Simulation.Duration;
        var times = options.SpaceTime ? Enumerable.Range(0, SpaceTimeRows).Select(k => d * k / (SpaceTimeRows - 1)) : [];
        if (options.Frames > 0) times = times.Concat(FrameTimes(s, options.Frames));
        return times.Distinct().Order().ToArray();
    }

    /// <summary>N evenly spaced instants from 0 to the duration.</summary>
    public static double[] FrameTimes(Scenario s, int frames) =>
        Enumerable.Range(0, frames).Select(k => frames == 1 ? 0 : s.Simulation.Duration * k / (frames - 1)).ToArray();

    /// <summary>Analyses a finished run as <paramref name="options"/> asks.</summary>
    /// <exception cref="InputException">The frequency-domain check finds no DC operating point.</exception>
    /// <exception cref="NumericalException">The frequency-domain network has no solution at some frequency.</exception>
    public static RunOutcome Analyse(SimulationResult r, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(options);
        var s = r.Scenario;
        // The figure record (the solver's steps), never the thinned output record: output_step must not move an edge.
        var edges = SourceEdgeFinder.Find(s.Source, r.FigureTime);
        var figures = options.Figures ? Figures(r, edges, options.SettleBand) : [];
        var eyes = (options.Eyes || options.Limits is not null) && RunEyes.Applies(s) ? RunEyes.Compute(r) : [];
        var verdicts = options.Limits is { } limits ? RunVerdicts.Judge(r, edges, limits, eyes, options.JudgeAtMidLevel) : [];
        return new RunOutcome
        {
            Result = r,
            Options = options,
            SourceEdges = edges,
            Figures = figures,
            Eyes = eyes,
            Verdicts = verdicts,
            FrameTimes = options.Frames > 0 ? FrameTimes(s, options.Frames) : [],
            FrequencyCheck = options.FrequencyCheck ? FrequencyDomainCheck.Compare(r) : null,
            FrequencyResponse = options.FrequencyCheck ? FrequencyBand.Response(s, r.Plan) : null,
        };
    }

    /// <summary>
    /// Signal-quality figures for every probe, with the receiver thresholds applied at loads that have them, computed from the
    /// figure record (<see cref="SimulationResult.FigureTime"/>, the solver's steps), never from the thinned output record. The
    /// first-edge figures of a clock or pulse are measured from its first edge to the start of the next source edge at the probe,
    /// and settling from the edge's arrival at the probe (the source edge's 50 % instant plus the line delay to the probe).
    /// </summary>
    public static IReadOnlyList<ProbeFigures> Figures(SimulationResult r, double settleBand = SignalQualityOptions.DefaultSettleBand) =>
        Figures(r, SourceEdgeFinder.Find(r.Scenario.Source, r.FigureTime), settleBand);

    static ProbeFigures[] Figures(SimulationResult r, IReadOnlyList<SourceEdge> edges, double settleBand)
    {
        var list = new ProbeFigures[r.Probes.Count];
        var src = r.Scenario.Source;
        for (int i = 0; i < r.Probes.Count; i++)
        {
            var spec = r.Scenario.Probes[i];
            var rx = NetPaths.ReceiverAt(r.Scenario, spec);
            var options = new SignalQualityOptions
            {
                SettleBand = settleBand,
                VihV = rx?.Vih,
                VilV = rx?.Vil,
                SourceEdgeTimeS = src.FirstEdgeMidpoint,
                // Settling counts from the edge's arrival here, as the verdict's rule 6 does.
                LineDelayS = NetPaths.DelayTo(r.Scenario, spec),
                FinalLevelV = r.Probes[i].SettledVolts,
                // A clock or a pulse: the first edge's figures end where the next source edge reaches the probe.
                NextEdgeTimeS = RunVerdicts.NextEdgeStart(r.Scenario, i, edges),
            };
            list[i] = new ProbeFigures(r.Probes[i], SignalQuality.Compute(r.FigureTime, r.Probes[i].FigureVolts, options));
        }
        return list;
    }
}
