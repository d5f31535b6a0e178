namespace WaveSim.Core.Solver;

/// <summary>
/// The implicit part of each step: the junction voltages and the lumped branches' step-average currents, solved together.
/// </summary>
/// <remarks>
/// Kirchhoff's current law at each junction is written over one step with the half-step line currents as known injections
/// (the leapfrog form), and each lumped R-L-C branch with the trapezoidal rule (A-stable, so a 1 fF or 1 µF part, a 0 ohm or
/// 1 Mohm resistor all stay stable; Dahlquist 1963). The matrix depends only on dt, so it is factored once (<see cref="SparseLu{T}"/>).
/// At the driver with a resistance Rs this reduces to the end-node update of Paul, Analysis of Multiconductor
/// Transmission Lines, 2nd ed. 2008, FDTD chapter.
/// </remarks>
internal sealed class JunctionSystem
{
    readonly Network _net;
    readonly double _dt;
    readonly int _nj, _n;
    readonly double[] _rhs, _x, _keep, _zeq;
    readonly SparseLu<double> _lu;
    // The nonlinear parts (none in a linear network): each part's response column w_q = A⁻¹·e_q, the k × k matrix M of part
    // voltages per unit part current, and the parts' voltages and start-of-step currents.
    readonly int _k;
    readonly double[][] _w = [];
    // The nonzero entries of each response column (a part at one end of a line moves only that end's unknowns).
    readonly int[][] _wAt = [];
    readonly double[][] _wVal = [];
    readonly PartEquations? _parts;
    readonly double[] _v0 = [], _vPart = [], _iNow = [];

    public JunctionSystem(Network net, double dt)
    {
        _net = net; _dt = dt;
        _nj = net.Junctions.Count;
        _n = _nj + net.Branches.Count;
        var a = new List<(int, int, double)>(_nj + 5 * net.Branches.Count);
        _keep = new double[_nj];
        _zeq = new double[net.Branches.Count];
        for (int j = 0; j < _nj; j++)
        {
            var jn = net.Junctions[j];
            a.Add((j, j, jn.C / dt + jn.G / 2));
            _keep[j] = jn.C / dt - jn.G / 2;
        }
        for (int b = 0; b < net.Branches.Count; b++)
        {
            var br = net.Branches[b];
            int row = _nj + b;
            if (br.A >= 0) { a.Add((br.A, row, 1)); a.Add((row, br.A, 0.5)); }
            if (br.B >= 0) { a.Add((br.B, row, -1)); a.Add((row, br.B, -0.5)); }
            _zeq[b] = br.R + 2 * br.L / dt + (br.C is { } c ? dt / (2 * c) : 0);
            a.Add((row, row, -_zeq[b]));
        }
        // The matrix depends only on dt: factored once, each step is one sparse solve, linear in the junctions and branches.
        var lu = SparseLu<double>.Factor(_n, a, Math.Abs);
        if (lu is null || lu.PivotRatio < 1e-15)
            throw new InputException("the network's lumped parts leave a node without a defined voltage (the step's equations are singular)");
        _lu = lu;
        _rhs = new double[_n];
        _x = new double[_n];
        _k = net.Nonlinear.Count;
        if (_k > 0)
        {
            // The linear network seen from the parts, once per run: k solves with a unit current through each part.
            _w = new double[_k][];
            var m = new double[_k, _k];
            for (int q = 0; q < _k; q++)
            {
                Array.Clear(_rhs);
                Inject(_rhs, net.Nonlinear[q], 1);
                _w[q] = new double[_n];
                _lu.Solve(_rhs, _w[q]);
                for (int p = 0; p < _k; p++) m[p, q] = Across(_w[q], net.Nonlinear[p]);
            }
            // The step carries the trapezoidal mean of the part's current: ½ of it is the unknown end-of-step current.
            _parts = new PartEquations(net.Nonlinear, m, 0.5);
            _wAt = new int[_k][]; _wVal = new double[_k][];
            for (int q = 0; q < _k; q++)
            {
                var w = _w[q];
                _wAt[q] = Enumerable.Range(0, _n).Where(r => w[r] != 0).ToArray();
                _wVal[q] = _wAt[q].Select(r => w[r]).ToArray();
            }
            _v0 = new double[_k]; _vPart = new double[_k]; _iNow = new double[_k];
        }
    }

    /// <summary>Adds a current <paramref name="i"/> through part <paramref name="p"/> (out of its A node, into its B node) to a right-hand side.</summary>
    static void Inject(double[] rhs, NonlinearPart p, double i)
    {
        if (p.A >= 0) rhs[p.A] -= i;
        if (p.B >= 0) rhs[p.B] += i;
    }

