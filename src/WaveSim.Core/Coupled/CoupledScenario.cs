using System.Collections.Immutable;
using WaveSim.Core.Model;

namespace WaveSim.Core.Coupled;

/// <summary>
/// A net of several conductors over a common reference: sections from the near end (z = 0) to the far end that every
/// conductor runs through, the end networks, probes and run settings. All values SI; immutable.
/// </summary>
public sealed record CoupledScenario
{
    /// <summary>Free text shown on outputs.</summary>
    public string Title { get; init; } = "";
    /// <summary>The conductors' names, in the order of the matrices' rows.</summary>
    public required IReadOnlyList<string> Conductors { get; init => field = value.ToImmutableArray(); }
    /// <summary>The sections from the near end to the far end.</summary>
    public required IReadOnlyList<CoupledSection> Sections { get; init => field = value.ToImmutableArray(); }
    /// <summary>The branches at z = 0.</summary>
    public IReadOnlyList<EndBranch> Near { get; init => field = value.ToImmutableArray(); } = [];
    /// <summary>The branches at the far end.</summary>
    public IReadOnlyList<EndBranch> Far { get; init => field = value.ToImmutableArray(); } = [];
    /// <summary>The probes.</summary>
    public required IReadOnlyList<CoupledProbe> Probes { get; init => field = value.ToImmutableArray(); }
    /// <summary>Run length and resolution.</summary>
    public required SimulationSpec Simulation { get; init; }
    /// <summary>The length unit the author used, for pictures.</summary>
    public string LengthUnit { get; init; } = "m";
    /// <summary>Metres per <see cref="LengthUnit"/>.</summary>
    public double LengthFactor { get; init; } = 1;
    /// <summary>The file it was read from, if any.</summary>
    public string? FilePath { get; init; }

    /// <summary>Total length, m.</summary>
    public double Length => Sections.Sum(s => s.Length);

    /// <summary>Every source with the end it sits at.</summary>
    public IEnumerable<CoupledSource> Sources => Near.Concat(Far).Select(b => b.Source).OfType<CoupledSource>();

    /// <summary>Whether conductor <paramref name="k"/> has a source of its own at either end.</summary>
    public bool IsDriven(int k) => Near.Concat(Far).Any(b => b.Source is not null && (b.At == k || b.To == k));
}
