using System.Numerics;

namespace WaveSim.Core.Solver;

/// <summary>
/// A sparse LU factorisation for the network's linear systems (the per-step junction solve, the DC operating point, the
/// frequency-domain nodal solve), factored once and then solved for any number of right-hand sides.
/// </summary>
/// <remarks>
/// The columns are eliminated in minimum-degree order (Tinney and Walker, "Direct solutions of sparse network equations by
/// optimally ordered triangular factorization", Proc. IEEE 55, 1967, scheme 2), each with a pivot row chosen by threshold partial
/// pivoting: among the rows whose entry is at least a tenth of the column's largest, the shortest (Markowitz 1957; Duff, Erisman
/// and Reid, Direct Methods for Sparse Matrices, 1986, ch. 7). Rows are equilibrated first. A net is a tree (every segment and
/// every series part starts a new junction), and eliminating a tree leaf-first makes no fill, so factoring and solving take time
/// and memory linear in the number of unknowns, where a dense LU takes the cube and the square.
/// </remarks>
internal sealed class SparseLu<T> where T : struct, INumberBase<T>
{
    /// <summary>The pivot threshold: a pivot at least this fraction of its column's largest candidate.</summary>
    const double Threshold = 0.1;

    /// <summary>
    /// A pivot below this fraction of its column's largest entry in the equilibrated matrix counts as zero: only an exact or
    /// underflowed zero, since a tiny leak (1e-15 S against 1 S) is a legitimate pivot; callers judge conditioning by
    /// <see cref="PivotRatio"/> or a residual.
    /// </summary>
    const double Singular = 1e-300;

    readonly int _n;
    readonly T[] _rowScale;
    readonly int[] _opTarget, _opSource;
    readonly T[] _opFactor;
    readonly int[] _pivRow, _pivCol, _uStart, _uCol;
    readonly T[] _pivVal, _uVal, _work;

    /// <summary>Smallest over largest pivot magnitude of the equilibrated matrix: a cheap sign of a nearly singular system.</summary>
    public double PivotRatio { get; }

    /// <summary>Number of stored factor entries (multipliers, pivots and U entries): the work of one solve.</summary>
    public long FactorEntries => _opFactor.Length + _pivVal.Length + _uVal.Length;

    SparseLu(int n, T[] rowScale, List<(int, int, T)> ops, List<(int Row, int Col, T Value, List<(int, T)> Others)> pivots, double ratio)
    {
        _n = n; _rowScale = rowScale; PivotRatio = ratio;
        _opTarget = new int[ops.Count]; _opSource = new int[ops.Count]; _opFactor = new T[ops.Count];
        for (int i = 0; i < ops.Count; i++) (_opTarget[i], _opSource[i], _opFactor[i]) = ops[i];
        _pivRow = new int[n]; _pivCol = new int[n]; _pivVal = new T[n]; _uStart = new int[n + 1];
        int total = pivots.Sum(p => p.Others.Count);
        _uCol = new int[total]; _uVal = new T[total];
        int at = 0;
        for (int i = 0; i < n; i++)
        {
            var p = pivots[i];
            _pivRow[i] = p.Row; _pivCol[i] = p.Col; _pivVal[i] = p.Value; _uStart[i] = at;
            foreach (var (c, v) in p.Others) { _uCol[at] = c; _uVal[at] = v; at++; }
        }
        _uStart[n] = at;
        _work = new T[n];
    }

