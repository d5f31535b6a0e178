using System.Globalization;
using System.Text.RegularExpressions;

namespace WaveSim.Core.Buffers;

/// <summary>
/// Numbers as buffer model files write them: a decimal number, an optional scale suffix (T G M k m u n p f, case-sensitive,
/// M is mega and m milli) and any trailing unit letters, which are ignored ("3.3V", "10pF", "5mA", "50ohm"), or NA.
/// </summary>
public static partial class BufferNumber
{
    static readonly Dictionary<char, double> Scales = new()
    {
        ['T'] = 1e12, ['G'] = 1e9, ['M'] = 1e6, ['k'] = 1e3, ['m'] = 1e-3, ['u'] = 1e-6, ['n'] = 1e-9, ['p'] = 1e-12, ['f'] = 1e-15,
    };

    [GeneratedRegex(@"\A([+-]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)([TGMkmunpf]?)([A-Za-z]*)\z")]
    private static partial Regex Pattern();

    /// <summary>Reads one token; false when it is not a number (NA included).</summary>
    /// <param name="token">The token, without spaces.</param>
    /// <param name="value">The value, scaled by its suffix.</param>
    public static bool TryParse(string token, out double value)
    {
        value = double.NaN;
        Match m = Pattern().Match(token ?? "");
        if (!m.Success) return false;
        double x = double.Parse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        if (m.Groups[2].Length == 1) x *= Scales[m.Groups[2].Value[0]];
        if (!double.IsFinite(x)) return false;
        value = x;
        return true;
    }

    /// <summary>True when the token is NA (any case), the standard's mark for a corner that is not given.</summary>
    public static bool IsNa(string token) => string.Equals(token, "NA", StringComparison.OrdinalIgnoreCase);
}
