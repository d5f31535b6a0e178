using System.CommandLine;
using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Output;
using WaveSim.Core.Pictures;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim run SCENARIO`: simulates and writes probes.csv, summary.json and the pictures.</summary>
public static class RunCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var outDir = CommonOptions.Out();
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var svg = new Option<bool>("--svg") { Description = "Also write waveforms.svg" };
        var currents = new Option<bool>("--currents") { Description = "Add a panel of probe currents to the waveform plot" };
        var frames = new Option<int>("--frames") { Description = "Write N frames of the voltage along the line to frames/", DefaultValueFactory = _ => 0 };
        var frameSize = new Option<string>("--frame-size") { Description = "Frame size WIDTHxHEIGHT in pixels", DefaultValueFactory = _ => PictureSizes.DefaultFrame };
        var settle = CommonOptions.SettleBand();
        var fdCheck = new Option<bool>("--check-frequency-domain") { Description = "Cross-check against the frequency-domain solver; also write frequency.csv and frequency.png" };
        var window = new Option<string?>("--window") { Description = "Time span of waveforms.png: START..STOP (e.g. 10ns..20ns) or all; default: all, or the first edges of a source with more than 50" };
        var plot = new Option<string?>("--plot") { Description = "Probes drawn in waveforms.png, comma-separated (e.g. rx,mid); default: every probe" };
        var cmd = new Command("run", "Simulate a scenario and write probes.csv, summary.json and pictures")
        { scenario, outDir, json, force, svg, currents, frames, frameSize, settle, fdCheck, window, plot };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            int nFrames = pr.GetValue(frames);
            if (nFrames < 0 || nFrames > 100_000) throw new InputException($"--frames: expected 0 to 100000, got {nFrames}");
            var (fw, fh) = ParseSize(pr.GetValue(frameSize)!);
            double band = CommonOptions.ParseBand(pr.GetValue(settle)!);
            var (s, plan) = CommonOptions.LoadPlanned(path, pr.InvocationConfiguration.Error);
            var files = new RunFileOptions
            {
                Waveforms = PictureOptions(s, pr.GetValue(window), pr.GetValue(plot), pr.GetValue(currents)),
                Svg = pr.GetValue(svg),
                FrameSize = new PixelSize(fw, fh),
            };
            var analysis = new AnalysisOptions { SettleBand = band, Frames = nFrames, FrequencyCheck = pr.GetValue(fdCheck) };
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path);
            using var output = new OutputFolder(dir, "run"); // held from before the simulation, so a second run into it is refused at once
            RunOutcome run;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "simulating"))
                run = Simulate.Run(s, new RunOptions { Analysis = analysis, Force = pr.GetValue(force), Plan = plan, Progress = bar }, ct);
            RunFilesWritten written;
            {
                written = RunFiles.Write(run, output, files, ct);
                output.Commit();
            }
            RunPrinter.Print(pr.InvocationConfiguration.Output, run, written, dir, pr.GetValue(json));
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>Reads --window and --plot into the picture options, checked against the scenario before anything runs.</summary>
    public static WaveformOptions PictureOptions(WaveSim.Core.Model.Scenario s, string? window, string? plot, bool currents)
    {
        TimeWindow? w = window is null ? null : ParseWindow(window);
        try { w?.CheckAgainst(s.Simulation.Duration); }
        catch (InputException ex) { throw new InputException("--window: " + ex.Message); }
        string[]? probes = plot?.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        try { if (probes is not null) RunPictures.ProbeIndices(s, probes); }
        catch (InputException ex) { throw new InputException("--plot: " + ex.Message); }
        return new WaveformOptions { Currents = currents, Window = w, Probes = probes };
    }

    /// <summary>Reads "10ns..20ns" (each end with its time unit) or "all".</summary>
    public static TimeWindow ParseWindow(string text)
    {
        const string Expected = "expected START..STOP with time units and START before STOP (e.g. 10ns..20ns), or all";
        if (text.Trim().Equals("all", StringComparison.OrdinalIgnoreCase)) return TimeWindow.Whole;
        string[] ends = text.Split("..");
        if (ends.Length != 2 || !Quantity.TryParse(ends[0].Trim(), Dimension.Time, out double a) || !Quantity.TryParse(ends[1].Trim(), Dimension.Time, out double b))
            throw new InputException($"--window: {Expected}, got '{text}'");
        if (!(b > a)) throw new InputException($"--window: {Expected}; '{text}' ends before it starts");
        return new TimeWindow(a, b);
    }

    /// <summary>Reads "1280x720".</summary>
    public static (int W, int H) ParseSize(string text)
    {
        var parts = text.Split('x', 'X');
        if (parts.Length == 2 && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int w)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int h) && w >= 160 && h >= 120 && w <= 8192 && h <= 8192)
            return (w, h);
        throw new InputException($"--frame-size: expected WIDTHxHEIGHT between 160x120 and 8192x8192, e.g. 1280x720, got '{text}'");
    }
}
