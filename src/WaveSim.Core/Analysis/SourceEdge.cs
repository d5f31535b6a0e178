namespace WaveSim.Core.Analysis;

/// <summary>One edge of the driver's waveform as it reaches a probe.</summary>
/// <param name="Rising">True for a low-to-high edge.</param>
/// <param name="SourceMidS">The instant the source's open-circuit voltage crosses its mid level, s (how a failure names the edge).</param>
/// <param name="StartS">The instant the edge starts at the probe: the source edge's start plus the line delay to the probe, s.
/// The edge's window runs from here to the next edge's start (or the record's end).</param>
/// <param name="DelayS">The line delay from the driver to the probe, s: the sum of the segment delays (lumped parts add none).</param>
public sealed record SourceEdge(bool Rising, double SourceMidS, double StartS, double DelayS)
{
    /// <summary>The edge's arrival at the probe, s: <see cref="SourceMidS"/> plus <see cref="DelayS"/>. Settling is measured from here.</summary>
    public double ArrivalMidS => SourceMidS + DelayS;
}
