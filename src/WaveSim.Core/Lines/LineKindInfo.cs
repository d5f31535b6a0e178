namespace WaveSim.Core.Lines;

/// <summary>A line kind and the keys it reads (the kind's own; the common ones are in <see cref="CrossSectionCatalog.Common"/>).</summary>
/// <param name="Name">Kind name as written in a scenario ("microstrip") and on the command line.</param>
/// <param name="Description">One line for help texts, naming the formula used.</param>
/// <param name="Dimensions">The kind's own keys.</param>
/// <param name="Solvable">The keys that synthesis may solve for (Z0 is monotonic in each).</param>
public sealed record LineKindInfo(string Name, string Description, IReadOnlyList<DimensionInfo> Dimensions, IReadOnlyList<string> Solvable)
{
    /// <summary>True for an edge-coupled pair (two strips, even and odd modes; see <see cref="CoupledLineParameters"/>).</summary>
    public bool Pair { get; init; }

    /// <summary>The kind's keys followed by the common keys.</summary>
    public IEnumerable<DimensionInfo> AllKeys => Dimensions.Concat(CrossSectionCatalog.Common);
}
