using WaveSim.Core.Rendering;

namespace WaveSim.Core.Pictures;

/// <summary>The waveform chart of a run and what part of the record it shows.</summary>
/// <param name="Chart">The chart to render.</param>
/// <param name="Shown">The time span drawn, s (clipped to the record).</param>
/// <param name="Limited">True when the window was chosen automatically because the record is long.</param>
/// <param name="SourceEdges">Edges of the source's open-circuit waveform in the record (crossings of its mid level).</param>
/// <param name="EdgesShown">Of those, the edges every drawn probe shows: leaving the source at or after the window's start and
/// reaching the farthest drawn probe (by the line's delay) by its end.</param>
public sealed record WaveformPicture(ChartSpec Chart, TimeWindow Shown, bool Limited, int SourceEdges, int EdgesShown);
