namespace WaveSim.Core.Measurements;

/// <summary>The analysis of a reflectometer trace: per-layer reflection and impedance, segments and lumped elements.</summary>
/// <param name="ReferenceOhm">Reference impedance Z0ref, Ω.</param>
/// <param name="VelocityMps">Velocity used for distances, m/s.</param>
/// <param name="LayerStepS">Round-trip time of one layer, s.</param>
/// <param name="IncidentV">Incident step at the port, V.</param>
/// <param name="RiseS">10-90 % rise time of the incident edge, s.</param>
/// <param name="TimeS">Round-trip time of each layer's top from the reference plane, s.</param>
/// <param name="DistanceM">The same as a distance, v·t/2, m.</param>
/// <param name="PortVolts">Port voltage averaged over each layer step, V.</param>
/// <param name="Rho">Reflection ρ = (v - baseline - v_inc) / V_inc averaged over each layer step.</param>
/// <param name="NaiveOhms">Z0ref (1 + ρ) / (1 - ρ) per layer, Ω (no correction for earlier steps).</param>
/// <param name="LayerOhms">Impedance per layer by layer peeling, Ω; NaN past where the profile stops.</param>
/// <param name="Segments">Stretches of one impedance, in order.</param>
/// <param name="Lumped">Shunt capacitances and series inductances, in order.</param>
/// <param name="End">How the profile ends.</param>
/// <param name="EndM">Where it ends, m.</param>
/// <param name="Warnings">One-line notes for the user.</param>
/// <param name="EndValue">For a <see cref="TdrEnd.Capacitive"/> end its capacitance, F; for an <see cref="TdrEnd.Inductive"/>
/// one its inductance, H; otherwise null.</param>
public sealed record TdrResult(
    double ReferenceOhm,
    double VelocityMps,
    double LayerStepS,
    double IncidentV,
    double RiseS,
    double[] TimeS,
    double[] DistanceM,
    double[] PortVolts,
    double[] Rho,
    double[] NaiveOhms,
    double[] LayerOhms,
    IReadOnlyList<ImpedanceSegment> Segments,
    IReadOnlyList<TdrLumped> Lumped,
    TdrEnd End,
    double EndM,
    IReadOnlyList<string> Warnings,
    double? EndValue = null);
