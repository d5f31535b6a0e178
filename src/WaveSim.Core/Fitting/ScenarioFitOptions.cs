using WaveSim.Core.Measurements;

namespace WaveSim.Core.Fitting;

/// <summary>Settings of <see cref="ScenarioFit.Run"/>.</summary>
public sealed record ScenarioFitOptions
{
    /// <summary>Default budget of simulations.</summary>
    public const int DefaultMaxSimulations = 200;

    /// <summary>Fraction of the simulated duration the capture's time offset may move either side of its start. 0.1.</summary>
    public const double OffsetWindowFraction = 0.1;

    /// <summary>
    /// How the capture's time axis is placed on the simulation's. <see cref="AlignMode.None"/>: as it is, nothing fitted.
    /// <see cref="AlignMode.CrossCorrelation"/> (default) or <see cref="AlignMode.Edge50"/>: aligned once with the starting
    /// scenario and refined by a least-squares search over the offset window, then the offset is fitted along with the
    /// parameters. Default CrossCorrelation.
    /// </summary>
    public AlignMode Align { get; init; } = AlignMode.CrossCorrelation;

    /// <summary>Budget of simulations, including those for the Jacobians and the uncertainties. Default 200; at least 2n + 2.</summary>
    public int MaxSimulations { get; init; } = DefaultMaxSimulations;

    /// <summary>
    /// Relative reduction of the sum of squares below which the fit stops: 1e-6. Far below what the noise of a capture lets one
    /// resolve (the sum of squares of m noisy samples scatters by about √(2/m) of itself), and it stops the fitter from spending
    /// simulations on the grid's rounding.
    /// </summary>
    public double ReductionTolerance { get; init; } = 1e-6;

    /// <summary>Receives the fraction of the budget used, 0..1, after each simulation.</summary>
    public IProgress<double>? Progress { get; init; }

    /// <summary>Run each simulation even beyond the memory and cell-update limits.</summary>
    public bool Force { get; init; }
}
