namespace WaveSim.Core.Measurements;

/// <summary>
/// Maps one bounded fit parameter x to an unbounded internal variable u and back (see <see cref="BoundedLeastSquares"/>).
/// </summary>
internal readonly struct ParameterTransform
{
    readonly double _lo, _hi, _scale;
    readonly bool _hasLo, _hasHi;

    public ParameterTransform(double lower, double upper, double start)
    {
        _lo = lower;
        _hi = upper;
        _hasLo = double.IsFinite(lower);
        _hasHi = double.IsFinite(upper);
        double fromBound = _hasLo ? start - lower : _hasHi ? upper - start : Math.Abs(start);
        _scale = Math.Abs(fromBound) > 0 ? Math.Abs(fromBound) : Math.Abs(start) > 0 ? Math.Abs(start) : 1.0;
    }

    /// <summary>True when either bound is finite: u is then a dimensionless angle or ratio of order one.</summary>
    public bool Bounded => _hasLo || _hasHi;

    public double ToExternal(double u)
    {
        if (_hasLo && _hasHi)
            return Math.Clamp(_lo + (_hi - _lo) * (1 + Math.Sin(u)) / 2, _lo, _hi);
        if (_hasLo)
            return _lo + _scale * (Math.Sqrt(u * u + 1) - 1);
        if (_hasHi)
            return _hi - _scale * (Math.Sqrt(u * u + 1) - 1);
        return u;
    }

    public double ToInternal(double x)
    {
        if (_hasLo && _hasHi)
        {
            // Keep the start off the bound: the sine is flat there and the search could not move.
            double margin = 1e-6 * (_hi - _lo);
            x = Math.Clamp(x, _lo + margin, _hi - margin);
            return Math.Asin(Math.Clamp(2 * (x - _lo) / (_hi - _lo) - 1, -1, 1));
        }
        if (_hasLo || _hasHi)
        {
            double d = (_hasLo ? x - _lo : _hi - x) / _scale;
            d = Math.Max(d, 1e-6);
            return Math.Sqrt((d + 1) * (d + 1) - 1);
        }
        return x;
    }
}
