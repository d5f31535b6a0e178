namespace WaveSim.Core.Rendering;

/// <summary>What a <see cref="NetMark"/> stands for; chooses the symbol drawn on the axis.</summary>
public enum NetMarkKind
{
    /// <summary>Where one line segment ends and the next (other Z0 or delay) begins.</summary>
    SegmentBoundary,
    /// <summary>A part from the line to ground, e.g. a capacitor.</summary>
    Shunt,
    /// <summary>A part in series with the line, e.g. a resistor.</summary>
    Series,
    /// <summary>The driving source.</summary>
    Source,
    /// <summary>The termination at a line end.</summary>
    Load,
    /// <summary>Where a branch leaves the main line.</summary>
    Branch,
    /// <summary>Where a probe records; marked at the top edge of the plot, with its name.</summary>
    Probe,
}
