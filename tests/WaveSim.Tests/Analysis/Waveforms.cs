namespace WaveSim.Tests.Analysis;

/// <summary>Synthetic test waveforms whose figures are known by construction.</summary>
internal static class Waveforms
{
    /// <summary>Samples every dt from 0 to the last breakpoint of a piecewise-linear waveform.</summary>
    public static (double[] T, double[] V) PiecewiseLinear(double dt, params (double T, double V)[] points)
    {
        int n = (int)Math.Round(points[^1].T / dt) + 1;
        var t = new double[n];
        var v = new double[n];
        int seg = 0;
        for (int i = 0; i < n; i++)
        {
            t[i] = i * dt;
            while (seg < points.Length - 2 && t[i] > points[seg + 1].T) seg++;
            var (t0, v0) = points[seg];
            var (t1, v1) = points[seg + 1];
            double f = Math.Clamp((t[i] - t0) / (t1 - t0), 0, 1);
            v[i] = v0 + f * (v1 - v0);
        }
        return (t, v);
    }

    /// <summary>Samples a function every dt on [0, end].</summary>
    public static (double[] T, double[] V) Sample(double dt, double end, Func<double, double> f)
    {
        int n = (int)Math.Round(end / dt) + 1;
        var t = new double[n];
        var v = new double[n];
        for (int i = 0; i < n; i++) { t[i] = i * dt; v[i] = f(t[i]); }
        return (t, v);
    }

    /// <summary>Asserts |actual − expected| within a relative tolerance (absolute floor for expected ≈ 0).</summary>
    public static void Near(double expected, double? actual, double relative = 0.005, double absoluteFloor = 1e-15)
    {
        Assert.NotNull(actual);
        double tol = Math.Max(Math.Abs(expected) * relative, absoluteFloor);
        Assert.True(Math.Abs(actual!.Value - expected) <= tol, $"expected {expected:R} ± {tol:G3}, got {actual.Value:R}");
    }
}
