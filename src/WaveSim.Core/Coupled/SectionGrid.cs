using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Coupled;

/// <summary>
/// One section's cells and the leapfrog in matrix form: node voltages V[k] (k = 0..n, N each) at whole steps, half-cell
/// currents I[k] (k = 0..n−1) at half steps.
/// </summary>
/// <remarks>
/// (L/dt + R/2)·I^{n+½} = (L/dt − R/2)·I^{n−½} − (V_{k+1} − V_k)/dz and (C/dt + G/2)·V^{n+1} = (C/dt − G/2)·V^n −
/// (I_k − I_{k−1})/dz: the single-line update with matrices, the loss terms averaged over the step (Paul, Analysis of
/// Multiconductor Transmission Lines, 2nd ed. 2008, FDTD chapter; from memory). The end nodes belong to the end networks.
/// </remarks>
internal sealed class SectionGrid
{
    public readonly int N, Cells;
    public readonly double Dz;
    public readonly double[] V, I;
    readonly double[] _ai, _bi, _av, _bv;   // N × N each, row-major
    readonly double[] _dv, _di;
    public readonly CoupledSection Section;

    public SectionGrid(CoupledSection s, int cells, double dt)
    {
        Section = s; N = s.L.Size; Cells = cells; Dz = s.Length / cells;
        V = new double[(cells + 1) * N]; I = new double[cells * N];
        var l = s.L.ToMatrix(); var c = s.C.ToMatrix(); var r = s.R.ToMatrix(); var g = s.G.ToMatrix();
        var li = (l / dt + r / 2).Inverse();
        var cv = (c / dt + g / 2).Inverse();
        _ai = Flat(li * (l / dt - r / 2)); _bi = Flat(li / Dz);
        _av = Flat(cv * (c / dt - g / 2)); _bv = Flat(cv / Dz);
        _dv = new double[N]; _di = new double[N];
    }

    static double[] Flat(Matrix<double> m)
    {
        var a = new double[m.RowCount * m.ColumnCount];
        for (int i = 0; i < m.RowCount; i++) for (int j = 0; j < m.ColumnCount; j++) a[i * m.ColumnCount + j] = m[i, j];
        return a;
    }

    /// <summary>Currents from n−½ to n+½ from the voltages at n; returns Σ I^{n−½}·(L·dz)·I^{n+½} when <paramref name="product"/>.</summary>
    public double UpdateCurrents(bool product)
    {
        if (N == 2 && !product) { UpdateCurrentsPair(); return 0; }
        int n = N;
        double sum = 0;
        Span<double> old = stackalloc double[n];
        for (int k = 0; k < Cells; k++)
        {
            int vi = k * n, ii = k * n;
            for (int a = 0; a < n; a++) { _dv[a] = V[vi + n + a] - V[vi + a]; old[a] = I[ii + a]; }
            for (int a = 0; a < n; a++)
            {
                double x = 0;
                int row = a * n;
                for (int b = 0; b < n; b++) x += _ai[row + b] * old[b] - _bi[row + b] * _dv[b];
                I[ii + a] = x;
            }
            if (product)
                for (int a = 0; a < n; a++)
                    for (int b = 0; b < n; b++) sum += old[a] * Section.L[a, b] * Dz * I[ii + b];
        }
        return sum;
    }

    /// <summary>Interior node voltages from n to n+1 from the currents at n+½.</summary>
    public void UpdateVoltages()
    {
        if (N == 2) { UpdateVoltagesPair(); return; }
        int n = N;
        Span<double> old = stackalloc double[n];
        for (int k = 1; k < Cells; k++)
        {
            int vi = k * n;
            for (int a = 0; a < n; a++) { _di[a] = I[vi + a] - I[vi - n + a]; old[a] = V[vi + a]; }
            for (int a = 0; a < n; a++)
            {
                double x = 0;
                int row = a * n;
                for (int b = 0; b < n; b++) x += _av[row + b] * old[b] - _bv[row + b] * _di[b];
                V[vi + a] = x;
            }
        }
    }

    /// <summary>The current update unrolled for a pair (the common case), the same arithmetic as the general loop.</summary>
    void UpdateCurrentsPair()
    {
        double a00 = _ai[0], a01 = _ai[1], a10 = _ai[2], a11 = _ai[3], b00 = _bi[0], b01 = _bi[1], b10 = _bi[2], b11 = _bi[3];
        var v = V; var i = I;
        for (int k = 0; k < Cells; k++)
        {
            int x = 2 * k;
            double d0 = v[x + 2] - v[x], d1 = v[x + 3] - v[x + 1], o0 = i[x], o1 = i[x + 1];
            i[x] = a00 * o0 - b00 * d0 + (a01 * o1 - b01 * d1);
            i[x + 1] = a10 * o0 - b10 * d0 + (a11 * o1 - b11 * d1);
        }
    }

    /// <summary>The voltage update unrolled for a pair.</summary>
    void UpdateVoltagesPair()
    {
        double a00 = _av[0], a01 = _av[1], a10 = _av[2], a11 = _av[3], b00 = _bv[0], b01 = _bv[1], b10 = _bv[2], b11 = _bv[3];
        var v = V; var i = I;
        for (int k = 1; k < Cells; k++)
        {
            int x = 2 * k;
            double d0 = i[x] - i[x - 2], d1 = i[x + 1] - i[x - 1], o0 = v[x], o1 = v[x + 1];
            v[x] = a00 * o0 - b00 * d0 + (a01 * o1 - b01 * d1);
            v[x + 1] = a10 * o0 - b10 * d0 + (a11 * o1 - b11 * d1);
        }
    }

    /// <summary>½ Σ Vᵀ·(C·dz)·V over the interior nodes, J.</summary>
    public double ElectricEnergy()
    {
        double e = 0;
        for (int k = 1; k < Cells; k++)
            for (int a = 0; a < N; a++)
                for (int b = 0; b < N; b++) e += 0.5 * V[k * N + a] * Section.C[a, b] * Dz * V[k * N + b];
        return e;
    }

    /// <summary>The node at index <paramref name="k"/> (0..Cells) of every conductor.</summary>
    public Span<double> Node(int k) => V.AsSpan(k * N, N);

    /// <summary>The half cell <paramref name="k"/> (0..Cells−1) of every conductor.</summary>
    public ReadOnlySpan<double> Cell(int k) => I.AsSpan(k * N, N);
}
