namespace WaveSim.Core.Rendering;

/// <summary>How a trace is drawn, so a trace that is a yardstick for the others is never hidden under them.</summary>
public enum TraceLook
{
    /// <summary>A thin line in the trace's colour and dash pattern (<see cref="Palette"/>), drawn in the panel's order.</summary>
    Line,

    /// <summary>
    /// The yardstick the other traces are read against (a capture, the net as drawn): a wide, pale band in the trace's colour,
    /// drawn beneath every other trace, so a thin trace on top of it stays visible and so does the band around it.
    /// </summary>
    Reference,

    /// <summary>A thin dashed line whatever the number of traces (a secondary trace, e.g. a fit's starting point).</summary>
    Dashed,
}
