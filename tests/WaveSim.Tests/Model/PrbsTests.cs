using WaveSim.Core.Model;

namespace WaveSim.Tests.Model;

/// <summary>
/// The PRBS generator against its definition: ITU-T Rec. O.150 (05/96), section 5, for PRBS9, PRBS15, PRBS23 and PRBS31, and
/// x^7 + x^6 + 1 for PRBS7 (the serial-link test pattern; not an O.150 sequence, from memory). Stage j of the register holds
/// the bit made j steps earlier, and the sum of the two tapped stages is fed back, so s_k = s_(k−n) ⊕ s_(k−t).
/// ReferenceData/prbs.md states the sources and the properties used here.
/// </summary>
/// <remarks>
/// What is run in full: every period of order 7, 9, 15 and 23 (at most 2^23 − 1 = 8 388 607 bits). PRBS31's period of
/// 2^31 − 1 bits cannot be held in one .NET array (Array.MaxLength is 2^31 − 57), so for it the test checks the recurrence
/// on the first 2^20 bits and proves the period from the polynomial: 2^31 − 1 is prime, so an irreducible x^31 + x^28 + 1
/// is primitive, and irreducibility of a prime-degree polynomial is Rabin's test (ReferenceData/prbs.md §2).
/// </remarks>
public class PrbsTests
{
    /// <summary>(order n, other tap t) from the O.150 polynomials x^n + x^t + 1, written out here rather than read from Prbs.Taps.</summary>
    public static TheoryData<int, int> Polynomials => new() { { 7, 6 }, { 9, 5 }, { 15, 14 }, { 23, 18 }, { 31, 28 } };

    /// <summary>The orders whose full period is short enough to run.</summary>
    public static TheoryData<int> RunnableOrders => new() { 7, 9, 15, 23 };

    [Fact]
    public void The_supported_orders_are_those_of_the_standard_polynomials()
    {
        // O.150 section 5 (and x^7 + x^6 + 1 for PRBS7): the second tap of each polynomial x^n + x^t + 1.
        Assert.Equal(new Dictionary<int, int> { [7] = 6, [9] = 5, [15] = 14, [23] = 18, [31] = 28 }, Prbs.Taps);
    }

    [Fact]
    public void The_first_bits_of_PRBS7_from_the_all_ones_register_are_the_ones_worked_out_by_hand()
    {
        // Worked by hand from s_k = s_(k−7) ⊕ s_(k−6), seed s_(−7) … s_(−1) = 1 (the seed itself is not emitted):
        //   s_0 … s_5 = 1⊕1 = 0;  s_6 = s_(−1)⊕s_0 = 1;  s_7 = s_0⊕s_1 = 0;  s_8 … s_11 = 0 (all taps zero);
        //   s_12 = s_5⊕s_6 = 1;  s_13 = s_6⊕s_7 = 1;  s_14 … s_17 = 0;  s_18 = s_11⊕s_12 = 1;  s_19 = s_12⊕s_13 = 0;
        //   s_20 = s_13⊕s_14 = 1;  s_21 … s_23 = 0;  s_24 = s_17⊕s_18 = 1;  s_25 = s_18⊕s_19 = 1;  s_26 = s_19⊕s_20 = 1;
        //   s_27 = s_20⊕s_21 = 1;  s_28 = s_21⊕s_22 = 0;  s_29 = s_22⊕s_23 = 0;  s_30 = s_23⊕s_24 = 1;  s_31 = s_24⊕s_25 = 0.
        const string expected = "0000001" + "0000011" + "0000101" + "0001111" + "0010";
        var bits = Prbs.Generate(7);
        Assert.Equal(expected, new string(bits.Take(expected.Length).Select(b => b ? '1' : '0').ToArray()));
        // The register ends a period where it began: the last seven bits are the seed's seven ones.
        Assert.All(bits[^7..], Assert.True);
    }

    [Theory]
    [MemberData(nameof(Polynomials))]
    public void Every_bit_follows_the_recurrence_of_the_polynomial(int n, int t)
    {
        // s_k = s_(k−n) ⊕ s_(k−t), with the all-ones seed standing for s_(−n) … s_(−1). For PRBS23 and PRBS31 the first 2^20 bits.
        var bits = Prbs.Generate(n);
        bool S(int k) => k < 0 || bits[k];
        for (int k = 0; k < bits.Length; k++)
            if (bits[k] != (S(k - n) ^ S(k - t)))
                Assert.Fail($"PRBS{n}: bit {k} breaks s_k = s_(k-{n}) xor s_(k-{t})");
        Assert.Equal(Math.Min((1 << n) - 1, 1 << 20), bits.Length);   // Generate's default cut is 2^20 bits
    }

