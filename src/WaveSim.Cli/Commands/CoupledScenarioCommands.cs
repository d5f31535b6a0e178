using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Coupled;
using WaveSim.Core.Output;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`run` and `check` on a coupled scenario (conductors:): the same options, through <see cref="Simulate.RunCoupled"/>.</summary>
public static class CoupledScenarioCommands
{
    /// <summary>What a coupled run takes beyond the scenario, from the `run` options.</summary>
    /// <param name="OutDir">The output folder.</param>
    /// <param name="Json">Print summary.json instead of the table.</param>
    /// <param name="Force">Run beyond the limits.</param>
    /// <param name="Svg">Also write waveforms.svg.</param>
    /// <param name="Currents">Add a current panel.</param>
    /// <param name="SettleBand">Settling band, fraction of the swing.</param>
    public sealed record RunSettings(string OutDir, bool Json, bool Force, bool Svg, bool Currents, double SettleBand);

    /// <summary>Refuses the `run` options a coupled run cannot take yet, naming the option.</summary>
    public static void Refuse(params (string Flag, bool Given)[] options)
    {
        foreach (var (flag, given) in options)
            if (given) throw new InputException($"{flag}: not available for a coupled scenario (conductors:) yet");
    }

    /// <summary>Runs the coupled scenario at <paramref name="path"/> and writes its files.</summary>
    public static int Run(string path, RunSettings settings, TextWriter output, TextWriter error, CancellationToken ct)
    {
        var s = CoupledLoader.Load(path);
        using var folder = new OutputFolder(settings.OutDir, "run");
        CoupledOutcome run;
        using (var bar = new ProgressBar(error, "simulating"))
        {
            try { run = Simulate.RunCoupled(s, new CoupledRunOptions { Force = settings.Force, Progress = bar, SettleBand = settings.SettleBand, SnapshotTimes = SpaceTimeRows(s) }, ct); }
            catch (InputException ex) when (ex is not ScenarioException) { throw new InputException($"{path}: {ex.Message}"); }   // name the file
        }
        var written = CoupledRunFiles.Write(run, folder, settings.Svg, settings.Currents);
        folder.Commit();
        if (settings.Json) { output.WriteLine(written.Summary); return ExitCodes.Ok; }
        var r = run.Result;
        output.WriteLine($"{s.Title}: {r.Plan.Steps} steps of {Quantity.Format(r.Plan.Dt, "s")} on {s.Conductors.Count} conductors in {r.Elapsed.TotalSeconds:F2} s");
        output.WriteLine($"  {"probe",-12} {"at",-16} {"final",10} {"min",10} {"max",10} {"overshoot",10} {"delay",10} {"crosstalk",18}");
        foreach (var (p, f) in run.Figures)
        {
            var xt = run.Crosstalk.FirstOrDefault(x => x.Probe == p.Name);
            string x = xt is null ? "-" : $"{V(xt.PeakV)} {xt.Percent.ToString("F1", CultureInfo.InvariantCulture)} %";
            string over = f.OvershootPct is { } o ? o.ToString("F1", CultureInfo.InvariantCulture) + " %" : "-";
            output.WriteLine($"  {p.Name,-12} {p.Location,-16} {V(p.Volts[^1]),10} {V(p.FigureVolts.Min()),10} {V(p.FigureVolts.Max()),10} {over,10} {T(f.Delay50S),10} {x,18}");
        }
        output.WriteLine($"wrote {Path.Combine(settings.OutDir, "probes.csv")}, {string.Join(", ", written.Files.Skip(1))}");
        return ExitCodes.Ok;
    }

    /// <summary>Prints the plan of the coupled scenario at <paramref name="path"/>: modes, Courant numbers, coupling.</summary>
    public static int Check(string path, bool json, TextWriter o)
    {
        var s = CoupledLoader.Load(path);
        var plan = CoupledPlan.For(s);
        var problems = new List<string>();
        try { CoupledRun.CheckLimits(s, plan); }
        catch (InputException ex) { problems.Add(ex.Message); }
        if (json)
        {
            var j = CoupledRunFiles.PlanJson(plan);
            j["problems"] = new System.Text.Json.Nodes.JsonArray(problems.Select(p => (System.Text.Json.Nodes.JsonNode)p).ToArray());
            o.WriteLine(JsonText.Write(j));
            return ExitCodes.Ok;
        }
        o.WriteLine(s.Title);
        o.WriteLine($"{s.Conductors.Count} conductors ({string.Join(", ", s.Conductors)}); time step {Quantity.Format(plan.Dt, "s")} (limit {Quantity.Format(plan.DtLimit, "s")}), {plan.Steps} steps, {plan.CellUpdates:G3} conductor-cell updates");
        foreach (var sp in plan.Sections)
        {
            o.WriteLine($"  {sp.Where}: {Quantity.Format(sp.Section.Length, "m")}, {sp.Cells} cells");
            for (int m = 0; m < sp.Modes.Velocities.Count; m++)
                o.WriteLine($"    mode {m + 1}: velocity {Quantity.Format(sp.Modes.Velocities[m], "m/s", 4)}, Courant number {sp.Courant[m]:F4}");
            if (SectionModes.Pair(sp.Section) is { } eo)
                o.WriteLine($"    even/odd: Z0e {Quantity.Format(eo.Z0e, "Ω", 4)}, Z0o {Quantity.Format(eo.Z0o, "Ω", 4)} (Zdiff {Quantity.Format(eo.Zdiff, "Ω", 4)}, Zcomm {Quantity.Format(eo.Zcomm, "Ω", 4)}), ve {Quantity.Format(eo.Ve, "m/s", 4)}, vo {Quantity.Format(eo.Vo, "m/s", 4)}");
            for (int a = 0; a < s.Conductors.Count; a++)
                for (int b = a + 1; b < s.Conductors.Count; b++)
                {
                    var (kb, kf) = SectionModes.Coupling(sp.Section, a, b);
                    if (kb != 0 || kf != 0)
                        o.WriteLine($"    {s.Conductors[a]}-{s.Conductors[b]}: backward coupling Kb {kb:F4}, forward coefficient Kf = (Lm/L - Cm/C)/2 {kf:F4}");
                }
        }
        if (plan.LowestCourant < 0.9)
            o.WriteLine($"  warning: the slowest mode runs at Courant number {plan.LowestCourant:F3}; fast edges on it carry numerical dispersion (ringing); a higher simulation.resolution reduces it");
        if (!plan.CarriesAnyEdge)
            o.WriteLine($"  source edges: the grid carries 10-90 % edges down to {Quantity.Format(plan.MinimumEdge, "s")}; shorter ones are run as Gaussian-filtered steps of that time");
        foreach (var p in problems) o.WriteLine("problem: " + p + " " + CommandGuard.ForceHint);
        if (problems.Count == 0) o.WriteLine("no problems found");
        return ExitCodes.Ok;
    }

    /// <summary>The instants of the space-time maps' rows, as many as a single-line run keeps.</summary>
    static double[] SpaceTimeRows(CoupledScenario s) =>
        Enumerable.Range(0, Core.Analysis.RunAnalysis.SpaceTimeRows).Select(k => s.Simulation.Duration * k / (Core.Analysis.RunAnalysis.SpaceTimeRows - 1)).ToArray();

    static string V(double v) => Quantity.Format(v, "V", 3);
    static string T(double? t) => t is { } x ? Quantity.Format(x, "s", 3) : "-";
}
