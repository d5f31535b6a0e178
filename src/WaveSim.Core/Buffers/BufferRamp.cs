namespace WaveSim.Core.Buffers;

/// <summary>A model's [Ramp]: the rising and falling 20-80 % ratios into the load R_load.</summary>
/// <param name="Rising">dV/dt_r.</param>
/// <param name="Falling">dV/dt_f.</param>
/// <param name="RLoad">R_load (Ω); 50 Ω when the file leaves it out, the standard's default (from memory).</param>
/// <param name="Line">The [Ramp] keyword's line.</param>
public sealed record BufferRamp(RampRate Rising, RampRate Falling, double RLoad, int Line);
