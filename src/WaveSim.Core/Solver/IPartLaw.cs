namespace WaveSim.Core.Solver;

/// <summary>A nonlinear part's law as the solves evaluate it: the current at a voltage and the slope there.</summary>
internal interface IPartLaw
{
    /// <summary>The current at <paramref name="v"/> (A), and dI/dV there (S) in <paramref name="slope"/>.</summary>
    double Current(double v, out double slope);

    /// <summary>
    /// As <see cref="Current"/>, with the interval [<paramref name="lo"/>, <paramref name="hi"/>) around <paramref name="v"/>
    /// on which the law is that straight line (a piecewise-linear law's segment), so a solve can finish without another evaluation.
    /// </summary>
    double Piece(double v, out double slope, out double lo, out double hi);
}
