namespace WaveSim.Core.Rendering;

/// <summary>
/// Axis tick steps of 1, 2 or 5 times a power of ten.
/// Rule (common practice, no source): the step is the smallest such value that splits the span into at most
/// the requested number of intervals; ticks are the integer multiples of the step.
/// </summary>
public static class NiceTicks
{
    static readonly double[] Mantissas = [1, 2, 5, 10];

    /// <summary>The tick step for a span.</summary>
    /// <param name="span">Axis span (max − min). Must be finite and greater than 0.</param>
    /// <param name="maxIntervals">Most intervals allowed. Must be at least 1.</param>
    public static double Step(double span, int maxIntervals)
    {
        if (!(span > 0) || !double.IsFinite(span)) throw new ArgumentOutOfRangeException(nameof(span), "Must be finite and greater than zero.");
        if (maxIntervals < 1) throw new ArgumentOutOfRangeException(nameof(maxIntervals), "Must be at least 1.");
        return StepFor(span / maxIntervals, span);
    }

    /// <summary>
    /// The 1-2-5 step at least <paramref name="raw"/> (the span per interval). At the ends of the double range the nice step
    /// can underflow to 0 or overflow to infinity; then the step is the largest finite nice value or <paramref name="span"/>
    /// itself (one interval), so that any finite span gets a finite, positive step.
    /// </summary>
    static double StepFor(double raw, double span)
    {
        if (!(raw > 0)) return span; // a span of a few subnormals split further underflows
        if (!double.IsFinite(raw)) return 1e308;
        int exponent = (int)Math.Floor(Math.Log10(raw));
        foreach (double m in Mantissas)
        {
            double step = Scaled(m, exponent);
            if (double.IsInfinity(step)) return 1e308;
            if (step >= raw * (1 - 1e-9)) return step;
        }
        return span; // only when 10^e underflows below raw: one interval
    }

    /// <summary>The step for [min, max] even when max − min overflows: the span per interval is taken from the halves.</summary>
    static double StepOf(double min, double max, int maxIntervals)
    {
        double span = CheckedSpan(min, max);
        if (maxIntervals < 1) throw new ArgumentOutOfRangeException(nameof(maxIntervals), "Must be at least 1.");
        if (double.IsFinite(span)) return Step(span, maxIntervals);
        return StepFor((max / 2 - min / 2) / maxIntervals * 2, double.MaxValue);
    }

    /// <summary>Ticks inside [min, max] (the axis keeps its range), e.g. 0..3.3 with 4 intervals → 0, 1, 2, 3.</summary>
    /// <param name="min">Axis start.</param>
    /// <param name="max">Axis end. Must be greater than <paramref name="min"/>.</param>
    /// <param name="maxIntervals">Most intervals the step may split the span into.</param>
    public static double[] Within(double min, double max, int maxIntervals)
    {
        double step = StepOf(min, max, maxIntervals);
        long first = (long)Math.Ceiling(min / step - 1e-9), last = (long)Math.Floor(max / step + 1e-9);
        // The 1e-9 tolerance admits a tick a rounding error outside; with subnormal steps that error shows: keep it inside.
        return Multiples(first, last, step).Select(t => Math.Clamp(t, min, max)).ToArray();
    }

    /// <summary>
    /// Ticks whose first and last enclose [min, max] (the axis grows to them),
    /// e.g. 0..3.3 with 8 intervals → 0, 0.5, …, 3.5.
    /// </summary>
    /// <param name="min">Data minimum.</param>
    /// <param name="max">Data maximum. Must be greater than <paramref name="min"/>.</param>
    /// <param name="maxIntervals">Most intervals the step may split the data span into.</param>
    public static double[] Covering(double min, double max, int maxIntervals)
    {
        double step = StepOf(min, max, maxIntervals);
        long first = (long)Math.Floor(min / step + 1e-9), last = (long)Math.Ceiling(max / step - 1e-9);
        // Near ±1.8e308 the enclosing multiple overflows: stop at the last finite one.
        if (double.IsInfinity(first * step)) first++;
        if (double.IsInfinity(last * step)) last--;
        return Multiples(first, last, step);
    }

    /// <summary>max − min, which may be infinite when both are finite but far apart (−1e308..1e308).</summary>
    static double CheckedSpan(double min, double max)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max) || !(max > min))
            throw new ArgumentException($"Axis range {min}..{max} must be finite with max > min.");
        return max - min;
    }

    static double[] Multiples(long first, long last, double step)
    {
        // k × step computed through the decimal mantissa so that 3 × 0.1 prints as 0.3, not 0.30000000000000004.
        int exponent = (int)Math.Floor(Math.Log10(step) + 1e-9);
        double mantissa = Math.Round(step / Math.Pow(10, exponent));
        // Near the ends of the double range 10^e is inexact or not finite: plain multiples of the step are then the best.
        bool decimalPath = Math.Abs(exponent) < 300 && mantissa is >= 1 and <= 10;
        var ticks = new double[Math.Max(0, last - first + 1)];
        for (long k = first; k <= last; k++)
        {
            double t = decimalPath ? Scaled(k * mantissa, exponent) : k * step;
            ticks[k - first] = t == 0 ? 0 : t; // no negative zero
        }
        return ticks;
    }

    // Below 1e-300 the divisor 10^-e would overflow to infinity (and the step to 0): divide in two stages.
    static double Scaled(double mantissa, int exponent) =>
        exponent >= 0 ? mantissa * Math.Pow(10, exponent)
        : exponent >= -300 ? mantissa / Math.Pow(10, -exponent)
        : mantissa / Math.Pow(10, -exponent - 300) / 1e300;
}
