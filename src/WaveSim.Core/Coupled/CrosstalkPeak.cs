namespace WaveSim.Core.Coupled;

/// <summary>The largest excursion on a quiet conductor's probe: a conductor with no source of its own.</summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="PeakV">The excursion from the probe's starting level with the largest magnitude, signed, V.</param>
/// <param name="Percent">|PeakV| as a percentage of the largest driven swing.</param>
/// <param name="TimeS">When it occurs, s.</param>
public sealed record CrosstalkPeak(string Probe, double PeakV, double Percent, double TimeS);
