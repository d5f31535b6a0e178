using WaveSim.Core.Buffers;

namespace WaveSim.Core.Solver;

/// <summary>
/// A buffer driver's law at its die pad: Ku·I_pullup(V) + Kd·I_pulldown(V) + I_clamps(V), each current into the pin, with
/// Ku and Kd set for the instant being solved (<see cref="DriverSchedule"/>). C_comp is a lumped C beside it.
/// </summary>
/// <remarks>
/// A conductance <see cref="Shunt"/> of the law is moved into the linear network (the pad junction's G) and taken off here,
/// which changes nothing in the sum but gives the linear network a DC path at the pad: without it a net whose only path to
/// ground is the driver would reach the part equations through a near-singular matrix (only Gmin holding the node).
/// While Ku and Kd hold still (between edges, most of a run) the four tables are summed once into one table
/// (<see cref="Settled"/>), so an evaluation is one segment lookup instead of four; the sum is the same straight line on each
/// piece, so the values agree to rounding.
/// </remarks>
internal sealed class DriverLaw : IPartLaw
{
    readonly PartLaw? _up, _down, _gnd, _power;

    public DriverLaw(BufferCurves curves)
    {
        double sum = (curves.OutputResistanceLow is { } rl ? 1 / rl : 0) + (curves.OutputResistanceHigh is { } rh ? 1 / rh : 0);
        Shunt = sum > 0 ? sum / 2 : 0.01;
        _up = curves.Pullup is { } u ? new PartLaw(u) : null;
        _down = curves.Pulldown is { } d ? new PartLaw(d) : null;
        _gnd = curves.GndClamp is { } g ? new PartLaw(g) : null;
        _power = curves.PowerClamp is { } p ? new PartLaw(p) : null;
    }

    /// <summary>The conductance (S) the network carries at the pad in this law's place, taken off the law.</summary>
    public double Shunt { get; }

    /// <summary>The pullup's and pulldown's switching coefficients at the instant being solved.</summary>
    public double Ku, Kd;

    /// <summary>Evaluations with the same Ku and Kd before their summed table is built (an edge changes them every step).</summary>
    const int SettleAfter = 64;

    // Up to two summed tables (the high and the low state), each with the Ku, Kd it was built for; the Ku, Kd seen lately and how often.
    readonly (double Ku, double Kd, PartLaw Law)?[] _settled = new (double, double, PartLaw)?[2];
    int _nextSlot, _seen;
    double _seenKu = double.NaN, _seenKd = double.NaN;

    /// <summary>The summed table for the present Ku and Kd, or null while they are still changing.</summary>
    PartLaw? Settled()
    {
        foreach (var slot in _settled)
            if (slot is { } s && s.Ku == Ku && s.Kd == Kd) return s.Law;
        if (Ku != _seenKu || Kd != _seenKd) { (_seenKu, _seenKd, _seen) = (Ku, Kd, 0); return null; }
        if (++_seen < SettleAfter) return null;
        var law = Sum();
        _settled[_nextSlot] = (Ku, Kd, law);
        _nextSlot = (_nextSlot + 1) % _settled.Length;
        return law;
    }

    /// <summary>The law for the present Ku and Kd as one table on the union of the four tables' voltages.</summary>
    PartLaw Sum()
    {
        var at = new SortedSet<double>();
        foreach (var t in new[] { _up, _down, _gnd, _power })
            if (t is not null) foreach (double x in t.Voltages) at.Add(x);
        if (at.Count < 2) { at.Add(-1); at.Add(1); }
        var v = at.ToArray();
        var i = new double[v.Length];
        for (int k = 0; k < v.Length; k++) i[k] = Direct(v[k], out _);
        return new PartLaw(v, i);
    }

    public double Current(double v, out double slope) =>
        Settled() is { } law ? law.Current(v, out slope) : Direct(v, out slope);

    public double Piece(double v, out double slope, out double lo, out double hi)
    {
        if (Settled() is { } law) return law.Piece(v, out slope, out lo, out hi);
        double i = 0, sum = 0, from = double.NegativeInfinity, to = double.PositiveInfinity;
        void Add(PartLaw? t, double k)
        {
            if (t is null) return;
            i += k * t.Piece(v, out double ds, out double l, out double h);
            sum += k * ds;
            from = Math.Max(from, l); to = Math.Min(to, h);
        }
        Add(_up, Ku); Add(_down, Kd); Add(_gnd, 1); Add(_power, 1);
        (lo, hi) = (from, to);
        slope = sum - Shunt;
        return i - Shunt * v;
    }

    double Direct(double v, out double slope)
    {
        double i = 0, s = 0, ds;
        if (_up is not null) { i += Ku * _up.Current(v, out ds); s += Ku * ds; }
        if (_down is not null) { i += Kd * _down.Current(v, out ds); s += Kd * ds; }
        if (_gnd is not null) { i += _gnd.Current(v, out ds); s += ds; }
        if (_power is not null) { i += _power.Current(v, out ds); s += ds; }
        slope = s - Shunt;
        return i - Shunt * v;
    }
}
