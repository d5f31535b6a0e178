namespace WaveSim.Core.Analysis;

/// <summary>Small shared routines on sampled waveforms: input checks, linear interpolation, edge finding.</summary>
internal static class WaveformMath
{
    /// <summary>Checks that the two arrays are present, equally long, finite, and that time increases strictly.</summary>
    public static void ValidateRecord(double[]? time, double[]? volts, int minSamples = 2)
    {
        if (time is null) throw new InputException("waveform: the time array is missing.");
        if (volts is null) throw new InputException("waveform: the voltage array is missing.");
        if (time.Length != volts.Length)
            throw new InputException($"waveform: time has {time.Length} samples but voltage has {volts.Length}; expected equal lengths.");
        if (time.Length < minSamples)
            throw new InputException($"waveform: {time.Length} samples; expected at least {minSamples}.");
        for (int i = 0; i < time.Length; i++)
        {
            if (!double.IsFinite(time[i]) || !double.IsFinite(volts[i]))
                throw new InputException($"waveform: sample {i} is not a finite number (t={time[i]}, v={volts[i]}).");
            if (i > 0 && !(time[i] > time[i - 1]))
                throw new InputException($"waveform: time must increase strictly, but sample {i} (t={time[i]}) is not after sample {i - 1} (t={time[i - 1]}).");
        }
    }

    /// <summary>Instant where the straight line between samples i and i+1 reaches <paramref name="level"/>.</summary>
    public static double CrossingTime(double[] t, double[] y, int i, double level)
    {
        double dy = y[i + 1] - y[i];
        if (dy == 0) return t[i];
        double f = Math.Clamp((level - y[i]) / dy, 0.0, 1.0);
        return t[i] + f * (t[i + 1] - t[i]);
    }

    /// <summary>The first index of the increasing <paramref name="times"/> at or after <paramref name="t"/> (its length when none is).</summary>
    public static int LowerBound(double[] times, double t)
    {
        int i = Array.BinarySearch(times, t);
        return i >= 0 ? i : ~i;
    }

    /// <summary>Linear interpolation of y at instant x (clamped to the ends). t must increase.</summary>
    public static double Interpolate(double[] t, double[] y, double x)
    {
        if (x <= t[0]) return y[0];
        int n = t.Length;
        if (x >= t[n - 1]) return y[n - 1];
        int hi = Array.BinarySearch(t, x);
        if (hi >= 0) return y[hi];
        hi = ~hi;
        int lo = hi - 1;
        double f = (x - t[lo]) / (t[hi] - t[lo]);
        return y[lo] + f * (y[hi] - y[lo]);
    }

    /// <summary>
    /// Edges between two regions: "low" (y at or below <paramref name="lo"/>) and "high" (y at or above
    /// <paramref name="hi"/>), lo &lt; hi. An edge runs from the last sample in the old region to the first
    /// sample in the new one. Entering the first region is not an edge.
    /// </summary>
    public static List<RegionEdge> FindRegionEdges(double[] y, double lo, double hi)
    {
        var edges = new List<RegionEdge>();
        int state = 0, lastInRegion = -1;
        for (int i = 0; i < y.Length; i++)
        {
            int region = y[i] <= lo ? -1 : y[i] >= hi ? 1 : 0;
            if (region == 0) continue;
            if (state != 0 && region != state)
                edges.Add(new RegionEdge(lastInRegion, i, region > 0));
            state = region;
            lastInRegion = i;
        }
        return edges;
    }

    /// <summary>Number of sign changes of y − level; samples exactly at the level keep the previous side.</summary>
    public static int CountLevelCrossings(double[] y, double level)
    {
        int count = 0, side = 0;
        foreach (double v in y)
        {
            int s = Math.Sign(v - level);
            if (s == 0) continue;
            if (side != 0 && s != side) count++;
            side = s;
        }
        return count;
    }

    /// <summary>Largest step back against the edge direction inside samples [from, to]: running extreme minus value.</summary>
    public static double LargestReversal(double[] y, int from, int to, bool rising)
    {
        double extreme = y[from], worst = 0;
        for (int i = from; i <= to; i++)
        {
            extreme = rising ? Math.Max(extreme, y[i]) : Math.Min(extreme, y[i]);
            worst = Math.Max(worst, rising ? extreme - y[i] : y[i] - extreme);
        }
        return worst;
    }
}

/// <summary>An edge between two level regions: sample indices of the last point in the old region and the first in the new.</summary>
internal readonly record struct RegionEdge(int From, int To, bool Rising);
