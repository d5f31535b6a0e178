using WaveSim.Core.Buffers;

namespace WaveSim.Core.Solver;

/// <summary>
/// A part's I-V law as the time loop evaluates it: the same piecewise-linear values as <see cref="IvCurve.Current"/> and
/// <see cref="IvCurve.Slope"/>, found from the segment used last (a step moves the voltage little, so the search is
/// usually a compare or two instead of a binary search).
/// </summary>
internal sealed class PartLaw : IPartLaw
{
    readonly double[] _v, _i, _s;
    int _hint;

    public PartLaw(IvCurve curve) : this([.. curve.Voltages], [.. curve.Currents]) { }

    /// <summary>A law through the points (<paramref name="v"/>[k], <paramref name="i"/>[k]), v increasing, extrapolated with the end slopes.</summary>
    public PartLaw(double[] v, double[] i)
    {
        _v = v;
        _i = i;
        _s = new double[_v.Length - 1];
        for (int k = 0; k < _s.Length; k++) _s[k] = (_i[k + 1] - _i[k]) / (_v[k + 1] - _v[k]);
    }

    /// <summary>The segment k with V[k] ≤ v &lt; V[k+1] (the end segments beyond the ends), as IvCurve chooses it.</summary>
    int Segment(double v)
    {
        int k = _hint, last = _s.Length - 1;
        while (k > 0 && v < _v[k]) k--;
        while (k < last && v >= _v[k + 1]) k++;
        _hint = k;
        return k;
    }

    /// <summary>The current at <paramref name="v"/> (A), and the slope there (S) in <paramref name="slope"/>.</summary>
    public double Current(double v, out double slope)
    {
        int k = Segment(v);
        double s = slope = _s[k];
        return v - _v[k] <= _v[k + 1] - v ? _i[k] + s * (v - _v[k]) : _i[k + 1] + s * (v - _v[k + 1]);
    }

    public double Piece(double v, out double slope, out double lo, out double hi)
    {
        int k = Segment(v);
        lo = k == 0 ? double.NegativeInfinity : _v[k];
        hi = k == _s.Length - 1 ? double.PositiveInfinity : _v[k + 1];
        double s = slope = _s[k];
        return v - _v[k] <= _v[k + 1] - v ? _i[k] + s * (v - _v[k]) : _i[k + 1] + s * (v - _v[k + 1]);
    }

    /// <summary>The table's voltages (V), increasing.</summary>
    public ReadOnlySpan<double> Voltages => _v;
}
