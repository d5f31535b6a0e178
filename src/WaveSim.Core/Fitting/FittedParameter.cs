namespace WaveSim.Core.Fitting;

/// <summary>A free parameter's fitted value.</summary>
/// <param name="Parameter">The parameter, with its start and bounds.</param>
/// <param name="Value">Best value, SI.</param>
/// <param name="Uncertainty">One standard deviation from the Jacobian at the solution, SI; NaN when the capture does not determine it.</param>
public sealed record FittedParameter(FreeParameter Parameter, double Value, double Uncertainty);
