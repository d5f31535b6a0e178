using WaveSim.Core.Buffers;

namespace WaveSim.Core.Model;

/// <summary>A far-end termination: parallel parts, any combination; none is an open end.</summary>
/// <param name="R">Resistor, ohm, returning to <paramref name="To"/>.</param>
/// <param name="To">The voltage the resistor returns to, V.</param>
/// <param name="C">Capacitance to ground, F.</param>
/// <param name="L">Inductance to ground, H.</param>
/// <param name="Short">A short to ground.</param>
/// <param name="Receiver">The receiver's input thresholds, if given.</param>
public sealed record LoadSpec(double? R = null, double To = 0, double? C = null, double? L = null, bool Short = false,
    ReceiverThresholds? Receiver = null)
{
    /// <summary>
    /// A nonlinear part in parallel with the others: a piecewise-linear current-voltage law, the voltage across it being the
    /// node's minus <see cref="To"/>; null for none.
    /// </summary>
    public IvCurve? Iv { get; init; }

    /// <summary>
    /// A receiver from a buffer model in parallel with the other parts: its clamps and C_comp at the die pad, its package
    /// between the pad and this node; null for none. Its Vinh and Vinl are <see cref="Receiver"/>.
    /// </summary>
    public BufferSpec? Buffer { get; init; }

    /// <summary>An open end.</summary>
    public static readonly LoadSpec Open = new();

    /// <summary>A short text such as "R 50 Ω to 1.65 V ∥ C 2 pF".</summary>
    public string Describe()
    {
        if (Short) return "short";
        var parts = new List<string>();
        if (R is { } r) parts.Add("R " + Units.Quantity.Format(r, "Ω") + (To != 0 ? " to " + Units.Quantity.Format(To, "V") : ""));
        if (C is { } c) parts.Add("C " + Units.Quantity.Format(c, "F"));
        if (L is { } l) parts.Add("L " + Units.Quantity.Format(l, "H"));
        if (Iv is { } iv) parts.Add($"I-V table ({iv.Voltages.Count} points)" + (To != 0 && R is null ? " to " + Units.Quantity.Format(To, "V") : ""));
        if (Buffer is { } b) parts.Add(b.Describe());
        return parts.Count == 0 ? "open" : string.Join(" ∥ ", parts);
    }
}

/// <summary>A receiver's logic thresholds, V.</summary>
/// <param name="Vih">Lowest input voltage read as high.</param>
/// <param name="Vil">Highest input voltage read as low.</param>
public sealed record ReceiverThresholds(double Vih, double Vil);