    /// <summary>
    /// Factors the n×n matrix given by <paramref name="entries"/> (duplicates are summed); null when it is singular (a column with
    /// no usable pivot, a zero row) or has an entry that is not finite.
    /// </summary>
    /// <param name="n">Number of unknowns and equations.</param>
    /// <param name="entries">Row, column and value of each nonzero.</param>
    /// <param name="norm">A magnitude for pivoting (|x| for reals, |re| + |im| for complex numbers).</param>
    public static SparseLu<T>? Factor(int n, IEnumerable<(int Row, int Col, T Value)> entries, Func<T, double> norm)
    {
        var rows = new Dictionary<int, T>[n];
        for (int i = 0; i < n; i++) rows[i] = [];
        foreach (var (r, c, v) in entries)
        {
            if (!double.IsFinite(norm(v))) return null;
            if (v == T.Zero) continue;
            ref var slot = ref System.Runtime.InteropServices.CollectionsMarshal.GetValueRefOrAddDefault(rows[r], c, out _);
            slot += v;
        }
        var scale = new T[n];
        var colRows = new HashSet<int>[n];
        for (int i = 0; i < n; i++) colRows[i] = [];
        for (int r = 0; r < n; r++)
        {
            double m = 0;
            foreach (var v in rows[r].Values) m = Math.Max(m, norm(v));
            if (!(m > 0) || !double.IsFinite(m)) return null;
            scale[r] = T.CreateChecked(1 / m);
            foreach (var c in rows[r].Keys.ToArray()) { rows[r][c] *= scale[r]; colRows[c].Add(r); }
        }
        var colMax = new double[n];
        for (int r = 0; r < n; r++)
            foreach (var (c, v) in rows[r]) colMax[c] = Math.Max(colMax[c], norm(v));

        var ops = new List<(int, int, T)>();
        var pivots = new List<(int, int, T, List<(int, T)>)>(n);
        double minPivot = double.PositiveInfinity, maxPivot = 0;
        var others = new List<int>();
        foreach (int k in MinimumDegreeOrder(n, rows))
        {
            var cands = colRows[k];
            double best = 0;
            foreach (int r in cands) best = Math.Max(best, norm(rows[r][k]));
            if (!(best > Singular * colMax[k])) return null;
            int p = -1, pLen = int.MaxValue;
            foreach (int r in cands)
                if (norm(rows[r][k]) >= Threshold * best && (rows[r].Count < pLen || (rows[r].Count == pLen && r < p)))
                { p = r; pLen = rows[r].Count; }
            var prow = rows[p];
            T piv = prow[k];
            double pn = norm(piv);
            minPivot = Math.Min(minPivot, pn); maxPivot = Math.Max(maxPivot, pn);
            var rest = new List<(int, T)>(prow.Count - 1);
            foreach (var (c, v) in prow)
            {
                colRows[c].Remove(p);
                if (c != k) rest.Add((c, v));
            }
            others.Clear();
            others.AddRange(cands);
            foreach (int r in others)
            {
                var row = rows[r];
                T f = row[k] / piv;
                row.Remove(k);
                cands.Remove(r);
                ops.Add((r, p, f));
                foreach (var (c, v) in rest)
                {
                    ref var slot = ref System.Runtime.InteropServices.CollectionsMarshal.GetValueRefOrAddDefault(row, c, out bool had);
                    slot -= f * v;
                    if (!had) colRows[c].Add(r);
                }
            }
            pivots.Add((p, k, piv, rest));
            rows[p] = [];
        }
        return new SparseLu<T>(n, scale, ops, pivots, maxPivot > 0 ? minPivot / maxPivot : 0);
    }

    /// <summary>Solves A x = b into <paramref name="x"/>; <paramref name="b"/> is left unchanged.</summary>
    public void Solve(ReadOnlySpan<T> b, Span<T> x)
    {
        var w = _work.AsSpan();
        for (int i = 0; i < _n; i++) w[i] = b[i] * _rowScale[i];
        var target = _opTarget; var source = _opSource; var factor = _opFactor;
        for (int i = 0; i < factor.Length; i++) w[target[i]] -= factor[i] * w[source[i]];
        for (int i = _n - 1; i >= 0; i--)
        {
            T sum = w[_pivRow[i]];
            for (int e = _uStart[i]; e < _uStart[i + 1]; e++) sum -= _uVal[e] * x[_uCol[e]];
            x[_pivCol[i]] = sum / _pivVal[i];
        }
    }

    /// <summary>
    /// The order to eliminate the unknowns in: repeatedly the one with the fewest neighbours in the symmetric pattern, its
    /// neighbours joined to each other (the fill it would make). A tree is peeled from its leaves, with no fill.
    /// </summary>
    static IEnumerable<int> MinimumDegreeOrder(int n, Dictionary<int, T>[] rows)
    {
        var adj = new HashSet<int>[n];
        for (int i = 0; i < n; i++) adj[i] = [];
        for (int r = 0; r < n; r++)
            foreach (int c in rows[r].Keys)
                if (c != r) { adj[r].Add(c); adj[c].Add(r); }
        var queue = new PriorityQueue<int, (int, int)>(n);
        for (int i = 0; i < n; i++) queue.Enqueue(i, (adj[i].Count, i));
        var done = new bool[n];
        var order = new List<int>(n);
        while (queue.TryDequeue(out int v, out var key))
        {
            if (done[v] || key.Item1 != adj[v].Count) continue;   // a stale entry: the degree changed since
            done[v] = true;
            order.Add(v);
            var nb = adj[v].ToArray();
            foreach (int u in nb) adj[u].Remove(v);
            for (int a = 0; a < nb.Length; a++)
                for (int b = a + 1; b < nb.Length; b++)
                    if (adj[nb[a]].Add(nb[b])) adj[nb[b]].Add(nb[a]);
            foreach (int u in nb) queue.Enqueue(u, (adj[u].Count, u));
            adj[v].Clear();
        }
        return order;
    }
}
