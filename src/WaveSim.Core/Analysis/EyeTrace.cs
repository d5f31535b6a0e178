namespace WaveSim.Core.Analysis;

/// <summary>One two-bit-wide slice of a waveform, for drawing an eye diagram.</summary>
/// <param name="T">Time [s] from the window start, 0 … 2·bit time; the bit centre is at one bit time.</param>
/// <param name="V">Voltage [V] at each instant of <paramref name="T"/>.</param>
public sealed record EyeTrace(double[] T, double[] V);
