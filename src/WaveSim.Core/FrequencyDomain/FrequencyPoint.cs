using System.Numerics;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>The small-signal solution at one frequency, per volt of the driver's open-circuit voltage.</summary>
/// <param name="Frequency">Frequency, Hz.</param>
/// <param name="Zin">Impedance seen by the driver looking into the line (its own resistance excluded), ohm; not finite at 0 Hz when the line has no DC path.</param>
/// <param name="Load">Transfer to the main line's far end, V_load / V_open-circuit (dimensionless).</param>
/// <param name="Volts">Transfer to each probe's voltage, V/V, in the scenario's probe order.</param>
/// <param name="Amps">Transfer to each probe's current, A/V, positive away from the driver.</param>
public sealed record FrequencyPoint(double Frequency, Complex Zin, Complex Load, Complex[] Volts, Complex[] Amps);

/// <summary>The DC operating point: the driver at its initial level, load resistors at their 'to' voltages, capacitors open, inductors shorted.</summary>
/// <param name="Volts">Each probe's voltage, V, in the scenario's probe order.</param>
/// <param name="Amps">Each probe's current, A.</param>
public sealed record DcLevels(double[] Volts, double[] Amps);
