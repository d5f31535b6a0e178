namespace WaveSim.Tests.Lines;

/// <summary>Tolerance checks for values printed to a few digits in a reference.</summary>
internal static class Close
{
    /// <summary>
    /// Asserts |actual - expected| &lt;= max(relTol |expected|, half a unit of the last printed digit), so a
    /// reference value printed as 2.57 is not held to more digits than it has.
    /// </summary>
    public static void Check(double expected, double actual, double relTol, int printedDecimals = -1, string what = "")
    {
        double tol = relTol * Math.Abs(expected);
        if (printedDecimals >= 0) tol = Math.Max(tol, 0.5 * Math.Pow(10, -printedDecimals) * (1 + 1e-9));
        Assert.True(Math.Abs(actual - expected) <= tol,
            $"{what} expected {expected} ± {tol:G3}, got {actual} (rel. diff {(actual - expected) / expected:G3})");
    }

    /// <summary>Relative tolerance only.</summary>
    public static void Rel(double expected, double actual, double relTol, string what = "") => Check(expected, actual, relTol, -1, what);
}
