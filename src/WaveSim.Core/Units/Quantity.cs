using System.Globalization;
using System.Text.RegularExpressions;

namespace WaveSim.Core.Units;

/// <summary>
/// Reads quantities such as "3.3 V", "500ps", "25 ohm", "170 ps/in", "0.66 c" into SI doubles,
/// and writes SI values back with an engineering prefix.
/// </summary>
/// <remarks>
/// Prefixes are case-sensitive: f p n u µ m k M G (m is milli, M is mega). "cm" is the centimetre
/// and a bare "c" is the speed of light. Per-length units divide by m, cm, mm, in, ft or mil.
/// </remarks>
public static partial class Quantity
{
    /// <summary>The speed of light in vacuum, m/s (exact, SI definition).</summary>
    public const double SpeedOfLight = 299_792_458.0;

    static readonly (string Symbol, double Factor)[] Prefixes =
    [
        ("f", 1e-15), ("p", 1e-12), ("n", 1e-9), ("u", 1e-6), ("\u00b5", 1e-6), ("\u03bc", 1e-6),
        ("m", 1e-3), ("k", 1e3), ("M", 1e6), ("G", 1e9), ("T", 1e12),
    ];

    static readonly (string Symbol, BaseKind Kind)[] PrefixableUnits =
    [
        ("V", BaseKind.Voltage), ("A", BaseKind.Current), ("s", BaseKind.Time), ("Hz", BaseKind.Frequency),
        ("ohm", BaseKind.Resistance), ("Ohm", BaseKind.Resistance), ("\u03a9", BaseKind.Resistance), ("\u2126", BaseKind.Resistance),
        ("S", BaseKind.Conductance), ("F", BaseKind.Capacitance), ("H", BaseKind.Inductance), ("W", BaseKind.Power),
    ];

    static readonly (string Symbol, double Metres)[] LengthUnits =
    [
        ("m", 1.0), ("km", 1e3), ("cm", 1e-2), ("mm", 1e-3), ("um", 1e-6), ("\u00b5m", 1e-6), ("\u03bcm", 1e-6), ("nm", 1e-9),
        ("in", 0.0254), ("mil", 0.0254e-3), ("ft", 0.3048),
    ];

    // ASCII digits only: \d would also match Arabic-Indic or full-width digits, which double.Parse then refuses.
    [GeneratedRegex(@"\A\s*([+-]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*(.*?)\s*\z", RegexOptions.Singleline)]
    private static partial Regex NumberAndUnit();

    /// <summary>Reads <paramref name="text"/> as one of the <paramref name="accepted"/> dimensions.</summary>
    /// <param name="text">The quantity as written, e.g. "2.5e-9 s".</param>
    /// <param name="accepted">The dimensions allowed here; the first that matches the unit wins.</param>
    /// <returns>The SI value and the dimension it was read as.</returns>
    /// <exception cref="UnitException">The text has no number, no unit, an unknown unit, or the wrong dimension.</exception>
    public static (double Value, Dimension Dimension) ParseAny(string text, params Dimension[] accepted)
    {
        string expected = string.Join(" or ", accepted.Select(d => d.Describe()));
        string units = string.Join("; ", accepted.Select(d => d.Examples()));
        Match m = NumberAndUnit().Match(text ?? "");
        if (!m.Success)
            throw new UnitException($"'{text}' is not a number with a unit; expected {expected} ({units})");
        double number = double.Parse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        string unit = m.Groups[2].Value.Replace(" ", "");
        if (unit.Length == 0)
        {
            if (accepted.Contains(Dimension.Number)) return (number, Dimension.Number);
            throw new UnitException($"'{text}' has no unit; expected {expected} ({units})");
        }
        if (!TryReadUnit(unit, out double factor, out Dimension dim))
            throw new UnitException($"'{text}' has an unknown unit '{unit}'; expected {expected} ({units})");
        if (!accepted.Contains(dim))
            throw new UnitException($"'{text}' is {dim.Describe()}, not {expected} ({units})");
        double value = number * factor;
        if (!double.IsFinite(value))
            throw new UnitException($"'{text}' is too large a number");
        CheckRange(text ?? "", value, dim);
        return (value, dim);
    }

    /// <summary>
    /// Refuses a non-zero value whose magnitude is outside <see cref="Dimension.SensibleRange"/>, naming the range, so that
    /// 1e-308 ns or 1e300 V is bad input here rather than a failure deep in the solver or the plots.
    /// </summary>
    /// <exception cref="UnitException">The magnitude is outside the range.</exception>
    public static void CheckRange(string text, double value, Dimension dim)
    {
        if (InRange(value, dim)) return;
        throw new UnitException($"'{text}' is outside the range accepted for {dim.Describe()}: {RangeText(dim)}");
    }

    /// <summary>True when <paramref name="value"/> is 0 or its size lies in <see cref="Dimension.SensibleRange"/> (always for a plain number).</summary>
    public static bool InRange(double value, Dimension dim) =>
        value == 0 || dim.SensibleRange is not var (min, max) || (Math.Abs(value) >= min * (1 - 1e-12) && Math.Abs(value) <= max * (1 + 1e-12));

    /// <summary>The accepted sizes as written in messages, e.g. "1e-18 F to 1 F in size (or 0)"; empty when unbounded.</summary>
    public static string RangeText(Dimension dim) => dim.SensibleRange is var (min, max)
        ? $"{Figure(min)} {dim.SiUnit} to {Figure(max)} {dim.SiUnit} in size (or 0)"
        : "";

