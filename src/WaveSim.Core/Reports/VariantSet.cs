namespace WaveSim.Core.Reports;

/// <summary>One variant of a study (a sweep point or a termination strategy) as its page shows it.</summary>
/// <param name="Label">Its name in words, e.g. "load.r = 47 Ω" or "series".</param>
/// <param name="X">Its place on the charts' horizontal axis (the varied value, or its index when the axis names categories).</param>
/// <param name="Time">Instants of its thinned waveforms, s; null when its waveforms were not kept.</param>
/// <param name="Volts">Per probe, the voltage at <paramref name="Time"/>, V.</param>
public sealed record Variant(string Label, double X, double[]? Time, double[][]? Volts);

/// <summary>One figure charted over the variants: a series per probe, with the limits it is held to.</summary>
/// <param name="Name">The figure's name, e.g. "overshoot".</param>
/// <param name="Unit">Its unit symbol (V, s, %, W or "").</param>
/// <param name="Values">Per probe, one value per variant (null where the figure does not apply).</param>
/// <param name="Limits">Bounds drawn across the chart, each with its label.</param>
public sealed record VariantFigure(string Name, string Unit, IReadOnlyList<double?[]> Values, IReadOnlyList<(string Label, double Value)> Limits)
{
    /// <summary>Its own horizontal axis (one value per variant) instead of the set's <see cref="Variant.X"/>; null for the set's.</summary>
    public FigureAxis? Axis { get; init; }

    /// <summary>True to draw the values as unjoined points (a scatter of samples), false to join them in variant order.</summary>
    public bool PointsOnly { get; init; }

    /// <summary>A line under the chart's heading (its statistics, say); null for none.</summary>
    public string? Note { get; init; }

    /// <summary>The study's outcome in one line, shown under the heading (a Monte Carlo run's yield, say); null for none.</summary>
    public string? Outcome { get; init; }
}

/// <summary>A horizontal axis of one figure's chart.</summary>
/// <param name="Label">The axis's name, e.g. a key path.</param>
/// <param name="Unit">Its unit symbol.</param>
/// <param name="Values">One value per variant, in variant order.</param>
public sealed record FigureAxis(string Label, string Unit, IReadOnlyList<double> Values);

/// <summary>
/// A study of variants for its page: a chart per figure, the best point or the limits marked, each variant's waveforms a
/// click away. Sweeps and termination studies fill it; a Monte Carlo run fills it with a chart per limited figure against its own key (<see cref="VariantFigure.Axis"/>).
/// </summary>
/// <param name="Title">The page's heading.</param>
/// <param name="XLabel">The horizontal axis's name.</param>
/// <param name="XUnit">Its unit symbol; "" for categories.</param>
/// <param name="Categorical">True when <see cref="Variant.X"/> is an index and the labels name the ticks.</param>
/// <param name="Probes">Probe names, matching each figure's series and each variant's waveforms.</param>
/// <param name="Variants">The variants, in study order.</param>
/// <param name="Figures">The figures charted.</param>
public sealed record VariantSet(string Title, string XLabel, string XUnit, bool Categorical, IReadOnlyList<string> Probes,
    IReadOnlyList<Variant> Variants, IReadOnlyList<VariantFigure> Figures)
{
    /// <summary>Index of the best variant, marked on every chart and shown first; null for none.</summary>
    public int? Best { get; init; }

    /// <summary>Why it is best, in words (e.g. "min rx.settling within rx.overshoot&lt;10").</summary>
    public string? BestNote { get; init; }

    /// <summary>A note under the heading (what was varied, what the verdicts were held to).</summary>
    public string? Note { get; init; }

    /// <summary>The study's outcome in one line, shown under the heading (a Monte Carlo run's yield, say); null for none.</summary>
    public string? Outcome { get; init; }
}
