using WaveSim.Core.Model;

namespace WaveSim.Core.Fitting;

/// <summary>The outcome of <see cref="ScenarioFit.Run"/>.</summary>
/// <param name="Parameters">The fitted values, in the order given.</param>
/// <param name="OffsetS">Shift added to the capture's time axis, s (fitted unless the alignment was None, then 0).</param>
/// <param name="OffsetUncertaintyS">One standard deviation of the fitted offset, s, on the same basis as the parameters'
/// (see <see cref="FittedParameter.Uncertainty"/>); NaN when it was not fitted.</param>
/// <param name="OffsetFitted">True when the offset was a fitted parameter (any alignment but None).</param>
/// <param name="RmsV">RMS of captured minus simulated at the capture's samples, with the fitted values, V.</param>
/// <param name="StartRmsV">The same with the starting values, V.</param>
/// <param name="Simulations">Number of simulations run, including the alignment and the Jacobians.</param>
/// <param name="Converged">True when the fit stopped improving; false when the budget ran out first.</param>
/// <param name="Fitted">The fitted scenario (its text with the fitted values is <see cref="Scenarios.ScenarioDocument.Edited(IEnumerable{Scenarios.KeyChange})"/>
/// of <see cref="ScenarioFit.Changes"/>).</param>
/// <param name="Time">The capture's sample times used, on the simulation's time axis (the fitted offset added), s.</param>
/// <param name="Captured">The capture's values at <paramref name="Time"/>, V.</param>
/// <param name="StartSimulated">The starting scenario's probe at <paramref name="Time"/>, V (aligned with the starting offset).</param>
/// <param name="FittedSimulated">The fitted scenario's probe at <paramref name="Time"/>, V.</param>
/// <param name="Basis">What the uncertainties rest on: samples, residual standard error, lag-1 autocorrelation and the widening
/// applied to every standard deviation.</param>
public sealed record ScenarioFitResult(
    IReadOnlyList<FittedParameter> Parameters,
    double OffsetS,
    double OffsetUncertaintyS,
    bool OffsetFitted,
    double RmsV,
    double StartRmsV,
    int Simulations,
    bool Converged,
    Scenario Fitted,
    double[] Time,
    double[] Captured,
    double[] StartSimulated,
    double[] FittedSimulated,
    UncertaintyBasis Basis);
