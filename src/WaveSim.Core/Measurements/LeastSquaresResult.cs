namespace WaveSim.Core.Measurements;

/// <summary>The outcome of <see cref="BoundedLeastSquares.Fit"/>.</summary>
/// <param name="Values">Best parameters found, inside their bounds.</param>
/// <param name="Uncertainty">One standard deviation of each parameter, from cov = s²·(JᵀJ)⁻¹ with s² = SSR/(m - n);
/// NaN when m ≤ n or JᵀJ is singular (a parameter the residuals do not depend on).</param>
/// <param name="RmsResidual">sqrt(SSR / m) at <paramref name="Values"/>, in the residuals' unit.</param>
/// <param name="Evaluations">Calls of the residual function, including those for the Jacobians.</param>
/// <param name="Converged">True when the fit stopped because it stopped improving, false when it ran out of evaluations.</param>
public sealed record LeastSquaresResult(double[] Values, double[] Uncertainty, double RmsResidual, int Evaluations, bool Converged);
