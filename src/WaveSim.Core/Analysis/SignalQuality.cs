namespace WaveSim.Core.Analysis;

/// <summary>
/// Signal-quality figures of a sampled waveform (overshoot, ringback, rise time, delay, settling,
/// threshold crossings, noise margins). Works on plain arrays; no solver types.
/// </summary>
/// <remarks>
/// Reference levels, transition duration, overshoot, undershoot and settling follow the terms of
/// IEEE Std 181-2011, "IEEE Standard for Transitions, Pulses, and Related Waveforms" (from memory), with the
/// state levels taken as described below instead of by histogram. Ringback, noise margins and threshold
/// crossings are signal-integrity practice (common practice, no source). Exact definitions: docs/signal-figures.md.
/// </remarks>
public static class SignalQuality
{
    /// <summary>Fraction of the record at its end whose mean is the final level: 0.05.</summary>
    public const double TailFraction = 0.05;

    /// <summary>
    /// A record whose tail mean lies within this fraction of its peak-to-peak range from the initial level
    /// is a pulse (it returned): 0.25. Used only when no final level is given.
    /// </summary>
    public const double PulseReturnFraction = 0.25;

    const double Low = 0.1, Mid = 0.5, High = 0.9;
    const int PlateauBins = 100;

    /// <summary>
    /// Computes the figures of the first edge of a waveform and the level it settles to.
    /// </summary>
    /// <param name="time">Sample instants [s], strictly increasing, at least 2.</param>
    /// <param name="volts">Sample values [V], same length as <paramref name="time"/>, finite.</param>
    /// <param name="options">Thresholds, source edge instant, next edge instant, expected levels, band; null for the defaults.</param>
    /// <returns>The figures; null members where a figure does not apply. A waveform that never moves gives
    /// low_V = high_V = its level, all edge figures null and 0 crossings.</returns>
    /// <remarks>
    /// Levels: initial = <see cref="SignalQualityOptions.InitialLevelV"/> or the first sample; final =
    /// <see cref="SignalQualityOptions.FinalLevelV"/> or the mean of the last 5 % of the samples. When the
    /// record comes back to its initial level (tail mean within 25 % of the peak-to-peak range of the initial
    /// level, or nearer the given initial than the given final level) it is a pulse: the final level is then
    /// the plateau (mean of the most populated of 100 histogram bins between the midpoint and the extreme, on
    /// the side the first edge goes), and the post-transition region ends where the second edge starts (the last
    /// local extreme before the waveform returns to its 10 % level). Figures are normalised u = (v − initial)/(final − initial),
    /// so a falling edge is handled like a rising one. Crossing instants are interpolated linearly. With
    /// <see cref="SignalQualityOptions.NextEdgeTimeS"/> the post-transition region also ends before the next source edge.
    /// Settling is counted from <see cref="SignalQualityOptions.SourceEdgeTimeS"/> plus <see cref="SignalQualityOptions.LineDelayS"/>,
    /// the edge's arrival at the probe (or from the first sample without a source edge instant).
    /// </remarks>
    /// <exception cref="InputException">Arrays missing, of different lengths, shorter than 2, not finite,
    /// time not strictly increasing, or options out of range.</exception>
    public static SignalFigures Compute(double[] time, double[] volts, SignalQualityOptions? options = null)
    {
        options ??= new SignalQualityOptions();
        options.Validate();
        WaveformMath.ValidateRecord(time, volts);
        int n = time.Length;

        double vmin = volts.Min(), vmax = volts.Max();
        double initial = options.InitialLevelV ?? volts[0];
        double tailMean = TailMean(volts);
        double flatEps = 1e-9 * Math.Max(1.0, Math.Max(Math.Abs(vmin), Math.Abs(vmax)));
        bool moves = vmax - vmin > flatEps;

        bool pulse;
        double final;
        if (options.FinalLevelV is { } given)
        {
            final = given;
            pulse = Math.Abs(tailMean - initial) < Math.Abs(tailMean - final);
        }
        else if (!moves)
        {
            final = tailMean;
            pulse = false;
        }
        else
        {
            pulse = Math.Abs(tailMean - initial) < PulseReturnFraction * (vmax - vmin);
            final = pulse ? PlateauLevel(volts, initial, vmin, vmax) : tailMean;
        }

        bool thresholdsGiven = options.VihV is not null || options.VilV is not null;
        var (crossings, nonMonotonic) = ThresholdFigures(time, volts, options, initial, final);

        if (!moves || Math.Abs(final - initial) <= flatEps)
            return new SignalFigures
            {
                LowV = tailMean, HighV = tailMean, ThresholdCrossings = options.HasThresholds ? crossings : 0,
                AboveHighV = Math.Max(0, vmax - tailMean), BelowLowV = Math.Max(0, tailMean - vmin),
                HasThresholds = thresholdsGiven,
            };

        double span = final - initial, swing = Math.Abs(span);
        bool rising = span > 0;
        double low = Math.Min(initial, final), high = Math.Max(initial, final);
        double[] u = new double[n];
        for (int i = 0; i < n; i++) u[i] = (volts[i] - initial) / span;

        var figures = new SignalFigures
        {
            LowV = low,
            HighV = high,
            AboveHighV = Math.Max(0, vmax - high),
            BelowLowV = Math.Max(0, low - vmin),
            Rising = rising,
            IsPulse = pulse,
            Monotonic = MonotonicThroughBand(volts, low + Low * swing, low + High * swing, options.MonotonicTolerance * swing),
            ThresholdCrossings = crossings,
            NoiseMarginHighV = options.VihV is { } vih ? high - vih : null,
            NoiseMarginLowV = options.VilV is { } vil ? vil - low : null,
            NonMonotonicEdges = nonMonotonic,
            HasThresholds = thresholdsGiven,
        };

        // The first edge's window ends where the next source edge reaches the probe: its figures never run across later edges.
        int last = n - 1;
        if (options.NextEdgeTimeS is { } next)
        {
            last = Math.Max(0, WaveformMath.LowerBound(time, next) - 1);
            figures = figures with { FirstEdgeWindowEndS = next };
        }
        int i50 = FirstAtOrAbove(u, 0, last, Mid);
        if (i50 < 0) return figures;   // never reaches half way before the next edge: no edge figures
        double t50 = i50 == 0 ? time[0] : WaveformMath.CrossingTime(time, u, i50 - 1, Mid);
        int wEnd = Math.Min(last, PostTransitionEnd(u, i50, pulse));

        double? duration = TransitionDuration(time, u, i50, wEnd);

        int peak = i50;
        for (int i = i50; i <= wEnd; i++) if (u[i] > u[peak]) peak = i;
        double minAfterPeak = u[peak];
        for (int i = peak; i <= wEnd; i++) minAfterPeak = Math.Min(minAfterPeak, u[i]);

        double? receiving = rising ? options.VihV : options.VilV;
        double uTh = receiving is { } th ? (th - initial) / span : Mid;
        int ic = FirstAtOrAbove(u, 0, wEnd, uTh);
        double? ringback = null, marginAfter = null;
        if (ic >= 0)
        {
            ringback = WaveformMath.LargestReversal(u, ic, wEnd, rising: true) * swing;
            if (receiving is not null)
            {
                // From the peak on: right at the crossing the value is the threshold itself.
                double minAfter = minAfterPeak;
                marginAfter = (minAfter - uTh) * swing;
            }
        }

        double? settledAt = SettledInstant(time, u, wEnd, options.SettleBand);
        // From the edge's arrival at the probe, not from the source: the flight down the line is delay_50_s, not settling.
        double reference = options.SourceEdgeTimeS is { } edgeAt ? edgeAt + options.LineDelayS : time[0];

        return figures with
        {
            OvershootPct = Math.Max(0, u[peak] - 1) * 100,
            UndershootPct = Math.Max(0, 1 - minAfterPeak) * 100,
            RingbackV = ringback,
            MarginAfterCrossingV = marginAfter,
            Rise1090S = rising ? duration : null,
            Fall9010S = rising ? null : duration,
            Delay50S = options.SourceEdgeTimeS is { } src ? t50 - src : null,
            SettlingS = settledAt - reference,
            UnsettledAtNextEdge = settledAt is null && last < n - 1,
        };
    }

