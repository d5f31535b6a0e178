using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>One probe's record and its signal-quality figures.</summary>
/// <param name="Probe">The probe's record.</param>
/// <param name="Figures">Its figures (<see cref="RunAnalysis.Figures(SimulationResult, double)"/>).</param>
public sealed record ProbeFigures(ProbeTrace Probe, SignalFigures Figures);
