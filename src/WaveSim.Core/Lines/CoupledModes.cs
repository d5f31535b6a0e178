namespace WaveSim.Core.Lines;

/// <summary>The quasi-static even- and odd-mode results of a symmetric coupled pair (per strip).</summary>
/// <param name="Even">Even mode (both strips at the same potential): Z0e and its eps_eff.</param>
/// <param name="Odd">Odd mode (strips at opposite potentials): Z0o and its eps_eff.</param>
public readonly record struct CoupledModes(QuasiTemResult Even, QuasiTemResult Odd);
