namespace WaveSim.Core.Lines;

/// <summary>The complete elliptic integral of the first kind, K, by the arithmetic-geometric mean.</summary>
/// <remarks>
/// K(k) = pi / (2 AGM(1, k')), k' = sqrt(1 - k^2) (Abramowitz and Stegun, Handbook of Mathematical
/// Functions, 1964, eq. 17.6.1 and Sec. 17.6). The AGM converges quadratically: a few iterations give full precision.
/// </remarks>
public static class EllipticIntegral
{
    /// <summary>The arithmetic-geometric mean of two non-negative numbers.</summary>
    public static double Agm(double a, double b)
    {
        if (a < 0 || b < 0 || double.IsNaN(a) || double.IsNaN(b))
            throw new ArgumentOutOfRangeException(nameof(a), "AGM needs two non-negative numbers.");
        for (int i = 0; i < 64 && Math.Abs(a - b) > 1e-16 * Math.Max(a, b); i++)
            (a, b) = (0.5 * (a + b), Math.Sqrt(a * b));
        return 0.5 * (a + b);
    }

    /// <summary>K(k) for the modulus k (not the parameter m = k^2). Must be 0 &lt;= k &lt; 1.</summary>
    public static double K(double k)
    {
        if (!(k >= 0 && k < 1))
            throw new ArgumentOutOfRangeException(nameof(k), "The modulus must be in [0, 1).");
        return KFromComplement(Math.Sqrt((1 - k) * (1 + k)));
    }

    /// <summary>
    /// K(k) given the complementary modulus k' = sqrt(1 - k^2) directly, which keeps full precision when k is
    /// close to 1. Must be 0 &lt; k' &lt;= 1.
    /// </summary>
    public static double KFromComplement(double kPrime)
    {
        if (!(kPrime > 0 && kPrime <= 1))
            throw new ArgumentOutOfRangeException(nameof(kPrime), "The complementary modulus must be in (0, 1].");
        return Math.PI / (2 * Agm(1, kPrime));
    }
}
