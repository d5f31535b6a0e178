using System.Globalization;
using WaveSim.Core.Io;
using WaveSim.Core.Model;
using WaveSim.Core.Units;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Reads a scenario YAML file into a validated <see cref="Scenario"/>. Every problem is reported as a
/// <see cref="ScenarioException"/> naming the file, line, column and key.
/// </summary>
public static class ScenarioLoader
{
    /// <summary>The top-level keys accepted.</summary>
    public static readonly string[] TopKeys = ["title", "source", "line", "load", "probes", "simulation"];
    /// <summary>The keys accepted under <c>source</c>.</summary>
    public static readonly string[] SourceKeys = ["waveform", "low", "high", "rise", "fall", "delay", "width", "period", "frequency", "bit_time", "pattern", "prbs", "file", "resistance", "buffer"];
    /// <summary>The keys accepted under <c>segment</c>.</summary>
    public static readonly string[] SegmentKeys = ["length", "z0", "delay", "velocity", "eps_eff", "r", "l", "g", "c", "geometry", "loss", "mode"];
    /// <summary>The keys accepted under <c>shunt</c> and <c>series</c>.</summary>
    public static readonly string[] LumpedKeys = ["r", "l", "c", "iv"];
    /// <summary>The keys accepted under <c>branch</c>.</summary>
    public static readonly string[] BranchKeys = ["name", "line", "load"];
    /// <summary>The keys accepted under <c>load</c>.</summary>
    public static readonly string[] LoadKeys = ["r", "to", "c", "l", "iv", "receiver", "buffer"];
    /// <summary>The keys accepted under <c>load.buffer</c> (and <c>source.buffer</c>).</summary>
    public static readonly string[] BufferKeys = BufferReference.Keys;
    /// <summary>The keys accepted under <c>load.receiver</c>.</summary>
    public static readonly string[] ReceiverKeys = ["vih", "vil"];
    /// <summary>The keys accepted in each probe.</summary>
    public static readonly string[] ProbeKeys = ["name", "at"];
    /// <summary>The keys accepted under <c>simulation</c>.</summary>
    public static readonly string[] SimulationKeys = ["duration", "output_step", "resolution"];

    /// <summary>
    /// The most line items a scenario may hold, branches' items included: 100,000. The junction solve and the DC operating point
    /// are sparse and linear in the number of items (a net is a tree), so the bound is memory and time, not the solves: a
    /// 100,000-item net plans in seconds and runs in about 1 GB, and the plan's limits (which count the junction solve) still bound
    /// the run (docs/PERFORMANCE.md). A real board net has tens of items; a finely cut taper a few thousand.
    /// </summary>
    public const int MaxLineItems = 100_000;

    static int CountItems(IReadOnlyList<LineElement> line) => line.Sum(e => e is Branch b ? 1 + CountItems(b.Line) : 1);

    /// <summary>Reads and validates the scenario file at <paramref name="path"/>.</summary>
    /// <exception cref="ScenarioException">The file cannot be read or is not a valid scenario.</exception>
    public static Scenario Load(string path) => Read(path).Scenario;

    /// <summary>Reads and validates a scenario from YAML text; <paramref name="file"/> names it in messages and anchors relative paths.</summary>
    /// <exception cref="ScenarioException">The text is not a valid scenario.</exception>
    public static Scenario Parse(string yaml, string file) => ReadText(yaml, file).Scenario;

    /// <summary>Reads and validates the scenario file at <paramref name="path"/>, keeping its text beside the model.</summary>
    /// <exception cref="ScenarioException">The file cannot be read or is not a valid scenario.</exception>
    public static ScenarioDocument Read(string path)
    {
        string text;
        try { text = BoundedText.Read(path, InputLimits.ScenarioBytes, "scenario"); }
        catch (FileReadException ex) { throw new ScenarioException(ex.Message); }
        return ReadText(text, path);
    }