    static double TailMean(double[] v)
    {
        int count = Math.Max(1, (int)Math.Ceiling(TailFraction * v.Length));
        double sum = 0;
        for (int i = v.Length - count; i < v.Length; i++) sum += v[i];
        return sum / count;
    }

    /// <summary>Plateau of a pulse: mean of the fullest histogram bin between the midpoint and the extreme on the first edge's side.</summary>
    static double PlateauLevel(double[] v, double initial, double vmin, double vmax)
    {
        double range = vmax - vmin;
        int dir = 1;
        foreach (double x in v)
            if (Math.Abs(x - initial) >= 0.5 * range) { dir = Math.Sign(x - initial); break; }
        double extreme = dir > 0 ? vmax : vmin;
        double mid = 0.5 * (initial + extreme);
        double width = Math.Abs(extreme - mid) / PlateauBins;
        var counts = new int[PlateauBins];
        var sums = new double[PlateauBins];
        foreach (double x in v)
        {
            if (dir * (x - mid) <= 0) continue;
            int bin = Math.Min(PlateauBins - 1, (int)(Math.Abs(x - mid) / width));
            counts[bin]++;
            sums[bin] += x;
        }
        int mode = 0;
        for (int b = 1; b < PlateauBins; b++) if (counts[b] > counts[mode]) mode = b;
        return counts[mode] > 0 ? sums[mode] / counts[mode] : extreme;
    }

