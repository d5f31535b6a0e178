using System.Globalization;

namespace WaveSim.Core.Rendering;

/// <summary>Renders a numbered PNG frame per snapshot (frame_00001.png, …), a few in parallel at a time, handing them over in order.</summary>
public static class FrameSequence
{
    /// <summary>The file name of frame <paramref name="number"/> (1-based), e.g. "frame_00001.png".</summary>
    public static string FileName(int number) => "frame_" + number.ToString("D5", CultureInfo.InvariantCulture) + ".png";

    /// <summary>
    /// Renders every snapshot with <see cref="FrameRenderer.RenderPng"/> on the same voltage scale. The frames are rendered in
    /// parallel in small batches and yielded in frame order, so the caller writes each one as it comes and no more than a batch
    /// is held in memory however many frames there are.
    /// </summary>
    /// <param name="layout">The line's pieces and elements.</param>
    /// <param name="snapshots">Snapshots in time order; frame k+1 shows snapshot k.</param>
    /// <param name="vMin">Bottom of the voltage axis on every frame, V.</param>
    /// <param name="vMax">Top of the voltage axis on every frame, V.</param>
    /// <param name="width">Frame width, px.</param>
    /// <param name="height">Frame height, px.</param>
    /// <param name="cancellationToken">Stops between batches (and before starting further frames of a batch) when cancelled.</param>
    /// <returns>Each frame's file name (<see cref="FileName"/>) and PNG bytes, in frame order.</returns>
    public static IEnumerable<(string Name, byte[] Png)> Render(LineLayout layout, IReadOnlyList<LineSnapshot> snapshots,
                                                                 double vMin, double vMax, int width, int height, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(snapshots);
        FrameRenderer.Layout(layout, vMin, vMax, width, height); // fail on bad arguments before the first frame is taken
        foreach (LineSnapshot s in snapshots) FrameRenderer.CheckSnapshot(layout, s);
        return Batches(layout, snapshots, vMin, vMax, width, height, cancellationToken);
    }

    static IEnumerable<(string Name, byte[] Png)> Batches(LineLayout layout, IReadOnlyList<LineSnapshot> snapshots,
                                                         double vMin, double vMax, int width, int height, CancellationToken cancellationToken)
    {
        int batch = 2 * Environment.ProcessorCount;
        var options = new ParallelOptions { CancellationToken = cancellationToken, MaxDegreeOfParallelism = Environment.ProcessorCount };
        var pngs = new byte[batch][];
        for (int first = 0; first < snapshots.Count; first += batch)
        {
            cancellationToken.ThrowIfCancellationRequested();
            int count = Math.Min(batch, snapshots.Count - first);
            Parallel.For(0, count, options, k => pngs[k] = FrameRenderer.RenderPng(layout, snapshots[first + k], vMin, vMax, width, height));
            for (int k = 0; k < count; k++)
            {
                yield return (FileName(first + k + 1), pngs[k]);
                pngs[k] = null!;
            }
        }
    }
}
