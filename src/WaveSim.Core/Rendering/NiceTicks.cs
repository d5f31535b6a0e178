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
        double raw = span / maxIntervals;
        int exponent = (int)Math.Floor(Math.Log10(raw));
        foreach (double m in Mantissas)
        {
            double step = Scaled(m, exponent);
            if (step >= raw * (1 - 1e-9)) return step;
        }
        return Scaled(10, exponent); // not reached: 10 × 10^e > raw always
    }

    /// <summary>Ticks inside [min, max] (the axis keeps its range), e.g. 0..3.3 with 4 intervals → 0, 1, 2, 3.</summary>
    /// <param name="min">Axis start.</param>
    /// <param name="max">Axis end. Must be greater than <paramref name="min"/>.</param>
    /// <param name="maxIntervals">Most intervals the step may split the span into.</param>
    public static double[] Within(double min, double max, int maxIntervals)
    {
        double step = Step(CheckedSpan(min, max), maxIntervals);
        long first = (long)Math.Ceiling(min / step - 1e-9), last = (long)Math.Floor(max / step + 1e-9);
        return Multiples(first, last, step);
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
        double step = Step(CheckedSpan(min, max), maxIntervals);
        long first = (long)Math.Floor(min / step + 1e-9), last = (long)Math.Ceiling(max / step - 1e-9);
        return Multiples(first, last, step);
    }

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
        var ticks = new double[Math.Max(0, last - first + 1)];
        for (long k = first; k <= last; k++)
        {
            double t = Scaled(k * mantissa, exponent);
            ticks[k - first] = t == 0 ? 0 : t; // no negative zero
        }
        return ticks;
    }

    static double Scaled(double mantissa, int exponent) =>
        exponent >= 0 ? mantissa * Math.Pow(10, exponent) : mantissa / Math.Pow(10, -exponent);
}
