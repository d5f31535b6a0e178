using System.Globalization;

namespace WaveSim.Core.Output;

/// <summary>How every CSV the tool writes spells a number: invariant culture, round-trip precision, and never "-0".</summary>
internal static class CsvNumber
{
    /// <summary>The cell text of <paramref name="v"/>.</summary>
    public static string Format(double v) => (v + 0.0).ToString("R", CultureInfo.InvariantCulture); // + 0.0 turns -0 into 0
}
