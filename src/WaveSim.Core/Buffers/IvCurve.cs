using WaveSim.Core.Units;

namespace WaveSim.Core.Buffers;

/// <summary>
/// A piecewise-linear current-voltage law: [V, I] points with V strictly increasing, I the current from the node into the
/// part (A), linear between points and extrapolated beyond the ends with the end segments' slopes.
/// </summary>
/// <remarks>
/// This is the form every nonlinear end takes in the solver: a buffer model's tables (turned into pin voltage by
/// <see cref="BufferCurves"/>) and, later, a scenario's own <c>iv:</c> table. Evaluation is a binary search, so a table of
/// n points costs O(log n) per call.
/// </remarks>
public sealed class IvCurve
{
    readonly double[] _v;
    readonly double[] _i;

    IvCurve(double[] v, double[] i)
    {
        _v = v;
        _i = i;
    }

    /// <summary>The points' voltages (V), strictly increasing.</summary>
    public IReadOnlyList<double> Voltages => _v;

    /// <summary>The points' currents (A), into the part.</summary>
    public IReadOnlyList<double> Currents => _i;

    /// <summary>Checks and builds a table.</summary>
    /// <param name="points">The [V, I] points in order.</param>
    /// <param name="context">What the points are, for errors, e.g. "net.yaml:12:5: iv".</param>
    /// <returns>The table.</returns>
    /// <exception cref="InputException">Fewer than two points, a value that is not finite, or a voltage that does not exceed
    /// the one before it; the message names the point (1-based) and its values.</exception>
    public static IvCurve Create(IReadOnlyList<(double Voltage, double Current)> points, string context)
    {
        ArgumentNullException.ThrowIfNull(points);
        if (points.Count < 2)
            throw new InputException($"{context}: needs at least two [V, I] points, got {points.Count}");
        var v = new double[points.Count];
        var i = new double[points.Count];
        for (int k = 0; k < points.Count; k++)
        {
            (v[k], i[k]) = points[k];
            if (!double.IsFinite(v[k]) || !double.IsFinite(i[k]))
                throw new InputException($"{context}: point {k + 1} [{v[k]}, {i[k]}] is not a pair of finite numbers");
            if (k > 0 && !(v[k] > v[k - 1]))
                throw new InputException($"{context}: point {k + 1} [{Quantity.Format(v[k], "V")}, {Quantity.Format(i[k], "A")}] " +
                                         $"does not exceed point {k}'s voltage {Quantity.Format(v[k - 1], "V")}; voltages must increase strictly");
        }
        return new IvCurve(v, i);
    }

    /// <summary>The segment holding <paramref name="voltage"/>: k with V[k] ≤ v &lt; V[k+1], the first below V[0], the last from V[n-1].</summary>
    int Segment(double voltage)
    {
        int k = Array.BinarySearch(_v, voltage);
        if (k < 0) k = ~k - 1; // the index of the last voltage below
        return Math.Clamp(k, 0, _v.Length - 2);
    }

    /// <summary>The current into the part at <paramref name="voltage"/> (A).</summary>
    public double Current(double voltage)
    {
        int k = Segment(voltage);
        double s = (_i[k + 1] - _i[k]) / (_v[k + 1] - _v[k]);
        // Measured from the nearer end, so the end points are returned exactly and extrapolation starts from them.
        return voltage - _v[k] <= _v[k + 1] - voltage ? _i[k] + s * (voltage - _v[k]) : _i[k + 1] + s * (voltage - _v[k + 1]);
    }

    /// <summary>dI/dV at <paramref name="voltage"/> (S): the slope of the segment holding it (at an interior point, the segment
    /// to its right), the end segment's beyond the ends.</summary>
    public double Slope(double voltage)
    {
        int k = Segment(voltage);
        return (_i[k + 1] - _i[k]) / (_v[k + 1] - _v[k]);
    }

    /// <summary>The mean of the slopes just left and just right of <paramref name="voltage"/> (S); the slope itself between
    /// points. Used for the small-signal resistance at a level that falls on a point of the table.</summary>
    public double SlopeAround(double voltage)
    {
        int k = Array.BinarySearch(_v, voltage);
        if (k <= 0 || k >= _v.Length - 1) return Slope(voltage);
        return 0.5 * (Slope(_v[k - 1]) + Slope(voltage));
    }

    /// <summary>
    /// True when the part can never deliver energy: I(V)·V ≥ 0 for every V, extrapolation included. That holds exactly when
    /// (1) every point has I·V ≥ 0, (2) the law passes through the origin, I(0) = 0 (to 1e-12 of the largest current, for
    /// rounding), and (3) both end segments have a slope ≥ 0, so the extrapolated lines stay in the first and third quadrants.
    /// </summary>
    /// <remarks>
    /// Why these suffice: between two points on the same side of 0 the current is a convex combination of currents of that
    /// side's sign; a segment that crosses 0 passes through the origin by (2), so each half keeps its end's sign; beyond the
    /// last point the line leaves a point of the right sign (or the origin) with a non-negative slope. Each is also needed:
    /// a point with I·V &lt; 0 is itself a violation, I(0) ≠ 0 gives one on one side of 0 arbitrarily close to it, and a
    /// negative end slope crosses the axis far enough out. Derived here from the definition P = V·I ≥ 0.
    /// </remarks>
    public bool IsPassive
    {
        get
        {
            for (int k = 0; k < _v.Length; k++)
                if (_v[k] * _i[k] < 0) return false;
            double scale = _i.Max(Math.Abs);
            if (Math.Abs(Current(0)) > 1e-12 * scale) return false;
            return Slope(_v[0] - 1) >= 0 && Slope(_v[^1] + 1) >= 0;
        }
    }
}
