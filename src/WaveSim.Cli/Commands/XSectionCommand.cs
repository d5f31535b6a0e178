using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Lines;
using WaveSim.Core.Output;
using WaveSim.Core.Units;

namespace WaveSim.Cli.Commands;

/// <summary>
/// `wavesim xsection KIND --width 8mil ...`: per-length Z0, eps_eff, delay, L, C, R and G of a line cross-section,
/// or, with --z0, the one dimension that gives that impedance. A coupled pair prints Z0 even/odd, eps_eff even/odd,
/// Zdiff, Zcomm and the coupling coefficient, then the pair as a differential and as a common-mode line; --z0 targets Zdiff.
/// </summary>
public static class XSectionCommand
{
    /// <summary>Creates the command; its dimension options come from <see cref="CrossSectionCatalog"/>.</summary>
    public static Command Create()
    {
        var kind = new Argument<string>("kind") { Description = "Line kind: " + string.Join(", ", CrossSectionCatalog.Kinds.Select(k => k.Name)), HelpName = "KIND" };
        kind.AcceptOnlyFromAmong(CrossSectionCatalog.Kinds.Select(k => k.Name).ToArray());
        var dims = CrossSectionCatalog.AllKeys.Select(d => new Option<string>("--" + d.Name) { Description = Describe(d.Name), HelpName = "value" }).ToList();
        var z0 = QuantityOption.Optional("--z0", Dimension.Resistance, "Target impedance for synthesis, e.g. \"50 ohm\" (Zdiff for a coupled pair); leave one dimension out", QuantityOption.Positive, "ohm");
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

    /// <summary>Names a cross-section key (and the target "z0", the choice "solve") as this command's option.</summary>
    static string Flag(string key) => "--" + key;

    static string Describe(string key)
    {
        var uses = CrossSectionCatalog.Kinds
            .SelectMany(k => k.AllKeys.Where(d => d.Name == key).Select(d => (Kind: k.Name, d.Description)))
            .GroupBy(u => u.Description)
            .Select(g => g.Count() == CrossSectionCatalog.Kinds.Count ? g.Key : $"{string.Join(", ", g.Select(u => u.Kind))}: {g.Key}");
        return string.Join("; ", uses);
    }

    static int Execute(string kind, Dictionary<string, string> raw, double? target, string? solveKey, bool asJson, TextWriter output, TextWriter error)
    {
        LineKindInfo info = CrossSectionCatalog.Find(kind, Context);
        if (target is null && solveKey is not null) throw new InputException($"{Context}: --solve needs a target impedance --z0");
        string? free = target is null ? null : CrossSection.FreeDimension(info.Name, raw, solveKey, Context, Flag);

        CrossSectionSpec spec = CrossSection.FromDictionary(info.Name, raw, Context, Flag, free);
        SynthesisResult? solved = free is null ? null : CrossSection.Solve(spec, free, target!.Value);
        if (info.Pair)
        {
            CoupledLineParameters pair = CrossSection.ComputePair(solved is null ? spec : spec.With(solved.Dimension, solved.Value));
            foreach (string w in pair.Warnings) error.WriteLine("warning: " + w);
            if (asJson) output.WriteLine(JsonText.Write(CrossSectionJson.Pair(pair, solved)));
            else WritePairTable(pair, solved, output);
            return ExitCodes.Ok;
        }
        LineParameters line = solved?.Line ?? CrossSection.Compute(spec);

        foreach (string w in line.Warnings) error.WriteLine("warning: " + w);
        if (asJson) output.WriteLine(JsonText.Write(CrossSectionJson.Line(line, solved)));
        else WriteTable(line, solved, output);
        return ExitCodes.Ok;
    }

    static void WritePairTable(CoupledLineParameters p, SynthesisResult? solved, TextWriter output)
    {
        var rows = new List<(string Name, string Value)>();
        if (solved is not null) rows.Add(SolvedRow(solved));
        rows.Add(("Z0 even", Quantity.Format(p.Z0Even, "Ω")));
        rows.Add(("Z0 odd", Quantity.Format(p.Z0Odd, "Ω")));
        rows.Add(("eps_eff even", p.Even.EpsEff.ToString("G5", CultureInfo.InvariantCulture)));
        rows.Add(("eps_eff odd", p.Odd.EpsEff.ToString("G5", CultureInfo.InvariantCulture)));
        rows.Add(("Zdiff", Quantity.Format(p.Zdiff, "Ω") + "  (2 Z0 odd)"));
        rows.Add(("Zcomm", Quantity.Format(p.Zcomm, "Ω") + "  (Z0 even / 2)"));
        rows.Add(("coupling k", p.Coupling.ToString("0.0000", CultureInfo.InvariantCulture)));
        foreach (var (name, line) in new[] { ("differential", p.Differential), ("common", p.Common) })
        {
            rows.Add(($"{name} delay", DelayText(line)));
            rows.AddRange(LossRows(line).Select(r => ($"{name} {r.Name}", r.Value)));
        }
        Print(p.Kind, rows, output);
    }

    static (string, string) SolvedRow(SynthesisResult solved)
    {
        string v = CrossSection.FormatValue(solved.Dimension, solved.Value);
        if (solved.Dimension != "er")
            v += $"  ({(solved.Value / 25.4e-6).ToString("0.###", CultureInfo.InvariantCulture)} mil)";
        return ($"{solved.Dimension} (solved)", v);
    }

    static string DelayText(LineParameters p) =>
        $"{Quantity.Format(p.DelayPerLength, "s/m")}  ({Quantity.Format(p.DelayPerLength * 0.0254, "s/in")})";

    static IEnumerable<(string Name, string Value)> LossRows(LineParameters p)
    {
        yield return ("L", Quantity.Format(p.L, "H/m"));
        yield return ("C", Quantity.Format(p.C, "F/m"));
        yield return ("R dc", Quantity.Format(p.RDc, "Ω/m"));
        if (p.FrequencyHz is double f)
        {
            string at = " at " + Quantity.Format(f, "Hz");
            yield return ("R" + at, Quantity.Format(p.RAc, "Ω/m"));
            yield return ("G" + at, Quantity.Format(p.G, "S/m"));
        }
    }

    static void Print(string kind, List<(string Name, string Value)> rows, TextWriter output)
    {
        int width = rows.Max(r => r.Name.Length) + 2;
        output.WriteLine(kind);
        foreach (var (name, value) in rows) output.WriteLine("  " + name.PadRight(width) + value);
    }

    static void WriteTable(LineParameters p, SynthesisResult? solved, TextWriter output)
    {
        var rows = new List<(string Name, string Value)>();
        if (solved is not null) rows.Add(SolvedRow(solved));
        rows.Add(("Z0", Quantity.Format(p.Z0, "Ω")));
        rows.Add(("eps_eff", p.EpsEff.ToString("G5", CultureInfo.InvariantCulture)));
        rows.Add(("delay", DelayText(p)));
        rows.AddRange(LossRows(p));
        Print(p.Kind, rows, output);
    }
}
