using System.Runtime.ExceptionServices;
using WaveSim.Core.Analysis;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Sweeps;

/// <summary>Settings of a sweep run.</summary>
public sealed record SweepRunOptions
{
    /// <summary>Run the points one after another on one thread (default false: all cores). Results are identical either way.</summary>
    public bool Serial { get; init; }
    /// <summary>Settling band as a fraction of the swing (default 0.05).</summary>
    public double SettleBand { get; init; } = SignalQualityOptions.DefaultSettleBand;
    /// <summary>Run points beyond the memory or cell-update limits.</summary>
    public bool Force { get; init; }
    /// <summary>Receives the fraction of points done, 0..1.</summary>
    public IProgress<double>? Progress { get; init; }
    /// <summary>
    /// Keep each point's probe voltages thinned to this many columns of min/max pairs (for a page that shows a point's
    /// waveforms); 0 (the default) keeps none.
    /// </summary>
    public int WaveformColumns { get; init; }
}

/// <summary>Runs every point of a <see cref="SweepGrid"/> through <see cref="Simulate.Run"/> and keeps each probe's signal figures.</summary>
public static class SweepRunner
{
    /// <summary>Runs the grid, in parallel on all cores unless <see cref="SweepRunOptions.Serial"/>.</summary>
    /// <remarks>Each point is an independent run whose result is stored at its own index, so the order and values do not depend on scheduling.</remarks>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    /// <exception cref="NumericalException">A point's solution broke down.</exception>
    public static SweepResult Run(SweepGrid grid, SweepRunOptions? options = null, CancellationToken ct = default) =>
        new(grid.Axes, grid.Probes, RunPoints(grid.Points, options, null, ct));

    /// <summary>
    /// Runs any list of variants (a grid's, a tolerance run's) through <see cref="Simulate.Run"/> with the figures-only
    /// analysis, in parallel unless <see cref="SweepRunOptions.Serial"/>; result i belongs to point i whatever the scheduling.
    /// </summary>
    /// <param name="points">The variants.</param>
    /// <param name="options">Settings; null for the defaults.</param>
    /// <param name="completed">Called (one call at a time) with each point's result as it finishes; null for none.</param>
    /// <param name="ct">Cancels the run.</param>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    /// <exception cref="NumericalException">A point's solution broke down.</exception>
    public static SweepPointResult[] RunPoints(IReadOnlyList<SweepPoint> points, SweepRunOptions? options = null,
        Action<SweepPointResult>? completed = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(points);
        options ??= new SweepRunOptions();
        var results = new SweepPointResult[points.Count];
        // A point keeps only its figures: no eyes, verdicts or snapshots.
        var run = new RunOptions { Force = options.Force, Analysis = AnalysisOptions.FiguresOnly(options.SettleBand) };
        int done = 0;
        var gate = new object();
        ParallelFor(points.Count, options.Serial, ct, i =>
        {
            var p = points[i];
            var outcome = Simulate.Run(p.Scenario, run with { Plan = p.Plan }, ct);
            var figures = outcome.Figures.Select(f => f.Figures).ToArray();
            SweepWaveforms? waves = null;
            if (options.WaveformColumns > 0)
            {
                var (t, v) = Rendering.MinMaxColumns.Thin(outcome.Result.Time, outcome.Result.Probes.Select(x => x.Volts).ToArray(), options.WaveformColumns);
                waves = new SweepWaveforms(t, v);
            }
            results[i] = new SweepPointResult(p.Index, p.Values, figures) { Waveforms = waves };
            int n = Interlocked.Increment(ref done);
            lock (gate)
            {
                completed?.Invoke(results[i]);
                options.Progress?.Report((double)n / results.Length);
            }
        });
        return results;
    }

    /// <summary>Parallel.For over [0, count) on all cores (or one), rethrowing a body's own exception rather than an AggregateException.</summary>
    internal static void ParallelFor(int count, bool serial, CancellationToken ct, Action<int> body)
    {
        var po = new ParallelOptions { MaxDegreeOfParallelism = serial ? 1 : Environment.ProcessorCount, CancellationToken = ct };
        try { Parallel.For(0, count, po, body); }
        catch (AggregateException ae)
        {
            var inner = ae.Flatten().InnerExceptions;
            var first = inner.FirstOrDefault(e => e is not OperationCanceledException) ?? inner[0];
            ExceptionDispatchInfo.Capture(first).Throw();
        }
    }
}
