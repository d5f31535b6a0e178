using System.Collections.Frozen;

namespace WaveSim.Core.Model;

/// <summary>Pseudo-random binary sequences from the ITU-T O.150 generator polynomials.</summary>
/// <remarks>ITU-T Recommendation O.150 (05/96), section 5: PRBS9 x^9+x^5+1, PRBS15 x^15+x^14+1, PRBS23 x^23+x^18+1,
/// PRBS31 x^31+x^28+1; PRBS7 x^7+x^6+1 is the short serial-link test pattern, not an O.150 sequence (from memory).
/// A Fibonacci shift register seeded with all ones; each bit is the feedback s_k = s_(k−n) ⊕ s_(k−t), not inverted
/// (O.150 sends its 2^15−1, 2^23−1 and 2^31−1 sequences inverted, from memory). Sources and checks:
/// tests/WaveSim.Tests/ReferenceData/prbs.md.</remarks>
public static class Prbs
{
    /// <summary>The orders supported, with the second tap of each polynomial.</summary>
    public static readonly IReadOnlyDictionary<int, int> Taps =
        new Dictionary<int, int> { [7] = 6, [9] = 5, [15] = 14, [23] = 18, [31] = 28 }.ToFrozenDictionary();

    /// <summary>One period (2^order − 1 bits) of the sequence, or <paramref name="maxBits"/> bits when that is fewer.</summary>
    /// <param name="order">7, 9, 15, 23 or 31.</param>
    /// <param name="maxBits">Upper bound on the bits returned (the long sequences are cut).</param>
    public static bool[] Generate(int order, int maxBits = 1 << 20)
    {
        if (!Taps.TryGetValue(order, out int tap))
            throw new ArgumentOutOfRangeException(nameof(order), "PRBS order must be 7, 9, 15, 23 or 31.");
        long period = (1L << order) - 1;
        int n = (int)Math.Min(period, maxBits);
        var bits = new bool[n];
        uint reg = (1u << order) - 1;
        for (int i = 0; i < n; i++)
        {
            uint b = ((reg >> (order - 1)) ^ (reg >> (tap - 1))) & 1u;
            reg = ((reg << 1) | b) & ((1u << order) - 1);
            bits[i] = b == 1;
        }
        return bits;
    }
}
