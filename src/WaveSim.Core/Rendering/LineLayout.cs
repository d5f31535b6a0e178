namespace WaveSim.Core.Rendering;

/// <summary>
/// How a line is drawn: its pieces (the first is the main line, the others branches drawn thinner), the length
/// unit of the position axis, and the elements marked along it.
/// </summary>
/// <param name="Pieces">Pieces; the first is the main line. At least one.</param>
/// <param name="LengthUnit">Display unit name of positions, e.g. "mm".</param>
/// <param name="LengthFactor">Metres per display unit, e.g. 1e-3 for "mm". Must be greater than 0.</param>
/// <param name="Elements">Elements marked along the axis.</param>
public sealed record LineLayout(IReadOnlyList<LinePiece> Pieces, string LengthUnit, double LengthFactor, IReadOnlyList<NetMark> Elements)
{
    /// <summary>A layout of one unbranched line.</summary>
    /// <param name="x">Node positions, metres, ascending.</param>
    /// <param name="lengthUnit">Display unit name, e.g. "mm".</param>
    /// <param name="lengthFactor">Metres per display unit.</param>
    /// <param name="elements">Elements marked along the axis.</param>
    public static LineLayout Single(double[] x, string lengthUnit, double lengthFactor, IReadOnlyList<NetMark> elements) =>
        new([new LinePiece("line", x)], lengthUnit, lengthFactor, elements);

    /// <summary>Node positions of the main line, metres.</summary>
    public double[] MainX => Pieces[0].X;

    /// <summary>Throws <see cref="ArgumentException"/> unless the layout can be drawn.</summary>
    public void Validate()
    {
        if (Pieces is null || Pieces.Count == 0) throw new ArgumentException("A line layout needs at least one piece.");
        if (!(LengthFactor > 0) || !double.IsFinite(LengthFactor)) throw new ArgumentException($"Length factor {LengthFactor} must be finite and greater than 0.");
        foreach (LinePiece p in Pieces)
        {
            if (p.X is null || p.X.Length < 2) throw new ArgumentException($"Piece '{p.Name}' needs at least two node positions.");
            for (int i = 1; i < p.X.Length; i++)
                if (!(p.X[i] >= p.X[i - 1]) || !double.IsFinite(p.X[i])) throw new ArgumentException($"Piece '{p.Name}' node positions must be finite and ascending (node {i})."); // a series part repeats a position
        }
        foreach (NetMark e in Elements)
            if (e.Piece < 0 || e.Piece >= Pieces.Count) throw new ArgumentException($"Element '{e.Label}' sits on piece {e.Piece}, but the layout has {Pieces.Count} piece(s).");
    }

    /// <summary>The elements drawn as lines and labelled over the main axis: those on the main line, without probes.</summary>
    internal IReadOnlyList<NetMark> MainMarks => Elements.Where(e => e.Piece == 0 && e.Kind != NetMarkKind.Probe).ToList();

    internal (double Min, double Max) Extent()
    {
        double min = Pieces.Min(p => p.X[0]), max = Pieces.Max(p => p.X[^1]);
        return (min, max);
    }
}
