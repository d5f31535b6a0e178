using System.CommandLine;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Cli;

/// <summary>Options and arguments shared by several commands.</summary>
public static class CommonOptions
{
    /// <summary>The scenario file argument.</summary>
    public static Argument<string> Scenario() => new("scenario") { Description = "Scenario file (YAML)" };

    /// <summary>--out DIR.</summary>
    public static Option<string?> Out() => new("--out", "-o") { Description = "Output folder (default: out/<scenario name>)" };

    /// <summary>--json: print the summary as one JSON object instead of text.</summary>
    public static Option<bool> Json() => new("--json") { Description = "Print the summary as JSON on stdout" };

    /// <summary>--force: run beyond the memory, cell-update and run-time limits.</summary>
    public static Option<bool> Force() => new("--force") { Description = "Run even when the plan exceeds 2 GB, 1e11 cell updates or an estimated 10 minutes" };

    /// <summary>Loads a scenario, turning a missing file into a one-line error.</summary>
    public static Scenario Load(string path) => Read(path).Scenario;

    static ScenarioDocument Read(string path) =>
        File.Exists(path) ? ScenarioLoader.Read(path) : throw new InputException($"{path}: no such scenario file");

    /// <summary>Loads a scenario and prints its warnings (<see cref="ScenarioWarnings"/>, for its grid plan) on <paramref name="warnings"/>.</summary>
    public static Scenario Load(string path, TextWriter warnings) => LoadPlanned(path, warnings).Scenario;

    /// <summary>Loads a scenario, plans its grid once and prints its warnings for that plan; pass the plan on to the run (<see cref="RunOptions.Plan"/>).</summary>
    public static (Scenario Scenario, Core.Solver.GridPlan Plan) LoadPlanned(string path, TextWriter warnings)
    {
        var (document, plan) = LoadDocumentPlanned(path, warnings);
        return (document.Scenario, plan);
    }

    /// <summary>Loads a scenario with its text (for what only the text knows: how values are written) and prints its warnings.</summary>
    public static ScenarioDocument LoadDocument(string path, TextWriter warnings) => LoadDocumentPlanned(path, warnings).Document;

    /// <summary>Loads a scenario with its text, plans its grid once and prints its warnings for that plan.</summary>
    public static (ScenarioDocument Document, Core.Solver.GridPlan Plan) LoadDocumentPlanned(string path, TextWriter warnings)
    {
        var document = Read(path);
        var plan = Simulate.Plan(document.Scenario);
        WarningOutput.Write(warnings, ScenarioWarnings.For(document.Scenario, plan));
        return (document, plan);
    }

    /// <summary>The output folder: the option's value, or out/&lt;scenario file name without extension&gt;&lt;suffix&gt;.</summary>
    public static string OutputDir(string? option, string scenarioPath, string suffix = "") =>
        option ?? Path.Combine("out", Path.GetFileNameWithoutExtension(scenarioPath) + suffix);

    /// <summary>--settle-band: the settling band of the signal-quality figures, read as a fraction of the swing ("5 %" or "0.05").</summary>
    public static Option<double> SettleBand() =>
        OptionValue.Create("--settle-band", "Settling band as a fraction or percentage of the swing", ParseBand, "5 %", "BAND");

    /// <summary>Reads a settling band: "5 %" or "0.05".</summary>
    public static double ParseBand(string text)
    {
        var (v, _) = Quantity.ParseAny(text, Dimension.Percent, Dimension.Number);
        if (!(v > 0 && v < 0.5)) throw new OptionValueException($"expected a band between 0 and 50 % of the swing, got '{text}'");
        return v;
    }
}
