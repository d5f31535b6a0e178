namespace WaveSim.Core.Measurements;

/// <summary>One signal-quality figure of the simulated and the captured waveform, and capture minus simulation.</summary>
/// <param name="Name">The figure's name (one of <see cref="Analysis.SignalFigures.FigureNames"/>).</param>
/// <param name="Simulated">The figure of the simulated waveform, SI; null where it does not apply.</param>
/// <param name="Captured">The figure of the aligned capture, SI; null where it does not apply.</param>
/// <param name="Difference">Captured minus simulated; null unless both apply.</param>
public sealed record FigureDifference(string Name, double? Simulated, double? Captured, double? Difference);
