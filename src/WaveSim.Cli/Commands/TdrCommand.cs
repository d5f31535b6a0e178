using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Measurements;
using WaveSim.Core.Model;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim tdr SCENARIO [--capture FILE]`: impedance profile from a simulated or captured step reflectometer trace.</summary>
public static class TdrCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var capture = new CaptureArguments(required: false);
        var rise = QuantityOption.Optional("--rise", Dimension.Time, $"10-90 % rise time of the step (default {Quantity.Format(Reflectometer.DefaultRiseS, "s")}; with --capture, measured from the trace)", QuantityOption.Positive, "TIME");
        var rs = QuantityOption.Create("--source-resistance", Dimension.Resistance, "Instrument resistance, also the reference impedance", "50 ohm", QuantityOption.Positive, "OHMS");
        var velocity = QuantityOption.Optional("--velocity", Dimension.Velocity, "Velocity for distances, e.g. 0.66c (default: the first segment's)", helpName: "V");
        var epsEff = QuantityOption.Optional("--eps-eff", Dimension.Number, "Effective permittivity for distances, e.g. 3.3 (instead of --velocity)", helpName: "X");
        var incident = QuantityOption.Optional("--incident", Dimension.Voltage, "With --capture: the incident step at the port (default: read after the edge)", QuantityOption.Positive, "VOLTS");
        var toScenario = new Option<string?>("--to-scenario") { Description = "Write the line found as a scenario YAML file", HelpName = "FILE" };
        var outDir = new Option<string?>("--out", "-o") { Description = "Output folder (default: out/<scenario>-tdr)" };
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var cmd = new Command("tdr", "Step reflectometry: impedance against distance by layer peeling, segments and lumped elements")
        { scenario, rise, rs, velocity, epsEff, incident, toScenario, outDir, json, force };
        capture.AddTo(cmd);
        cmd.SetAction((pr, ct) => CommandGuard.RunAsync(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(scenario)!;
            var s = CommonOptions.Load(path);
            double sourceOhms = pr.GetValue(rs);
            double? riseS = pr.GetValue(rise);
            double v = LibraryErrors.Naming(() => Reflectometer.DistanceVelocity(s, pr.GetValue(velocity), pr.GetValue(epsEff)),
                ("velocity", "--velocity"), ("epsEff", "--eps-eff"));
            Capture? cap = capture.Read(pr);
            if (cap is null && pr.GetValue(incident) is not null)
                throw new InputException("--incident: applies only with --capture (the simulated instrument's incident step is 1 V)");
            if (pr.GetValue(toScenario) is { } target && Directory.Exists(target))
                throw new InputException($"--to-scenario: {target} is a folder; give a file name"); // said before the simulation, not after
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path, "-tdr");
            using var output = new OutputFolder(dir, "tdr"); // held from before the simulation, so a second run into it is refused at once

            ReflectometerTrace trace;
            if (cap is null)
            {
                using var bar = new ProgressBar(pr.InvocationConfiguration.Error, "simulating");
                trace = Reflectometer.Simulate(s, riseS ?? Reflectometer.DefaultRiseS, sourceOhms,
                    new SimulationOptions { Force = pr.GetValue(force), Progress = bar }, ct);
            }
            else
            {
                CaptureArguments.Warn(cap, s.Simulation.Duration, pr.InvocationConfiguration.Error);
                trace = LibraryErrors.Naming(() => Reflectometer.FromCapture(cap, sourceOhms, pr.GetValue(incident), riseS), ("incidentV", "--incident"));
            }
            TdrResult result = TdrAnalysis.Analyse(trace, v);

            string title = cap is null ? $"{s.Title}: simulated reflectometer" : $"{Path.GetFileName(cap.Source)}: reflectometer trace";
            var summary = TdrOutputs.Json(result);
            output.WriteText("tdr.csv", w => TdrOutputs.WriteCsv(result, w));
            output.WriteText("tdr.json", RunSummary.Text(summary));
            output.Write("tdr.png", XyChart.RenderPng(TdrOutputs.Chart(result, title, cap is null ? s : null), PictureSizes.Overlay.Width, PictureSizes.Overlay.Height));
            // The scenario file commits with the folder: both appear, or neither.
            if (pr.GetValue(toScenario) is { } scenarioFile) output.WriteBeside(scenarioFile, TdrScenarioWriter.Yaml(result, title));
            output.Commit();

            var o = pr.InvocationConfiguration.Output;
            foreach (string w in result.Warnings) pr.InvocationConfiguration.Error.WriteLine("warning: " + w);
            if (pr.GetValue(json)) o.WriteLine(RunSummary.Text(summary));
            else Print(o, result, dir, pr.GetValue(toScenario));
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    static void Print(TextWriter o, TdrResult r, string dir, string? scenarioFile)
    {
        o.WriteLine($"reference {Quantity.Format(r.ReferenceOhm, "Ω")}, incident {Quantity.Format(r.IncidentV, "V", 3)}, rise {Quantity.Format(r.RiseS, "s", 3)}, " +
                    $"velocity {Quantity.Format(r.VelocityMps, "m/s", 3)}, layer step {Quantity.Format(r.LayerStepS, "s", 3)} ({Quantity.Format(r.VelocityMps * r.LayerStepS / 2, "m", 3)})");
        o.WriteLine($"  {"from",10} {"to",10} {"Z0",10}");
        foreach (var seg in r.Segments)
            o.WriteLine($"  {Quantity.Format(seg.StartM, "m", 3),10} {Quantity.Format(seg.EndM, "m", 3),10} {Quantity.Format(seg.Z0Ohm, "Ω", 4),10}");
        static string Part(TdrLumped l) => l.Kind == LumpedKind.ShuntCapacitance
            ? $"shunt C {Quantity.Format(l.Value, "F", 3)}"
            : $"series L {Quantity.Format(l.Value, "H", 3)}";
        for (int i = 0; i < r.Lumped.Count; i++)
        {
            var l = r.Lumped[i];
            if (l.Paired && i + 1 < r.Lumped.Count && r.Lumped[i + 1].Paired)
            {
                o.WriteLine($"  {Part(l)} then {Part(r.Lumped[i + 1])} at {Quantity.Format(l.AtM, "m", 3)}");
                i++;
            }
            else o.WriteLine($"  {Part(l)} at {Quantity.Format(l.AtM, "m", 3)}");
        }
        string endText = r.End switch
        {
            TdrEnd.Capacitive => $"capacitive, C {Quantity.Format(r.EndValue ?? double.NaN, "F", 3)} to ground,",
            TdrEnd.Inductive => $"inductive, L {Quantity.Format(r.EndValue ?? double.NaN, "H", 3)} to ground,",
            _ => r.End.ToString().ToLower(CultureInfo.InvariantCulture),
        };
        o.WriteLine($"  end: {endText} at {Quantity.Format(r.EndM, "m", 3)}");
        o.WriteLine($"wrote {Path.Combine(dir, "tdr.csv")}, tdr.json, tdr.png" + (scenarioFile is null ? "" : ", " + scenarioFile));
    }
}
