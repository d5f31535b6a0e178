namespace WaveSim.Core.Analysis;

/// <summary>
/// Eye diagram of a bit-pattern waveform: folds the record into two-bit-wide traces and measures the
/// vertical opening at the bit centre and the horizontal opening at the mid level or the thresholds.
/// </summary>
public static class EyeAnalysis
{
    /// <summary>
    /// Folds the waveform and measures the eye.
    /// </summary>
    /// <param name="time">Sample instants [s], strictly increasing.</param>
    /// <param name="volts">Sample values [V], same length.</param>
    /// <param name="bitTime">Unit interval [s], greater than 0.</param>
    /// <param name="firstBitStart">Instant [s] at the probe where bit 0 begins; bit k is centred at firstBitStart + (k + ½)·bitTime.</param>
    /// <param name="vih">Receiver input-high threshold [V], or null; give both thresholds or neither.</param>
    /// <param name="vil">Receiver input-low threshold [V], or null; less than <paramref name="vih"/>.</param>
    /// <param name="skipTime">Time [s] after <paramref name="firstBitStart"/> to leave out (start-up); at least 0.</param>
    /// <remarks>
    /// Trace k covers [firstBitStart + (k − ½)·bitTime, firstBitStart + (k + 3/2)·bitTime], so bit k is centred
    /// at one bit time and its nominal edges at ½ and 3/2 bit times; a trace is kept when its window lies inside
    /// the record and starts no earlier than firstBitStart + skipTime − ½·bitTime. Values between samples are
    /// interpolated linearly. A bit is "1" when its centre value exceeds the mid level (halfway between the
    /// highest and lowest centre values), else "0"; because of this classification eye_height_V is never
    /// negative — a closed eye shows in the width and in the threshold figures. A trace's opening is the
    /// interval around its centre in which it stays on its side of the level (interpolated crossings; the window
    /// ends when it never leaves); the eye width is the intersection over all traces.
    /// </remarks>
    /// <exception cref="InputException">Bad arrays, bit time, thresholds or skip time, or no complete window.</exception>
    public static EyeDiagram Compute(double[] time, double[] volts, double bitTime, double firstBitStart,
        double? vih, double? vil, double skipTime)
    {
        WaveformMath.ValidateRecord(time, volts);
        if (!(bitTime > 0) || !double.IsFinite(bitTime))
            throw new InputException($"eye: bit time {bitTime} s must be a finite value greater than 0.");
        if (!double.IsFinite(firstBitStart))
            throw new InputException($"eye: first bit start {firstBitStart} s must be finite.");
        if (!(skipTime >= 0) || !double.IsFinite(skipTime))
            throw new InputException($"eye: skip time {skipTime} s must be finite and at least 0.");
        if ((vih is null) != (vil is null))
            throw new InputException("eye: give both Vih and Vil, or neither.");
        if (vih is { } hi && vil is { } lo && (!double.IsFinite(hi) || !double.IsFinite(lo) || !(hi > lo)))
            throw new InputException($"eye: Vih ({hi} V) must be finite and greater than Vil ({lo} V).");

        int n = time.Length;
        double earliest = Math.Max(time[0], firstBitStart + skipTime - 0.5 * bitTime);
        const double slack = 1e-9;   // of a bit time, so windows that touch the record ends are kept
        long kMin = (long)Math.Ceiling((earliest - firstBitStart) / bitTime + 0.5 - slack);
        long kMax = (long)Math.Floor((time[n - 1] - firstBitStart) / bitTime - 1.5 + slack);
        if (kMax < kMin)
            throw new InputException(
                $"eye: the record ({time[0]} s to {time[n - 1]} s) holds no complete two-bit window after first bit start {firstBitStart} s and skip {skipTime} s.");

        var traces = new List<EyeTrace>();
        var centres = new List<int>();
        for (long k = kMin; k <= kMax; k++)
        {
            double start = firstBitStart + (k - 0.5) * bitTime;
            traces.Add(Slice(time, volts, start, bitTime, out int centre));
            centres.Add(centre);
        }
        return new EyeDiagram(traces, Measure(traces, centres, bitTime, vih, vil), bitTime);
    }

