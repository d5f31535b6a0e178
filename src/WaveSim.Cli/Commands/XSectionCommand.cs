using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using WaveSim.Core;
using WaveSim.Core.Lines;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>
/// `wavesim xsection KIND --width 8mil ...`: per-length Z0, eps_eff, delay, L, C, R and G of a line cross-section,
/// or, with --z0, the one dimension that gives that impedance.
/// </summary>
public static class XSectionCommand
{
    /// <summary>Creates the command; its dimension options come from <see cref="CrossSectionCatalog"/>.</summary>
    public static Command Create()
    {
        var kind = new Argument<string>("kind") { Description = "Line kind: " + string.Join(", ", CrossSectionCatalog.Kinds.Select(k => k.Name)) };
        kind.AcceptOnlyFromAmong(CrossSectionCatalog.Kinds.Select(k => k.Name).ToArray());
        var dims = CrossSectionCatalog.AllKeys.Select(d => new Option<string>("--" + d.Name) { Description = Describe(d.Name), HelpName = "value" }).ToList();
        var z0 = new Option<string>("--z0") { Description = "Target impedance for synthesis, e.g. \"50 ohm\"; leave one dimension out", HelpName = "ohm" };
        var solve = new Option<string>("--solve") { Description = "The dimension to solve for with --z0 (default: the one left out)", HelpName = "key" };
        var json = new Option<bool>("--json") { Description = "Print one JSON object (SI units) instead of a table" };

        var cmd = new Command("xsection", "Per-length line parameters of a cross-section, or the dimension for a target Z0") { kind };
        foreach (var o in dims) cmd.Options.Add(o);
        cmd.Options.Add(z0);
        cmd.Options.Add(solve);
        cmd.Options.Add(json);
        cmd.SetAction(pr => CommandGuard.Run(pr.InvocationConfiguration.Error, () =>
        {
            var raw = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
            foreach (var o in dims)
                if (pr.GetValue(o) is string v) raw[o.Name[2..]] = v;
            return Execute(pr.GetRequiredValue(kind), raw, pr.GetValue(z0), pr.GetValue(solve), pr.GetValue(json),
                           pr.InvocationConfiguration.Output, pr.InvocationConfiguration.Error);
        }));
        return cmd;
    }

    const string Context = "xsection";

    static string Describe(string key)
    {
        var uses = CrossSectionCatalog.Kinds
            .SelectMany(k => k.AllKeys.Where(d => d.Name == key).Select(d => (Kind: k.Name, d.Description)))
            .GroupBy(u => u.Description)
            .Select(g => g.Count() == CrossSectionCatalog.Kinds.Count ? g.Key : $"{string.Join(", ", g.Select(u => u.Kind))}: {g.Key}");
        return string.Join("; ", uses);
    }

    static int Execute(string kind, Dictionary<string, string> raw, string? z0Text, string? solveKey, bool asJson, TextWriter output, TextWriter error)
    {
        LineKindInfo info = CrossSectionCatalog.Find(kind, Context);
        string? free = null;
        double target = 0;
        if (z0Text is null)
        {
            if (solveKey is not null) throw new InputException($"{Context}: --solve needs a target impedance --z0");
        }
        else
        {
            try { target = Quantity.Parse(z0Text, Dimension.Resistance); }
            catch (UnitException ex) { throw new InputException($"{Context}: --z0: {ex.Message}"); }
            var missing = info.Dimensions.Where(d => d.Required && !raw.ContainsKey(d.Name)).Select(d => d.Name).ToList();
            if (solveKey is not null)
            {
                free = info.Solvable.FirstOrDefault(s => string.Equals(s, solveKey, StringComparison.OrdinalIgnoreCase))
                    ?? throw new InputException($"{Context}: cannot solve {info.Name} for '--solve {solveKey}'; solvable: {string.Join(", ", info.Solvable)}");
                raw.Remove(free); // the solved value replaces any given one
            }
            else if (missing.Count == 1) free = missing[0];
            else if (missing.Count == 0)
                throw new InputException($"{Context}: --z0 needs one dimension left out, or --solve KEY (solvable: {string.Join(", ", info.Solvable)})");
            else
                throw new InputException($"{Context}: --z0 solves for one dimension, but {string.Join(", ", missing.Select(m => "--" + m))} are missing");
        }

        CrossSectionSpec spec = CrossSection.FromDictionary(info.Name, raw, Context, "--", free);
        SynthesisResult? solved = free is null ? null : CrossSection.Solve(spec, free, target);
        LineParameters line = solved?.Line ?? CrossSection.Compute(spec);

        foreach (string w in line.Warnings) error.WriteLine("warning: " + w);
        if (asJson) WriteJson(line, solved, output);
        else WriteTable(line, solved, output);
        return ExitCodes.Ok;
    }

    static void WriteJson(LineParameters p, SynthesisResult? solved, TextWriter output)
    {
        var o = new JsonObject { ["kind"] = p.Kind };
        if (solved is not null)
            o[solved.Dimension == "er" ? "er" : solved.Dimension + "_m"] = solved.Value;
        o["z0_ohm"] = p.Z0;
        o["eps_eff"] = p.EpsEff;
        o["delay_s_per_m"] = p.DelayPerLength;
        o["l_h_per_m"] = p.L;
        o["c_f_per_m"] = p.C;
        o["r_dc_ohm_per_m"] = p.RDc;
        if (p.FrequencyHz is double f)
        {
            o["frequency_hz"] = f;
            o["r_ac_ohm_per_m"] = p.RAc;
            o["g_s_per_m"] = p.G;
        }
        o["warnings"] = new JsonArray(p.Warnings.Select(w => (JsonNode?)JsonValue.Create(w)).ToArray());
        output.WriteLine(o.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
    }

    static void WriteTable(LineParameters p, SynthesisResult? solved, TextWriter output)
    {
        var rows = new List<(string Name, string Value)>();
        if (solved is not null)
        {
            string v = CrossSection.FormatValue(solved.Dimension, solved.Value);
            if (solved.Dimension != "er")
                v += $"  ({(solved.Value / 25.4e-6).ToString("0.###", CultureInfo.InvariantCulture)} mil)";
            rows.Add(($"{solved.Dimension} (solved)", v));
        }
        rows.Add(("Z0", Quantity.Format(p.Z0, "Ω")));
        rows.Add(("eps_eff", p.EpsEff.ToString("G5", CultureInfo.InvariantCulture)));
        rows.Add(("delay", $"{Quantity.Format(p.DelayPerLength, "s/m")}  ({Quantity.Format(p.DelayPerLength * 0.0254, "s/in")})"));
        rows.Add(("L", Quantity.Format(p.L, "H/m")));
        rows.Add(("C", Quantity.Format(p.C, "F/m")));
        rows.Add(("R dc", Quantity.Format(p.RDc, "Ω/m")));
        if (p.FrequencyHz is double f)
        {
            string at = " at " + Quantity.Format(f, "Hz");
            rows.Add(("R" + at, Quantity.Format(p.RAc, "Ω/m")));
            rows.Add(("G" + at, Quantity.Format(p.G, "S/m")));
        }
        int width = rows.Max(r => r.Name.Length) + 2;
        output.WriteLine(p.Kind);
        foreach (var (name, value) in rows) output.WriteLine("  " + name.PadRight(width) + value);
    }
}
