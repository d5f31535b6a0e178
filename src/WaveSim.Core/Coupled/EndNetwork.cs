using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Coupled;

/// <summary>
/// The implicit part of each step at one place where the conductors end or meet: the N node voltages (each with its half
/// cells' capacitance and conductance matrix) and the step-average currents of the branches there, solved together.
/// </summary>
/// <remarks>
/// Kirchhoff's current law at each node is written over one step with the half-step line currents as known injections
/// (the leapfrog form), each branch's R, L and C with the trapezoidal rule, as the single-line junctions are (Paul,
/// Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, FDTD chapter, the terminal conditions; from memory). The
/// matrix depends only on dt, so its inverse is formed once; each step is one small matrix-vector product.
/// </remarks>
internal sealed class EndNetwork
{
    readonly int _n, _size;
    readonly double _dt;
    readonly double[] _keep;          // N × N: Cj/dt − Gj/2
    readonly double[] _inverse;       // size × size
    readonly double[] _rhs, _x;
    public readonly EndBranch[] Branches;
    /// <summary>Each branch's current at the present whole step (trapezoidal state), A.</summary>
    public readonly double[] Current;
    /// <summary>Each branch's capacitor voltage at the present whole step, V.</summary>
    public readonly double[] CapVoltage;
    /// <summary>Each branch's current averaged over the last step (at the half step), A.</summary>
    public readonly double[] Average;
    readonly double[] _zeq;

    public EndNetwork(string where, int n, Matrix<double> cj, Matrix<double> gj, IReadOnlyList<EndBranch> branches, double dt)
    {
        _n = n; _dt = dt;
        Branches = [.. branches];
        int nb = Branches.Length;
        _size = n + nb;
        var a = Matrix<double>.Build.Dense(_size, _size);
        _keep = new double[n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                a[i, j] = cj[i, j] / dt + gj[i, j] / 2;
                _keep[i * n + j] = cj[i, j] / dt - gj[i, j] / 2;
            }
        _zeq = new double[nb];
        for (int b = 0; b < nb; b++)
        {
            var br = Branches[b];
            int row = n + b;
            a[br.At, row] += 1; a[row, br.At] += 0.5;
            if (br.To is { } to) { a[to, row] -= 1; a[row, to] -= 0.5; }
            _zeq[b] = br.R + 2 * br.L / dt + (br.C is { } c ? dt / (2 * c) : 0);
            a[row, row] = -_zeq[b];
        }
        var lu = a.LU();
        double det = Math.Abs(lu.Determinant);
        if (!(det > 0) || !double.IsFinite(det) || a.ConditionNumber() > 1e15)
            throw new InputException($"{where}: the parts leave a node without a defined voltage (the step's equations are singular: zero-impedance branches in parallel or in a loop?)");
        var inv = a.Inverse();
        _inverse = new double[_size * _size];
        for (int i = 0; i < _size; i++) for (int j = 0; j < _size; j++) _inverse[i * _size + j] = inv[i, j];
        _rhs = new double[_size]; _x = new double[_size];
        Current = new double[nb]; CapVoltage = new double[nb]; Average = new double[nb];
    }

    /// <summary>
    /// Advances the nodes from step n to n+1: <paramref name="v"/> holds V^n on entry and V^{n+1} on return;
    /// <paramref name="arriving"/> and <paramref name="leaving"/> are the line currents at n+1/2 into and out of the nodes
    /// (null for none); <paramref name="sourcesNow"/>, <paramref name="sourcesNext"/> each branch's source voltage at n and n+1.
    /// </summary>
    public void Step(Span<double> v, ReadOnlySpan<double> arriving, ReadOnlySpan<double> leaving, double[] sourcesNow, double[] sourcesNext)
    {
        int n = _n;
        for (int i = 0; i < n; i++)
        {
            double r = 0;
            for (int j = 0; j < n; j++) r += _keep[i * n + j] * v[j];
            if (!arriving.IsEmpty) r += arriving[i];
            if (!leaving.IsEmpty) r -= leaving[i];
            _rhs[i] = r;
        }
        for (int b = 0; b < Branches.Length; b++)
        {
            var br = Branches[b];
            double r = -0.5 * v[br.At] - 2 * br.L * Current[b] / _dt + CapVoltage[b] + 0.5 * (sourcesNow[b] + sourcesNext[b]);
            if (br.To is { } to) r += 0.5 * v[to];
            _rhs[n + b] = r;
        }
        for (int i = 0; i < _size; i++)
        {
            double s = 0;
            int row = i * _size;
            for (int j = 0; j < _size; j++) s += _inverse[row + j] * _rhs[j];
            _x[i] = s;
        }
        for (int i = 0; i < n; i++) v[i] = _x[i];
        for (int b = 0; b < Branches.Length; b++)
        {
            double avg = _x[n + b];
            Average[b] = avg;
            Current[b] = 2 * avg - Current[b];
            if (Branches[b].C is { } c) CapVoltage[b] += _dt * avg / c;
        }
    }

    /// <summary>The current the branches deliver into conductor <paramref name="k"/>'s node, from <paramref name="currents"/> (A).</summary>
    public double Into(int k, double[] currents)
    {
        double s = 0;
        for (int b = 0; b < Branches.Length; b++)
        {
            if (Branches[b].At == k) s -= currents[b];
            if (Branches[b].To == k) s += currents[b];
        }
        return s;
    }

    /// <summary>The energy stored in the branches' inductors and capacitors at the present step, J.</summary>
    public double StoredEnergy()
    {
        double e = 0;
        for (int b = 0; b < Branches.Length; b++)
        {
            e += 0.5 * Branches[b].L * Current[b] * Current[b];
            if (Branches[b].C is { } c) e += 0.5 * c * CapVoltage[b] * CapVoltage[b];
        }
        return e;
    }
}
