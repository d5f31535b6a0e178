namespace WaveSim.Core.Rendering;

/// <summary>How a <see cref="Marker"/> is drawn.</summary>
public enum MarkerStyle
{
    /// <summary>A thin ring with plain text: a point worth noticing.</summary>
    Ring,

    /// <summary>A filled diamond with bold, boxed text: the one point a reader should find first (e.g. the best point of a sweep).</summary>
    Highlight,
}