    [Theory]
    [MemberData(nameof(RunnableOrders))]
    public void The_period_is_exactly_2n_minus_1_and_holds_every_nonzero_state_once(int n)
    {
        // Maximal length (Golomb 1967, ch. III; from memory): the n-bit windows of one period, read cyclically, are the
        // 2^n − 1 non-zero states, each once. Then no shorter period exists (a shorter one would repeat a window).
        long period = (1L << n) - 1;
        var bits = Prbs.Generate(n, int.MaxValue);
        Assert.Equal(period, bits.Length);
        var seen = new bool[1 << n];
        int window = 0, mask = (1 << n) - 1;
        for (int k = 0; k < bits.Length + n - 1; k++)
        {
            window = ((window << 1) | (bits[k % bits.Length] ? 1 : 0)) & mask;
            if (k < n - 1) continue;
            Assert.False(window == 0, $"PRBS{n}: the all-zeros state at bit {k}");
            Assert.False(seen[window], $"PRBS{n}: state {window} repeats at bit {k}, before the end of the period");
            seen[window] = true;
        }
        Assert.Equal(period, seen.Count(x => x));
    }

    [Theory]
    [MemberData(nameof(RunnableOrders))]
    public void A_period_holds_2n_minus_1_ones_and_one_zero_fewer(int n)
    {
        // Balance (Golomb's first postulate): 2^(n−1) ones and 2^(n−1) − 1 zeros per period.
        var bits = Prbs.Generate(n, int.MaxValue);
        Assert.Equal(1L << (n - 1), bits.LongCount(b => b));
        Assert.Equal((1L << (n - 1)) - 1, bits.LongCount(b => !b));
    }

    [Theory]
    [InlineData(7, 6)]
    [InlineData(31, 28)]
    public void The_polynomial_is_primitive_where_2n_minus_1_is_prime(int n, int t)
    {
        // 2^7 − 1 = 127 and 2^31 − 1 are (Mersenne) primes, so the order of x modulo an irreducible p of degree n divides a
        // prime and is not 1: p is primitive and every non-zero seed gives period 2^n − 1. For prime n, Rabin (SIAM J. Comput.
        // 9(2), 1980): p is irreducible iff x^(2^n) ≡ x (mod p) and gcd(x^2 − x, p) = 1, i.e. p(0) = p(1) = 1.
        Assert.True(IsPrime((1L << n) - 1));
        ulong p = (1UL << n) | (1UL << t) | 1UL;
        Assert.True((p & 1) == 1 && ulong.PopCount(p) % 2 == 1, "p has a root in GF(2)");
        ulong x = 2;                                            // the polynomial x
        for (int i = 0; i < n; i++) x = MulMod(x, x, p, n);     // x^(2^i) → x^(2^(i+1))
        Assert.Equal(2UL, x);
    }

    [Fact]
    public void The_primitivity_test_rejects_a_reducible_polynomial()
    {
        // Without roots but reducible: (x^3 + x + 1)(x^4 + x + 1) = x^7 + x^5 + x^4 + x^4 + x^3 + x^2 + x + x + 1
        // = x^7 + x^5 + x^3 + x^2 + 1 (multiplied out by hand; pairs cancel in GF(2)). Its factors have degrees 3 and 4, not
        // 1 or 7, so x^(2^7) ≢ x modulo it and the test above must say no.
        ulong reducible = (1UL << 7) | (1UL << 5) | (1UL << 3) | (1UL << 2) | 1UL;
        Assert.Equal(reducible, ClMul(0b1011, 0b10011));
        ulong x = 2;
        for (int i = 0; i < 7; i++) x = MulMod(x, x, reducible, 7);
        Assert.NotEqual(2UL, x);
    }

    /// <summary>Carry-less (GF(2)) product of two polynomials held as bit masks.</summary>
    static ulong ClMul(ulong a, ulong b)
    {
        ulong r = 0;
        for (int i = 0; i < 64 && b >> i != 0; i++)
            if ((b >> i & 1) == 1) r ^= a << i;
        return r;
    }

    /// <summary>a·b mod p in GF(2)[x], p of degree n ≤ 31 (a, b of degree below n, so the product fits in 62 bits).</summary>
    static ulong MulMod(ulong a, ulong b, ulong p, int n)
    {
        ulong r = ClMul(a, b);
        for (int d = 2 * n - 2; d >= n; d--)
            if ((r >> d & 1) == 1) r ^= p << (d - n);
        return r;
    }

    static bool IsPrime(long m)
    {
        for (long d = 2; d * d <= m; d++)
            if (m % d == 0) return false;
        return m > 1;
    }
}
