namespace WaveSim.Core.Measurements;

/// <summary>
/// Direct ("naive") conversion of a step reflectometer trace into impedance, sample by sample.
/// </summary>
/// <remarks>
/// Convention: the instrument launches a step through a source matched to the reference impedance Z0. The incident
/// step amplitude at the instrument port is v_inc (half the open-circuit source step). The port voltage is
/// v(t) = v_inc + v_r(t), so the reflection is ρ(t) = (v(t) - v_inc) / v_inc, and the impedance at the matching
/// round-trip time is Z = Z0 (1 + ρ) / (1 - ρ) (from Γ = (Z - Z0)/(Z + Z0), Pozar eq. 2.35; tests/WaveSim.Tests/ReferenceData/published-checks.md §11, "TDR relations").
/// This ignores the transmission loss through earlier steps and the multiple reflections between them, so it is
/// exact only up to the first discontinuity; <see cref="LayerPeeling"/> corrects for both.
/// </remarks>
public static class StepReflectometry
{
    /// <summary>Reflection ρ = (v - v_inc) / v_inc for every sample.</summary>
    /// <param name="volts">Port voltage samples, V.</param>
    /// <param name="incidentVolts">Incident step amplitude at the port, V. Must be non-zero.</param>
    /// <returns>ρ per sample (dimensionless).</returns>
    public static double[] Reflection(double[] volts, double incidentVolts)
    {
        ArgumentNullException.ThrowIfNull(volts);
        if (incidentVolts == 0 || !double.IsFinite(incidentVolts))
            throw new InputException($"the incident step amplitude must be a non-zero voltage, got {incidentVolts} V");
        return volts.Select(v => (v - incidentVolts) / incidentVolts).ToArray();
    }

    /// <summary>Impedance Z = Z0 (1 + ρ) / (1 - ρ) of one reflection value.</summary>
    /// <param name="rho">Reflection, dimensionless. ρ ≥ 1 (an open) gives +∞; ρ ≤ -1 (a short) gives 0.</param>
    /// <param name="referenceOhms">Reference impedance Z0, Ω. Must be positive.</param>
    /// <returns>The impedance, Ω.</returns>
    public static double ImpedanceOf(double rho, double referenceOhms)
    {
        if (!(referenceOhms > 0) || double.IsInfinity(referenceOhms))
            throw new InputException($"the reference impedance must be positive, got {referenceOhms} ohm");
        if (rho >= 1)
            return double.PositiveInfinity;
        if (rho <= -1)
            return 0;
        return referenceOhms * (1 + rho) / (1 - rho);
    }

    /// <summary>Impedance per sample from port voltages (see the class remarks for the convention).</summary>
    /// <param name="volts">Port voltage samples, V.</param>
    /// <param name="incidentVolts">Incident step amplitude at the port, V. Must be non-zero.</param>
    /// <param name="referenceOhms">Reference impedance Z0, Ω. Must be positive.</param>
    /// <returns>Z per sample, Ω.</returns>
    public static double[] Impedance(double[] volts, double incidentVolts, double referenceOhms) =>
        Reflection(volts, incidentVolts).Select(r => ImpedanceOf(r, referenceOhms)).ToArray();
}
