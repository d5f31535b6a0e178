using WaveSim.Core.Buffers;
using WaveSim.Core.Model;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// The one discrete key of the key-path API: a buffer's corner (<c>source.buffer.corner</c>, <c>load.buffer.corner</c>,
/// <c>line[1].branch.load.buffer.corner</c>). A <see cref="KeyChange"/> carries it as the corner's index (0 typ, 1 min,
/// 2 max) in <see cref="Units.Dimension.Number"/>, so sweeps and other variants pass it like any value.
/// </summary>
public static class BufferCorners
{
    /// <summary>The corner names in index order.</summary>
    public static IReadOnlyList<string> Names { get; } = ["typ", "min", "max"];

    /// <summary>True when <paramref name="keyPath"/> names a buffer's corner.</summary>
    public static bool IsCornerKey(string keyPath) =>
        keyPath.EndsWith(".buffer.corner", StringComparison.Ordinal) && (keyPath == "source.buffer.corner" || keyPath.EndsWith("load.buffer.corner", StringComparison.Ordinal));

    /// <summary>The index of corner name <paramref name="name"/>; null when it is not typ, min or max.</summary>
    public static int? IndexOf(string name) => Names.ToList().IndexOf(name.Trim().ToLowerInvariant()) is var i and >= 0 ? i : null;

    /// <summary>The scenario with the buffer at <paramref name="keyPath"/> in corner <paramref name="index"/> (0 typ, 1 min, 2 max).</summary>
    /// <exception cref="InputException">No buffer there, an index that is not a corner, or a corner the model does not give.</exception>
    public static Scenario With(Scenario s, string keyPath, double index)
    {
        if (index is not (0 or 1 or 2)) throw new InputException($"{keyPath}: {index} is not a corner (typ, min or max)");
        var corner = (Corner)(int)index;
        var path = KeyPath.Parse(keyPath);
        if (path.Parts[0].Name == "source")
        {
            var b = s.Source.Buffer ?? throw new InputException($"{keyPath}: the source has no buffer");
            var nb = Corner_(b, corner, keyPath);
            double edge = BufferDriver.EdgeTime(nb);
            return s with { Source = s.Source with { Buffer = nb, High = BufferDriver.High(nb), Low = BufferDriver.Low(nb), Rise = edge, Fall = edge } };
        }
        return path.Parts.Length == 3
            ? s with { Load = LoadWith(s.Load, keyPath, corner) }
            : s with { Line = LineWith(s.Line, path, 0, keyPath, corner) };
    }

    /// <summary>The corner index (0 typ, 1 min, 2 max) of the buffer at <paramref name="keyPath"/> in <paramref name="s"/>.</summary>
    /// <exception cref="InputException">No buffer there, or a path that names none.</exception>
    public static int Read(Scenario s, string keyPath)
    {
        ArgumentNullException.ThrowIfNull(s);
        var path = KeyPath.Parse(keyPath);
        if (path.Parts[0].Name == "source")
            return (int)(s.Source.Buffer ?? throw new InputException($"{keyPath}: the source has no buffer")).Corner;
        var load = path.Parts.Length == 3 ? s.Load : LoadAt(s.Line, path, 0, keyPath);
        return (int)(load.Buffer ?? throw new InputException($"{keyPath}: that load has no buffer")).Corner;
    }

    static LoadSpec LoadAt(IReadOnlyList<LineElement> line, KeyPath path, int at, string keyPath)
    {
        var p = path.Parts;
        if (at + 2 >= p.Length || p[at] is not { Name: "line", Index: { } i } || i >= line.Count || line[i] is not Branch br || p[at + 1].Name != "branch")
            throw new InputException($"{keyPath}: expected source.buffer.corner, load.buffer.corner or line[i].branch.load.buffer.corner naming a branch");
        return p[at + 2].Name == "load" ? br.Load : LoadAt(br.Line, path, at + 2, keyPath);
    }

    static BufferSpec Corner_(BufferSpec b, Corner corner, string keyPath)
    {
        try { b.Model.RequireCorner(corner); }
        catch (InputException ex) { throw new InputException($"{keyPath}: {ex.Message}"); }
        return b with { Corner = corner };
    }

    static LoadSpec LoadWith(LoadSpec load, string keyPath, Corner corner)
    {
        var b = load.Buffer ?? throw new InputException($"{keyPath}: that load has no buffer");
        return load with { Buffer = Corner_(b, corner, keyPath) };
    }

    /// <summary>line[i].branch.(line[j].branch.)…load.buffer.corner from part <paramref name="at"/> on.</summary>
    static IReadOnlyList<LineElement> LineWith(IReadOnlyList<LineElement> line, KeyPath path, int at, string keyPath, Corner corner)
    {
        var p = path.Parts;
        if (at + 1 >= p.Length || p[at] is not { Name: "line", Index: { } i } || i >= line.Count || line[i] is not Branch br || p[at + 1].Name != "branch")
            throw new InputException($"{keyPath}: expected source.buffer.corner, load.buffer.corner or line[i].branch.load.buffer.corner naming a branch");
        var nb = p[at + 2].Name == "load"
            ? br with { Load = LoadWith(br.Load, keyPath, corner) }
            : br with { Line = LineWith(br.Line, path, at + 2, keyPath, corner) };
        var list = line.ToList();
        list[i] = nb;
        return list;
    }
}
