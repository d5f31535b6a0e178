using System.Numerics;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>One probe's transfer over a sweep, per volt of the driver's open-circuit voltage.</summary>
/// <param name="Name">The probe's name.</param>
/// <param name="Volts">V_probe / V_open-circuit at each frequency.</param>
/// <param name="Amps">I_probe / V_open-circuit at each frequency, A/V.</param>
public sealed record ProbeTransfer(string Name, Complex[] Volts, Complex[] Amps)
{
    /// <summary>Voltage gain 20·log10|H|, dB (−∞ where the voltage is zero).</summary>
    public double GainDb(int k) => 20 * Math.Log10(Volts[k].Magnitude);

    /// <summary>Voltage phase, degrees, in (−180, 180].</summary>
    public double PhaseDeg(int k) => Volts[k].Phase * 180 / Math.PI;
}

/// <summary>A frequency sweep of a scenario.</summary>
/// <param name="Title">The scenario's title.</param>
/// <param name="F">Frequencies, Hz, ascending.</param>
/// <param name="Logarithmic">True when the frequencies are spaced evenly in log10(f).</param>
/// <param name="Zin">Impedance seen by the driver into the line (its own resistance excluded), ohm.</param>
/// <param name="Load">Transfer to the main line's far end, H(f) = V_load / V_open-circuit.</param>
/// <param name="Probes">Each probe's transfer, in the scenario's order.</param>
public sealed record FrequencyResponse(string Title, double[] F, bool Logarithmic, Complex[] Zin, Complex[] Load, IReadOnlyList<ProbeTransfer> Probes)
{
    /// <summary>Insertion gain to the far end, 20·log10|H(f)|, dB (the insertion loss is its negative).</summary>
    public double LoadGainDb(int k) => 20 * Math.Log10(Load[k].Magnitude);
}
