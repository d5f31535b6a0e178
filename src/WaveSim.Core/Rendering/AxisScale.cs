using System.Globalization;

namespace WaveSim.Core.Rendering;

/// <summary>One axis: its range in SI units, its ticks, and how its numbers and title are written.</summary>
public sealed class AxisScale
{
    /// <summary>Builds an axis over [min, max].</summary>
    /// <param name="label">Quantity name, e.g. "Time".</param>
    /// <param name="unit">SI unit symbol, e.g. "s"; empty for a pure number.</param>
    /// <param name="min">Axis start, SI.</param>
    /// <param name="max">Axis end, SI. Must be greater than <paramref name="min"/>.</param>
    /// <param name="ticks">Tick positions, SI, inside [min, max].</param>
    /// <param name="displayPrefix">Prefix to show numbers with; null picks one from the range.</param>
    public AxisScale(string label, string unit, double min, double max, IReadOnlyList<double> ticks, EngineeringPrefix? displayPrefix = null)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max) || !(max > min))
            throw new ArgumentException($"Axis '{label}' range {min}..{max} must be finite with max > min.");
        Label = label;
        Unit = unit;
        Min = min;
        Max = max;
        Ticks = ticks;
        Prefix = displayPrefix ?? EngineeringPrefix.ForAxis(unit, min, max);
        double step = ticks.Count > 1 ? Math.Abs(ticks[1] - ticks[0]) / Prefix.Factor : (max - min) / Prefix.Factor;
        Decimals = Math.Clamp((int)-Math.Floor(Math.Log10(step) + 1e-9), 0, 12);
    }

    /// <summary>An axis over exactly [min, max] with 1-2-5 ticks inside it (see <see cref="NiceTicks.Within"/>).</summary>
    public static AxisScale Exact(string label, string unit, double min, double max, int maxIntervals) =>
        new(label, unit, min, max, NiceTicks.Within(min, max, maxIntervals));

    /// <summary>Quantity name, e.g. "Voltage".</summary>
    public string Label { get; }

    /// <summary>SI unit symbol, e.g. "V".</summary>
    public string Unit { get; }

    /// <summary>Axis start, SI.</summary>
    public double Min { get; }

    /// <summary>Axis end, SI.</summary>
    public double Max { get; }

    /// <summary>Tick positions, SI.</summary>
    public IReadOnlyList<double> Ticks { get; }

    /// <summary>The engineering prefix numbers on this axis are shown with.</summary>
    public EngineeringPrefix Prefix { get; }

    /// <summary>Decimal places of the tick numbers (enough to tell neighbouring ticks apart).</summary>
    public int Decimals { get; }

    /// <summary>The axis title with its display unit, e.g. "Time [ns]"; just the label when there is no unit.</summary>
    public string Title => Unit.Length == 0 && Prefix.Symbol.Length == 0 ? Label : $"{Label} [{Prefix.Symbol}{Unit}]";

    /// <summary>A tick number in display units, invariant culture, with a true minus sign.</summary>
    public string FormatTick(double value)
    {
        double shown = value / Prefix.Factor;
        if (Math.Abs(shown) < 0.5 * Math.Pow(10, -Decimals)) shown = 0;
        string text = shown.ToString("F" + Decimals, CultureInfo.InvariantCulture);
        return text.StartsWith('-') ? "\u2212" + text[1..] : text;
    }

    /// <summary>Fraction 0..1 of the way from <see cref="Min"/> to <see cref="Max"/>.</summary>
    public double Fraction(double value) => (value - Min) / (Max - Min);
}