    /// <summary>The voltage across part <paramref name="p"/> in the junction voltages <paramref name="x"/> (without its offset).</summary>
    static double Across(double[] x, NonlinearPart p) => (p.A >= 0 ? x[p.A] : 0) - (p.B >= 0 ? x[p.B] : 0);

    /// <summary>Sets the parts' voltages (the Newton guess for the first step) from the junction voltages of the DC start.</summary>
    public void StartParts()
    {
        for (int p = 0; p < _k; p++)
        {
            var part = _net.Nonlinear[p];
            _vPart[p] = Across(_junctionV!, part) - part.Offset;
            _iNow[p] = part.Law.Current(_vPart[p], out _);
        }
    }

    /// <summary>Entries of the factors, the work of one step's solve (for the plan's estimate).</summary>
    public long FactorEntries => _lu.FactorEntries;

    /// <summary>Junction voltages at the new step, after <see cref="Solve"/>.</summary>
    public ReadOnlySpan<double> Voltages => _x.AsSpan(0, _nj);

    /// <summary>Advances junctions and branches from step n to n+1, given the segments' currents at n+1/2 and voltages at n.</summary>
    /// <param name="vsNow">Driver voltage at step n.</param>
    /// <param name="vsNext">Driver voltage at step n+1.</param>
    public void Solve(double vsNow, double vsNext)
    {
        var net = _net;
        var rhs = _rhs;
        for (int j = 0; j < _nj; j++) rhs[j] = 0;
        foreach (var seg in net.Segments)
        {
            rhs[seg.Start] -= seg.I[0];
            rhs[seg.End] += seg.I[seg.Cells - 1];
        }
        for (int j = 0; j < _nj; j++) rhs[j] += _keep[j] * JunctionVoltage(j);
        for (int b = 0; b < net.Branches.Count; b++)
        {
            var br = net.Branches[b];
            double r = -2 * br.L * br.Current / _dt + br.CapVoltage;
            if (br.A >= 0) r -= 0.5 * JunctionVoltage(br.A);
            if (br.B >= 0) r += 0.5 * JunctionVoltage(br.B);
            if (br.DrivenA) r -= 0.5 * (vsNow + vsNext);
            if (br.B < 0) r += br.FixedB;
            rhs[_nj + b] = r;
        }
        if (_k > 0) SolveParts(rhs);
        else _lu.Solve(rhs, _x);
        for (int b = 0; b < net.Branches.Count; b++)
        {
            var br = net.Branches[b];
            double avg = _x[_nj + b];
            br.Average = avg;
            br.Current = 2 * avg - br.Current;
            if (br.C is { } c) br.CapVoltage += _dt * avg / c;
        }
    }

    /// <summary>
    /// The step with nonlinear parts: their start-of-step currents (half of the trapezoidal mean; the last step's end currents,
    /// or the DC start's) are known injections; the
    /// linear solve gives the part voltages without the unknown half; the k part equations find it; the response columns add it.
    /// </summary>
    void SolveParts(double[] rhs)
    {
        var parts = _net.Nonlinear;
        for (int p = 0; p < _k; p++) Inject(rhs, parts[p], 0.5 * _iNow[p]);
        _lu.Solve(rhs, _x);
        for (int p = 0; p < _k; p++) _v0[p] = Across(_x, parts[p]) - parts[p].Offset;
        if (!_parts!.Solve(_v0, _vPart))
            throw new NumericalException($"the nonlinear parts' equations have no solution the step can find (at '{parts[0].Label}'{(_k > 1 ? $" and {_k - 1} more" : "")})");
        var found = _parts.Currents;
        for (int q = 0; q < _k; q++)
        {
            double iNext = found[q];
            parts[q].Average = 0.5 * (_iNow[q] + iNext);
            _iNow[q] = iNext;
            double s = 0.5 * iNext;
            int[] at = _wAt[q];
            double[] w = _wVal[q];
            for (int e = 0; e < at.Length; e++) _x[at[e]] += s * w[e];
        }
    }

    /// <summary>The latest voltage of junction <paramref name="j"/>, read from a segment end that mirrors it.</summary>
    double JunctionVoltage(int j) => _junctionV![j];

    double[]? _junctionV;

    /// <summary>Binds the array that holds the junction voltages at the current step.</summary>
    public void Bind(double[] junctionVoltages) => _junctionV = junctionVoltages;
}
