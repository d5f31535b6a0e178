using System.Collections.Immutable;

namespace WaveSim.Core.Model;

/// <summary>Where a probe sits.</summary>
public enum ProbeAnchor
{
    /// <summary>The driver's output node (after its resistance), or a branch's junction.</summary>
    Source,
    /// <summary>The far-end node of the line (or of the branch).</summary>
    Load,
    /// <summary>A distance from the start of the line (or of the branch).</summary>
    Distance,
}

/// <summary>A probe: a name and a point on the main line or on a branch.</summary>
/// <param name="Name">An identifier (letters, digits, _ and -).</param>
/// <param name="BranchPath">Branch names from the main line outward; empty for the main line.</param>
/// <param name="Anchor">Source, load or a distance.</param>
/// <param name="Distance">Distance from the start of that line, m (for <see cref="ProbeAnchor.Distance"/>).</param>
public sealed record ProbeSpec(string Name, IReadOnlyList<string> BranchPath, ProbeAnchor Anchor, double Distance = 0)
{
    /// <summary>Branch names from the main line outward; empty for the main line (held as an immutable array).</summary>
    public IReadOnlyList<string> BranchPath { get; init => field = value.ToImmutableArray(); } = BranchPath.ToImmutableArray();

    /// <summary>The location as written in a scenario, e.g. "stub/load" or "75 mm".</summary>
    public string Describe()
    {
        string where = Anchor switch
        {
            ProbeAnchor.Source => "source",
            ProbeAnchor.Load => "load",
            _ => Units.Quantity.Format(Distance, "m"),
        };
        return BranchPath.Count == 0 ? where : string.Join("/", BranchPath) + "/" + where;
    }
}
