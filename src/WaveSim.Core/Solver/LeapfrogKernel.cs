using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace WaveSim.Core.Solver;

/// <summary>
/// One leapfrog step inside a segment, current and voltage passes fused and vectorised.
/// </summary>
/// <remarks>
/// The step is I[k] ← Ci1·I[k] + Ci2·(V[k] − V[k+1]) for k in 0..n−1, then V[k] ← Cv1·V[k] + Cv2·(I[k−1] − I[k]) for k in 1..n−1
/// (Yee's staggered update, IEEE Trans. AP-14, 1966). The new V[k] needs only the new I[k−1], I[k] and the old V[k], so one sweep
/// does both passes: each vector of new currents is stored, shifted in with the previous one to form I[k−1], and used at once for
/// the voltages of the same cells, which no later load reads. That halves the memory traffic of two separate passes.
/// Each update is one product and one fused multiply-add, fma(Ci2, V[k] − V[k+1], Ci1·I[k]): the IEEE 754 fusedMultiplyAdd
/// rounds once, so the value is defined exactly and every width (and the scalar loops, through <see cref="Math.FusedMultiplyAdd"/>)
/// gives the same bits, while the fused operation saves an instruction per update on the floating-point ports that bound the loop.
/// </remarks>
internal static class LeapfrogKernel
{
    /// <summary>The widest vector width that runs on hardware here: 512, 256, 128, or 0 (scalar).</summary>
    public static int VectorBits =>
        Vector512.IsHardwareAccelerated ? 512 : Vector256.IsHardwareAccelerated ? 256 : Vector128.IsHardwareAccelerated ? 128 : 0;

    /// <summary>The new current of one half cell: fma(ci2, vk − vk1, ci1·ik).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Current(double ik, double vk, double vk1, double ci1, double ci2) => Math.FusedMultiplyAdd(ci2, vk - vk1, ci1 * ik);

    /// <summary>The new voltage of one interior node: fma(cv2, ik0 − ik1, cv1·vk), with ik0 the new current on its left.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Voltage(double vk, double ik0, double ik1, double cv1, double cv2) => Math.FusedMultiplyAdd(cv2, ik0 - ik1, cv1 * vk);

    /// <summary>One step with uniform coefficients, on the widest accelerated vector width.</summary>
    /// <param name="v">Node voltages V[0..n]; V[0] and V[n] are read, not written.</param>
    /// <param name="i">Half-cell currents I[0..n−1].</param>
    /// <param name="ci1">Current self coefficient Ci1.</param>
    /// <param name="ci2">Current coupling coefficient Ci2, S.</param>
    /// <param name="cv1">Voltage self coefficient Cv1.</param>
    /// <param name="cv2">Voltage coupling coefficient Cv2, ohm.</param>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Step(Span<double> v, Span<double> i, double ci1, double ci2, double cv1, double cv2)
    {
        CheckLengths(v.Length, i.Length);
        // Lossless: Ci1 = Cv1 = 1 exactly, and 1·x = x exactly, so dropping those products changes no bit.
        bool unit = ci1 == 1 && cv1 == 1;
        if (Vector512.IsHardwareAccelerated)
        {
            if (unit) Uniform<Lanes512, Vector512<double>, UnitSelf>(v, i, ci1, ci2, cv1, cv2);
            else Uniform<Lanes512, Vector512<double>, ScaledSelf>(v, i, ci1, ci2, cv1, cv2);
        }
        else if (Vector256.IsHardwareAccelerated)
        {
            if (unit) Uniform<Lanes256, Vector256<double>, UnitSelf>(v, i, ci1, ci2, cv1, cv2);
            else Uniform<Lanes256, Vector256<double>, ScaledSelf>(v, i, ci1, ci2, cv1, cv2);
        }
        else if (Vector128.IsHardwareAccelerated)
        {
            if (unit) Uniform<Lanes128, Vector128<double>, UnitSelf>(v, i, ci1, ci2, cv1, cv2);
            else Uniform<Lanes128, Vector128<double>, ScaledSelf>(v, i, ci1, ci2, cv1, cv2);
        }
        else ScalarTail(v, i, ci1, ci2, cv1, cv2, 0);
    }

