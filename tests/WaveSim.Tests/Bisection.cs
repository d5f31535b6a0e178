namespace WaveSim.Tests;

/// <summary>The tests' own root finder, kept apart from the solver's Newton so a check does not lean on the code it checks.</summary>
internal static class Bisection
{
    /// <summary>The root of an increasing g on [lo, hi] by bisection (200 halvings: to the last bit of a double).</summary>
    public static double Root(Func<double, double> g, double lo, double hi)
    {
        for (int i = 0; i < 200; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (g(mid) > 0) hi = mid; else lo = mid;
        }
        return 0.5 * (lo + hi);
    }
}
