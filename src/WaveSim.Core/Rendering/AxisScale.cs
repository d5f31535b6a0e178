using System.Globalization;

namespace WaveSim.Core.Rendering;

/// <summary>
/// One axis: its range in SI units, how values are placed along it (linear or logarithmic), its ticks, and how its
/// numbers and title are written.
/// </summary>
public sealed class AxisScale
{
    /// <summary>Builds a linear axis over [min, max].</summary>
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

    AxisScale(string label, string unit, double min, double max, double[] major, double[] minor)
    {
        Label = label;
        Unit = unit;
        Min = min;
        Max = max;
        Kind = AxisKind.Logarithmic;
        Ticks = major;
        MinorTicks = minor;
        Prefix = EngineeringPrefix.None;
        Decimals = major.Length == 0 ? 0 : major.Max(t => LogLabelDecimals(t));
        logMin = Math.Log10(min);
        logSpan = Math.Log10(max) - logMin;
    }

    readonly double logMin, logSpan;

    /// <summary>An axis over exactly [min, max] with 1-2-5 ticks inside it (see <see cref="NiceTicks.Within"/>).</summary>
    public static AxisScale Exact(string label, string unit, double min, double max, int maxIntervals) =>
        new(label, unit, min, max, NiceTicks.Within(min, max, maxIntervals));

    /// <summary>
    /// A logarithmic axis over exactly [min, max]: a value's position is proportional to log10 of it. Ticks follow
    /// <see cref="LogTicks.Within"/>; each tick number carries its own engineering prefix ("1 p", "10 p", "100 p", "1 n")
    /// for units that take one, so the title shows the bare unit.
    /// </summary>
    /// <param name="label">Quantity name, e.g. "load.c".</param>
    /// <param name="unit">SI unit symbol, e.g. "F"; empty for a pure number.</param>
    /// <param name="min">Axis start, SI. Must be finite and greater than 0.</param>
    /// <param name="max">Axis end, SI. Must be finite and greater than <paramref name="min"/>.</param>
    /// <param name="maxIntervals">Label slots across the axis (at least 1).</param>
    /// <exception cref="ArgumentOutOfRangeException">min is not greater than 0, or the range is not finite with max &gt; min.</exception>
    public static AxisScale Logarithmic(string label, string unit, double min, double max, int maxIntervals)
    {
        if (!(min > 0) || !double.IsFinite(max) || !(max > min))
            throw new ArgumentOutOfRangeException(nameof(min), $"Axis '{label}' is logarithmic: its range {min}..{max} must be finite with 0 < min < max.");
        var (major, minor) = LogTicks.Within(min, max, maxIntervals);
        return new AxisScale(label, unit, min, max, major, minor);
    }

    /// <summary>How values are placed along the axis.</summary>
    public AxisKind Kind { get; } = AxisKind.Linear;

    /// <summary>Quantity name, e.g. "Voltage".</summary>
    public string Label { get; }

    /// <summary>SI unit symbol, e.g. "V".</summary>
    public string Unit { get; }

    /// <summary>Axis start, SI.</summary>
    public double Min { get; }

    /// <summary>Axis end, SI.</summary>
    public double Max { get; }

    /// <summary>Labelled tick positions, SI.</summary>
    public IReadOnlyList<double> Ticks { get; }

    /// <summary>Unlabelled tick positions, SI (2..9 × each decade on a logarithmic axis); empty on a linear axis.</summary>
    public IReadOnlyList<double> MinorTicks { get; } = [];

    /// <summary>
    /// The engineering prefix numbers on this axis are shown with; <see cref="EngineeringPrefix.None"/> on a logarithmic
    /// axis, where each tick number carries its own.
    /// </summary>
    public EngineeringPrefix Prefix { get; }

    /// <summary>
    /// Decimal places of the tick numbers (enough to tell neighbouring ticks apart); on a logarithmic axis, the most
    /// any tick number needs (each is written with as many as it needs).
    /// </summary>
    public int Decimals { get; }