    /// <summary>One step with a coefficient per cell (current coefficients per half cell, voltage coefficients per node).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Step(Span<double> v, Span<double> i, CellCoefficients c)
    {
        CheckLengths(v.Length, i.Length);
        c.Check(i.Length);
        if (Vector512.IsHardwareAccelerated) PerCell<Lanes512, Vector512<double>>(v, i, c);
        else if (Vector256.IsHardwareAccelerated) PerCell<Lanes256, Vector256<double>>(v, i, c);
        else if (Vector128.IsHardwareAccelerated) PerCell<Lanes128, Vector128<double>>(v, i, c);
        else PerCellTail(v, i, c, 0);
    }

    /// <summary>The uniform step on one chosen width (also runs in software where that width is not accelerated, for tests).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void Uniform<TL, TVec, TS>(Span<double> v, Span<double> i, double ci1, double ci2, double cv1, double cv2)
        where TL : struct, ISimdLanes<TVec> where TVec : struct where TS : struct, ISelfTerm
    {
        int n = i.Length, w = TL.Count, m = 0;
        if (n >= w)
        {
            ref double pv = ref MemoryMarshal.GetReference(v);
            ref double pi = ref MemoryMarshal.GetReference(i);
            TVec a = TL.Splat(ci1), b = TL.Splat(ci2), c = TL.Splat(cv1), d = TL.Splat(cv2), prev = default;
            double v0 = v[0];
            nuint k = 0, w1 = (nuint)w, w2 = 2 * w1, w3 = 3 * w1, w4 = 4 * w1, end4 = (nuint)(n - 4 * w), end1 = (nuint)(n - w);
            // Four vectors per turn: independent chains for the out-of-order core and a quarter of the loop overhead. Every load
            // of the turn comes before its stores, so each vector reads only old voltages, as in the scalar order.
            if (n >= 4 * w)
            {
                for (; k <= end4; k += w4)
                {
                    TVec v0k = TL.Load(ref pv, k), v1k = TL.Load(ref pv, k + w1), v2k = TL.Load(ref pv, k + w2), v3k = TL.Load(ref pv, k + w3);
                    TVec i0 = TL.MulAdd(b, TL.Sub(v0k, TL.Load(ref pv, k + 1)), Self<TL, TVec, TS>(a, TL.Load(ref pi, k)));
                    TVec i1 = TL.MulAdd(b, TL.Sub(v1k, TL.Load(ref pv, k + w1 + 1)), Self<TL, TVec, TS>(a, TL.Load(ref pi, k + w1)));
                    TVec i2 = TL.MulAdd(b, TL.Sub(v2k, TL.Load(ref pv, k + w2 + 1)), Self<TL, TVec, TS>(a, TL.Load(ref pi, k + w2)));
                    TVec i3 = TL.MulAdd(b, TL.Sub(v3k, TL.Load(ref pv, k + w3 + 1)), Self<TL, TVec, TS>(a, TL.Load(ref pi, k + w3)));
                    TL.Store(i0, ref pi, k);
                    TL.Store(i1, ref pi, k + w1);
                    TL.Store(i2, ref pi, k + w2);
                    TL.Store(i3, ref pi, k + w3);
                    TL.Store(TL.MulAdd(d, TL.Sub(TL.ShiftIn(prev, i0), i0), Self<TL, TVec, TS>(c, v0k)), ref pv, k);
                    TL.Store(TL.MulAdd(d, TL.Sub(TL.ShiftIn(i0, i1), i1), Self<TL, TVec, TS>(c, v1k)), ref pv, k + w1);
                    TL.Store(TL.MulAdd(d, TL.Sub(TL.ShiftIn(i1, i2), i2), Self<TL, TVec, TS>(c, v2k)), ref pv, k + w2);
                    TL.Store(TL.MulAdd(d, TL.Sub(TL.ShiftIn(i2, i3), i3), Self<TL, TVec, TS>(c, v3k)), ref pv, k + w3);
                    prev = i3;
                }
            }
            for (; k <= end1; k += w1)
            {
                TVec vk = TL.Load(ref pv, k);
                TVec iNew = TL.MulAdd(b, TL.Sub(vk, TL.Load(ref pv, k + 1)), Self<TL, TVec, TS>(a, TL.Load(ref pi, k)));
                TL.Store(iNew, ref pi, k);
                TL.Store(TL.MulAdd(d, TL.Sub(TL.ShiftIn(prev, iNew), iNew), Self<TL, TVec, TS>(c, vk)), ref pv, k);
                prev = iNew;
            }
            m = (int)k;
            v[0] = v0;   // the first vector also wrote the end node, which belongs to the junction
        }
        ScalarTail(v, i, ci1, ci2, cv1, cv2, m);
    }

