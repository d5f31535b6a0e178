using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace WaveSim.Core.Solver;

/// <summary>
/// The few vector operations the leapfrog kernel needs, over one vector width, so one kernel body serves 128, 256 and 512 bits.
/// Implemented by empty structs: the JIT compiles a separate, fully inlined copy of the kernel for each.
/// </summary>
/// <typeparam name="TVec">The vector type, e.g. <see cref="Vector256{T}"/> of double.</typeparam>
internal interface ISimdLanes<TVec> where TVec : struct
{
    /// <summary>Doubles per vector.</summary>
    static abstract int Count { get; }
    /// <summary>True when this width runs on hardware rather than in software.</summary>
    static abstract bool IsAccelerated { get; }
    /// <summary>Every lane set to <paramref name="x"/>.</summary>
    static abstract TVec Splat(double x);
    /// <summary>Loads Count doubles from p[k]; no bounds check.</summary>
    static abstract TVec Load(ref double p, nuint k);
    /// <summary>Stores Count doubles to p[k]; no bounds check.</summary>
    static abstract void Store(TVec x, ref double p, nuint k);
    /// <summary>Lane-wise a + b.</summary>
    static abstract TVec Add(TVec a, TVec b);
    /// <summary>Lane-wise a − b.</summary>
    static abstract TVec Sub(TVec a, TVec b);
    /// <summary>Lane-wise a · b.</summary>
    static abstract TVec Mul(TVec a, TVec b);
    /// <summary>Lane-wise a · b + c rounded once (IEEE 754 fusedMultiplyAdd), the same value as <see cref="Math.FusedMultiplyAdd"/>.</summary>
    static abstract TVec MulAdd(TVec a, TVec b, TVec c);
    /// <summary>[prev_last, cur_0, …, cur_(Count−2)]: the vector one element behind <paramref name="cur"/>.</summary>
    static abstract TVec ShiftIn(TVec prev, TVec cur);
}

/// <summary>Two doubles per vector (SSE2 / Arm64 AdvSimd).</summary>
internal readonly struct Lanes128 : ISimdLanes<Vector128<double>>
{
    public static int Count => Vector128<double>.Count;
    public static bool IsAccelerated => Vector128.IsHardwareAccelerated;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> Splat(double x) => Vector128.Create(x);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> Load(ref double p, nuint k) => Vector128.LoadUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static void Store(Vector128<double> x, ref double p, nuint k) => x.StoreUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> Add(Vector128<double> a, Vector128<double> b) => a + b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> Sub(Vector128<double> a, Vector128<double> b) => a - b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> Mul(Vector128<double> a, Vector128<double> b) => a * b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector128<double> MulAdd(Vector128<double> a, Vector128<double> b, Vector128<double> c) => Vector128.FusedMultiplyAdd(a, b, c);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector128<double> ShiftIn(Vector128<double> prev, Vector128<double> cur)
    {
        if (Sse2.IsSupported) return Sse2.Shuffle(prev, cur, 0b01);   // [prev1, cur0]
        return Vector128.Create(prev.GetElement(1), cur.GetElement(0));
    }
}

/// <summary>Four doubles per vector (AVX2).</summary>
internal readonly struct Lanes256 : ISimdLanes<Vector256<double>>
{
    public static int Count => Vector256<double>.Count;
    public static bool IsAccelerated => Vector256.IsHardwareAccelerated;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> Splat(double x) => Vector256.Create(x);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> Load(ref double p, nuint k) => Vector256.LoadUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static void Store(Vector256<double> x, ref double p, nuint k) => x.StoreUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> Add(Vector256<double> a, Vector256<double> b) => a + b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> Sub(Vector256<double> a, Vector256<double> b) => a - b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> Mul(Vector256<double> a, Vector256<double> b) => a * b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector256<double> MulAdd(Vector256<double> a, Vector256<double> b, Vector256<double> c) => Vector256.FusedMultiplyAdd(a, b, c);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector256<double> ShiftIn(Vector256<double> prev, Vector256<double> cur)
    {
        if (Avx.IsSupported)
        {
            // [p2, p3, c0, c1], then per 128-bit half pick (odd of the first, even of the second): [p3, c0, c1, c2].
            var mid = Avx.Permute2x128(prev, cur, 0x21);
            return Avx.Shuffle(mid, cur, 0b0101);
        }
        return Vector256.Create(prev.GetElement(3), cur.GetElement(0), cur.GetElement(1), cur.GetElement(2));
    }
}

/// <summary>Eight doubles per vector (AVX-512).</summary>
internal readonly struct Lanes512 : ISimdLanes<Vector512<double>>
{
    public static int Count => Vector512<double>.Count;
    public static bool IsAccelerated => Vector512.IsHardwareAccelerated;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> Splat(double x) => Vector512.Create(x);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> Load(ref double p, nuint k) => Vector512.LoadUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static void Store(Vector512<double> x, ref double p, nuint k) => x.StoreUnsafe(ref p, k);
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> Add(Vector512<double> a, Vector512<double> b) => a + b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> Sub(Vector512<double> a, Vector512<double> b) => a - b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> Mul(Vector512<double> a, Vector512<double> b) => a * b;
    [MethodImpl(MethodImplOptions.AggressiveInlining)] public static Vector512<double> MulAdd(Vector512<double> a, Vector512<double> b, Vector512<double> c) => Vector512.FusedMultiplyAdd(a, b, c);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<double> ShiftIn(Vector512<double> prev, Vector512<double> cur)
    {
        // Rotate both up one lane, then take lane 0 from prev: one permute each and a blend on AVX-512.
        var up = Vector512.Create(7L, 0, 1, 2, 3, 4, 5, 6);
        var first = Vector512.Create(-1L, 0, 0, 0, 0, 0, 0, 0).AsDouble();
        return Vector512.ConditionalSelect(first, Vector512.Shuffle(prev, up), Vector512.Shuffle(cur, up));
    }
}
