namespace WaveSim.Core.Tolerances;

/// <summary>
/// The SplitMix64 generator (G. Steele, D. Lea, C. Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014):
/// a 64-bit state advanced by the golden-ratio increment 0x9E3779B97F4A7C15 and scrambled by two xor-shift-multiply
/// rounds. Written here, not taken from <see cref="Random"/>, whose algorithm .NET does not specify, so a seed gives the
/// same values on every runtime.
/// </summary>
public struct SplitMix64
{
    const ulong Golden = 0x9E3779B97F4A7C15UL;
    ulong _state;

    /// <summary>A generator whose first output is <see cref="Mix"/>(<paramref name="seed"/> + golden increment).</summary>
    public SplitMix64(ulong seed) => _state = seed;

    /// <summary>
    /// The generator of sample <paramref name="index"/> of a run seeded with <paramref name="seed"/>: its state is
    /// Mix(seed) xor Mix(index + golden increment), so each sample's values depend on (seed, index) alone and never on
    /// which thread or shard draws them.
    /// </summary>
    public static SplitMix64 ForSample(ulong seed, long index) => new(Mix(seed) ^ Mix(unchecked((ulong)index + Golden)));

    /// <summary>The next 64-bit output.</summary>
    public ulong Next()
    {
        _state = unchecked(_state + Golden);
        return Mix(_state);
    }

    /// <summary>A double in [0, 1): the top 53 bits of the next output times 2^-53.</summary>
    public double NextUnit() => (Next() >> 11) * (1.0 / (1UL << 53));

    /// <summary>A standard normal deviate by the Box-Muller transform (G. E. P. Box, M. E. Muller, 1958) of two outputs; the second root is not kept.</summary>
    public double NextNormal()
    {
        double u1 = 1.0 - NextUnit();   // (0, 1]: the logarithm stays finite
        double u2 = NextUnit();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }

    /// <summary>The output function: two xor-shift-multiply rounds and a final xor-shift.</summary>
    public static ulong Mix(ulong z)
    {
        unchecked
        {
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }
}
