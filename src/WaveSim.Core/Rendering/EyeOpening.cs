namespace WaveSim.Core.Rendering;

/// <summary>A box marking the measured eye opening.</summary>
/// <param name="TimeStart">Left edge, s from the start of the 2-UI window.</param>
/// <param name="TimeEnd">Right edge, s; greater than <paramref name="TimeStart"/>.</param>
/// <param name="VLow">Bottom edge, V.</param>
/// <param name="VHigh">Top edge, V; greater than <paramref name="VLow"/>.</param>
/// <param name="Label">Text drawn above the box, e.g. "eye 0.62 V × 0.71 UI".</param>
public sealed record EyeOpening(double TimeStart, double TimeEnd, double VLow, double VHigh, string Label);
