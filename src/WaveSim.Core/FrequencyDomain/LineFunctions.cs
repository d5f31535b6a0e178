using System.Numerics;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>Hyperbolic functions of a line's electrical length γl, in forms that neither overflow nor lose the ω → 0 limit.</summary>
internal static class LineFunctions
{
    /// <summary>sinh(z)/z, by its Taylor series near 0 (error below 1e-17 for |z| &lt; 0.1).</summary>
    public static Complex Sinhc(Complex z)
    {
        if (z.Magnitude > 0.1) return Complex.Sinh(z) / z;
        Complex z2 = z * z;
        return 1 + z2 / 6 * (1 + z2 / 20 * (1 + z2 / 42 * (1 + z2 / 72)));
    }
}
