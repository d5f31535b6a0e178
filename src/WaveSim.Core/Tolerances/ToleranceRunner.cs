using WaveSim.Core.Sweeps;

namespace WaveSim.Core.Tolerances;

/// <summary>How far a tolerance run has got.</summary>
/// <param name="Done">Samples finished.</param>
/// <param name="Total">Samples of this run (or shard).</param>
/// <param name="Passed">Finished samples meeting every limit.</param>
public readonly record struct ToleranceProgress(int Done, int Total, int Passed);

/// <summary>Runs a <see cref="ToleranceSet"/>'s variants through the sweep's parallel, order-preserving runner.</summary>
public static class ToleranceRunner
{
    /// <summary>Runs every variant of the set with the figures-only analysis.</summary>
    /// <param name="set">The variants.</param>
    /// <param name="limits">The limits counted in the progress's running yield.</param>
    /// <param name="options">Threads, settling band, force.</param>
    /// <param name="progress">Receives the count done and passed after each sample; null for none.</param>
    /// <param name="ct">Cancels the run.</param>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    /// <exception cref="NumericalException">A sample's solution broke down.</exception>
    public static ToleranceResult Run(ToleranceSet set, IReadOnlyList<SweepLimit> limits, SweepRunOptions? options = null,
        IProgress<ToleranceProgress>? progress = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(set);
        ArgumentNullException.ThrowIfNull(limits);
        int done = 0, passed = 0;
        var probes = set.Probes;
        var points = SweepRunner.RunPoints(set.Points, options, p =>
        {
            done++;
            var r = new ToleranceResult(set.Keys, set.Nominal, probes, [p], set.Options.Corners);
            if (r.Passes(p, limits)) passed++;
            progress?.Report(new ToleranceProgress(done, set.Points.Count, passed));
        }, ct);
        return new ToleranceResult(set.Keys, set.Nominal, probes, points, set.Options.Corners);
    }
}
