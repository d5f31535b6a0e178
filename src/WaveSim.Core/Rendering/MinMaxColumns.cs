namespace WaveSim.Core.Rendering;

/// <summary>
/// Thins sampled waveforms for drawing: the record is cut into columns of equal time (one per pixel column) and each keeps
/// its first and last instant carrying the column's smallest and largest value in the order they occur, so no peak is lost.
/// Every probe shares the instants, so the charts keep one time axis.
/// </summary>
public static class MinMaxColumns
{
    /// <summary>The kept sample indices' instants and, per series, the values drawn there.</summary>
    /// <param name="time">Ascending instants, s.</param>
    /// <param name="series">Series sampled at <paramref name="time"/>.</param>
    /// <param name="columns">Number of columns (at least 1).</param>
    public static (double[] Time, double[][] Values) Thin(double[] time, IReadOnlyList<double[]> series, int columns)
    {
        ArgumentNullException.ThrowIfNull(time);
        ArgumentNullException.ThrowIfNull(series);
        columns = Math.Max(1, columns);
        int n = time.Length;
        if (n <= 2 * columns) return (time, series.ToArray());
        double t0 = time[0], span = time[^1] - time[0];
        var t = new List<double>(2 * columns);
        var v = series.Select(_ => new List<double>(2 * columns)).ToArray();
        int start = 0;
        for (int c = 0; c < columns && start < n; c++)
        {
            double edge = t0 + span * (c + 1) / columns;
            int end = start;
            while (end < n && (time[end] < edge || c == columns - 1)) end++;
            if (end == start) continue;
            if (end - start == 1)
            {
                t.Add(time[start]);
                for (int s = 0; s < v.Length; s++) v[s].Add(series[s][start]);
            }
            else
            {
                t.Add(time[start]);
                t.Add(time[end - 1]);
                for (int s = 0; s < v.Length; s++)
                {
                    var x = series[s];
                    int lo = start, hi = start;
                    for (int k = start + 1; k < end; k++)
                    {
                        // NaN is a gap: never an extreme while a number is there.
                        if (double.IsNaN(x[k])) continue;
                        if (double.IsNaN(x[lo]) || x[k] < x[lo]) lo = k;
                        if (double.IsNaN(x[hi]) || x[k] > x[hi]) hi = k;
                    }
                    // The extreme that comes first is drawn first, so the line keeps the waveform's direction.
                    v[s].Add(lo <= hi ? x[lo] : x[hi]);
                    v[s].Add(lo <= hi ? x[hi] : x[lo]);
                }
            }
            start = end;
        }
        return (t.ToArray(), v.Select(l => l.ToArray()).ToArray());
    }
}
