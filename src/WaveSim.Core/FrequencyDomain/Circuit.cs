using WaveSim.Core.Model;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>Which family of current unknowns a <see cref="CurrentRef"/> points into.</summary>
internal enum CurrentKind { Driver, Lumped, SegmentStart, SegmentEnd }

/// <summary>One current unknown, positive in the direction away from the driver.</summary>
internal readonly record struct CurrentRef(CurrentKind Kind, int Index);

/// <summary>
/// A lumped R-L-C series branch from junction A to junction B (−1 = ground); current unknown positive from A to B. No C means
/// a short in its place; Return is the DC voltage the B end returns to (a load resistor's 'to'), used only in the DC solve.
/// </summary>
internal sealed record LumpedEdge(int A, int B, double R, double L, double? C, double Return = 0);

/// <summary>A uniform line piece between two junctions (a whole segment or part of one cut at a probe).</summary>
internal sealed record SegmentEdge(int Start, int End, Segment Line);

/// <summary>What a probe reads: one junction's voltage and a weighted sum of current unknowns.</summary>
internal sealed record ProbeTap(string Name, int Junction, CurrentRef[] Currents, double Weight);

/// <summary>
/// The scenario as a graph for nodal analysis: junctions (0 is the driver's output node), lumped branches, line pieces and
/// probe taps. Unknowns: junction voltages, then the driver current, the lumped currents, and each piece's start and end currents.
/// </summary>
internal sealed class Circuit
{
    public required int Junctions { get; init; }
    public required double DriverResistance { get; init; }
    public required IReadOnlyList<LumpedEdge> Lumped { get; init; }
    public required IReadOnlyList<SegmentEdge> Segments { get; init; }
    public required IReadOnlyList<ProbeTap> Probes { get; init; }
    /// <summary>The junction of the main line's far end.</summary>
    public required int LoadJunction { get; init; }
    /// <summary>The currents into the main line's load parts.</summary>
    public required CurrentRef[] LoadCurrents { get; init; }

    public int DriverCurrent => Junctions;
    public int Size => Junctions + 1 + Lumped.Count + 2 * Segments.Count;

    public int Index(CurrentRef c) => c.Kind switch
    {
        CurrentKind.Driver => Junctions,
        CurrentKind.Lumped => Junctions + 1 + c.Index,
        CurrentKind.SegmentStart => Junctions + 1 + Lumped.Count + 2 * c.Index,
        _ => Junctions + 1 + Lumped.Count + 2 * c.Index + 1,
    };
}
