using System.CommandLine;
using WaveSim.Core;
using WaveSim.Core.Output;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim check SCENARIO`: reads the scenario and prints the grid plan and the problems found, without running.</summary>
public static class CheckCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var scenario = CommonOptions.Scenario();
        var json = CommonOptions.Json();
        var cmd = new Command("check", "Read a scenario and print the plan (cells, Courant numbers, step, memory) without running") { scenario, json };
        cmd.SetAction(pr => CommandGuard.Run(pr.InvocationConfiguration.Error, () =>
        {
            if (CoupledLoader.IsCoupledFile(pr.GetValue(scenario)!))
                return CoupledScenarioCommands.Check(pr.GetValue(scenario)!, pr.GetValue(json), pr.InvocationConfiguration.Output);
            var (s, plan) = CommonOptions.LoadPlanned(pr.GetValue(scenario)!, pr.InvocationConfiguration.Error);
            var problems = PlanAdvisor.Problems(s, plan);
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json))
            {
                var j = RunSummary.PlanJson(plan);
                j["problems"] = new System.Text.Json.Nodes.JsonArray(problems.Select(p => (System.Text.Json.Nodes.JsonNode)p).ToArray());
                j["buffers"] = new System.Text.Json.Nodes.JsonArray(Buffers(s)
                    .Select(b => (System.Text.Json.Nodes.JsonNode)new System.Text.Json.Nodes.JsonObject
                    {
                        ["at"] = b.At, ["lines"] = new System.Text.Json.Nodes.JsonArray(b.Lines.Select(l => (System.Text.Json.Nodes.JsonNode)l!).ToArray()),
                    }).ToArray());
                j["warnings"] = new System.Text.Json.Nodes.JsonArray(ScenarioWarnings.For(s, plan)
                    .Select(w => (System.Text.Json.Nodes.JsonNode)new System.Text.Json.Nodes.JsonObject { ["key"] = w.Key, ["message"] = w.Message }).ToArray());
                o.WriteLine(RunSummary.Text(j));
            }
            else
            {
                o.WriteLine($"{s.Title}");
                PrintPlan(o, plan, s);
                if (EdgeLimit.HasRampedEdges(s.Source) && plan.CarriesAnyEdge)
                    o.WriteLine("  source edges: run as given (every segment at Courant number 1, where the grid carries any edge exactly)");
                else if (EdgeLimit.HasRampedEdges(s.Source))
                    o.WriteLine($"  source edges: the grid carries 10-90 % edges down to {Quantity.Format(plan.MinimumEdge, "s")} ({GridPlan.MinimumEdgeSteps.ToString(System.Globalization.CultureInfo.InvariantCulture)} time steps); shorter ones are run as Gaussian-filtered steps of that time");
                foreach (var (at, lines) in Buffers(s))
                {
                    o.WriteLine($"  {at}: {lines[0]}");
                    foreach (string l in lines.Skip(1)) o.WriteLine($"    {l}");
                }
                foreach (var (where, fit) in Simulate.LossFits(s, plan))
                    o.WriteLine($"  {where}: frequency-dependent loss fitted with {fit.SeriesPoles.Length} series and {fit.ShuntPoles.Length} shunt poles; largest error over the band: internal impedance {100 * fit.InternalMaxError:F3} %, permittivity {100 * fit.PermittivityMaxError:F3} %");
                var limits = PlanLimits.Exceeded(s, plan).Select(x => x.Message).ToHashSet();
                foreach (var p in problems) o.WriteLine("problem: " + p + (limits.Contains(p) ? " " + CommandGuard.ForceHint : ""));
                if (problems.Count == 0) o.WriteLine("no problems found");
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    /// <summary>The scenario's buffers with where they sit (source, load, a branch's load) and their summaries.</summary>
    static IEnumerable<(string At, IReadOnlyList<string> Lines)> Buffers(Core.Model.Scenario s) =>
        Core.Model.BufferSpec.Of(s).Select(b => (b.At, b.Buffer.Summary(b.Driver)));

    /// <summary>Prints the plan as an aligned table.</summary>
    public static void PrintPlan(TextWriter o, GridPlan plan, Core.Model.Scenario scenario)
    {
        o.WriteLine($"time step {Quantity.Format(plan.Dt, "s")} (limit {Quantity.Format(plan.DtLimit, "s")}), {plan.Steps} steps, {plan.TotalCells} cells, {plan.CellUpdates:G3} cell updates, memory about {Quantity.Format(plan.MemoryBytes, "B", 3)}");
        // The output step thins the CSV only; the figures come from their own record, at the figure step.
        string output = scenario.Simulation.OutputStep is { } h ? Quantity.Format(h, "s") : $"every step ({Quantity.Format(plan.Dt, "s")})";
        string figure = plan.FigureStep is { } hf ? $"{Quantity.Format(hf, "s")} ({plan.FigureRows} samples per probe)" : "the output step";
        o.WriteLine($"output step {output} ({plan.OutputRows} rows), figure step {figure}");
        o.WriteLine($"  {"segment",-22} {"length",10} {"Z0",10} {"delay",10} {"cells",8} {"Courant",9}");
        foreach (var sp in plan.Segments)
        {
            o.WriteLine($"  {sp.Where,-22} {Quantity.Format(sp.Segment.Length, "m"),10} {Quantity.Format(sp.Segment.Z0, "Ω", 3),10} {Quantity.Format(sp.Segment.Delay, "s"),10} {sp.Cells,8} {sp.Courant,9:F6}");
            var s = sp.Segment;
            if (s.Loss is not null)
                o.WriteLine($"    frequency-dependent loss: cells sized by the front delay {Quantity.Format(s.FrontDelay, "s")} (the fastest, high-frequency wave); in-band delay {Quantity.Format(s.Delay, "s")}");
            if (s.Derived is { } d)
            {
                // A wideband dielectric has no single G: show it at its reference frequency, where it is ωC·tan δ.
                double f = d.FrequencyHz ?? Core.Model.FrequencyLoss.DefaultReferenceFrequency;
                string g = s.Loss?.Dielectric is null ? $"G {Quantity.Format(s.G, "S")}/m"
                    : $"G {Quantity.Format(s.ShuntAdmittance(new System.Numerics.Complex(0, 2 * Math.PI * f)).Real, "S")}/m at {Quantity.Format(f, "Hz")} (wideband dielectric, none at DC)";
                o.WriteLine($"    from {d.Kind} geometry: Z0 {Quantity.Format(d.Z0, "Ω")}, eps_eff {d.EpsEff:G4}, {Quantity.Format(d.DelayPerLength, "s")}/m, L {Quantity.Format(s.L, "H")}/m, C {Quantity.Format(s.C, "F")}/m, R {Quantity.Format(s.R, "Ω")}/m, {g}");
            }
        }
    }
}
