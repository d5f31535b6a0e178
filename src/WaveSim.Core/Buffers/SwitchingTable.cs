namespace WaveSim.Core.Buffers;

/// <summary>
/// The switching coefficients of one edge in one corner: Ku(t) scales the pullup table and Kd(t) the pulldown table, at the
/// instants <see cref="Time"/> (s) from the start of the edge; before the first and after the last instant they hold their
/// end values.
/// </summary>
/// <param name="Rising">True for the rising edge.</param>
/// <param name="Corner">The corner.</param>
/// <param name="Method">How the coefficients were found.</param>
/// <param name="Time">Instants (s), increasing.</param>
/// <param name="Ku">Pullup coefficient at each instant.</param>
/// <param name="Kd">Pulldown coefficient at each instant.</param>
/// <param name="Notes">What the caller should be told: a fall-back to the ramp rule and why, instants where the equations were singular.</param>
public sealed record SwitchingTable(bool Rising, Corner Corner, SwitchingMethod Method, double[] Time, double[] Ku, double[] Kd,
                                    IReadOnlyList<string> Notes)
{
    /// <summary>Ku at <paramref name="t"/> (s), linear between instants.</summary>
    public double PullupAt(double t) => Hold(Time, Ku, t);

    /// <summary>Kd at <paramref name="t"/> (s), linear between instants.</summary>
    public double PulldownAt(double t) => Hold(Time, Kd, t);

    /// <summary>Piecewise-linear in <paramref name="x"/>, constant beyond the ends.</summary>
    internal static double Hold(IReadOnlyList<double> x, IReadOnlyList<double> y, double at)
    {
        if (at <= x[0]) return y[0];
        if (at >= x[^1]) return y[^1];
        int lo = 0, hi = x.Count - 1;
        while (hi - lo > 1)
        {
            int mid = (lo + hi) / 2;
            if (x[mid] <= at) lo = mid; else hi = mid;
        }
        return y[lo] + (y[hi] - y[lo]) * (at - x[lo]) / (x[hi] - x[lo]);
    }
}