    /// <summary>Reads and validates a scenario from YAML text, kept beside the model; <paramref name="file"/> names it in messages and anchors relative paths.</summary>
    /// <exception cref="ScenarioException">The text is not a valid scenario.</exception>
    public static ScenarioDocument ReadText(string yaml, string file)
    {
        YamlShape.Check(yaml, file); // before the tree is built: YamlDotNet recurses where this walk does not
        var stream = new YamlStream();
        try { stream.Load(new StringReader(yaml)); }
        catch (YamlException ex)
        { throw new ScenarioException($"{file}:{ex.Start.Line}:{ex.Start.Column}: not valid YAML: {FirstLine(ex.InnerException?.Message ?? ex.Message)}"); }
        catch (InvalidOperationException)
        { throw new ScenarioException($"{file}: not valid YAML: the parser stopped inside an unbalanced bracket, brace or quote"); }
        catch (ArgumentException)
        { throw new ScenarioException($"{file}: not valid YAML: an alias ('*name') or anchor where a value was expected; scenarios use neither"); }
        if (stream.Documents.Count == 0 || stream.Documents[0].RootNode is not YamlMappingNode root)
            throw new ScenarioException($"{file}:1:1: a scenario is a mapping of keys (title, source, line, load, probes, simulation)");

        if (CoupledLoader.IsCoupled(root)) throw CoupledLoader.NotHere(root, file);
        var top = new YamlMap(file, "", root, TopKeys);
        var source = ReadSource(top, file);
        var lineNode = top.Sequence("line") ?? throw top.Error("missing required key 'line'");
        var line = ReadLine(top, "line", lineNode, file, new HashSet<string>());
        if (CountItems(line) is var count && count > MaxLineItems)
            throw top.Error(lineNode, "line", $"{count} items (segments, shunts, series parts and branches, counted inside branches too); at most {MaxLineItems} are accepted");
        var load = ReadLoad(top, "load");
        var sim = ReadSimulation(top);
        var scenario = new Scenario
        {
            Title = EchoText.Clean(top.Text("title") ?? System.IO.Path.GetFileNameWithoutExtension(file)),
            Source = source,
            Line = line,
            Load = load,
            Probes = [],
            Simulation = sim,
            FilePath = file,
        };
        (scenario, _) = (WithLengthUnit(scenario, root, file), 0);
        return new ScenarioDocument(file, yaml, scenario with { Probes = ReadProbes(top, scenario) });
    }

    /// <summary>Takes the display length unit from the first segment's length as written ("150 mm" → mm).</summary>
    static Scenario WithLengthUnit(Scenario s, YamlMappingNode root, string file)
    {
        foreach (var item in ((YamlSequenceNode)root.Children[new YamlScalarNode("line")]).Children.OfType<YamlMappingNode>())
        {
            if (item.Children.TryGetValue(new YamlScalarNode("segment"), out var seg) && seg is YamlMappingNode m
                && m.Children.TryGetValue(new YamlScalarNode("length"), out var len) && len is YamlScalarNode text)
            {
                string unit = new string((text.Value ?? "").Reverse().TakeWhile(ch => char.IsLetter(ch) || ch == '\u00b5' || ch == '\u03bc').Reverse().ToArray());
                if (unit.Length > 0 && Quantity.TryParse("1 " + unit, Dimension.Length, out double f))
                    return s with { LengthUnit = unit, LengthFactor = f };
                break;
            }
        }
        return s;
    }

    static string FirstLine(string s) => s.ReplaceLineEndings(" ");

