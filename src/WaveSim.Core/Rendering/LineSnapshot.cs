namespace WaveSim.Core.Rendering;

/// <summary>The voltages along a line at one instant: one array per <see cref="LineLayout"/> piece, one value per node.</summary>
/// <param name="Time">The instant, s.</param>
/// <param name="Voltages">Voltages, V: Voltages[p][i] is at node i of piece p.</param>
public sealed record LineSnapshot(double Time, IReadOnlyList<double[]> Voltages)
{
    /// <summary>A snapshot of an unbranched line.</summary>
    /// <param name="time">The instant, s.</param>
    /// <param name="voltage">One voltage per node of the main line, V.</param>
    public LineSnapshot(double time, double[] voltage) : this(time, [voltage]) { }

    /// <summary>The voltages along the main line, V.</summary>
    public double[] Voltage => Voltages[0];
}