    /// <summary>The axis title with its display unit, e.g. "Time [ns]"; just the label when there is no unit.</summary>
    public string Title => Unit.Length == 0 && Prefix.Symbol.Length == 0 ? Label : $"{Label} [{Prefix.Symbol}{Unit}]";

    /// <summary>
    /// A tick number in display units, invariant culture, with a true minus sign. On a logarithmic axis the number
    /// carries its own prefix ("4.7 p") for units that take one, and is a plain number ("0.01", "1e6") otherwise.
    /// </summary>
    public string FormatTick(double value)
    {
        if (Kind == AxisKind.Logarithmic) return LogLabel(value).Text;
        double shown = value / Prefix.Factor;
        if (Math.Abs(shown) < 0.5 * Math.Pow(10, -Decimals)) shown = 0;
        string text = shown.ToString("F" + Decimals, CultureInfo.InvariantCulture);
        return text.StartsWith('-') ? "\u2212" + text[1..] : text;
    }

    /// <summary>
    /// Fraction 0..1 of the way from <see cref="Min"/> to <see cref="Max"/>: (v − min)/(max − min) on a linear axis,
    /// (log10 v − log10 min)/(log10 max − log10 min) on a logarithmic one. NaN stays NaN (a gap).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The axis is logarithmic and <paramref name="value"/> is 0 or less.</exception>
    public double Fraction(double value)
    {
        // Halves when max − min overflows (−1e308..1e308): any finite range places its values.
        if (Kind == AxisKind.Linear)
            return double.IsFinite(Max - Min) ? (value - Min) / (Max - Min) : (value / 2 - Min / 2) / (Max / 2 - Min / 2);
        if (value <= 0)
            throw new ArgumentOutOfRangeException(nameof(value), $"Axis '{Label}' is logarithmic and cannot place {value.ToString(CultureInfo.InvariantCulture)}: values must be greater than 0.");
        return (Math.Log10(value) - logMin) / logSpan;
    }

    /// <summary>The value at fraction <paramref name="fraction"/> of the way from <see cref="Min"/> to <see cref="Max"/> (the inverse of <see cref="Fraction"/>).</summary>
    public double ValueAt(double fraction) => Kind == AxisKind.Linear
        ? (double.IsFinite(Max - Min) ? Min + fraction * (Max - Min) : 2 * (Min / 2 + fraction * (Max / 2 - Min / 2)))
        : Math.Pow(10, logMin + fraction * logSpan);

    (string Text, int Decimals) LogLabel(double value)
    {
        if (!(value > 0) || !double.IsFinite(value)) return (value.ToString(CultureInfo.InvariantCulture), 0);
        if (EngineeringPrefix.TakesPrefix(Unit))
        {
            EngineeringPrefix p = EngineeringPrefix.ForMagnitude(value);
            var (number, decimals) = Plain(value / p.Factor);
            return (p.Symbol.Length == 0 ? number : number + " " + p.Symbol, decimals);
        }
        if (value >= 1e-3 && value < 1e5) return Plain(value);
        // Outside 0.001..99 999 a pure number reads better as a power of ten: 1e6, 2e−5.
        int e = (int)Math.Floor(Math.Log10(value) + 1e-9);
        var (mantissa, d) = Plain(value / Math.Pow(10, e));
        return ($"{mantissa}e{(e < 0 ? "\u2212" : "")}{Math.Abs(e)}", d);
    }

    int LogLabelDecimals(double value) => LogLabel(value).Decimals;

    /// <summary>A positive number with as few decimals as it needs (at most 6), e.g. 100, 4.7, 0.01.</summary>
    static (string Text, int Decimals) Plain(double v)
    {
        double r = Math.Round(v, 6);
        string text = r.ToString("0.######", CultureInfo.InvariantCulture);
        int dot = text.IndexOf('.');
        return (text, dot < 0 ? 0 : text.Length - dot - 1);
    }
}