    /// <summary>Samples inside [start, start + 2·bitTime], plus interpolated points at both ends and at the centre.</summary>
    static EyeTrace Slice(double[] t, double[] v, double start, double bitTime, out int centreIndex)
    {
        double end = start + 2 * bitTime, centre = start + bitTime;
        var ts = new List<double> { 0 };
        var vs = new List<double> { WaveformMath.Interpolate(t, v, start) };
        int i = Array.BinarySearch(t, start);
        i = i >= 0 ? i + 1 : ~i;
        centreIndex = -1;
        for (; i < t.Length && t[i] < end; i++)
        {
            if (centreIndex < 0 && t[i] >= centre)
            {
                centreIndex = ts.Count;
                if (t[i] > centre) { ts.Add(bitTime); vs.Add(WaveformMath.Interpolate(t, v, centre)); }
                else { ts.Add(bitTime); vs.Add(v[i]); continue; }
            }
            ts.Add(t[i] - start);
            vs.Add(v[i]);
        }
        if (centreIndex < 0) { centreIndex = ts.Count; ts.Add(bitTime); vs.Add(WaveformMath.Interpolate(t, v, centre)); }
        ts.Add(2 * bitTime);
        vs.Add(WaveformMath.Interpolate(t, v, end));
        return new EyeTrace(ts.ToArray(), vs.ToArray());
    }

    static EyeFigures Measure(List<EyeTrace> traces, List<int> centres, double bitTime, double? vih, double? vil)
    {
        int count = traces.Count;
        var centreValues = new double[count];
        for (int k = 0; k < count; k++) centreValues[k] = traces[k].V[centres[k]];
        double mid = 0.5 * (centreValues.Max() + centreValues.Min());
        bool[] one = centreValues.Select(x => x > mid).ToArray();
        int ones = one.Count(b => b), zeros = count - ones;
        var figures = new EyeFigures
        {
            MidLevelV = mid, TraceCount = count, OnesCount = ones, ZerosCount = zeros, HasThresholds = vih is not null,
        };
        if (ones == 0 || zeros == 0) return figures;

        double lowestOne = double.PositiveInfinity, highestZero = double.NegativeInfinity;
        for (int k = 0; k < count; k++)
            if (one[k]) lowestOne = Math.Min(lowestOne, centreValues[k]);
            else highestZero = Math.Max(highestZero, centreValues[k]);

        figures = figures with
        {
            EyeHeightV = lowestOne - highestZero,
            EyeWidthS = Width(traces, centres, one, mid, mid, bitTime),
        };
        if (vih is { } hi && vil is { } lo)
            figures = figures with
            {
                EyeHeightThresholdsV = Math.Min(lowestOne - hi, lo - highestZero),
                EyeWidthThresholdsS = Width(traces, centres, one, hi, lo, bitTime),
            };
        return figures;
    }

    /// <summary>Intersection of the per-trace openings: "1" traces at or above levelOne, "0" traces at or below levelZero.</summary>
    static double Width(List<EyeTrace> traces, List<int> centres, bool[] one, double levelOne, double levelZero, double bitTime)
    {
        double left = 0, right = 2 * bitTime;
        for (int k = 0; k < traces.Count; k++)
        {
            var (t, v) = (traces[k].T, traces[k].V);
            double level = one[k] ? levelOne : levelZero;
            bool Wanted(double x) => one[k] ? x >= level : x <= level;
            int c = centres[k];
            if (!Wanted(v[c])) return 0;
            for (int i = c - 1; i >= 0; i--)
                if (!Wanted(v[i])) { left = Math.Max(left, WaveformMath.CrossingTime(t, v, i, level)); break; }
            for (int i = c + 1; i < t.Length; i++)
                if (!Wanted(v[i])) { right = Math.Min(right, WaveformMath.CrossingTime(t, v, i - 1, level)); break; }
        }
        return Math.Max(0, right - left);
    }
}
