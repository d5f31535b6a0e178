namespace WaveSim.Core.Measurements;

/// <summary>
/// A step reflectometer's record at its port, with the incident step it was taken with: the port voltage is
/// baseline + incident(t) + reflected(t).
/// </summary>
/// <param name="Time">Sample times, s, strictly increasing.</param>
/// <param name="Volts">Port voltage, V.</param>
/// <param name="ReferenceTimeS">Instant the incident edge passes 50 % at the port: round-trip time zero, s.</param>
/// <param name="IncidentV">Amplitude of the incident step at the port, V (positive).</param>
/// <param name="BaselineV">Port voltage before the edge, V.</param>
/// <param name="RampS">Duration of the incident edge taken as a linear 0-100 % ramp centred on <paramref name="ReferenceTimeS"/>, s (1.25 × its 10-90 % rise).</param>
/// <param name="ReferenceOhm">The instrument's impedance, which the analysis takes as the reference Z0, Ω.</param>
public sealed record ReflectometerTrace(double[] Time, double[] Volts, double ReferenceTimeS, double IncidentV,
    double BaselineV, double RampS, double ReferenceOhm)
{
    /// <summary>The incident edge's 10-90 % rise time, s.</summary>
    public double RiseS => RampS / 1.25;

    /// <summary>The incident wave alone at time <paramref name="t"/>, V above the baseline.</summary>
    /// <param name="t">Time, s.</param>
    /// <returns>0 before the ramp, <see cref="IncidentV"/> after it, linear between.</returns>
    public double Incident(double t)
    {
        double x = (t - (ReferenceTimeS - RampS / 2)) / RampS;
        return IncidentV * Math.Clamp(RampS > 0 ? x : (x >= 0 ? 1 : 0), 0, 1);
    }
}