    internal static SourceSpec ReadSource(YamlMap top, string file, params string[] extraKeys)
    {
        var s = top.Map("source", [.. SourceKeys, .. extraKeys]) ?? throw top.Error("missing required key 'source'");
        string wf = s.Text("waveform") ?? throw s.Error("missing required key 'source.waveform'");
        if (!Enum.TryParse<WaveformKind>(wf, ignoreCase: true, out var kind) || int.TryParse(wf, out _))
            throw s.Error(s.Node("waveform")!, "source.waveform", $"'{wf}' is not a waveform; expected one of: step, pulse, trapezoid, gaussian, sine, bits, table");
        var buffer = BufferReference.Read(s, "buffer", receiving: false);
        if (buffer is not null && BufferDriver.Conflict(s) is { } conflict) throw conflict;
        double high = buffer is not null ? BufferDriver.High(buffer) : s.Quantity("high") ?? throw s.Error("missing required key 'source.high'");
        double low = buffer is not null ? BufferDriver.Low(buffer) : s.Quantity("low") ?? 0;
        double rise = buffer is not null ? BufferDriver.EdgeTime(buffer) : s.NonNegative("rise") ?? 0;
        double? fallGiven = s.NonNegative("fall");
        double fall = fallGiven ?? rise;
        double delay = s.NonNegative("delay") ?? 0;
        double resistance = s.NonNegative("resistance") ?? 0;
        double width = 0, period = 0, bitTime = 0;
        IReadOnlyList<bool> bits = [];
        double[] tt = [], tv = [];

        void Need(string key) { if (!s.Has(key)) throw s.Error($"missing required key 'source.{key}' for waveform '{wf}'"); }
        switch (kind)
        {
            case WaveformKind.Pulse:
                Need("width"); width = s.NonNegative("width")!.Value; break;
            case WaveformKind.Gaussian:
                Need("width"); width = s.Positive("width")!.Value; break;
            case WaveformKind.Trapezoid:
                Need("width"); width = s.NonNegative("width")!.Value;
                Need("period"); period = s.Positive("period")!.Value;
                if (ScenarioRules.TrapezoidMisfit(rise, width, fall, period) is { } misfit)
                    throw s.Error(s.Node("period")!, "source.period", misfit);
                break;
            case WaveformKind.Sine:
                if (s.Has("period")) period = s.Positive("period")!.Value;
                else if (s.Has("frequency")) period = 1 / s.Positive("frequency")!.Value;
                else throw s.Error("missing required key 'source.period' (or 'source.frequency') for waveform 'sine'");
                break;
            case WaveformKind.Bits:
                Need("bit_time"); bitTime = s.Positive("bit_time")!.Value;
                bits = ReadBits(s);
                if (ScenarioRules.BitEdgeMisfit(rise, fall, bitTime) is { } edge)
                    throw s.Error(s.Node("bit_time")!, "source.bit_time", edge);
                break;
            case WaveformKind.Table:
                Need("file"); (tt, tv) = ReadTable(s, file); break;
        }
        var spec = new SourceSpec
        {
            Waveform = kind, Low = low, High = high, Rise = rise, Delay = delay, Width = width,
            Period = period, BitTime = bitTime, Bits = bits, TableTime = [.. tt], TableVolts = [.. tv], Resistance = resistance,
        };
        if (buffer is not null) return BufferDriver.Check(s, spec with { Buffer = buffer });
        return fallGiven is { } f ? spec with { Fall = f } : spec;   // a fall never written follows the rise, in variants too
    }

    static IReadOnlyList<bool> ReadBits(YamlMap s)
    {
        if (s.Has("pattern") == s.Has("prbs"))
            throw s.Error("waveform 'bits' needs exactly one of 'source.pattern' (e.g. \"1011001\") or 'source.prbs' (7, 9, 15, 23 or 31)");
        if (s.Text("pattern") is { } p)
        {
            if (p.Length == 0 || p.Any(ch => ch != '0' && ch != '1'))
                throw s.Error(s.Node("pattern")!, "source.pattern", $"'{p}' is not a pattern of 0 and 1");
            return p.Select(ch => ch == '1').ToArray();
        }
        string order = s.Text("prbs")!;
        if (!int.TryParse(order, NumberStyles.None, CultureInfo.InvariantCulture, out int k) || !Prbs.Taps.ContainsKey(k))
            throw s.Error(s.Node("prbs")!, "source.prbs", $"'{order}' is not a PRBS order; expected 7, 9, 15, 23 or 31");
        return Prbs.Generate(k);
    }

