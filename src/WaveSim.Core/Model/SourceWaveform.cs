namespace WaveSim.Core.Model;

/// <summary>
/// Evaluates a <see cref="SourceSpec"/>'s waveform. Edges are linear 0-100 % ramps lasting 1.25x the 10-90 % time; an edge
/// shorter than <see cref="SourceSpec.MinimumEdge"/> (a zero rise included) is instead a Gaussian-filtered step of that 10-90 time.
/// </summary>
/// <remarks>
/// The Gaussian-filtered step is ½(1 + erf((x − 4σ)/(σ√2))), cut at ±4σ and rescaled to run exactly from 0 to 1 over 8σ, with
/// σ = t₁₀₋₉₀/(2√2·erf⁻¹(0.8)) = t₁₀₋₉₀/2.5631. Its spectrum falls as exp(−(ωσ)²/2), so it carries almost nothing near the grid's
/// Nyquist frequency, where the leapfrog's numerical dispersion is largest (Taflove and Hagness, Computational Electrodynamics,
/// 3rd ed. 2005, ch. 2); a linear ramp's spectrum falls only as 1/ω² and rings more on a grid with Courant number below 1.
/// </remarks>
internal static class SourceWaveform
{
    /// <summary>0-100 % ramp length for a 10-90 % time: a linear ramp covers 80 % in 0.8 of its length.</summary>
    public static double Ramp(double tenNinety) => 1.25 * tenNinety;

    /// <summary>10-90 % time of a Gaussian-filtered step over its σ: 2√2·erf⁻¹(0.8).</summary>
    public const double GaussianTenNinetyOverSigma = 2.5631031310892;

    /// <summary>Half-length of the Gaussian-filtered edge, in σ: it is cut at ±4σ (the tail left out is 3.2e-5 on each side).</summary>
    const double GaussianHalfSpan = 4;

    /// <summary>Whether an edge of this 10-90 % time is widened to the source's minimum edge.</summary>
    public static bool Widened(SourceSpec s, double tenNinety) => tenNinety < s.MinimumEdge;

    /// <summary>0-100 % length of an edge of the given 10-90 % time, after widening.</summary>
    public static double EdgeLength(SourceSpec s, double tenNinety) =>
        Widened(s, tenNinety) ? 2 * GaussianHalfSpan * s.MinimumEdge / GaussianTenNinetyOverSigma : Ramp(tenNinety);

    /// <summary>Progress 0..1 of an edge of the given 10-90 % time, <paramref name="x"/> after it starts.</summary>
    public static double EdgeFraction(SourceSpec s, double x, double tenNinety)
    {
        if (!Widened(s, tenNinety)) return RampFraction(x, Ramp(tenNinety));
        double span = EdgeLength(s, tenNinety);
        if (x <= 0) return 0;
        if (x >= span) return 1;
        double sigma = s.MinimumEdge / GaussianTenNinetyOverSigma;
        return (Phi((x - GaussianHalfSpan * sigma) / sigma) - GaussianTail) / (1 - 2 * GaussianTail);
    }

    /// <summary>The Gaussian's mass beyond the cut at −<see cref="GaussianHalfSpan"/> σ, taken off so the edge starts at exactly 0.</summary>
    static readonly double GaussianTail = Phi(-GaussianHalfSpan);

    static double Phi(double z) => 0.5 * MathNet.Numerics.SpecialFunctions.Erfc(-z / Math.Sqrt(2));

    public static double Evaluate(SourceSpec s, double t)
    {
        double lo = s.Low, hi = s.High, swing = hi - lo;
        double x = t - s.Delay;
        switch (s.Waveform)
        {
            case WaveformKind.Step:
                return lo + swing * EdgeFraction(s, x, s.Rise);
            case WaveformKind.Pulse:
                return lo + swing * PulseFraction(x, s);
            case WaveformKind.Trapezoid:
                if (x < 0) return lo;
                return lo + swing * PulseFraction(x % s.Period, s);
            case WaveformKind.Gaussian:
            {
                double sigma = s.Width / (2 * Math.Sqrt(2 * Math.Log(2)));
                double d = x - 2 * s.Width;
                return lo + swing * Math.Exp(-d * d / (2 * sigma * sigma));
            }
            case WaveformKind.Sine:
                if (x < 0) return lo;
                return lo + swing * 0.5 * (1 - Math.Cos(2 * Math.PI * x / s.Period));
            case WaveformKind.Bits:
                return lo + swing * BitsFraction(x, s);
            case WaveformKind.Table:
                return Table(s, x);
            default:
                throw new InvalidOperationException(s.Waveform.ToString());
        }
    }

