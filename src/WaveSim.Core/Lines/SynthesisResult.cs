namespace WaveSim.Core.Lines;

/// <summary>The result of solving a cross-section for a target impedance.</summary>
/// <param name="Dimension">The key that was solved for.</param>
/// <param name="Value">Its value in SI (m for lengths, plain for er).</param>
/// <param name="Line">The line analysed with the solved value.</param>
public sealed record SynthesisResult(string Dimension, double Value, LineParameters Line);
