using System.Globalization;
using WaveSim.Core.Coupled;
using WaveSim.Core.Io;
using WaveSim.Core.Lines;
using WaveSim.Core.Units;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Reads the coupled form of a scenario (<c>conductors:</c>, <c>coupled:</c>, <c>near:</c>, <c>far:</c>, docs/coupled.md) into a
/// <see cref="CoupledScenario"/>, every error one line with file, line, column and key.
/// </summary>
public static class CoupledLoader
{
    /// <summary>Keys at the top of a coupled scenario.</summary>
    public static readonly string[] TopKeys = ["title", "conductors", "coupled", "near", "far", "probes", "simulation"];
    /// <summary>Keys of a coupled section.</summary>
    public static readonly string[] SectionKeys = ["length", "l", "c", "r", "g", "z0", "delay", "geometry"];
    /// <summary>Keys of an end-network item.</summary>
    public static readonly string[] BranchKeys = ["at", "to", "r", "l", "c", "source"];
    /// <summary>Keys of a coupled probe.</summary>
    public static readonly string[] ProbeKeys = ["name", "at", "between"];

    static readonly YamlScalarNode ConductorsKey = new("conductors");

    /// <summary>Whether the YAML text is a coupled scenario (has <c>conductors:</c> at the top), without validating it.</summary>
    public static bool IsCoupledText(string yaml)
    {
        try
        {
            YamlShape.Check(yaml, "scenario");   // before the tree is built: the tree's builder recurses on deep nesting
            var stream = new YamlStream();
            stream.Load(new StringReader(yaml));
            return stream.Documents.Count > 0 && stream.Documents[0].RootNode is YamlMappingNode root && IsCoupled(root);
        }
        catch (ScenarioException) { return false; }   // the loader that follows reports it
        catch (YamlException) { return false; }
        catch (InvalidOperationException) { return false; }
        catch (ArgumentException) { return false; }
    }

    /// <summary>Whether the file at <paramref name="path"/> is a coupled scenario; false when it cannot be read (the loader says why).</summary>
    public static bool IsCoupledFile(string path)
    {
        try { return IsCoupledText(BoundedText.Read(path, InputLimits.ScenarioBytes, "scenario")); }
        catch (FileReadException) { return false; }
    }

    internal static bool IsCoupled(YamlMappingNode root) => root.Children.ContainsKey(ConductorsKey);

    /// <summary>The error of a single-line reader handed a coupled scenario.</summary>
    internal static CoupledFormRefused NotHere(YamlMappingNode root, string file)
    {
        var key = root.Children.Keys.First(k => k.Equals(ConductorsKey));
        return new CoupledFormRefused($"{file}:{key.Start.Line}:{key.Start.Column}");
    }

    /// <summary>Reads and validates the coupled scenario file at <paramref name="path"/>.</summary>
    /// <exception cref="ScenarioException">The file cannot be read or is not a valid coupled scenario.</exception>
    public static CoupledScenario Load(string path)
    {
        string text;
        try { text = BoundedText.Read(path, InputLimits.ScenarioBytes, "scenario"); }
        catch (FileReadException ex) { throw new ScenarioException(ex.Message); }
        return Parse(text, path);
    }