    static double RampFraction(double x, double ramp)
    {
        if (x <= 0) return 0;
        if (ramp <= 0 || x >= ramp) return 1;
        return x / ramp;
    }

    static double PulseFraction(double x, SourceSpec s)
    {
        double up = EdgeLength(s, s.Rise), down = EdgeLength(s, s.Fall);
        if (x <= 0) return 0;
        if (x < up) return EdgeFraction(s, x, s.Rise);
        x -= up;
        if (x <= s.Width) return 1;
        x -= s.Width;
        if (x < down) return 1 - EdgeFraction(s, x, s.Fall);
        return 0;
    }

    static double BitsFraction(double x, SourceSpec s)
    {
        if (x < 0 || s.Bits.Count == 0) return 0;
        long k = (long)Math.Floor(x / s.BitTime);
        double into = x - k * s.BitTime;
        bool now = Bit(s, k), before = k > 0 && Bit(s, k - 1);
        if (now == before) return now ? 1 : 0;
        double f = EdgeFraction(s, into, now ? s.Rise : s.Fall);
        return now ? f : 1 - f;
    }

    static bool Bit(SourceSpec s, long k) => s.Bits[(int)(k % s.Bits.Count)];

    static double Table(SourceSpec s, double x)
    {
        var (t, v) = (s.TableTime, s.TableVolts);
        if (x <= t[0]) return v[0];
        if (x >= t[^1]) return v[^1];
        int i = System.Collections.Immutable.ImmutableArray.BinarySearch(t, x);
        if (i >= 0) return v[i];
        i = ~i;
        double f = (x - t[i - 1]) / (t[i] - t[i - 1]);
        return v[i - 1] + f * (v[i] - v[i - 1]);
    }

    public static double ShortestFeature(SourceSpec s)
    {
        static double Pos(params double[] xs) => xs.Where(x => x > 0).DefaultIfEmpty(double.PositiveInfinity).Min();
        return s.Waveform switch
        {
            WaveformKind.Step => Pos(s.Rise),
            WaveformKind.Pulse or WaveformKind.Trapezoid => Pos(s.Rise, s.Fall, s.Width),
            WaveformKind.Gaussian => Pos(s.Width),
            WaveformKind.Sine => Pos(s.Period / 4),
            WaveformKind.Bits => Pos(s.Rise, s.Fall, s.BitTime),
            WaveformKind.Table => Pos(s.TableTime.Zip(s.TableTime.Skip(1), (a, b) => b - a).Where(d => d > 0).DefaultIfEmpty(double.PositiveInfinity).Min()),
            _ => double.PositiveInfinity,
        };
    }

    public static double FirstEdgeMidpoint(SourceSpec s) => s.Waveform switch
    {
        WaveformKind.Gaussian => s.Delay + 2 * s.Width - s.Width / 2,
        WaveformKind.Sine => s.Delay + s.Period / 4,
        WaveformKind.Bits => s.Delay + FirstOneIndex(s) * s.BitTime + EdgeLength(s, s.Rise) / 2,
        WaveformKind.Table => TableMidpoint(s),
        _ => s.Delay + EdgeLength(s, s.Rise) / 2,
    };

    static int FirstOneIndex(SourceSpec s)
    {
        for (int i = 0; i < s.Bits.Count; i++) if (s.Bits[i]) return i;
        return 0;
    }

    static double TableMidpoint(SourceSpec s)
    {
        var (t, v) = (s.TableTime, s.TableVolts);
        double lo = v.Min(), hi = v.Max(), mid = (lo + hi) / 2;
        bool startLow = v[0] < mid;
        for (int i = 1; i < t.Length; i++)
            if ((v[i] >= mid) == startLow && (v[i - 1] >= mid) != startLow)
                return s.Delay + t[i - 1] + (mid - v[i - 1]) / (v[i] - v[i - 1]) * (t[i] - t[i - 1]);
        return s.Delay + t[0];
    }
}
