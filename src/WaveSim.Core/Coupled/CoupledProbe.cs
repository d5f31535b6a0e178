namespace WaveSim.Core.Coupled;

/// <summary>Where on the conductors a coupled probe sits.</summary>
public enum CoupledAnchor
{
    /// <summary>z = 0.</summary>
    Near,
    /// <summary>The far end.</summary>
    Far,
    /// <summary>A distance from the near end.</summary>
    Distance,
}

/// <summary>
/// A probe on a conductor (or between two): the voltage to the reference (or V_a − V_b) and the current toward the far
/// end (or (I_a − I_b)/2).
/// </summary>
/// <param name="Name">An identifier.</param>
/// <param name="Conductor">The conductor read (a in a between probe).</param>
/// <param name="Minus">The second conductor of a between probe (b), or null.</param>
/// <param name="Anchor">Near end, far end or a distance.</param>
/// <param name="Distance">Distance from the near end, m (for <see cref="CoupledAnchor.Distance"/>).</param>
public sealed record CoupledProbe(string Name, int Conductor, int? Minus, CoupledAnchor Anchor, double Distance = 0);
