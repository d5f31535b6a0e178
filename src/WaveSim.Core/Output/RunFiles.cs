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
        var files = new List<string>();
        void Add(string name) => files.Add(name);

        var picture = RunPictures.Waveforms(outcome, options.Waveforms);
        output.WriteText("probes.csv", w => ProbesCsv.Write(r, w)); Add("probes.csv");
        string summary = RunSummary.Text(RunSummary.Json(outcome));
        output.WriteText("summary.json", summary); Add("summary.json");
        var size = options.Waveforms.Currents ? PictureSizes.WaveformsWithCurrents : PictureSizes.Waveforms;
        output.Write("waveforms.png", XyChart.RenderPng(picture.Chart, size.Width, size.Height)); Add("waveforms.png");
        if (options.Svg) { output.WriteText("waveforms.svg", XyChart.RenderSvg(picture.Chart, size.Width, size.Height)); Add("waveforms.svg"); }
        output.Write("spacetime.png", RunPictures.SpaceTime(r, PictureSizes.SpaceTime.Width, PictureSizes.SpaceTime.Height)); Add("spacetime.png");
        foreach (var eye in outcome.Eyes)
            if (EyePicture.RenderPng(r.Scenario.Title, eye, PictureSizes.Eye.Width, PictureSizes.Eye.Height) is { } png)
            {
                string name = $"eye_{eye.Probe.Name}.png";
                output.Write(name, png); Add(name);
            }
        if (outcome.FrameTimes.Count > 0)
        {
            var (lo, hi) = RunPictures.VoltageRange(r);
            int done = 0;
            foreach (var (name, png) in FrameSequence.Render(RunPictures.Layout(r), RunPictures.Frames(r, outcome.FrameTimes), lo, hi,
                         options.FrameSize.Width, options.FrameSize.Height, ct))
            {
                output.Write("frames/" + name, png); // one at a time: a thousand frames are never held together
                options.FrameProgress?.Report(++done / (double)outcome.FrameTimes.Count);
            }
            Add("frames/");
        }
        if (outcome.FrequencyResponse is { } response)
        {
            FrequencyOutputs.Write(output, response, r.Scenario.Title);
            Add(FrequencyOutputs.CsvName); Add(FrequencyOutputs.PngName);
        }
        return new RunFilesWritten(files, picture, summary);
    }
}