    static (double[], double[]) ReadTable(YamlMap s, string file)
    {
        string rel = s.Text("file")!;
        string dir = System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(file)) ?? ".";
        string path = System.IO.Path.Combine(dir, rel);
        var t = new List<double>(); var v = new List<double>();
        int i = -1;
        try
        {
            foreach (string line in BoundedText.Lines(path, InputLimits.TableBytes, "waveform table", InputLimits.LineChars, rel))
            {
                i++;
                string l = line.Trim();
                if (l.Length == 0) continue;
                var f = l.Split(',');
                bool ok = f.Length >= 2 && double.TryParse(f[0], NumberStyles.Float, CultureInfo.InvariantCulture, out double ti)
                          & double.TryParse(f[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double vi);
                if (!ok)
                {
                    if (t.Count == 0 && i == 0) continue; // header row
                    throw new ScenarioException($"{path}:{i + 1}: expected 'time_s,volts_V' numbers, found '{EchoText.Excerpt(l)}'");
                }
                double.TryParse(f[0], NumberStyles.Float, CultureInfo.InvariantCulture, out ti);
                double.TryParse(f[1], NumberStyles.Float, CultureInfo.InvariantCulture, out vi);
                if (!double.IsFinite(ti) || !double.IsFinite(vi))
                    throw new ScenarioException($"{path}:{i + 1}: time and voltage must be finite numbers, found '{EchoText.Excerpt(l)}'");
                if (t.Count > 0 && ti <= t[^1])
                    throw new ScenarioException($"{path}:{i + 1}: time must increase from row to row ({ti} after {t[^1]})");
                t.Add(ti); v.Add(vi);
            }
        }
        catch (FileReadException ex) { throw s.Error(s.Node("file")!, "source.file", $"'{EchoText.Excerpt(rel)}': {ex.Reason}"); }
        if (t.Count < 2) throw s.Error(s.Node("file")!, "source.file", $"'{rel}' holds fewer than two samples");
        return (t.ToArray(), v.ToArray());
    }

    static List<LineElement> ReadLine(YamlMap parent, string key, YamlSequenceNode seq, string file, HashSet<string> branchNames)
    {
        var items = new List<LineElement>();
        int i = 0;
        foreach (var node in seq.Children)
        {
            string path = $"{parent.Join(key)}[{i}]";
            if (node is not YamlMappingNode m || m.Children.Count != 1)
                throw new ScenarioException($"{file}:{node.Start.Line}:{node.Start.Column}: {path}: each line item is one of 'segment', 'shunt', 'series' or 'branch' with its keys");
            var wrapper = new YamlMap(file, path, m, "segment", "shunt", "series", "branch");
            string kind = ((YamlScalarNode)m.Children.Keys.First()).Value!;
            items.Add(kind switch
            {
                "segment" => ReadSegment(wrapper.Map("segment", SegmentKeys)!),
                "shunt" => new Shunt(ReadParts(wrapper.Map("shunt", LumpedKeys)!)),
                "series" => new Model.Series(ReadParts(wrapper.Map("series", LumpedKeys)!)),
                _ => ReadBranch(wrapper.Map("branch", BranchKeys)!, file, branchNames),
            });
            i++;
        }
        if (!items.OfType<Segment>().Any())
            throw new ScenarioException($"{file}:{seq.Start.Line}:{seq.Start.Column}: {parent.Join(key)}: needs at least one segment");
        return items;
    }

