namespace WaveSim.Core.Reports;

/// <summary>One waveform of an overlay: a run's probe or a capture.</summary>
/// <param name="Label">Its name on the chart (the run's title or folder, or the capture's file).</param>
/// <param name="Source">Where it was read from, in words.</param>
/// <param name="Time">Ascending instants, s.</param>
/// <param name="Volts">Voltage at each instant, V.</param>
public sealed record OverlayTrace(string Label, string Source, double[] Time, double[] Volts);
