namespace WaveSim.Core.Buffers;

/// <summary>One [Ramp] entry dV/dt as the file writes it, a ratio: the 20-80 % voltage swing over the 20-80 % time, per corner.</summary>
/// <param name="DeltaV">The 20-80 % swing (V) per corner.</param>
/// <param name="DeltaT">The 20-80 % time (s) per corner.</param>
public sealed record RampRate(CornerValue DeltaV, CornerValue DeltaT)
{
    /// <summary>The slew rate dV/dt of <paramref name="corner"/> (V/s).</summary>
    public double Rate(Corner corner) => DeltaV.At(corner) / DeltaT.At(corner);
}