    static Segment ReadSegment(YamlMap m)
    {
        double length = m.Positive("length") ?? throw m.Error($"missing required key '{m.Join("length")}'");
        double? rGiven = m.NonNegative("r");
        double? gGiven = m.NonNegative("g");
        if (m.Has("geometry")) return SegmentGeometry.Read(m, length, rGiven, gGiven);
        if (m.Has("mode")) throw m.Error(m.Node("mode")!, m.Join("mode"), "only a segment with a coupled-pair geometry has a mode: remove this key or add a geometry");
        double r = rGiven ?? 0;
        double g = gGiven ?? 0;
        if (m.Has("z0"))
        {
            if (m.Has("l") || m.Has("c"))
                throw m.Error("give either z0 with a delay, velocity or eps_eff, or l and c per length, not both");
            double z0 = m.Positive("z0")!.Value;
            int given = new[] { "delay", "velocity", "eps_eff" }.Count(m.Has);
            if (given != 1)
                throw m.Error($"with z0, give exactly one of '{m.Join("delay")}' (e.g. 6.5 ns/m or 1.2 ns), '{m.Join("velocity")}' (e.g. 0.66 c) or '{m.Join("eps_eff")}' (e.g. 3.3)");
            double perLength;
            if (m.Has("delay"))
            {
                var (d, dim) = m.QuantityWithDim("delay")!.Value;
                if (!(d > 0)) throw m.Error(m.Node("delay")!, m.Join("delay"), "must be greater than zero");
                perLength = dim.PerLength ? d : d / length;
            }
            else if (m.Has("velocity"))
            {
                double v = m.Positive("velocity")!.Value;
                if (ScenarioRules.FasterThanLight(v))
                    throw m.Error(m.Node("velocity")!, m.Join("velocity"), $"'{m.Text("velocity")}' is faster than light");
                perLength = 1 / v;
            }
            else
            {
                double ee = m.Positive("eps_eff")!.Value;
                if (ee < 1) throw m.Error(m.Node("eps_eff")!, m.Join("eps_eff"), ScenarioRules.AtLeastOne(ee));
                perLength = Math.Sqrt(ee) / Quantity.SpeedOfLight;
            }
            return SegmentLoss.Apply(m, Segment.FromZ0(length, z0, perLength, r, g), rGiven is not null, gGiven is not null);
        }
        if (m.Has("l") && m.Has("c"))
        {
            if (m.Has("delay") || m.Has("velocity") || m.Has("eps_eff"))
                throw m.Error("with l and c per length, do not also give delay, velocity or eps_eff");
            double l = m.Positive("l")!.Value;
            double c = m.Positive("c")!.Value;
            if (ScenarioRules.FasterThanLight(l, c) is { } fast)
                throw m.Error(m.Node("c")!, m.Join("c"), fast);
            return SegmentLoss.Apply(m, new Segment(length, r, l, g, c), rGiven is not null, gGiven is not null);
        }
        throw m.Error($"a segment needs z0 with one of delay, velocity or eps_eff, or l and c per length");
    }

    static LumpedParts ReadParts(YamlMap m)
    {
        if (IvTable.Read(m) is { } iv)
        {
            if (m.Has("r") || m.Has("l") || m.Has("c"))
                throw m.Error(m.Node("iv")!, m.Join("iv"), "an I-V table is a part of its own here: give it alone, without r, l or c (put those in an item of their own)");
            return new LumpedParts { Iv = iv };
        }
        var parts = new LumpedParts(m.NonNegative("r"), m.Positive("l"), m.Positive("c"));
        if (parts.R is null && parts.L is null && parts.C is null)
            throw m.Error("give at least one of r, l, c (or an I-V table, iv)");
        return parts;
    }

    static Branch ReadBranch(YamlMap m, string file, HashSet<string> names)
    {
        string name = m.Identifier("name");
        if (!names.Add(name)) throw m.Error(m.Node("name")!, m.Join("name"), $"branch name '{name}' is used twice");
        var seq = m.Sequence("line") ?? throw m.Error($"missing required key '{m.Join("line")}'");
        var line = ReadLine(m, "line", seq, file, names);
        return new Branch(name, line, ReadLoad(m, "load"));
    }