    /// <summary>Reads and validates a coupled scenario from YAML text; <paramref name="file"/> names it in messages.</summary>
    /// <exception cref="ScenarioException">The text is not a valid coupled scenario.</exception>
    public static CoupledScenario Parse(string yaml, string file)
    {
        YamlShape.Check(yaml, file);
        var stream = new YamlStream();
        try { stream.Load(new StringReader(yaml)); }
        catch (YamlException ex) { throw new ScenarioException($"{file}:{ex.Start.Line}:{ex.Start.Column}: not valid YAML: {(ex.InnerException?.Message ?? ex.Message).ReplaceLineEndings(" ")}"); }
        catch (InvalidOperationException) { throw new ScenarioException($"{file}: not valid YAML: the parser stopped inside an unbalanced bracket, brace or quote"); }
        catch (ArgumentException) { throw new ScenarioException($"{file}: not valid YAML: an alias ('*name') or anchor where a value was expected; scenarios use neither"); }
        if (stream.Documents.Count == 0 || stream.Documents[0].RootNode is not YamlMappingNode root)
            throw new ScenarioException($"{file}:1:1: a scenario is a mapping of keys");
        foreach (string single in new[] { "line", "source", "load" })
            if (root.Children.Keys.FirstOrDefault(k => k is YamlScalarNode sc && sc.Value == single) is { } bad)
                throw new ScenarioException($"{file}:{bad.Start.Line}:{bad.Start.Column}: {single}: a scenario has either 'line:' (one conductor) or 'conductors:' with 'coupled:', 'near:' and 'far:'; '{single}' belongs to the single-line form");
        var top = new YamlMap(file, "", root, TopKeys);
        var names = ReadConductors(top);
        var sectionsNode = top.Sequence("coupled") ?? throw top.Error("missing required key 'coupled' (the sections from the near end)");
        if (sectionsNode.Children.Count == 0) throw top.Error(sectionsNode, "coupled", "expected at least one '- section: { … }'");
        var sections = new List<CoupledSection>();
        string lengthUnit = "m"; double lengthFactor = 1;
        for (int i = 0; i < sectionsNode.Children.Count; i++)
        {
            string at = $"coupled[{i}]";
            if (sectionsNode.Children[i] is not YamlMappingNode item) throw top.Error(sectionsNode.Children[i], at, "expected '- section: { length, l, c }'");
            var wrap = new YamlMap(file, at, item, "section");
            var sec = wrap.Map("section", SectionKeys) ?? throw wrap.Error($"missing required key '{at}.section'");
            sections.Add(ReadSection(sec, names.Count));
            if (i == 0 && UnitOf(sec.Text("length")) is { } u && Quantity.TryParse("1 " + u, Dimension.Length, out double f)) { lengthUnit = u; lengthFactor = f; }
        }
        var near = ReadEnd(top, "near", names, file);
        var far = ReadEnd(top, "far", names, file);
        var sim = ScenarioLoader.ReadSimulation(top);
        var scenario = new CoupledScenario
        {
            Title = EchoText.Clean(top.Text("title") ?? Path.GetFileNameWithoutExtension(file)),
            Conductors = names, Sections = sections, Near = near, Far = far, Probes = [], Simulation = sim,
            LengthUnit = lengthUnit, LengthFactor = lengthFactor, FilePath = file,
        };
        return scenario with { Probes = ReadProbes(top, names, scenario.Length) };
    }

    static string? UnitOf(string? text) =>
        text is null ? null : new string(text.Reverse().TakeWhile(ch => char.IsLetter(ch) || ch == '\u00b5' || ch == '\u03bc').Reverse().ToArray()) is { Length: > 0 } u ? u : null;

    static List<string> ReadConductors(YamlMap top)
    {
        var seq = top.Sequence("conductors")!;
        var names = new List<string>();
        foreach (var n in seq.Children)
        {
            string name = (n as YamlScalarNode)?.Value ?? "";
            if (n is not YamlScalarNode || !YamlMap.IdentifierPattern().IsMatch(name))
                throw top.Error(n, "conductors", $"'{EchoText.Clean(name)}' is not a name: use letters, digits, '_' and '-' only");
            if (names.Contains(name)) throw top.Error(n, "conductors", $"'{name}' is named twice");
            names.Add(name);
        }
        if (names.Count < 2) throw top.Error(seq, "conductors", "expected at least two conductor names (one conductor is the 'line:' form)");
        return names;
    }

