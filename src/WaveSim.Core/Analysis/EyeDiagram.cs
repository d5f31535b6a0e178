namespace WaveSim.Core.Analysis;

/// <summary>Result of <see cref="EyeAnalysis.Compute"/>: the folded traces for plotting and the eye figures.</summary>
/// <param name="Traces">One trace per analysed bit, each two bit times wide with the bit centred.</param>
/// <param name="Figures">Eye height and width.</param>
/// <param name="BitTimeS">The bit time (unit interval) [s]; the traces span 0 … 2·BitTimeS.</param>
public sealed record EyeDiagram(IReadOnlyList<EyeTrace> Traces, EyeFigures Figures, double BitTimeS);
