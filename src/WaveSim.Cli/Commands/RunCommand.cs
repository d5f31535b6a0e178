using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
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
        var frames = IntegerOption.Create("--frames", "Write N frames of the voltage along the line to frames/", 0, 100_000, 0, "N");
        var frameSize = StructuredOption.Size("--frame-size", "Frame size in pixels", PictureSizes.DefaultFrame, new PixelSize(160, 120), new PixelSize(8192, 8192));
        var settle = CommonOptions.SettleBand();
        var fdCheck = new Option<bool>("--check-frequency-domain") { Description = "Cross-check against the frequency-domain solver; also write frequency.csv and frequency.png" };
        var window = StructuredOption.Window("--window", "Time span of waveforms.png: START..STOP (e.g. 10ns..20ns) or all; default: all, or the first edges of a source with more than 50");
        var plot = StructuredOption.CommaList("--plot", "Probes drawn in waveforms.png, comma-separated (e.g. rx,mid); default: every probe", "probe names", helpName: "PROBES");
        var cmd = new Command("run", "Simulate a scenario and write probes.csv, summary.json and pictures")
        { scenario, outDir, json, force, svg, currents, frames, frameSize, settle, fdCheck, window, plot };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            int nFrames = pr.GetValue(frames);
            var (fw, fh) = pr.GetValue(frameSize);
            double band = pr.GetValue(settle);
            if (Core.Scenarios.CoupledLoader.IsCoupledFile(path))
            {
                CoupledScenarioCommands.Refuse(("--frames", nFrames > 0), ("--check-frequency-domain", pr.GetValue(fdCheck)),
                    ("--window", pr.GetResult(window) is not null), ("--plot", pr.GetResult(plot) is not null));
                return CoupledScenarioCommands.Run(path, new(CommonOptions.OutputDir(pr.GetValue(outDir), path), pr.GetValue(json), pr.GetValue(force),
                    pr.GetValue(svg), pr.GetValue(currents), band), pr.InvocationConfiguration.Output, pr.InvocationConfiguration.Error, ct);
            }
            var (s, plan) = CommonOptions.LoadPlanned(path, pr.InvocationConfiguration.Error);
            var files = new RunFileOptions
            {
                Waveforms = PictureOptions(s, pr.GetValue(window), pr.GetResult(plot) is null ? null : pr.GetValue(plot), pr.GetValue(currents)),
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
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "frames"))
                written = RunFiles.Write(run, output, files with { FrameProgress = nFrames > 0 ? bar : null }, ct);
            output.Commit();
            RunPrinter.Print(pr.InvocationConfiguration.Output, run, written, dir, pr.GetValue(json));
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>Reads --window and --plot into the picture options, checked against the scenario before anything runs.</summary>
    public static WaveformOptions PictureOptions(WaveSim.Core.Model.Scenario s, TimeWindow? w, string[]? probes, bool currents)
    {
        try { w?.CheckAgainst(s.Simulation.Duration); }
        catch (InputException ex) { throw new InputException("--window: " + ex.Message); }
        try { if (probes is not null) RunPictures.ProbeIndices(s, probes); }
        catch (InputException ex) { throw new InputException("--plot: " + ex.Message); }
        return new WaveformOptions { Currents = currents, Window = w, Probes = probes };
    }

}
