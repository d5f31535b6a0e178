namespace WaveSim.Core.Solver;

/// <summary>
/// The nodes of one line in order, with the edges on either side of each. Junction nodes are stored; a segment's interior nodes
/// are kept as one run and produced on demand, so a line of millions of cells costs a few bytes, not a few objects, per node.
/// </summary>
internal sealed class LineNodeList
{
    /// <summary>A stored node (Run &lt; 0) or a run of a segment's interior nodes k = 1..Cells−1 at Start + k·Dz.</summary>
    readonly record struct Entry(int First, (double Position, NodeRef Node, EdgeRef[] Upstream, EdgeRef[] Downstream) Stored,
                                 int Run, int Cells, double Start, double Dz)
    {
        public int Count => Run < 0 ? 1 : Cells - 1;
    }

    readonly List<Entry> _entries = [];

    /// <summary>Number of nodes.</summary>
    public int Count { get; private set; }

    /// <summary>Appends one stored node.</summary>
    public void Add((double Position, NodeRef Node, EdgeRef[] Upstream, EdgeRef[] Downstream) node)
    {
        _entries.Add(new Entry(Count, node, -1, 0, 0, 0));
        Count++;
    }

    /// <summary>Appends the interior nodes 1..cells−1 of segment <paramref name="segment"/>, which starts at <paramref name="start"/>.</summary>
    public void AddInterior(int segment, int cells, double start, double dz)
    {
        if (cells < 2) return;
        _entries.Add(new Entry(Count, default, segment, cells, start, dz));
        Count += cells - 1;
    }

    /// <summary>Position of node <paramref name="index"/> along its line, m.</summary>
    public double Position(int index)
    {
        var (e, k) = Find(index);
        return e.Run < 0 ? e.Stored.Position : e.Start + k * e.Dz;
    }

    /// <summary>Where node <paramref name="index"/>'s voltage lives.</summary>
    public NodeRef Node(int index)
    {
        var (e, k) = Find(index);
        return e.Run < 0 ? e.Stored.Node : new NodeRef(e.Run, k, -1);
    }

    /// <summary>Node <paramref name="index"/> with its upstream and downstream edges (allocates for interior nodes).</summary>
    public (double Position, NodeRef Node, EdgeRef[] Upstream, EdgeRef[] Downstream) this[int index]
    {
        get
        {
            var (e, k) = Find(index);
            if (e.Run < 0) return e.Stored;
            return (e.Start + k * e.Dz, new NodeRef(e.Run, k, -1), [new EdgeRef(e.Run, k - 1, -1)], [new EdgeRef(e.Run, k, -1)]);
        }
    }

    /// <summary>The entry holding node <paramref name="index"/> and, for a run, the node's index k within its segment.</summary>
    (Entry Entry, int K) Find(int index)
    {
        if ((uint)index >= (uint)Count) throw new ArgumentOutOfRangeException(nameof(index));
        int lo = 0, hi = _entries.Count - 1;
        while (lo < hi)
        {
            int mid = (lo + hi + 1) / 2;
            if (_entries[mid].First <= index) lo = mid; else hi = mid - 1;
        }
        var e = _entries[lo];
        return (e, index - e.First + 1);
    }
}
