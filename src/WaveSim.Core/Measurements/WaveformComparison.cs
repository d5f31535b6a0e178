using System.Globalization;
using System.Numerics;
using MathNet.Numerics.IntegralTransforms;
using MathNet.Numerics.Interpolation;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Aligns a capture with a simulation and measures how far apart they are.
/// </summary>
/// <remarks>
/// Both records are resampled with linear interpolation (MathNet.Numerics <see cref="LinearSpline"/>): it adds no
/// overshoot of its own, which a cubic spline would at sharp edges. The grid step defaults to the finer of the two
/// median sample intervals (the median, so that a few odd gaps in an unevenly sampled capture do not set it).
/// </remarks>
public static class WaveformComparison
{
    /// <summary>Largest grid the comparison will build, points. A finer step is refused with an error.</summary>
    public const int MaxGridPoints = 4_000_000;

    /// <summary>Aligns the capture with the simulation, resamples both on their overlap and forms the residual.</summary>
    /// <param name="simT">Simulated sample times, s, strictly increasing.</param>
    /// <param name="simV">Simulated values, V.</param>
    /// <param name="capT">Captured sample times, s, strictly increasing (any origin, any spacing).</param>
    /// <param name="capV">Captured values, V.</param>
    /// <param name="mode">How to find the time offset of the capture.</param>
    /// <param name="step">Grid step, s. Default (null): the finer of the two median sample intervals. Must be positive.</param>
    /// <returns>The offset, the common grid, both waveforms on it and the residual statistics.</returns>
    /// <exception cref="InputException">Too few samples, time not increasing, no overlap after alignment, or a flat waveform that cannot be aligned.</exception>
    public static AlignedWaveforms Compare(double[] simT, double[] simV, double[] capT, double[] capV, AlignMode mode, double? step = null)
    {
        Validate(simT, simV, "simulation");
        Validate(capT, capV, "capture");
        double simStep = MedianStep(simT), capStep = MedianStep(capT);
        double dt = step ?? Math.Min(simStep, capStep);
        if (!(dt > 0) || !double.IsFinite(dt))
            throw new InputException($"comparison step must be a positive time, got {Text(dt)} s");
        // Advice the user can follow: say which record sets the step (no command has a step option).
        string tooFine = step is not null ? "pass a coarser step"
            : simStep <= capStep ? "the simulation's sample interval sets the step: set a coarser simulation.output_step"
            : "the capture's sample interval sets the step: compare a capture sampled less finely (every k-th row) or a shorter one";

        double offset = mode switch
        {
            AlignMode.None => 0.0,
            AlignMode.Edge50 => Crossing50Of(simT, simV, "simulation") - Crossing50Of(capT, capV, "capture"),
            AlignMode.CrossCorrelation => CorrelationOffset(simT, simV, capT, capV, dt, tooFine),
            _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, "Unknown alignment mode."),
        };

        double t0 = Math.Max(simT[0], capT[0] + offset);
        double t1 = Math.Min(simT[^1], capT[^1] + offset);
        if (!(t1 > t0))
            throw new InputException(
                $"the capture and the simulation do not overlap in time after alignment (capture shifted by {Text(offset)} s)");
        int n = GridCount(t1 - t0, dt, tooFine);
        if (n < 2)
            throw new InputException($"the overlap of capture and simulation ({Text(t1 - t0)} s) is shorter than one grid step ({Text(dt)} s)");

        var sim = LinearSpline.InterpolateSorted(simT, simV);
        var cap = LinearSpline.InterpolateSorted(capT.Select(t => t + offset).ToArray(), capV);
        var grid = new double[n];
        var s = new double[n];
        var c = new double[n];
        var r = new double[n];
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        for (int k = 0; k < n; k++)
        {
            // The last point is clamped so that rounding never steps past the overlap.
            double t = Math.Min(t0 + k * dt, t1);
            grid[k] = t;
            s[k] = sim.Interpolate(t);
            c[k] = cap.Interpolate(t);
            r[k] = c[k] - s[k];
            min = Math.Min(min, s[k]);
            max = Math.Max(max, s[k]);
        }

