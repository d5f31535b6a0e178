using System.CommandLine;
using System.Text.Json.Nodes;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Output;
using WaveSim.Core.Reports;
using WaveSim.Core.Analysis;
using WaveSim.Core.Terminations;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim report SCENARIO`: simulates and writes one self-contained report.html.</summary>
public static class ReportCommand
{
    /// <summary>Name of the page written into the output folder.</summary>
    public const string FileName = "report.html";

    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var outDir = CommonOptions.Out();
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var terminations = new Option<bool>("--terminations") { Description = "Add the termination comparison (runs every strategy)" };
        var settle = CommonOptions.SettleBand();
        var window = StructuredOption.Window("--window", "Time span first shown by the page and drawn in its static picture: START..STOP or all; default as run's waveforms.png");
        var plot = StructuredOption.CommaList("--plot", "Probes first shown by the page and drawn in its static picture, comma-separated; default: every probe", "probe names", helpName: "PROBES");
        var currents = new Option<bool>("--currents") { Description = "Show the current chart when the page opens and add currents to its static picture" };
        var cmd = new Command("report", "Simulate a scenario and write one self-contained HTML report (report.html)")
        { scenario, outDir, json, force, terminations, settle, window, plot, currents };
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            double band = pr.GetValue(settle);
            // The file is read once: the scenario shown is the text the run was read from.
            var (document, plan) = CommonOptions.LoadDocumentPlanned(path, pr.InvocationConfiguration.Error);
            var s = document.Scenario;
            string text = document.Text;
            var options = HtmlReport.RunOptions(band, pr.GetValue(force)) with { Plan = plan };
            var pictures = RunCommand.PictureOptions(s, pr.GetValue(window), pr.GetResult(plot) is null ? null : pr.GetValue(plot), pr.GetValue(currents));
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path);
            using var output = new OutputFolder(dir, "report"); // held from before the work starts, so a second run into it is refused at once
            RunOutcome run;
            using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "simulating"))
                run = Simulate.Run(s, options with { Progress = bar }, ct);
            TerminationStudyResult? study = null;
            if (pr.GetValue(terminations))
                using (var bar = new ProgressBar(pr.InvocationConfiguration.Error, "terminations"))
                    study = TerminationStudy.Run(s, new TerminationOptions { SettleBand = band, Force = pr.GetValue(force) }, bar, ct);
            var report = HtmlReport.Build(ReportInput.For(run, text, study) with { Waveforms = pictures });
            output.WriteText(FileName, report.Html);
            output.Commit();
            string file = Path.Combine(Path.GetFullPath(dir), FileName);
            var o = pr.InvocationConfiguration.Output;
            int pass = report.Checks.Count(c => c.Pass == true), fail = report.Checks.Count(c => c.Pass == false);
            if (pr.GetValue(json))
                o.WriteLine(RunSummary.Text(new JsonObject
                {
                    ["report"] = file,
                    ["probes"] = new JsonArray(report.Checks.Select(c => (JsonNode)new JsonObject
                    {
                        ["name"] = c.Probe,
                        ["verdict"] = c.Pass switch { true => "pass", false => "fail", null => "not judged" },
                        ["failures"] = new JsonArray(c.Verdict.Failures.Select(f => (JsonNode)f.ToString()).ToArray()),
                    }).ToArray()),
                    ["pass"] = pass,
                    ["fail"] = fail,
                    ["not_judged"] = report.Checks.Count - pass - fail,
                }));
            else
            {
                o.WriteLine($"{s.Title}: {pass} probe(s) pass, {fail} fail, {report.Checks.Count - pass - fail} not judged (no receiver thresholds)");
                o.WriteLine($"wrote {file}");
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }
}
