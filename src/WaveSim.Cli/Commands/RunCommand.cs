using System.CommandLine;
using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
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
        var frameSize = new Option<string>("--frame-size") { Description = "Frame size WIDTHxHEIGHT in pixels", DefaultValueFactory = _ => "1280x720" };
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
            var s = CommonOptions.Load(path, pr.InvocationConfiguration.Error);
            var pictureOptions = PictureOptions(s, pr.GetValue(window), pr.GetValue(plot), pr.GetValue(currents));
            var options = new SimulationOptions { Force = pr.GetValue(force), SnapshotTimes = RunPictures.SnapshotTimes(s, nFrames) };
            if (pr.GetValue(fdCheck) && !options.Force) FrequencyDomainCheck.CheckLimits(s, Simulate.Plan(s));
            SimulationResult result;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "simulating"))
                result = Simulate.Run(s, options with { Progress = bar }, ct);
            var figures = RunSummary.Figures(result, band);
            var eyes = RunEyes.Compute(result);
            var summary = RunSummary.Json(result, figures, eyes);
            IReadOnlyList<ProbeDifference>? fd = null;
            FrequencyResponse? response = null;
            if (pr.GetValue(fdCheck))
            {
                fd = FrequencyDomainCheck.Compare(result);
                summary["frequency_domain_check"] = new System.Text.Json.Nodes.JsonObject(fd.Select(d =>
                    KeyValuePair.Create(d.Probe, (System.Text.Json.Nodes.JsonNode?)new System.Text.Json.Nodes.JsonObject { ["max_diff_V"] = d.MaxDiffV, ["max_diff_pct"] = d.MaxDiffPct })));
                var (f0, f1) = FrequencyBand(s);
                response = FrequencySweep.Compute(s, f0, f1, 200, log: true);
            }
            var picture = RunPictures.Waveforms(result, pictureOptions);
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path);
            using (var output = new OutputFolder(dir))
            {
                ProbesCsv.Write(result, output.File("probes.csv"));
                File.WriteAllText(output.File("summary.json"), RunSummary.Text(summary));
                var chart = picture.Chart;
                File.WriteAllBytes(output.File("waveforms.png"), XyChart.RenderPng(chart, 1200, pr.GetValue(currents) ? 900 : 600));
                if (pr.GetValue(svg)) File.WriteAllText(output.File("waveforms.svg"), XyChart.RenderSvg(chart, 1200, pr.GetValue(currents) ? 900 : 600));
                File.WriteAllBytes(output.File("spacetime.png"), RunPictures.SpaceTime(result, 1000, 800));
                foreach (var eye in eyes)
                    if (RunEyes.RenderPng(s.Title, eye, 1000, 700) is { } png) File.WriteAllBytes(output.File($"eye_{eye.Probe.Name}.png"), png);
                if (nFrames > 0)
                {
                    var (lo, hi) = RunPictures.VoltageRange(result);
                    string framesDir = Path.GetDirectoryName(output.File("frames/frame_00001.png"))!;
                    using var bar = new ProgressBar(pr.InvocationConfiguration.Error, "frames");
                    FrameSequence.WriteAll(framesDir, RunPictures.Layout(result), RunPictures.Frames(result, nFrames), lo, hi, fw, fh, ct);
                }
                if (response is not null) FrequencyOutputs.Write(Path.GetDirectoryName(output.File("frequency.csv"))!, response, s.Title);
                output.Commit();
            }
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json)) o.WriteLine(RunSummary.Text(summary));
            else
            {
                PrintSummary(o, result, figures, eyes, dir);
                if (picture.Limited)
                    o.WriteLine($"  waveforms.png shows {picture.Shown.Describe()}: the start-up and the first {picture.EdgesShown} of {picture.SourceEdges} source edges; --window all draws the whole record, --window START..STOP another part");
                if (fd is not null)
                    foreach (var d in fd)
                        o.WriteLine($"  frequency-domain check {d.Probe}: largest difference {Quantity.Format(d.MaxDiffV, "V", 3)} ({d.MaxDiffPct:F3} % of the swing)");
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>The band of the frequency plots: from 1/duration up to 3/(shortest source feature), at most 100 GHz.</summary>
    public static (double Start, double Stop) FrequencyBand(WaveSim.Core.Model.Scenario s)
    {
        double f0 = 1 / s.Simulation.Duration;
        double feature = s.Source.ShortestFeature;
        double f1 = double.IsFinite(feature) ? 3 / feature : 1 / Simulate.Plan(s).Dt / 4;
        return (f0, Math.Clamp(f1, f0 * 10, 100e9));
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

    static void PrintSummary(TextWriter o, SimulationResult r, IReadOnlyList<(ProbeTrace Probe, SignalFigures Figures)> figures, IReadOnlyList<ProbeEye> eyes, string dir)
    {
        o.WriteLine($"{r.Scenario.Title}: {r.Plan.Steps} steps of {Quantity.Format(r.Plan.Dt, "s")} on {r.Plan.TotalCells} cells in {r.Elapsed.TotalSeconds:F2} s");
        o.WriteLine($"  {"probe",-12} {"final",10} {"min",10} {"max",10} {"overshoot",10} {"delay",10} {"rise",10} {"settling",10}");
        foreach (var (p, f) in figures)
            o.WriteLine($"  {p.Name,-12} {V(p.Volts[^1]),10} {V(p.FigureVolts.Min()),10} {V(p.FigureVolts.Max()),10} {Pct(f.OvershootPct),10} {T(f.Delay50S),10} {T(f.Rise1090S ?? f.Fall9010S),10} {(f.UnsettledAtNextEdge ? "unsettled" : T(f.SettlingS)),10}");
        foreach (var (p, f) in figures.Where(x => x.Figures.UnsettledAtNextEdge))
            o.WriteLine($"  {p.Name}: not settled before next edge (its first-edge figures end where the next source edge reaches it, at {T(f.FirstEdgeWindowEndS)})");
        foreach (var e in eyes)
        {
            var f = e.Diagram?.Figures;
            o.WriteLine(f is null ? $"  eye {e.Probe.Name}: {e.Note}"
                : $"  eye {e.Probe.Name}: height {V(f.EyeHeightV)}, width {T(f.EyeWidthS)}" + (f.HasThresholds ? $", against thresholds {V(f.EyeHeightThresholdsV)} x {T(f.EyeWidthThresholdsS)}" : "") + $" ({f.TraceCount} bits)");
        }
        string eyeFiles = string.Concat(eyes.Where(e => e.Diagram is not null).Select(e => $", eye_{e.Probe.Name}.png"));
        o.WriteLine($"wrote {Path.Combine(dir, "probes.csv")}, summary.json, waveforms.png, spacetime.png{eyeFiles}");
    }

    static string V(double v) => Quantity.Format(v, "V", 3);
    static string V(double? v) => v is { } x ? V(x) : "-";
    static string T(double? t) => t is { } x ? Quantity.Format(x, "s", 3) : "-";
    static string Pct(double? p) => p is { } x ? x.ToString("F1", CultureInfo.InvariantCulture) + " %" : "-";
}
