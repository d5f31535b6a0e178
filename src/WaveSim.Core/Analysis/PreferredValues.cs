namespace WaveSim.Core.Analysis;

/// <summary>
/// Standard resistor values: the E24 and E96 series and rounding of a computed value to the nearest one.
/// </summary>
/// <remarks>
/// Tables typed in from IEC 60063:2015, "Preferred number series for resistors and capacitors".
/// E96 equals round(100·10^(i/96)) for every i; E24 keeps its historical values, eight of which
/// (27 30 33 36 39 43 47 82) differ from round(10·10^(i/24)).
/// </remarks>
public static class PreferredValues
{
    /// <summary>E24 values of one decade, as printed (10 … 91).</summary>
    public static IReadOnlyList<int> E24 { get; } =
    [
        10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91,
    ];

    /// <summary>E96 values of one decade, as printed (100 … 976).</summary>
    public static IReadOnlyList<int> E96 { get; } =
    [
        100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158,
        162, 165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255,
        261, 267, 274, 280, 287, 294, 301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412,
        422, 432, 442, 453, 464, 475, 487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665,
        681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976,
    ];

    /// <summary>The printed values of a series (E24: 10…91, E96: 100…976).</summary>
    public static IReadOnlyList<int> Table(PreferredSeries series) => series switch
    {
        PreferredSeries.E24 => E24,
        PreferredSeries.E96 => E96,
        _ => throw new InputException($"unknown preferred-value series '{series}'; expected E24 or E96."),
    };

    /// <summary>
    /// The series value nearest to <paramref name="ohms"/> in log space: the boundary between two neighbours
    /// a &lt; b is their geometric mean √(a·b); an exact tie goes to the larger value. Works across decades
    /// (9.9 Ω → 10 Ω in E24) and in any decade, typically 0.1 Ω … 10 MΩ.
    /// </summary>
    /// <param name="ohms">Resistance [Ω], finite and greater than 0.</param>
    /// <param name="series">E24 or E96.</param>
    /// <returns>The preferred value [Ω].</returns>
    /// <exception cref="InputException">Resistance not positive or not finite.</exception>
    public static double Nearest(double ohms, PreferredSeries series)
    {
        if (!(ohms > 0) || !double.IsFinite(ohms))
            throw new InputException($"resistance {ohms} ohm cannot be rounded to a preferred value: expected a finite value greater than 0.");
        var table = Table(series);
        int digits = series == PreferredSeries.E24 ? 1 : 2;   // printed values carry 2 or 3 figures
        int decade = (int)Math.Floor(Math.Log10(ohms));
        double best = double.NaN, bestDistance = double.PositiveInfinity;
        // Candidates from the decade below to the one above cover mantissas that round across a boundary.
        for (int d = decade - 1; d <= decade + 1; d++)
        {
            foreach (int printed in table)
            {
                double candidate = Scale(printed, d - digits);
                double distance = Math.Abs(Math.Log(ohms / candidate));
                if (distance < bestDistance || (distance == bestDistance && candidate > best))
                {
                    best = candidate;
                    bestDistance = distance;
                }
            }
        }
        return best;
    }

    /// <summary>printed·10^k, dividing for negative k so that e.g. 47·10^-1 is the double nearest 4.7.</summary>
    static double Scale(int printed, int k) => k >= 0 ? printed * Math.Pow(10, k) : printed / Math.Pow(10, -k);
}
