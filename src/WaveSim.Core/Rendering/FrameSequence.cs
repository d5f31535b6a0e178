using System.Globalization;

namespace WaveSim.Core.Rendering;

/// <summary>Writes a numbered PNG frame per snapshot (frame_00001.png, …), rendering in parallel.</summary>
public static class FrameSequence
{
    /// <summary>The file name of frame <paramref name="number"/> (1-based), e.g. "frame_00001.png".</summary>
    public static string FileName(int number) => "frame_" + number.ToString("D5", CultureInfo.InvariantCulture) + ".png";

    /// <summary>
    /// Renders every snapshot with <see cref="FrameRenderer.RenderPng"/> on the same voltage scale and writes it to
    /// <paramref name="directory"/>; each file is written under a temporary name and then moved into place.
    /// </summary>
    /// <param name="directory">An existing folder (the caller creates and cleans it).</param>
    /// <param name="layout">The line's pieces and elements.</param>
    /// <param name="snapshots">Snapshots in time order; frame k+1 shows snapshot k.</param>
    /// <param name="vMin">Bottom of the voltage axis on every frame, V.</param>
    /// <param name="vMax">Top of the voltage axis on every frame, V.</param>
    /// <param name="width">Frame width, px.</param>
    /// <param name="height">Frame height, px.</param>
    /// <param name="cancellationToken">Stops starting new frames when cancelled.</param>
    /// <returns>The paths written, in frame order.</returns>
    public static IReadOnlyList<string> WriteAll(string directory, LineLayout layout, IReadOnlyList<LineSnapshot> snapshots,
                                                 double vMin, double vMax, int width, int height, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(snapshots);
        if (!Directory.Exists(directory)) throw new DirectoryNotFoundException($"Frame folder '{directory}' does not exist.");
        FrameRenderer.Layout(layout, vMin, vMax, width, height); // fail on bad arguments before any file is written
        foreach (LineSnapshot s in snapshots) FrameRenderer.CheckSnapshot(layout, s);
        var paths = new string[snapshots.Count];
        var options = new ParallelOptions { CancellationToken = cancellationToken, MaxDegreeOfParallelism = Environment.ProcessorCount };
        Parallel.For(0, snapshots.Count, options, k =>
        {
            byte[] png = FrameRenderer.RenderPng(layout, snapshots[k], vMin, vMax, width, height);
            string path = Path.Combine(directory, FileName(k + 1));
            string temp = path + ".tmp";
            File.WriteAllBytes(temp, png);
            File.Move(temp, path, overwrite: true);
            paths[k] = path;
        });
        return paths;
    }
}
