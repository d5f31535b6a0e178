namespace WaveSim.Core.Solver;

/// <summary>A nonlinear part's law as the solves evaluate it: the current at a voltage and the slope there.</summary>
internal interface IPartLaw
{
    /// <summary>The current at <paramref name="v"/> (A), and dI/dV there (S) in <paramref name="slope"/>.</summary>
    double Current(double v, out double slope);
}
