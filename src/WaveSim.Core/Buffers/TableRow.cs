namespace WaveSim.Core.Buffers;

/// <summary>One row of a buffer-model table: the independent value (a voltage or a time) and its typ/min/max column values.</summary>
/// <param name="X">Voltage (V) of an I-V table or time (s) of a waveform table.</param>
/// <param name="Y">Current (A) or voltage (V) per corner.</param>
/// <param name="Line">The row's line in the model file (1-based).</param>
public readonly record struct TableRow(double X, CornerValue Y, int Line);
