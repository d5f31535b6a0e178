using WaveSim.Core.Model;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>
/// Turns a scenario into a <see cref="Circuit"/>. Segments are cut at probe distances so every probe sits on a junction.
/// A probe's current follows the same reading as the time-domain probes: at the driver, the driver's current; at a load,
/// the current into the load parts; elsewhere the line current, averaged over the two sides of a junction (they differ by
/// what hangs off it).
/// </summary>
internal sealed class CircuitBuilder
{
    /// <summary>Relative tolerance (of a segment's length) within which a probe counts as sitting on the segment's end.</summary>
    const double EndTolerance = 1e-9;

    /// <summary>A place on one line where a junction is met, with the current arriving and the current leaving along the line.</summary>
    sealed record Entry(double Position, int Junction, CurrentRef[] Up, CurrentRef[] Down);

    readonly List<LumpedEdge> _lumped = [];
    readonly List<SegmentEdge> _segments = [];
    readonly Dictionary<string, List<Entry>> _lines = [];
    readonly Dictionary<string, List<double>> _cuts = [];
    readonly Dictionary<string, CurrentRef[]> _loads = [];
    readonly Dictionary<string, int> _ends = [];
    int _junctions;

    public static Circuit Build(Scenario scenario, IReadOnlyList<ProbeSpec> probes)
    {
        if (HasIvPart(scenario.Line, scenario.Load) || scenario.Source.Buffer is not null)
            throw new InputException("the frequency-domain solve needs a linear network, and this one has I-V table ('iv') or buffer model parts: leave the check out for it");
        var b = new CircuitBuilder();
        foreach (var p in probes.Where(p => p.Anchor == ProbeAnchor.Distance))
        {
            string path = string.Join("/", p.BranchPath);
            if (!b._cuts.TryGetValue(path, out var list)) b._cuts[path] = list = [];
            list.Add(p.Distance);
        }
        int source = b._junctions++;
        b.BuildLine(scenario.Line, scenario.Load, source, "", [new CurrentRef(CurrentKind.Driver, 0)]);
        var taps = probes.Select(b.Tap).ToArray();
        return new Circuit
        {
            Junctions = b._junctions, DriverResistance = scenario.Source.Resistance, Lumped = b._lumped, Segments = b._segments,
            Probes = taps, LoadJunction = b._ends[""], LoadCurrents = b._loads[""],
        };
    }

    static bool HasIvPart(IReadOnlyList<LineElement> line, LoadSpec load) =>
        load.Iv is not null || load.Buffer is not null || line.Any(e => e switch
        {
            Shunt sh => sh.Parts.Iv is not null,
            Model.Series se => se.Parts.Iv is not null,
            Branch br => HasIvPart(br.Line, br.Load),
            _ => false,
        });

    void BuildLine(IReadOnlyList<LineElement> line, LoadSpec load, int start, string path, CurrentRef[] up)
    {
        var entries = new List<Entry>();
        _lines[path] = entries;
        var cuts = _cuts.GetValueOrDefault(path) ?? [];
        int node = start;
        double pos = 0;
        foreach (var element in line)
        {
            switch (element)
            {
                case Segment s:
                {
                    double end = pos + s.Length;
                    var inside = cuts.Where(d => d > pos + EndTolerance * s.Length && d < end - EndTolerance * s.Length)
                        .Distinct().Order().ToList();
                    double at = pos;
                    foreach (double cut in inside.Append(end))
                    {
                        double piece = cut - at;
                        int next = _junctions++;
                        int k = _segments.Count;
                        _segments.Add(new SegmentEdge(node, next, s with { Length = piece }));
                        entries.Add(new Entry(at, node, up, [new CurrentRef(CurrentKind.SegmentStart, k)]));
                        up = [new CurrentRef(CurrentKind.SegmentEnd, k)];
                        node = next;
                        at = cut;
                    }
                    pos = end;
                    break;
                }
                case Shunt sh:
                    _lumped.Add(new LumpedEdge(node, -1, sh.Parts.R ?? 0, sh.Parts.L ?? 0, sh.Parts.C));
                    break;
                case Model.Series se:
                {
                    int next = _junctions++;
                    var current = new CurrentRef(CurrentKind.Lumped, _lumped.Count);
                    _lumped.Add(new LumpedEdge(node, next, se.Parts.R ?? 0, se.Parts.L ?? 0, se.Parts.C));
                    entries.Add(new Entry(pos, node, up, [current]));
                    up = [current];
                    node = next;
                    break;
                }
                case Branch br:
                    BuildLine(br.Line, br.Load, node, path.Length == 0 ? br.Name : path + "/" + br.Name, []);
                    break;
            }
        }
        var loadCurrents = AddLoad(load, node);
        entries.Add(new Entry(pos, node, up, loadCurrents));
        _loads[path] = loadCurrents;
        _ends[path] = node;
    }

    CurrentRef[] AddLoad(LoadSpec load, int node)
    {
        var refs = new List<CurrentRef>();
        void Add(LumpedEdge e) { refs.Add(new CurrentRef(CurrentKind.Lumped, _lumped.Count)); _lumped.Add(e); }
        if (load.Short) { Add(new LumpedEdge(node, -1, 0, 0, null)); return [.. refs]; }
        if (load.R is { } r) Add(new LumpedEdge(node, -1, r, 0, null, load.To));
        if (load.C is { } c) Add(new LumpedEdge(node, -1, 0, 0, c));
        if (load.L is { } l) Add(new LumpedEdge(node, -1, 0, l, null));
        return [.. refs];
    }

    ProbeTap Tap(ProbeSpec p)
    {
        var entries = _lines[string.Join("/", p.BranchPath)];
        switch (p.Anchor)
        {
            case ProbeAnchor.Source when p.BranchPath.Count == 0:
                return new ProbeTap(p.Name, entries[0].Junction, [new CurrentRef(CurrentKind.Driver, 0)], 1);
            case ProbeAnchor.Source:
                return new ProbeTap(p.Name, entries[0].Junction, entries[0].Down, 1);
            case ProbeAnchor.Load:
                return new ProbeTap(p.Name, entries[^1].Junction, entries[^1].Down, 1);
            default:
            {
                // The nearest entry; where a series part repeats a position the first one (the side toward the driver) wins.
                var e = entries[0];
                foreach (var x in entries.Skip(1))
                    if (Math.Abs(x.Position - p.Distance) < Math.Abs(e.Position - p.Distance) * (1 - 1e-12) - 1e-15) e = x;
                bool both = e.Up.Length > 0 && e.Down.Length > 0;
                return new ProbeTap(p.Name, e.Junction, [.. e.Up, .. e.Down], both ? 0.5 : 1);
            }
        }
    }
}