    /// <summary>The per-cell step on one chosen width.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void PerCell<TL, TVec>(Span<double> v, Span<double> i, CellCoefficients c)
        where TL : struct, ISimdLanes<TVec> where TVec : struct
    {
        int n = i.Length, w = TL.Count, m = 0;
        if (n >= w)
        {
            ref double pv = ref MemoryMarshal.GetReference(v);
            ref double pi = ref MemoryMarshal.GetReference(i);
            ref double pa = ref MemoryMarshal.GetArrayDataReference(c.Ci1);
            ref double pb = ref MemoryMarshal.GetArrayDataReference(c.Ci2);
            ref double pc = ref MemoryMarshal.GetArrayDataReference(c.Cv1);
            ref double pd = ref MemoryMarshal.GetArrayDataReference(c.Cv2);
            TVec prev = default;
            double v0 = v[0];
            for (; m <= n - w; m += w)
            {
                nuint k = (nuint)m;
                TVec vk = TL.Load(ref pv, k);
                TVec iNew = TL.MulAdd(TL.Load(ref pb, k), TL.Sub(vk, TL.Load(ref pv, k + 1)), TL.Mul(TL.Load(ref pa, k), TL.Load(ref pi, k)));
                TL.Store(iNew, ref pi, k);
                TL.Store(TL.MulAdd(TL.Load(ref pd, k), TL.Sub(TL.ShiftIn(prev, iNew), iNew), TL.Mul(TL.Load(ref pc, k), vk)), ref pv, k);
                prev = iNew;
            }
            v[0] = v0;
        }
        PerCellTail(v, i, c, m);
    }

    /// <summary>c·x, or x itself when <typeparamref name="TS"/> says the coefficient is exactly 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    static TVec Self<TL, TVec, TS>(TVec c, TVec x) where TL : struct, ISimdLanes<TVec> where TVec : struct where TS : struct, ISelfTerm =>
        TS.IsUnit ? x : TL.Mul(c, x);

    /// <summary>Finishes a step from cell <paramref name="m"/>: I[m..n−1], then V[max(m,1)..n−1]; m = 0 is the whole scalar step.</summary>
    static void ScalarTail(Span<double> v, Span<double> i, double ci1, double ci2, double cv1, double cv2, int m)
    {
        int n = i.Length;
        for (int k = m; k < n; k++) i[k] = Current(i[k], v[k], v[k + 1], ci1, ci2);
        for (int k = Math.Max(m, 1); k < n; k++) v[k] = Voltage(v[k], i[k - 1], i[k], cv1, cv2);
    }

    static void PerCellTail(Span<double> v, Span<double> i, CellCoefficients c, int m)
    {
        int n = i.Length;
        for (int k = m; k < n; k++) i[k] = Current(i[k], v[k], v[k + 1], c.Ci1[k], c.Ci2[k]);
        for (int k = Math.Max(m, 1); k < n; k++) v[k] = Voltage(v[k], i[k - 1], i[k], c.Cv1[k], c.Cv2[k]);
    }

    static void CheckLengths(int nv, int ni)
    {
        if (nv != ni + 1) throw new ArgumentException($"the voltage array must have one more entry than the current array (got {nv} and {ni})");
    }
}

/// <summary>Whether the self coefficients Ci1, Cv1 of a uniform step are exactly 1 (a lossless segment).</summary>
internal interface ISelfTerm
{
    /// <summary>True when the products with Ci1 and Cv1 may be left out.</summary>
    static abstract bool IsUnit { get; }
}

/// <summary>Lossy: the self terms are multiplied.</summary>
internal readonly struct ScaledSelf : ISelfTerm
{
    public static bool IsUnit => false;
}

/// <summary>Lossless: Ci1 = Cv1 = 1.</summary>
internal readonly struct UnitSelf : ISelfTerm
{
    public static bool IsUnit => true;
}
