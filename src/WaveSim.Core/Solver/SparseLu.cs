using System.Numerics;
using System.Runtime.InteropServices;

namespace WaveSim.Core.Solver;

/// <summary>
/// A sparse LU factorisation for the network's linear systems (the per-step junction solve, the DC operating point, the
/// frequency-domain nodal solve), factored once and then solved for any number of right-hand sides, or refactored for new
/// values on the same pattern (one frequency after another) without searching for pivots again.
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
    /// The threshold a refactor accepts an old pivot at: looser than the first choice's, so that one frequency after another
    /// keeps the order (the growth of an entry per elimination stays bounded by 1/RefactorThreshold, and a tree row is eliminated
    /// into at most a few others).
    /// </summary>
    const double RefactorThreshold = 1e-3;

    /// <summary>
    /// A pivot below this fraction of its column's largest entry in the equilibrated matrix counts as zero: only an exact or
    /// underflowed zero, since a tiny leak (1e-15 S against 1 S) is a legitimate pivot; callers judge conditioning by
    /// <see cref="PivotRatio"/> or a residual.
    /// </summary>
    const double Singular = 1e-300;

    readonly int _n;
    readonly Func<T, double> _norm;
    // The pattern: each input entry's row, column and slot; each row's slots (for equilibration).
    readonly int[] _entryRow, _entryCol, _entrySlot, _rowSlotStart, _rowSlots;
    // The elimination program, replayed by Refactor: per step its pivot slot and a range of ops; per op the slot of the entry it
    // removes and a range of (target, source) slot pairs.
    readonly int[] _stepPivotSlot, _stepOpStart, _opSlot, _opTarget, _opSource, _opPairStart, _pairTarget, _pairSource;
    readonly int[] _pivRow, _pivCol, _uStart, _uCol, _uSlot;
    readonly T[] _val, _rowScale, _opFactor, _pivVal, _uVal, _work;

    /// <summary>Smallest over largest pivot magnitude of the equilibrated matrix: a cheap sign of a nearly singular system.</summary>
    public double PivotRatio { get; private set; }

    /// <summary>Whether the last <see cref="Refactor"/> kept the old pivots (for the tests of the fast path).</summary>
    public bool Refactored { get; private set; }

    /// <summary>Number of stored factor entries (multipliers, pivots and U entries): the work of one solve.</summary>
    public long FactorEntries => _opFactor.Length + _pivVal.Length + _uVal.Length;

    SparseLu(int n, Func<T, double> norm, Builder b)
    {
        _n = n; _norm = norm;
        _entryRow = b.EntryRow; _entryCol = b.EntryCol; _entrySlot = b.EntrySlot;
        _rowSlotStart = b.RowSlotStart; _rowSlots = b.RowSlots;
        _stepPivotSlot = [.. b.StepPivotSlot]; _stepOpStart = [.. b.StepOpStart, b.OpSlot.Count];
        _opSlot = [.. b.OpSlot]; _opTarget = [.. b.OpTarget]; _opSource = [.. b.OpSource];
        _opPairStart = [.. b.OpPairStart, b.PairTarget.Count]; _pairTarget = [.. b.PairTarget]; _pairSource = [.. b.PairSource];
        _pivRow = [.. b.PivRow]; _pivCol = [.. b.PivCol]; _uStart = [.. b.UStart, b.USlot.Count];
        _uSlot = [.. b.USlot]; _uCol = [.. b.UCol];
        _val = new T[b.Slots];
        _rowScale = b.Scale;
        _opFactor = [.. b.OpFactor];
        _pivVal = new T[n]; _uVal = new T[_uSlot.Length];
        _work = new T[n];
        for (int i = 0; i < n; i++) _pivVal[i] = b.Values[_stepPivotSlot[i]];
        for (int e = 0; e < _uSlot.Length; e++) _uVal[e] = b.Values[_uSlot[e]];
        PivotRatio = b.PivotRatio;
    }

    /// <summary>
    /// Factors the n×n matrix given by <paramref name="entries"/> (duplicates are summed; zeros are kept as part of the pattern);
    /// null when it is singular (a column with no usable pivot, a zero row) or has an entry that is not finite.
    /// </summary>
    /// <param name="n">Number of unknowns and equations.</param>
    /// <param name="entries">Row, column and value of each entry.</param>
    /// <param name="norm">A magnitude for pivoting (|x| for reals, |re| + |im| for complex numbers).</param>
    public static SparseLu<T>? Factor(int n, IReadOnlyList<(int Row, int Col, T Value)> entries, Func<T, double> norm)
    {
        var b = new Builder();
        return b.Run(n, entries, norm) ? new SparseLu<T>(n, norm, b) : null;
    }

    /// <summary>
    /// Refactors for new values on the same pattern (the same rows and columns in the same order) with the pivots chosen before;
    /// false when the pattern differs or a pivot has become too small for the old order (factor afresh then).
    /// </summary>
    public bool Refactor(IReadOnlyList<(int Row, int Col, T Value)> entries)
    {
        if (entries.Count != _entrySlot.Length) return false;
        var val = _val;
        Array.Clear(val);
        for (int i = 0; i < entries.Count; i++)
        {
            var (r, c, v) = entries[i];
            if (r != _entryRow[i] || c != _entryCol[i] || !double.IsFinite(_norm(v))) return false;
            val[_entrySlot[i]] += v;
        }
        for (int r = 0; r < _n; r++)
        {
            double m = 0;
            for (int e = _rowSlotStart[r]; e < _rowSlotStart[r + 1]; e++) m = Math.Max(m, _norm(val[_rowSlots[e]]));
            if (!(m > 0)) return false;
            var s = _rowScale[r] = T.CreateChecked(1 / m);
            for (int e = _rowSlotStart[r]; e < _rowSlotStart[r + 1]; e++) val[_rowSlots[e]] *= s;
        }
        double minPivot = double.PositiveInfinity, maxPivot = 0;
        for (int i = 0; i < _n; i++)
        {
            T piv = val[_stepPivotSlot[i]];
            double pn = _norm(piv), best = pn;
            for (int o = _stepOpStart[i]; o < _stepOpStart[i + 1]; o++) best = Math.Max(best, _norm(val[_opSlot[o]]));
            if (!(pn >= RefactorThreshold * best) || !(pn > 0)) { Refactored = false; return false; }
            minPivot = Math.Min(minPivot, pn); maxPivot = Math.Max(maxPivot, pn);
            _pivVal[i] = piv;
            for (int o = _stepOpStart[i]; o < _stepOpStart[i + 1]; o++)
            {
                T f = _opFactor[o] = val[_opSlot[o]] / piv;
                for (int q = _opPairStart[o]; q < _opPairStart[o + 1]; q++) val[_pairTarget[q]] -= f * val[_pairSource[q]];
            }
        }
        for (int e = 0; e < _uSlot.Length; e++) _uVal[e] = val[_uSlot[e]];
        PivotRatio = minPivot / maxPivot;
        Refactored = true;
        return true;
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

    /// <summary>The first factorisation: chooses the order and the pivots, and records the program a refactor replays.</summary>
    sealed class Builder
    {
        public int[] EntryRow = [], EntryCol = [], EntrySlot = [], RowSlotStart = [], RowSlots = [];
        public readonly List<int> StepPivotSlot = [], StepOpStart = [], OpSlot = [], OpTarget = [], OpSource = [], OpPairStart = [],
            PairTarget = [], PairSource = [], PivRow = [], PivCol = [], UStart = [], USlot = [], UCol = [];
        public readonly List<T> OpFactor = [];
        public T[] Values = [], Scale = [];
        public int Slots;
        public double PivotRatio;
        readonly List<T> _values = [];

        public bool Run(int n, IReadOnlyList<(int Row, int Col, T Value)> entries, Func<T, double> norm)
        {
            // rows[r]: column → slot of the entry's value.
            var rows = new Dictionary<int, int>[n];
            for (int i = 0; i < n; i++) rows[i] = [];
            EntryRow = new int[entries.Count]; EntryCol = new int[entries.Count]; EntrySlot = new int[entries.Count];
            for (int i = 0; i < entries.Count; i++)
            {
                var (r, c, v) = entries[i];
                if (!double.IsFinite(norm(v))) return false;
                ref int slot = ref CollectionsMarshal.GetValueRefOrAddDefault(rows[r], c, out bool had);
                if (!had) { slot = _values.Count; _values.Add(T.Zero); }
                _values[slot] += v;
                EntryRow[i] = r; EntryCol[i] = c; EntrySlot[i] = slot;
            }
            var val = CollectionsMarshal.AsSpan(_values);
            Scale = new T[n];
            RowSlotStart = new int[n + 1];
            var rowSlots = new List<int>(_values.Count);
            var colRows = new HashSet<int>[n];
            for (int i = 0; i < n; i++) colRows[i] = [];
            for (int r = 0; r < n; r++)
            {
                RowSlotStart[r] = rowSlots.Count;
                double m = 0;
                foreach (int s in rows[r].Values) m = Math.Max(m, norm(val[s]));
                if (!(m > 0)) return false;
                Scale[r] = T.CreateChecked(1 / m);
                foreach (var (c, s) in rows[r]) { val[s] *= Scale[r]; colRows[c].Add(r); rowSlots.Add(s); }
            }
            RowSlotStart[n] = rowSlots.Count;
            RowSlots = [.. rowSlots];
            var colMax = new double[n];
            for (int r = 0; r < n; r++)
                foreach (var (c, s) in rows[r]) colMax[c] = Math.Max(colMax[c], norm(val[s]));

            double minPivot = double.PositiveInfinity, maxPivot = 0;
            var others = new List<int>();
            var rest = new List<(int Col, int Slot)>();
            foreach (int k in MinimumDegreeOrder(n, rows))
            {
                val = CollectionsMarshal.AsSpan(_values);
                var cands = colRows[k];
                double best = 0;
                foreach (int r in cands) best = Math.Max(best, norm(val[rows[r][k]]));
                if (!(best > Singular * colMax[k])) return false;
                int p = -1, pLen = int.MaxValue;
                foreach (int r in cands)
                    if (norm(val[rows[r][k]]) >= Threshold * best && (rows[r].Count < pLen || (rows[r].Count == pLen && r < p)))
                    { p = r; pLen = rows[r].Count; }
                var prow = rows[p];
                int ps = prow[k];
                T piv = val[ps];
                double pn = norm(piv);
                minPivot = Math.Min(minPivot, pn); maxPivot = Math.Max(maxPivot, pn);
                rest.Clear();
                foreach (var (c, s) in prow)
                {
                    colRows[c].Remove(p);
                    if (c != k) rest.Add((c, s));
                }
                StepPivotSlot.Add(ps); StepOpStart.Add(OpSlot.Count);
                PivRow.Add(p); PivCol.Add(k);
                UStart.Add(USlot.Count);
                foreach (var (c, s) in rest) { USlot.Add(s); UCol.Add(c); }
                others.Clear();
                others.AddRange(cands);
                foreach (int r in others)
                {
                    var row = rows[r];
                    int rs = row[k];
                    T f = _values[rs] / piv;
                    row.Remove(k);
                    cands.Remove(r);
                    OpSlot.Add(rs); OpTarget.Add(r); OpSource.Add(p); OpFactor.Add(f); OpPairStart.Add(PairTarget.Count);
                    foreach (var (c, s) in rest)
                    {
                        ref int slot = ref CollectionsMarshal.GetValueRefOrAddDefault(row, c, out bool had);
                        if (!had) { slot = _values.Count; _values.Add(T.Zero); colRows[c].Add(r); }
                        _values[slot] -= f * _values[s];
                        PairTarget.Add(slot); PairSource.Add(s);
                    }
                }
                rows[p] = [];
            }
            Values = [.. _values];
            Slots = _values.Count;
            PivotRatio = maxPivot > 0 ? minPivot / maxPivot : 0;
            return true;
        }
    }

    /// <summary>
    /// The order to eliminate the unknowns in: repeatedly the one with the fewest neighbours in the symmetric pattern, its
    /// neighbours joined to each other (the fill it would make). A tree is peeled from its leaves, with no fill.
    /// </summary>
    static List<int> MinimumDegreeOrder(int n, Dictionary<int, int>[] rows)
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
