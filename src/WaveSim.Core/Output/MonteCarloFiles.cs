using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Core.Output;

/// <summary>
/// The files of a whole tolerance run: montecarlo.csv, summary.json, and per limited figure a histogram
/// (<c>histogram_&lt;probe&gt;_&lt;figure&gt;.png</c>) and a scatter against its most influential key
/// (<c>scatter_&lt;probe&gt;_&lt;figure&gt;.png</c>). An unsharded run and a merge of its shards write them through this one place.
/// </summary>
public static class MonteCarloFiles
{
    /// <summary>Writes the files into <paramref name="output"/> (not committed) and returns the picture names.</summary>
    public static IReadOnlyList<string> Write(OutputFolder output, ToleranceResult r, IReadOnlyList<SweepLimit> limits, ulong? seed)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limits);
        output.WriteText("montecarlo.csv", w => MonteCarloCsv.Write(r, limits, w));
        output.WriteText("summary.json", RunSummary.Text(ToleranceSummary.Json(r, limits, seed)));
        var pictures = new List<string>();
        var size = PictureSizes.Sweep(1);
        foreach (var l in limits.DistinctBy(l => l.Target))
        {
            string stem = $"{l.Target.Probe}_{FigureSelector.Stem(l.Target.Figure)}";
            if (ToleranceSummary.Sensitivity(r, l.Target) is { Count: > 0 } ranked && TolerancePictures.Histogram(r, l) is { } h)
            {
                output.Write($"histogram_{stem}.png", XyChart.RenderPng(h, size.Width, size.Height));
                pictures.Add($"histogram_{stem}.png");
                int key = r.Keys.ToList().FindIndex(k => k.KeyPath == ranked[0].Key);
                if (TolerancePictures.Scatter(r, l, key) is { } s)
                {
                    output.Write($"scatter_{stem}.png", XyChart.RenderPng(s, size.Width, size.Height));
                    pictures.Add($"scatter_{stem}.png");
                }
            }
            else if (TolerancePictures.Histogram(r, l) is { } only)
            {
                output.Write($"histogram_{stem}.png", XyChart.RenderPng(only, size.Width, size.Height));
                pictures.Add($"histogram_{stem}.png");
            }
        }
        return pictures;
    }

    /// <summary>Writes a shard's partial folder: its rows as montecarlo.csv and its <see cref="ShardManifest"/>.</summary>
    public static void WritePartial(OutputFolder output, ToleranceResult r, IReadOnlyList<SweepLimit> limits, ShardManifest manifest)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(manifest);
        output.WriteText("montecarlo.csv", w => MonteCarloCsv.Write(r, limits, w));
        output.WriteText(ShardManifest.FileName, RunSummary.Text(manifest.ToJson()));
    }
}
