namespace WaveSim.Core.Fitting;

/// <summary>A free parameter's fitted value.</summary>
/// <param name="Parameter">The parameter, with its start and bounds.</param>
/// <param name="Value">Best value, SI.</param>
/// <param name="Uncertainty">One standard deviation, SI: √diag(s²·(JᵀJ)⁻¹) from the Jacobian at the solution, scaled by the residual
/// standard error s and widened by √(n/n_eff) for the residual's lag-1 autocorrelation (<see cref="ResidualCorrelation"/>); NaN
/// when the capture does not determine it. It covers the noise, not a model that cannot match the capture.</param>
public sealed record FittedParameter(FreeParameter Parameter, double Value, double Uncertainty);