        (double rms, double peak) = ResidualAtCaptureSamples(sim, capT, capV, offset, t0, t1, r);
        double swing = max - min;
        double rmsPct = swing > 0 ? 100 * rms / swing : double.NaN;
        double peakPct = swing > 0 ? 100 * peak / swing : double.NaN;
        return new AlignedWaveforms(offset, grid, s, c, r, rms, peak, rmsPct, peakPct);
    }

    /// <summary>
    /// RMS and peak of captured minus simulated at the capture's own samples inside the overlap, as <c>fit</c> measures it.
    /// Between two capture samples the interpolated capture is an average of two noisy values, so a grid finer than the
    /// capture would understate the noise (by √(3/4) for white noise on a grid twice as fine).
    /// </summary>
    static (double Rms, double Peak) ResidualAtCaptureSamples(LinearSpline sim, double[] capT, double[] capV, double offset,
        double t0, double t1, double[] gridResidual)
    {
        double sumSq = 0, peak = 0;
        int count = 0;
        for (int k = 0; k < capT.Length; k++)
        {
            double t = capT[k] + offset;
            if (t < t0 || t > t1)
                continue;
            double d = capV[k] - sim.Interpolate(t);
            sumSq += d * d;
            peak = Math.Max(peak, Math.Abs(d));
            count++;
        }
        if (count > 0)
            return (Math.Sqrt(sumSq / count), peak);
        // No capture sample falls inside a very short overlap: fall back on the grid.
        foreach (double d in gridResidual)
        {
            sumSq += d * d;
            peak = Math.Max(peak, Math.Abs(d));
        }
        return (Math.Sqrt(sumSq / gridResidual.Length), peak);
    }

    /// <summary>
    /// Time of the first 50 % crossing, with linear interpolation between the two samples that straddle it.
    /// </summary>
    /// <remarks>
    /// The 50 % level lies midway between the initial and the final level (each the mean of the first / last 2 %
    /// of the samples, at least one), and only a crossing in the direction initial → final counts: overshoot and
    /// ringing do not move it. When the record returns to about where it started (initial and final differ by less
    /// than 10 % of max - min, e.g. a pulse), the level is midway between min and max and the first crossing
    /// either way counts.
    /// </remarks>
    /// <param name="t">Sample times, s, strictly increasing.</param>
    /// <param name="v">Sample values, V.</param>
    /// <returns>The crossing time, s.</returns>
    /// <exception cref="InputException">The waveform is flat or never crosses its 50 % level.</exception>
    public static double Crossing50(double[] t, double[] v) => Crossing50Of(t, v, "waveform");

    static double Crossing50Of(double[] t, double[] v, string what)
    {
        Validate(t, v, what);
        int n = v.Length;
        int w = Math.Max(1, n / 50);
        double initial = 0, final = 0;
        for (int i = 0; i < w; i++)
        {
            initial += v[i] / w;
            final += v[n - 1 - i] / w;
        }
        double min = v.Min(), max = v.Max();
        if (!(max > min))
            throw new InputException($"the {what} is flat: it has no 50 % crossing to align on");

        bool step = Math.Abs(final - initial) >= 0.1 * (max - min);
        double level = step ? 0.5 * (initial + final) : 0.5 * (min + max);
        int direction = step ? Math.Sign(final - initial) : 0;
        for (int i = 0; i + 1 < n; i++)
        {
            bool rising = v[i] < level && v[i + 1] >= level;
            bool falling = v[i] > level && v[i + 1] <= level;
            if ((direction >= 0 && rising) || (direction <= 0 && falling))
                return t[i] + (level - v[i]) / (v[i + 1] - v[i]) * (t[i + 1] - t[i]);
        }
        throw new InputException($"the {what} never crosses its 50 % level ({Text(level)} V)");
    }

    /// <summary>
    /// Offset maximising the correlation coefficient of the two waveforms resampled at <paramref name="dt"/>, each
    /// with its mean over the overlap removed, over lags where the records overlap by at least half the shorter one;
    /// the peak is refined by a parabola through it and its two neighbours.
    /// </summary>
    /// <remarks>
    /// Normalising over the overlap matters: a raw product sum Σ a[k]·b[k-L] of records of different extent has a
    /// lopsided peak around a step and settles several samples off. The sums Σa·b for all lags come from one FFT
    /// product (MathNet <see cref="Fourier"/>), the overlap sums Σa, Σa², Σb, Σb² from running totals (the scheme of
    /// J. P. Lewis, "Fast normalized cross-correlation", Vision Interface 1995; from memory).
    /// </remarks>
    static double CorrelationOffset(double[] simT, double[] simV, double[] capT, double[] capV, double dt, string tooFine)
    {
        double[] a = Resample(simT, simV, dt, tooFine);
        double[] b = Resample(capT, capV, dt, tooFine);
        int ns = a.Length, nc = b.Length;
        RemoveMean(a);   // keeps the running sums well conditioned; the coefficient does not depend on it
        RemoveMean(b);

        int size = 1;
        while (size < ns + nc - 1)
            size <<= 1;
        var fa = new Complex[size];
        var fb = new Complex[size];
        for (int k = 0; k < ns; k++) fa[k] = a[k];
        for (int k = 0; k < nc; k++) fb[k] = b[k];
        Fourier.Forward(fa, FourierOptions.Matlab);
        Fourier.Forward(fb, FourierOptions.Matlab);
        for (int k = 0; k < size; k++)
            fa[k] *= Complex.Conjugate(fb[k]);
        Fourier.Inverse(fa, FourierOptions.Matlab);   // fa[L mod size] = Σ_k a[k]·b[k-L]

        double[] sa = Prefix(a, false), saa = Prefix(a, true), sb = Prefix(b, false), sbb = Prefix(b, true);
        double Coefficient(int lag)
        {
            int k0 = Math.Max(0, lag), k1 = Math.Min(ns, nc + lag);
            int m = k1 - k0;
            if (m < 2)
                return double.NaN;
            double sumA = sa[k1] - sa[k0], sumAA = saa[k1] - saa[k0];
            double sumB = sb[k1 - lag] - sb[k0 - lag], sumBB = sbb[k1 - lag] - sbb[k0 - lag];
            double sumAB = fa[((lag % size) + size) % size].Real;
            double varA = sumAA - sumA * sumA / m, varB = sumBB - sumB * sumB / m;
            double floor = 1e-12 * Math.Max(saa[ns], sbb[nc]);
            if (!(varA > floor) || !(varB > floor))
                return double.NaN;   // one side is flat over this overlap: no information
            return (sumAB - sumA * sumB / m) / Math.Sqrt(varA * varB);
        }

        int minOverlap = Math.Max(2, Math.Min(ns, nc) / 2);
        int best = int.MinValue;
        double bestValue = double.NegativeInfinity;
        for (int lag = -(nc - 1); lag <= ns - 1; lag++)
        {
            int overlap = Math.Min(ns, nc + lag) - Math.Max(0, lag);
            if (overlap < minOverlap)
                continue;
            double value = Coefficient(lag);
            if (value > bestValue)
            {
                bestValue = value;
                best = lag;
            }
        }
        if (best == int.MinValue)
            throw new InputException("a flat waveform cannot be aligned by correlation; use edge or no alignment");

        double ym = Coefficient(best - 1), y0 = bestValue, yp = Coefficient(best + 1);
        double curvature = ym - 2 * y0 + yp;
        double frac = double.IsFinite(curvature) && curvature < 0 ? Math.Clamp(0.5 * (ym - yp) / curvature, -0.5, 0.5) : 0.0;
        return simT[0] - capT[0] + (best + frac) * dt;
    }

    static double[] Prefix(double[] x, bool squares)
    {
        var p = new double[x.Length + 1];
        for (int i = 0; i < x.Length; i++)
            p[i + 1] = p[i] + (squares ? x[i] * x[i] : x[i]);
        return p;
    }

    static double[] Resample(double[] t, double[] v, double dt, string tooFine)
    {
        int n = GridCount(t[^1] - t[0], dt, tooFine);
        var spline = LinearSpline.InterpolateSorted(t, v);
        var y = new double[n];
        for (int k = 0; k < n; k++)
            y[k] = spline.Interpolate(Math.Min(t[0] + k * dt, t[^1]));
        return y;
    }

    static int GridCount(double span, double dt, string tooFine)
    {
        double count = Math.Floor(span / dt * (1 + 1e-12)) + 1;
        if (count > MaxGridPoints)
            throw new InputException(
                $"the comparison grid would have {count:0} points (step {Text(dt)} s over {Text(span)} s), more than the {MaxGridPoints} it may hold; {tooFine}");
        return (int)count;
    }

    static void RemoveMean(double[] x)
    {
        double mean = x.Average();
        for (int i = 0; i < x.Length; i++)
            x[i] -= mean;
    }

    static double MedianStep(double[] t)
    {
        var d = new double[t.Length - 1];
        for (int i = 0; i < d.Length; i++)
            d[i] = t[i + 1] - t[i];
        Array.Sort(d);
        return d[d.Length / 2];
    }

    static void Validate(double[] t, double[] v, string what)
    {
        ArgumentNullException.ThrowIfNull(t);
        ArgumentNullException.ThrowIfNull(v);
        if (t.Length != v.Length)
            throw new ArgumentException($"The {what} has {t.Length} times but {v.Length} values.", nameof(v));
        if (t.Length < 2)
            throw new InputException($"the {what} has fewer than two samples");
        for (int i = 0; i < t.Length; i++)
        {
            if (!double.IsFinite(t[i]) || !double.IsFinite(v[i]))
                throw new InputException($"the {what} has a non-finite value at sample {i}");
            if (i > 0 && !(t[i] > t[i - 1]))
                throw new InputException($"the {what}'s time does not increase at sample {i} ({Text(t[i])} s after {Text(t[i - 1])} s)");
        }
    }

    static string Text(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
