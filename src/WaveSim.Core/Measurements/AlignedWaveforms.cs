namespace WaveSim.Core.Measurements;

/// <summary>A simulated and a captured waveform on a common time grid, with the difference between them.</summary>
/// <param name="OffsetS">Shift added to the capture's time axis to align it with the simulation, s.</param>
/// <param name="Time">The common grid: the overlap of both records after alignment, evenly spaced, s.</param>
/// <param name="Simulated">The simulation linearly interpolated on <paramref name="Time"/>, V.</param>
/// <param name="Captured">The shifted capture linearly interpolated on <paramref name="Time"/>, V.</param>
/// <param name="Residual">Captured minus simulated on <paramref name="Time"/>, V.</param>
/// <param name="RmsV">Root mean square of captured minus simulated at the capture's own samples inside the overlap, V.</param>
/// <param name="PeakV">Largest absolute difference at those samples, V.</param>
/// <param name="RmsPct">RMS residual as a percentage of the simulated swing (max - min on the grid); NaN when the simulation is flat.</param>
/// <param name="PeakPct">Peak residual as a percentage of the simulated swing; NaN when the simulation is flat.</param>
public sealed record AlignedWaveforms(
    double OffsetS,
    double[] Time,
    double[] Simulated,
    double[] Captured,
    double[] Residual,
    double RmsV,
    double PeakV,
    double RmsPct,
    double PeakPct);