    static LoadSpec ReadLoad(YamlMap parent, string key)
    {
        var node = parent.Node(key);
        if (node is null) return LoadSpec.Open;
        if (node is YamlScalarNode s)
        {
            return s.Value switch
            {
                "open" or "" or null => LoadSpec.Open,
                "short" => new LoadSpec(Short: true),
                _ => throw parent.Error(node, parent.Join(key), $"'{s.Value}' is not a load; expected 'open', 'short' or a mapping of r, to, c, l, iv, receiver, buffer"),
            };
        }
        var m = parent.Map(key, LoadKeys)!;
        double? r = m.NonNegative("r");
        double to = m.Quantity("to") ?? 0;
        var iv = IvTable.Read(m);
        if (m.Has("to") && r is null && iv is null) throw m.Error(m.Node("to")!, m.Join("to"), "'to' is the voltage the load resistor (or I-V table) returns to: give 'r' or 'iv' too");
        ReceiverThresholds? rx = null;
        if (m.Map("receiver", ReceiverKeys) is { } rm)
        {
            double vih = rm.Quantity("vih") ?? throw rm.Error($"missing required key '{rm.Join("vih")}'");
            double vil = rm.Quantity("vil") ?? throw rm.Error($"missing required key '{rm.Join("vil")}'");
            if (ScenarioRules.ThresholdOrder(vih, vil) is { } order) throw rm.Error(rm.Node("vil")!, rm.Join("vil"), order);
            rx = new ReceiverThresholds(vih, vil);
        }
        var buffer = BufferReference.Read(m, "buffer", receiving: true);
        if (buffer is not null && rx is not null)
            throw m.Error(m.Node("receiver")!, m.Join("receiver"), "a buffer receiver takes its thresholds from the model's Vinh and Vinl: give 'buffer' or 'receiver', not both");
        if (buffer is { Model: { Vinh: { } vinh, Vinl: { } vinl } }) rx = new ReceiverThresholds(vinh, vinl);
        return new LoadSpec(r, to, m.Positive("c"), m.Positive("l"), false, rx) { Iv = iv, Buffer = buffer };
    }

    internal static SimulationSpec ReadSimulation(YamlMap top)
    {
        var m = top.Map("simulation", SimulationKeys) ?? throw top.Error("missing required key 'simulation' (with 'duration')");
        double duration = m.Positive("duration") ?? throw m.Error("missing required key 'simulation.duration'");
        double? step = m.Positive("output_step");
        double res = m.Positive("resolution") ?? 20;
        if (res < 1) throw m.Error(m.Node("resolution")!, "simulation.resolution", ScenarioRules.AtLeastOne(res));
        return new SimulationSpec(duration, step, res);
    }

    static IReadOnlyList<ProbeSpec> ReadProbes(YamlMap top, Scenario scenario)
    {
        var seq = top.Sequence("probes");
        if (seq is null)
            return [new ProbeSpec("source", [], ProbeAnchor.Source), new ProbeSpec("load", [], ProbeAnchor.Load)];
        var probes = new List<ProbeSpec>();
        int i = 0;
        foreach (var node in seq.Children)
        {
            string path = $"probes[{i++}]";
            if (node is not YamlMappingNode pm)
                throw top.Error(node, path, "each probe is a mapping { name: ..., at: ... }");
            var m = new YamlMap(top.File, path, pm, ProbeKeys);
            string name = m.Identifier("name");
            if (probes.Any(p => p.Name == name)) throw m.Error(m.Node("name")!, m.Join("name"), $"probe name '{name}' is used twice");
            string at = m.Text("at") ?? throw m.Error($"missing required key '{m.Join("at")}'");
            probes.Add(ProbeLocation.Resolve(name, at, scenario, msg => m.Error(m.Node("at")!, m.Join("at"), msg)));
        }
        if (probes.Count == 0) throw top.Error(seq, "probes", "the list is empty; leave 'probes' out for the default source and load probes");
        return probes;
    }
}
