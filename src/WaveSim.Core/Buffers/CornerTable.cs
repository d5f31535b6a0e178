namespace WaveSim.Core.Buffers;

/// <summary>
/// A table of a buffer model as the file writes it ([Pulldown], [Pullup], a clamp, or a waveform): rows of an independent
/// value with one column per corner, in the file's own coordinates (for [Pullup] and [POWER Clamp], reference minus pin).
/// </summary>
/// <param name="Keyword">The keyword that holds the table, e.g. "[Pulldown]".</param>
/// <param name="Line">The keyword's line in the file.</param>
/// <param name="Rows">The rows in file order; X strictly increasing (the reader checks it).</param>
public sealed record CornerTable(string Keyword, int Line, IReadOnlyList<TableRow> Rows)
{
    /// <summary>The (X, Y) pairs of one corner; NA cells take the typ value of their row.</summary>
    public (double X, double Y)[] At(Corner corner) => Rows.Select(r => (r.X, r.Y.At(corner))).ToArray();

    /// <summary>True when any row gives a number (not NA) in the column of <paramref name="corner"/>.</summary>
    public bool Has(Corner corner) => Rows.Any(r => r.Y.Has(corner));
}
