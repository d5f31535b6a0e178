namespace WaveSim.Core.Fitting;

/// <summary>What a fit's ± values rest on: the residual's size and how correlated it is (see <see cref="ResidualCorrelation"/>).</summary>
/// <param name="Samples">Capture samples in the residual, n.</param>
/// <param name="Parameters">Values fitted, p (the time offset included when it was fitted).</param>
/// <param name="StandardErrorV">Residual standard error s = √(SSR/(n − p)), V; it scales every uncertainty.</param>
/// <param name="Lag1">Lag-1 autocorrelation of the residual at the solution.</param>
/// <param name="EffectiveSamples">Independent samples the residual is worth, n·(1 − ρ1)/(1 + ρ1) with ρ1 held to [0, 1).</param>
/// <param name="Widening">√(n/n_eff): the factor every standard deviation was multiplied by, at least 1.</param>
public sealed record UncertaintyBasis(int Samples, int Parameters, double StandardErrorV, double Lag1, double EffectiveSamples, double Widening);
