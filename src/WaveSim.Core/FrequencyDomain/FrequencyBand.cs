using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>The band of a run's frequency response (frequency.csv and frequency.png).</summary>
public static class FrequencyBand
{
    /// <summary>Frequencies in the band, spaced evenly in log10(f).</summary>
    public const int Points = 200;

    /// <summary>
    /// From 1/duration up to 3/(shortest source feature), or a quarter of the grid's step rate when the source has no feature,
    /// at most 100 GHz and at least a decade. <paramref name="plan"/> is the run's own plan (no second planning).
    /// </summary>
    public static (double Start, double Stop) For(Scenario s, GridPlan plan)
    {
        double f0 = 1 / s.Simulation.Duration;
        double feature = s.Source.ShortestFeature;
        double f1 = double.IsFinite(feature) ? 3 / feature : 1 / plan.Dt / 4;
        return (f0, Math.Clamp(f1, f0 * 10, 100e9));
    }

    /// <summary>The frequency response of the run's scenario over its band.</summary>
    /// <exception cref="NumericalException">The network has no solution at some frequency.</exception>
    public static FrequencyResponse Response(Scenario s, GridPlan plan)
    {
        var (f0, f1) = For(s, plan);
        return FrequencySweep.Compute(s, f0, f1, Points, log: true);
    }
}
