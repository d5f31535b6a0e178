using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>A node where segments end and lumped parts attach; solved implicitly each step.</summary>
internal sealed class Junction
{
    public required string Label { get; init; }
    /// <summary>Half-cell capacitance gathered from the attached segment ends, F.</summary>
    public double C;
    /// <summary>Half-cell conductance gathered from the attached segment ends, S.</summary>
    public double G;
    /// <summary>Position along its line, m, and the line's path (for pictures).</summary>
    public double Position;
}

/// <summary>A segment on the grid: its own arrays of node voltages (both ends included) and half-cell currents.</summary>
internal sealed class GridSegment
{
    public required SegmentPlan Plan { get; init; }
    public required int Start { get; init; }
    public required int End { get; init; }
    public required double StartPosition { get; init; }
    public required string LinePath { get; init; }
    public int Cells => Plan.Cells;
    public double Dz => Plan.Segment.Length / Plan.Cells;
    /// <summary>V[0..n]: node voltages; V[0] and V[n] mirror the junctions.</summary>
    public double[] V = [];
    /// <summary>I[0..n-1]: half-cell currents, positive from start to end, at the latest half step.</summary>
    public double[] I = [];
    public double CurrentA, CurrentB, VoltA, VoltB;
    /// <summary>The pole-residue fit of the segment's frequency-dependent loss; null for constant R and G.</summary>
    public Lines.RationalLoss? Dispersion;
}

/// <summary>What a lumped branch stands for, so probes can find the driver's and the load's currents.</summary>
internal enum BranchRole { Source, Shunt, Series, Load }

/// <summary>
/// A lumped branch of R, L and C in series, from node A to node B (−1 = a fixed voltage: ground, the driver, or a load's return).
/// Integrated with the trapezoidal rule: A-stable, so any part value is stable.
/// </summary>
internal sealed class LumpedBranch
{
    public required BranchRole Role { get; init; }
    public required string Label { get; init; }
    public required int A { get; init; }
    public required int B { get; init; }
    public double R, L;
    public double? C;
    /// <summary>The fixed voltage at the B end when B = −1 (a load's return voltage); the driver sits at the A end.</summary>
    public double FixedB;
    /// <summary>True when the A end is the driver's open-circuit voltage.</summary>
    public bool DrivenA;
    /// <summary>State: current at the latest whole step, capacitor voltage, and the step-average current.</summary>
    public double Current, CapVoltage, Average;
}

/// <summary>
/// A nonlinear part from node A to node B (−1 = ground): a piecewise-linear law I(V) with V = V_A − V_B − Offset and I the
/// current from A through the part into B. It holds no state of its own; each step it is solved with the junctions.
/// </summary>
internal sealed class NonlinearPart
{
    public required BranchRole Role { get; init; }
    public required string Label { get; init; }
    public required int A { get; init; }
    public required int B { get; init; }
    public required Buffers.IvCurve Curve { get; init; }
    /// <summary>The fixed voltage subtracted from V_A − V_B (a load's <c>to</c>), V.</summary>
    public double Offset;
    /// <summary>The step-average current (the trapezoidal mean of the step's two ends), A, for probes.</summary>
    public double Average;
    /// <summary>A buffer driver's time-varying law in place of <see cref="Curve"/>; null for a fixed table.</summary>
    public DriverLaw? Driver { get; init; }
    IPartLaw? _law;
    /// <summary>The law the solves evaluate: the driver's, or the table's (with its cached segment search).</summary>
    public IPartLaw Law => _law ??= Driver ?? (IPartLaw)new PartLaw(Curve);
}

/// <summary>A node of the grid as seen by a probe: which voltage to read and which currents to average.</summary>
internal readonly record struct NodeRef(int Segment, int Index, int Junction)
{
    public static NodeRef OnJunction(int j) => new(-1, -1, j);
}

/// <summary>An edge current: a segment's half-cell, a lumped branch, or (Branch ≤ −2) nonlinear part −2 − Branch.</summary>
internal readonly record struct EdgeRef(int Segment, int Index, int Branch)
{
    /// <summary>The current of nonlinear part <paramref name="p"/>.</summary>
    public static EdgeRef OnPart(int p) => new(-1, -1, -2 - p);
}

/// <summary>The whole discretised network: junctions, segments, lumped branches, and where every line's nodes lie.</summary>
internal sealed class Network
{
    public List<Junction> Junctions { get; } = [];
    public List<GridSegment> Segments { get; } = [];
    public List<LumpedBranch> Branches { get; } = [];
    /// <summary>The nonlinear parts (I-V tables); empty for a linear network, which then runs exactly as without them.</summary>
    public List<NonlinearPart> Nonlinear { get; } = [];
    /// <summary>For each line path ("" for the main line, "stub", "stub/sub"), its nodes in order with position and edges.</summary>
    public Dictionary<string, LineNodes> Lines { get; } = [];
    public int SourceBranch { get; set; }
    /// <summary>A buffer driver's C_pkg, a branch from ground into the pin, whose current the source probe takes off the
    /// package's (the pin's current into the line); −1 for none.</summary>
    public int SourceShunt { get; set; } = -1;
    /// <summary>A buffer driver's switching schedule (sets its law's Ku and Kd for each instant); null for a Thevenin source.</summary>
    public DriverSchedule? Driver { get; set; }
}

/// <summary>The nodes of one line in order from its start, with the edges on either side of each node.</summary>
internal sealed class LineNodes
{
    public LineNodeList Nodes { get; } = new();
    public int StartJunction;
    public int EndJunction;
    public List<int> LoadBranches { get; } = [];
    /// <summary>The load's nonlinear parts (indices into <see cref="Network.Nonlinear"/>).</summary>
    public List<int> LoadParts { get; } = [];
    public double Length;
}
