using WaveSim.Core.Analysis;
using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Pictures;
using WaveSim.Core.Rendering;

namespace WaveSim.Core.Output;

/// <summary>What <see cref="RunFiles.Write"/> wrote.</summary>
/// <param name="Files">The files written, relative to the output folder, in the order written (the frames as "frames/").</param>
/// <param name="Waveforms">The waveform picture: what part of the record waveforms.png shows.</param>
/// <param name="Summary">The text of summary.json.</param>
public sealed record RunFilesWritten(IReadOnlyList<string> Files, WaveformPicture Waveforms, string Summary);

/// <summary>
/// Writes a run's files into an <see cref="OutputFolder"/>: probes.csv, summary.json, waveforms.png (and .svg), spacetime.png,
/// eye_PROBE.png for every probe with an eye, frames/ when the outcome holds frames, and frequency.csv and frequency.png with
/// the frequency-domain check. The caller commits the folder.
/// </summary>
public static class RunFiles
{
    /// <summary>Writes every file of <paramref name="outcome"/> into <paramref name="output"/> (staged until the caller commits).</summary>
    /// <exception cref="InputException">The waveform window or probes do not fit the run.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled while writing frames.</exception>
    public static RunFilesWritten Write(RunOutcome outcome, OutputFolder output, RunFileOptions? options = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(output);
        options ??= new RunFileOptions();
        var r = outcome.Result;
        var sizes = options.Sizes;
        var files = new List<string>();
        void Add(string name) => files.Add(name);

        var picture = RunPictures.Waveforms(outcome, options.Waveforms);
        output.Write("probes.csv", stream => ProbesCsv.Write(r, stream)); Add("probes.csv");
        string summary = RunSummary.Text(RunSummary.Json(outcome));
        output.WriteText("summary.json", summary); Add("summary.json");
        int height = options.Waveforms.Currents ? sizes.WaveformWithCurrentsHeight : sizes.WaveformHeight;
        output.Write("waveforms.png", XyChart.RenderPng(picture.Chart, sizes.WaveformWidth, height)); Add("waveforms.png");
        if (options.Svg) { output.WriteText("waveforms.svg", XyChart.RenderSvg(picture.Chart, sizes.WaveformWidth, height)); Add("waveforms.svg"); }
        output.Write("spacetime.png", RunPictures.SpaceTime(r, sizes.SpaceTimeWidth, sizes.SpaceTimeHeight)); Add("spacetime.png");
        foreach (var eye in outcome.Eyes)
            if (EyePicture.RenderPng(r.Scenario.Title, eye, sizes.EyeWidth, sizes.EyeHeight) is { } png)
            {
                string name = $"eye_{eye.Probe.Name}.png";
                output.Write(name, png); Add(name);
            }
        if (outcome.FrameTimes.Count > 0)
        {
            var (lo, hi) = RunPictures.VoltageRange(r);
            string framesDir = Path.GetDirectoryName(output.File("frames/" + FrameSequence.FileName(1)))!;
            FrameSequence.WriteAll(framesDir, RunPictures.Layout(r), RunPictures.Frames(r, outcome.FrameTimes), lo, hi, sizes.FrameWidth, sizes.FrameHeight, ct);
            Add("frames/");
        }
        if (outcome.FrequencyResponse is { } response)
        {
            FrequencyOutputs.Write(Path.GetDirectoryName(output.File(FrequencyOutputs.CsvName))!, response, r.Scenario.Title);
            Add(FrequencyOutputs.CsvName); Add(FrequencyOutputs.PngName);
        }
        return new RunFilesWritten(files, picture, summary);
    }
}
