using System.Globalization;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>The warnings of a scenario and its grid plan: times out of scale with the net, widened edges, numerical dispersion.</summary>
/// <remarks>Thresholds and their reasons are listed in docs/warnings.md.</remarks>
public static class ScenarioWarnings
{
    /// <summary>A one-pass dispersion bound above this fraction of the swing is warned about.</summary>
    public const double DispersionLimit = 0.02;

    static string Steps => GridPlan.MinimumEdgeSteps.ToString(CultureInfo.InvariantCulture);

    /// <summary>Every warning for <paramref name="s"/> run on <paramref name="plan"/>, in a fixed order.</summary>
    public static IReadOnlyList<ScenarioWarning> For(Scenario s, GridPlan plan)
    {
        var list = new List<ScenarioWarning>(TimeScaleWarnings.For(s));
        foreach (var (key, t) in EdgeLimit.WidenedEdges(s.Source, plan))
            list.Add(new(key, $"{EdgeLimit.Describe(t)} is shorter than the shortest edge the grid carries ({Steps} time steps): "
                + $"it is run as a Gaussian-filtered step with a 10-90 % time of {Quantity.Format(plan.MinimumEdge, "s")}"));
        if (Dispersion(s, plan) is { } d) list.Add(d);
        if (s.Source.Buffer is { } b) list.AddRange(BufferDriver.Notes(b).Select(n => new ScenarioWarning("source.buffer", n)));
        return list;
    }

    /// <summary>The dispersion warning for the source's fastest edge on its worst path, when the bound exceeds <see cref="DispersionLimit"/>.</summary>
    static ScenarioWarning? Dispersion(Scenario s, GridPlan plan)
    {
        var src = s.Source with { MinimumEdge = plan.MinimumEdge };
        if (!EdgeLimit.HasRampedEdges(src) || plan.Segments.All(p => p.Courant >= 1)) return null;
        double edge = src.Waveform == WaveformKind.Step ? src.Rise : Math.Min(src.Rise, src.Fall);
        bool widened = SourceWaveform.Widened(src, edge);
        var spectrum = widened ? DispersionBound.GaussianStep(plan.MinimumEdge) : DispersionBound.LinearRamp(SourceWaveform.Ramp(edge));
        double worst = 0; string end = ""; IReadOnlyList<SegmentPlan> path = [];
        foreach (var (e, p) in DispersionBound.Paths(s, plan))
        {
            double b = DispersionBound.OnePass(spectrum, p, plan.Dt);
            if (b > worst) (worst, end, path) = (b, e, p);
        }
        if (worst <= DispersionLimit) return null;
        // Named for the segment that loses the most phase: per cell about (ωdt/2)³(1/S³ − 1/S)/3 at low frequency.
        var low = path.MaxBy(p => p.Cells * (1 / (p.Courant * p.Courant * p.Courant) - 1 / p.Courant))!;
        string edgeText = Quantity.Format(widened ? plan.MinimumEdge : edge, "s");
        string courant = low.Courant.ToString("F3", CultureInfo.InvariantCulture), pct = (100 * worst).ToString("F1", CultureInfo.InvariantCulture);
        return new(low.Where, $"numerical dispersion: with Courant number {courant} here (below 1), the source's fastest edge ({edgeText} 10-90 %) can differ at {end} "
            + $"by up to {pct} % of the swing from the exact line (a bound from the leapfrog's dispersion relation), so figures such as overshoot "
            + "may be off by that much: make every segment's delay a whole number of time steps, or use a slower edge");
    }
}
