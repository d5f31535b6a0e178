using WaveSim.Core.Analysis;

namespace WaveSim.Core.Measurements;

/// <summary>A simulated probe compared with a capture: the aligned waveforms, their difference and the figures of both.</summary>
/// <param name="Probe">The probe compared.</param>
/// <param name="Comparison">The aligned waveforms on their common grid and the RMS and peak differences.</param>
/// <param name="SimulatedFigures">Signal-quality figures of the simulation on the common grid.</param>
/// <param name="CapturedFigures">Signal-quality figures of the aligned capture on the common grid.</param>
/// <param name="Figures">Each figure of both, with capture minus simulation, in <see cref="SignalFigures.FigureNames"/> order.</param>
public sealed record CaptureComparisonResult(
    string Probe,
    AlignedWaveforms Comparison,
    SignalFigures SimulatedFigures,
    SignalFigures CapturedFigures,
    IReadOnlyList<FigureDifference> Figures);