    /// <summary>A range bound as written in messages: 0.001 to 9999 plainly, else a power of ten (1e-18, 1e12).</summary>
    static string Figure(double x) => x is >= 1e-3 and < 1e4
        ? x.ToString("G4", CultureInfo.InvariantCulture)
        : x.ToString("0.###e0", CultureInfo.InvariantCulture);

    /// <summary>Reads <paramref name="text"/> as the one dimension given and returns the SI value.</summary>
    public static double Parse(string text, Dimension dimension) => ParseAny(text, dimension).Value;

    /// <summary>Like <see cref="Parse(string, Dimension)"/> but returns false instead of throwing.</summary>
    public static bool TryParse(string text, Dimension dimension, out double value)
    {
        try { value = Parse(text, dimension); return true; }
        catch (UnitException) { value = 0; return false; }
    }

    static bool TryReadUnit(string unit, out double factor, out Dimension dim)
    {
        factor = 1; dim = default;
        if (unit == "%") { factor = 0.01; dim = Dimension.Percent; return true; }
        if (unit == "c") { factor = SpeedOfLight; dim = Dimension.Velocity; return true; }
        if (unit == "m/s") { dim = Dimension.Velocity; return true; }
        int slash = unit.IndexOf('/');
        if (slash >= 0)
        {
            string num = unit[..slash], den = unit[(slash + 1)..];
            if (!TryLength(den, out double perMetres)) return false;
            if (!TryPrefixed(num, out factor, out BaseKind k)) return false;
            factor /= perMetres;
            dim = new Dimension(k, true);
            return true;
        }
        if (TryLength(unit, out factor)) { dim = Dimension.Length; return true; }
        if (TryPrefixed(unit, out factor, out BaseKind kind)) { dim = new Dimension(kind); return true; }
        return false;
    }

    static bool TryLength(string unit, out double metres)
    {
        foreach (var (s, f) in LengthUnits)
            if (unit == s) { metres = f; return true; }
        metres = 0;
        return false;
    }

    static bool TryPrefixed(string unit, out double factor, out BaseKind kind)
    {
        foreach (var (s, k) in PrefixableUnits)
            if (unit == s) { factor = 1; kind = k; return true; }
        foreach (var (p, f) in Prefixes)
            if (unit.StartsWith(p, StringComparison.Ordinal))
                foreach (var (s, k) in PrefixableUnits)
                    if (unit.Length == p.Length + s.Length && unit.EndsWith(s, StringComparison.Ordinal))
                    { factor = f; kind = k; return true; }
        factor = 0; kind = default;
        return false;
    }

    /// <summary>Formats an SI value with an engineering prefix and a unit symbol, e.g. 2.5e-9 → "2.5 ns".</summary>
    /// <param name="value">The value in SI units.</param>
    /// <param name="unit">The unit symbol, e.g. "s", "V", "Ω".</param>
    /// <param name="digits">Significant digits (default 4, at least 1).</param>
    /// <remarks>
    /// Never an exponent beside a prefix: the value is rounded to <paramref name="digits"/> first, so 999.7 ns at 3 digits is
    /// "1 µs", not "1E+03 ns". Below the smallest prefix (femto) the figure is shown to 10^−(digits−1) of it, so a value that is
    /// zero up to rounding (5e-23 s, a difference of two equal instants) prints as "0 s".
    /// </remarks>
    public static string Format(double value, string unit, int digits = 4)
    {
        digits = Math.Clamp(digits, 1, 15);
        if (!double.IsFinite(value)) return $"{value.ToString(CultureInfo.InvariantCulture)} {unit}";
        (string p, double f)[] scale = [("T", 1e12), ("G", 1e9), ("M", 1e6), ("k", 1e3), ("", 1), ("m", 1e-3), ("µ", 1e-6), ("n", 1e-9), ("p", 1e-12), ("f", 1e-15)];
        double a = Math.Abs(value);
        for (int i = 0; i < scale.Length; i++)
        {
            if (a < scale[i].f * 0.9999999) continue;
            // Round the mantissa to the significant digits; a carry to 1000 moves up one prefix (999.7 n → 1 µ).
            double m = RoundSignificant(value / scale[i].f, digits);
            if (Math.Abs(m) >= 1000 && i > 0) { i--; m = RoundSignificant(m / 1000, digits); }
            return $"{Plain(m, digits)} {scale[i].p}{unit}";
        }
        // Smaller than 1 f: a fixed resolution of 10^-(digits-1) f, so rounding noise shows as 0.
        double tiny = Math.Round(value / 1e-15, Math.Min(digits - 1, 15));
        return tiny == 0 ? $"0 {unit}" : $"{Plain(tiny, digits)} f{unit}";
    }

    /// <summary>x rounded to <paramref name="digits"/> significant digits, exactly as the "G" format rounds it.</summary>
    static double RoundSignificant(double x, int digits) =>
        double.Parse(x.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>Fixed-point text of an already rounded mantissa (no exponent, no trailing zeros, no "-0").</summary>
    static string Plain(double m, int digits) =>
        m == 0 ? "0" : m.ToString("0." + new string('#', Math.Max(1, digits)), CultureInfo.InvariantCulture);
}
