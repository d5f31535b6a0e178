using System.Collections.Immutable;
using WaveSim.Core.Buffers;

namespace WaveSim.Core.Model;

/// <summary>One item of a line, in order from the source end.</summary>
public abstract record LineElement;

/// <summary>A uniform transmission-line segment given per length (SI: ohm/m, H/m, S/m, F/m).</summary>
/// <param name="Length">Physical length, m (&gt; 0).</param>
/// <param name="R">Series resistance per length, ohm/m.</param>
/// <param name="L">Series inductance per length, H/m (&gt; 0).</param>
/// <param name="G">Shunt conductance per length, S/m.</param>
/// <param name="C">Shunt capacitance per length, F/m (&gt; 0).</param>
public sealed record Segment(double Length, double R, double L, double G, double C) : LineElement
{
    /// <summary>The cross-section figures this segment was derived from, when it was given by geometry.</summary>
    public GeometryFigures? Derived { get; init; }

    /// <summary>
    /// Frequency-dependent conductor and dielectric loss, when given; null keeps the constant R and G. With it, R is R_dc
    /// (when a conductor model is given), L is the external inductance L∞, C the capacitance at the dielectric's reference
    /// frequency and G is 0 (when a dielectric model is given).
    /// </summary>
    public FrequencyLoss? Loss { get; init; }

    /// <summary>Series impedance per length at complex frequency s, ohm/m: R + sL, or the exact frequency-dependent form.</summary>
    public System.Numerics.Complex SeriesImpedance(System.Numerics.Complex s) => Loss is { } f ? f.SeriesImpedance(s, R, L) : R + s * L;

    /// <summary>Shunt admittance per length at complex frequency s, S/m: G + sC, or the exact frequency-dependent form.</summary>
    public System.Numerics.Complex ShuntAdmittance(System.Numerics.Complex s) => Loss is { } f ? f.ShuntAdmittance(s, G, C) : G + s * C;

    /// <summary>The one-way delay of the fastest wave the segment carries, s: <see cref="Delay"/> scaled by √κ(∞) with a wideband dielectric.</summary>
    public double FrontDelay => Loss is { } f ? Delay * Math.Sqrt(f.HighFrequencyRatio) : Delay;

    /// <summary>Characteristic impedance of the lossless part, √(L/C), ohm.</summary>
    public double Z0 => Math.Sqrt(L / C);
    /// <summary>Propagation velocity 1/√(LC), m/s.</summary>
    public double Velocity => 1 / Math.Sqrt(L * C);
    /// <summary>One-way delay of the whole segment, s.</summary>
    public double Delay => Length * Math.Sqrt(L * C);

    /// <summary>A segment from its impedance and delay per length, s/m.</summary>
    public static Segment FromZ0(double length, double z0, double delayPerLength, double r = 0, double g = 0) =>
        new(length, r, z0 * delayPerLength, g, delayPerLength / z0);
}

/// <summary>Series R, L, C parts in one branch. Absent parts are null: no C means a short in its place.</summary>
/// <param name="R">Resistance, ohm.</param>
/// <param name="L">Inductance, H.</param>
/// <param name="C">Capacitance, F.</param>
public sealed record LumpedParts(double? R = null, double? L = null, double? C = null)
{
    /// <summary>
    /// A nonlinear part instead of R, L and C: a piecewise-linear current-voltage law (the voltage across it is the node's
    /// minus ground for a shunt, minus the far side for a series part); null for none. The loader gives it alone.
    /// </summary>
    public IvCurve? Iv { get; init; }

    /// <summary>A short text such as "R 22 Ω + C 1 nF".</summary>
    public string Describe() => string.Join(" + ", new[]
    {
        Iv is { } iv ? $"I-V table ({iv.Voltages.Count} points)" : null,
        R is { } r ? "R " + Units.Quantity.Format(r, "Ω") : null,
        L is { } l ? "L " + Units.Quantity.Format(l, "H") : null,
        C is { } c ? "C " + Units.Quantity.Format(c, "F") : null,
    }.Where(x => x != null));
}

/// <summary>A lumped branch from this point to ground (R, L, C in series with each other).</summary>
public sealed record Shunt(LumpedParts Parts) : LineElement;

/// <summary>A lumped element in series with the line at this point (R, L, C in series with each other).</summary>
public sealed record Series(LumpedParts Parts) : LineElement;

/// <summary>A side line hanging off this point with its own load (a stub or a second receiver).</summary>
/// <param name="Name">An identifier (letters, digits, _ and -), used in probe locations and file names.</param>
/// <param name="Line">The branch's own elements, from the junction outward.</param>
/// <param name="Load">The branch's far-end load.</param>
public sealed record Branch(string Name, IReadOnlyList<LineElement> Line, LoadSpec Load) : LineElement
{
    /// <summary>The branch's own elements, from the junction outward (held as an immutable array).</summary>
    public IReadOnlyList<LineElement> Line { get; init => field = value.ToImmutableArray(); } = Line.ToImmutableArray();
}