    /// <summary>Crossing count (Vil/Vih regions, or the 50 % level) and the non-monotonic edges through the threshold band.</summary>
    static (int Crossings, IReadOnlyList<NonMonotonicEdge> Edges) ThresholdFigures(
        double[] t, double[] v, SignalQualityOptions o, double initial, double final)
    {
        if (o.VihV is not { } vih || o.VilV is not { } vil)
            return (WaveformMath.CountLevelCrossings(v, 0.5 * (initial + final)), []);
        var edges = WaveformMath.FindRegionEdges(v, vil, vih);
        double tolerance = o.MonotonicTolerance * Math.Abs(final - initial);
        var bad = new List<NonMonotonicEdge>();
        foreach (var e in edges)
        {
            double reversal = WaveformMath.LargestReversal(v, e.From, e.To, e.Rising);
            if (reversal <= tolerance) continue;
            double start = WaveformMath.CrossingTime(t, v, e.From, e.Rising ? vil : vih);
            double end = WaveformMath.CrossingTime(t, v, e.To - 1, e.Rising ? vih : vil);
            bad.Add(new NonMonotonicEdge(start, end, e.Rising, reversal));
        }
        return (edges.Count, bad);
    }

    static bool? MonotonicThroughBand(double[] v, double lo, double hi, double tolerance)
    {
        var edges = WaveformMath.FindRegionEdges(v, lo, hi);
        if (edges.Count == 0) return null;
        return edges.All(e => WaveformMath.LargestReversal(v, e.From, e.To, e.Rising) <= tolerance);
    }

    /// <summary>First index in [from, to] with u at or above level, or −1.</summary>
    static int FirstAtOrAbove(double[] u, int from, int to, double level)
    {
        for (int i = from; i <= to; i++) if (u[i] >= level) return i;
        return -1;
    }

    /// <summary>
    /// Last index of the post-transition region: the record end, or for a pulse the start of the second edge,
    /// found by walking back from the return to the 10 % level while the waveform rises going back.
    /// </summary>
    static int PostTransitionEnd(double[] u, int i50, bool pulse)
    {
        int n = u.Length;
        if (!pulse) return n - 1;
        int back = -1;
        for (int i = i50 + 1; i < n; i++) if (u[i] <= Low) { back = i; break; }
        if (back < 0) return n - 1;
        int start = back;
        while (start - 1 >= i50 && u[start - 1] > u[start]) start--;
        return start;
    }

    /// <summary>First 90 % crossing minus the last 10 % crossing before it (normalised waveform), or null.</summary>
    static double? TransitionDuration(double[] t, double[] u, int i50, int wEnd)
    {
        int k90 = FirstAtOrAbove(u, i50, wEnd, High);
        if (k90 <= 0) return null;
        int j10 = -1;
        for (int i = k90 - 1; i >= 0; i--) if (u[i] <= Low) { j10 = i; break; }
        if (j10 < 0) return null;
        return WaveformMath.CrossingTime(t, u, k90 - 1, High) - WaveformMath.CrossingTime(t, u, j10, Low);
    }

    /// <summary>
    /// Instant the waveform enters ±band around the final level for good, i.e. stays there to the end of the
    /// post-transition region (record end, or the start of a pulse's second edge). Null if it ends outside.
    /// </summary>
    static double? SettledInstant(double[] t, double[] u, int wEnd, double band)
    {
        bool In(int i) => Math.Abs(u[i] - 1) <= band;
        if (!In(wEnd)) return null;
        int lastOut = -1;
        for (int i = wEnd; i >= 0; i--) if (!In(i)) { lastOut = i; break; }
        if (lastOut < 0) return t[0];
        double edge = u[lastOut] > 1 ? 1 + band : 1 - band;
        return WaveformMath.CrossingTime(t, u, lastOut, edge);
    }
}
