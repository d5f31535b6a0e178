namespace WaveSim.Core.Buffers;

/// <summary>
/// A component's [Package]: R_pkg and L_pkg in series with the pin, C_pkg from the pin to ground, per corner (Ω, H, F).
/// </summary>
/// <param name="R">R_pkg.</param>
/// <param name="L">L_pkg.</param>
/// <param name="C">C_pkg.</param>
public sealed record PackageParasitics(CornerValue R, CornerValue L, CornerValue C);