    static CoupledSection ReadSection(YamlMap m, int n)
    {
        double length = m.Positive("length", Dimension.Length) ?? throw m.Error($"missing required key '{m.Join("length")}'");
        ConductorMatrix l, c;
        ConductorMatrix? rGeom = null;
        if (m.Has("geometry"))
        {
            foreach (string k in new[] { "l", "c", "z0", "delay" })
                if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "a section given by geometry takes L and C from it: remove this key");
            if (n != 2) throw m.Error(m.Node("geometry")!, m.Join("geometry"), $"a geometry describes a pair; this scenario has {n} conductors: give 'l' and 'c' matrices");
            (l, c, rGeom) = FromGeometry(m);
        }
        else if (m.Has("z0") || m.Has("delay"))
        {
            foreach (string k in new[] { "l", "c" })
                if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "a section given by 'z0' and 'delay' (uncoupled conductors) takes no matrices: remove this key");
            var z0 = List(m, "z0", n, Dimension.Resistance);
            var delay = List(m, "delay", n, Dimension.Time, Dimension.DelayPerLength);
            var d = delay.Select(x => x.Dim == Dimension.Time ? x.Value / length : x.Value).ToArray();
            for (int k = 0; k < n; k++)
                if (!(z0[k].Value > 0) || !(d[k] > 0)) throw m.Error(m.Node(z0[k].Value > 0 ? "delay" : "z0")!, m.Join(z0[k].Value > 0 ? "delay" : "z0"), $"entry {k + 1} must be greater than zero");
            l = ConductorMatrix.Diagonal(Enumerable.Range(0, n).Select(k => z0[k].Value * d[k]).ToArray());
            c = ConductorMatrix.Diagonal(Enumerable.Range(0, n).Select(k => d[k] / z0[k].Value).ToArray());
        }
        else
        {
            l = Matrix(m, "l", n, Dimension.InductancePerLength) ?? throw m.Error($"missing required key '{m.Join("l")}' (or 'geometry', or 'z0' and 'delay')");
            c = Matrix(m, "c", n, Dimension.CapacitancePerLength) ?? throw m.Error($"missing required key '{m.Join("c")}'");
        }
        var r = Matrix(m, "r", n, Dimension.ResistancePerLength) ?? rGeom ?? ConductorMatrix.Zero(n);
        var g = Matrix(m, "g", n, Dimension.ConductancePerLength) ?? ConductorMatrix.Zero(n);
        Check(m, "l", MatrixChecks.Inductance(l, n));
        Check(m, "c", MatrixChecks.Capacitance(c, n));
        Check(m, "r", MatrixChecks.Resistance(r, n));
        Check(m, "g", MatrixChecks.Conductance(g, n));
        return new CoupledSection(length, l, c, r, g);
    }

    static void Check(YamlMap m, string key, string? fault)
    {
        if (fault is null) return;
        var node = m.Node(key) ?? m.Node("geometry") ?? m.Node("z0");
        throw node is null ? m.Error($"{m.Join(key)} {fault}") : m.Error(node, m.Join(key), $"the matrix {fault}");
    }

    /// <summary>
    /// L, C and R of a pair from its cross-section: the even and odd modes <see cref="CrossSection.ComputePair"/> computes
    /// (coupled microstrip: Kirschning and Jansen; coupled stripline: Cohn; see docs/xsection.md), turned into matrices by
    /// <see cref="SectionModes.FromModes"/>; R is each strip's DC resistance (or the skin-effect value at 'at').
    /// </summary>
    static (ConductorMatrix, ConductorMatrix, ConductorMatrix) FromGeometry(YamlMap m)
    {
        var (raw, context) = SegmentGeometry.Raw(m, "{ kind: coupled-microstrip, width: 6 mil, gap: 6 mil, height: 4 mil, er: 4.2 }");
        CoupledLineParameters pair;
        try { pair = CrossSection.ComputePair(CrossSection.FromDictionary(raw, context)); }
        catch (InputException ex) when (ex is not ScenarioException) { throw new ScenarioException(ex.Message.StartsWith(context, StringComparison.Ordinal) ? ex.Message : context + ": " + ex.Message); }
        double ve = 1 / pair.Even.DelayPerLength, vo = 1 / pair.Odd.DelayPerLength;
        var (l, c) = SectionModes.FromModes(pair.Z0Even, pair.Z0Odd, ve, vo);
        double rs = pair.Even.RAc > 0 ? pair.Even.RAc : pair.Even.RDc;
        return (l, c, ConductorMatrix.Diagonal([rs, rs]));
    }

    static List<(double Value, Dimension Dim)> List(YamlMap m, string key, int n, params Dimension[] dims)
    {
        var node = m.Node(key) ?? throw m.Error($"missing required key '{m.Join(key)}'");
        if (node is not YamlSequenceNode seq || seq.Children.Count != n || seq.Children.Any(x => x is not YamlScalarNode))
            throw m.Error(node, m.Join(key), $"expected a list of {n} values, one per conductor");
        return seq.Children.Select(x => Entry(m, key, (YamlScalarNode)x, dims)).ToList();
    }

    static (double, Dimension) Entry(YamlMap m, string key, YamlScalarNode x, params Dimension[] dims)
    {
        string text = x.Value ?? "";
        if (!text.Any(char.IsLetter))
            throw m.Error(x, m.Join(key), $"'{EchoText.Clean(text)}' has no unit; every entry carries one, a zero too (e.g. '0 {Units(dims[0])}')");
        try { return Quantity.ParseAny(text, dims); }
        catch (UnitException ex) { throw m.Error(x, m.Join(key), ex.Message); }
    }

    static string Units(Dimension d) =>
        d == Dimension.InductancePerLength ? "nH/in" : d == Dimension.CapacitancePerLength ? "pF/in" : d == Dimension.ResistancePerLength ? "ohm/m"
        : d == Dimension.ConductancePerLength ? "S/m" : d == Dimension.Resistance ? "ohm" : "ns";

    /// <summary>A matrix written as rows (<c>[[a, b], [b, a]]</c>) or as a list (the diagonal); null when absent.</summary>
    static ConductorMatrix? Matrix(YamlMap m, string key, int n, Dimension dim)
    {
        var node = m.Node(key);
        if (node is null) return null;
        if (node is not YamlSequenceNode seq) throw m.Error(node, m.Join(key), $"expected a {n} × {n} matrix [[…], […]] or a list of {n} values (the diagonal)");
        if (seq.Children.All(x => x is YamlScalarNode))
        {
            if (seq.Children.Count != n) throw m.Error(node, m.Join(key), $"a list is the diagonal: expected {n} values, one per conductor, found {seq.Children.Count}");
            return ConductorMatrix.Diagonal(seq.Children.Select(x => Entry(m, key, (YamlScalarNode)x, dim).Item1).ToArray());
        }
        if (seq.Children.Count != n || seq.Children.Any(r => r is not YamlSequenceNode row || row.Children.Count != n || row.Children.Any(e => e is not YamlScalarNode)))
            throw m.Error(node, m.Join(key), $"the scenario has {n} conductors: expected {n} rows of {n} values each");
        return new ConductorMatrix(seq.Children.Select(r => ((YamlSequenceNode)r).Children.Select(e => Entry(m, key, (YamlScalarNode)e, dim).Item1).ToArray()).ToArray());
    }

    static int Conductor(YamlMap m, string key, IReadOnlyList<string> names, YamlNode? node = null, string? text = null)
    {
        text ??= m.Text(key) ?? throw m.Error($"missing required key '{m.Join(key)}'");
        int k = names.ToList().IndexOf(text);
        if (k < 0) throw m.Error(node ?? m.Node(key)!, m.Join(key), $"'{EchoText.Clean(text)}' is not a conductor; conductors: {string.Join(", ", names)}");
        return k;
    }

    static List<EndBranch> ReadEnd(YamlMap top, string key, IReadOnlyList<string> names, string file)
    {
        var list = new List<EndBranch>();
        if (top.Sequence(key) is not { } seq) return list;
        for (int i = 0; i < seq.Children.Count; i++)
        {
            string at = $"{key}[{i}]";
            if (seq.Children[i] is not YamlMappingNode node) throw top.Error(seq.Children[i], at, "expected '- { at: CONDUCTOR, r: 50 ohm }' or '- { at: CONDUCTOR, source: { … } }'");
            var m = new YamlMap(file, at, node, BranchKeys);
            int a = Conductor(m, "at", names);
            if (m.Has("source"))
            {
                foreach (string k in new[] { "to", "r", "l", "c" })
                    if (m.Has(k)) throw m.Error(m.Node(k)!, m.Join(k), "a source item has only 'at' and 'source' (its output resistance is source.resistance); put other parts in an item of their own");
                var spec = ScenarioLoader.ReadSource(m, file, "invert");
                var srcMap = m.Map("source", [.. ScenarioLoader.SourceKeys, "invert"])!;
                bool invert = false;
                if (srcMap.Text("invert") is { } inv && !bool.TryParse(inv, out invert))
                    throw srcMap.Error(srcMap.Node("invert")!, srcMap.Join("invert"), $"'{EchoText.Clean(inv)}' is not true or false");
                list.Add(new EndBranch(a, null, spec.Resistance, Source: new CoupledSource(spec, invert)));
                continue;
            }
            int? to = m.Has("to") ? Conductor(m, "to", names) : null;
            if (to == a) throw m.Error(m.Node("to")!, m.Join("to"), "a branch from a conductor to itself does nothing: name another conductor, or leave 'to' out for the reference");
            if (!m.Has("r") && !m.Has("l") && !m.Has("c")) throw m.Error($"{at}: expected at least one of 'r', 'l', 'c' (or a 'source')");
            double r = m.NonNegative("r", Dimension.Resistance) ?? 0;
            double l = m.NonNegative("l", Dimension.Inductance) ?? 0;
            double? c = m.Positive("c", Dimension.Capacitance);
            list.Add(new EndBranch(a, to, r, l, c));
        }
        return list;
    }

    static List<CoupledProbe> ReadProbes(YamlMap top, IReadOnlyList<string> names, double length)
    {
        var seq = top.Sequence("probes") ?? throw top.Error("missing required key 'probes'");
        var list = new List<CoupledProbe>();
        for (int i = 0; i < seq.Children.Count; i++)
        {
            string at = $"probes[{i}]";
            if (seq.Children[i] is not YamlMappingNode node) throw top.Error(seq.Children[i], at, "expected '- { name: NAME, at: CONDUCTOR/near }'");
            var m = new YamlMap(top.File, at, node, ProbeKeys);
            string name = m.Identifier("name");
            if (list.Any(p => p.Name == name)) throw m.Error(m.Node("name")!, m.Join("name"), $"probe '{name}' is named twice");
            string where = m.Text("at") ?? throw m.Error($"missing required key '{m.Join("at")}'");
            int a; int? b = null;
            if (m.Node("between") is { } bn)
            {
                if (bn is not YamlSequenceNode pair || pair.Children.Count != 2 || pair.Children.Any(x => x is not YamlScalarNode))
                    throw m.Error(bn, m.Join("between"), "expected two conductor names, e.g. [aggr, quiet]");
                a = Conductor(m, "between", names, pair.Children[0], ((YamlScalarNode)pair.Children[0]).Value ?? "");
                b = Conductor(m, "between", names, pair.Children[1], ((YamlScalarNode)pair.Children[1]).Value ?? "");
                if (a == b) throw m.Error(bn, m.Join("between"), "expected two different conductors");
            }
            else
            {
                int slash = where.IndexOf('/');
                if (slash < 0) throw m.Error(m.Node("at")!, m.Join("at"), $"'{EchoText.Clean(where)}': expected CONDUCTOR/near, CONDUCTOR/far or CONDUCTOR/DISTANCE (or 'between: [a, b]' with at: near, far or a distance)");
                a = Conductor(m, "at", names, m.Node("at"), where[..slash]);
                where = where[(slash + 1)..];
            }
            var (anchor, distance) = Place(m, where.Trim(), length);
            list.Add(new CoupledProbe(name, a, b, anchor, distance));
        }
        if (list.Count == 0) throw top.Error(seq, "probes", "expected at least one probe");
        return list;
    }

    static (CoupledAnchor, double) Place(YamlMap m, string where, double length)
    {
        if (where == "near") return (CoupledAnchor.Near, 0);
        if (where == "far") return (CoupledAnchor.Far, length);
        if (!Quantity.TryParse(where, Dimension.Length, out double z) || z < 0 || z > length * (1 + 1e-9))
            throw m.Error(m.Node("at")!, m.Join("at"), $"'{EchoText.Clean(where)}': expected near, far or a distance from the near end between 0 and {Quantity.Format(length, "m")}");
        return (CoupledAnchor.Distance, z);
    }

    /// <summary>The invariant text of a number, for messages.</summary>
    internal static string Text(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
