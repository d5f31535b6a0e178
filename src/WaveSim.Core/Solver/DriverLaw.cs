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

    public double Current(double v, out double slope)
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
