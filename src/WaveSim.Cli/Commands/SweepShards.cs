using WaveSim.Core.Output;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Cli.Commands;

/// <summary>A sweep cut into shards: one shard's points into a partial folder, and the partials back into one sweep.</summary>
internal static class SweepShards
{
    /// <summary>Runs the points of <paramref name="part"/> and writes them with their manifest; commits the folder.</summary>
    public static void RunPartial(OutputFolder output, SweepGrid grid, Shard part, string scenarioPath, KeyValuePair<string, string>[] settings,
        SweepRunOptions options, CancellationToken ct)
    {
        var points = grid.Points.Where(p => part.Contains(p.Index)).ToArray();
        var rows = SweepRunner.RunPoints(points, options, null, ct);
        var manifest = new ShardManifest("sweep", scenarioPath, ShardManifest.HashFile(scenarioPath), settings, part, grid.Points.Count);
        output.WriteText("sweep.csv", w => SweepCsv.WritePartial(new SweepResult(grid.Axes, grid.Probes, rows), w));
        output.WriteText(ShardManifest.FileName, RunSummary.Text(manifest.ToJson()));
        output.Commit();
    }
}
