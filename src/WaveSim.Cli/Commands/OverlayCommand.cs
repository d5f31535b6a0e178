using System.CommandLine;
using System.Text.Json.Nodes;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Measurements;
using WaveSim.Core.Output;
using WaveSim.Core.Reports;
using WaveSim.Core.Rendering;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim overlay DIR… --probe NAME`: one probe from several run folders (and a capture) on one chart and one page.</summary>
public static class OverlayCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var dirs = new Argument<string[]>("folders") { Description = "Run output folders (each holding probes.csv)", Arity = ArgumentArity.OneOrMore };
        var probe = new Option<string>("--probe") { Description = "The probe drawn from every folder", Required = true, HelpName = "NAME" };
        var outDir = new Option<string?>("--out", "-o") { Description = "Output folder (default: out/overlay-<probe>)" };
        var capture = new CaptureArguments(required: false);
        var window = StructuredOption.Window("--window", "Time span shown by overlay.png and first shown by overlay.html: START..STOP (e.g. 10ns..20ns) or all; default: all");
        var json = CommonOptions.Json();
        var cmd = new Command("overlay", "Draw one probe from several run folders (and a capture) on one chart: overlay.png and overlay.html")
        { dirs, probe, outDir, window, json };
        capture.AddTo(cmd);
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string name = pr.GetValue(probe)!;
            // Every folder is read before the output folder is opened: a folder without the probe costs nothing.
            var traces = pr.GetValue(dirs)!.Select(d => RunFolderTrace.Read(d, name))
                .Select(t => new OverlayTrace(t.Title, Path.GetFileName(Path.TrimEndingDirectorySeparator(Path.GetFullPath(t.Folder))), t.Time, t.Volts)).ToList();
            if (capture.Read(pr) is { } cap)
            {
                CaptureArguments.Warn(cap, pr.InvocationConfiguration.Error);
                traces.Add(new OverlayTrace(Path.GetFileName(cap.Source), "capture", cap.Time, cap.Volts));
            }
            var shown = OverlayPage.Distinct(traces);
            var w = pr.GetValue(window);
            try { w?.CheckAgainst(shown.Max(t => t.Time[^1])); }
            catch (InputException ex) { throw new InputException("--window: " + ex.Message); }
            string title = $"{name}: " + string.Join(" / ", shown.Select(t => t.Label));
            string dir = pr.GetValue(outDir) ?? Path.Combine("out", "overlay-" + name);
            using var output = new OutputFolder(dir, "overlay");
            output.Write("overlay.png", XyChart.RenderPng(OverlayPage.Chart(title, shown, w), PictureSizes.Overlay.Width, PictureSizes.Overlay.Height));
            output.WriteText("overlay.html", OverlayPage.Html(title, name, shown, w));
            output.Commit();
            var o = pr.InvocationConfiguration.Output;
            string full = Path.GetFullPath(dir);
            if (pr.GetValue(json))
                o.WriteLine(RunSummary.Text(new JsonObject
                {
                    ["probe"] = name,
                    ["traces"] = new JsonArray(shown.Select(t => (JsonNode)new JsonObject { ["label"] = t.Label, ["from"] = t.Source, ["samples"] = t.Time.Length }).ToArray()),
                    ["png"] = Path.Combine(full, "overlay.png"),
                    ["html"] = Path.Combine(full, "overlay.html"),
                }));
            else
            {
                o.WriteLine($"{name} from {shown.Count} waveform(s): {string.Join(", ", shown.Select(t => t.Label))}");
                o.WriteLine($"wrote {Path.Combine(full, "overlay.png")} and overlay.html");
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }
}
