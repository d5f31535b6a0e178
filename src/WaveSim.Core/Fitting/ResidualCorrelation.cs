namespace WaveSim.Core.Fitting;

/// <summary>
/// How far the residuals of a fit are from white noise, and how much that widens the parameters' uncertainties.
/// </summary>
/// <remarks>
/// <para>The least-squares covariance s²·(JᵀJ)⁻¹ assumes m independent residuals. Samples of a band-limited noise (a scope's
/// front end, an averaging filter) or of a model error are not: neighbours move together, and the data hold fewer independent
/// samples than they have points. Modelling the residual as a first-order autoregressive process with lag-1 autocorrelation ρ1,
/// the effective number of independent samples is n_eff = n·(1 − ρ1)/(1 + ρ1) (M. S. Bartlett, J. R. Stat. Soc. Suppl. 8, 1946;
/// D. S. Wilks, Statistical Methods in the Atmospheric Sciences, section on the variance of a time average; from memory), and
/// each standard deviation grows by √(n/n_eff) = √((1 + ρ1)/(1 − ρ1)).</para>
/// <para>A negative ρ1 would shrink the uncertainties; it is taken as 0, so the widening is never below 1.</para>
/// </remarks>
public static class ResidualCorrelation
{
    /// <summary>Largest lag-1 autocorrelation used, so that the widening stays finite (it is then about 1400).</summary>
    public const double MaxLag1 = 1 - 1e-6;

    /// <summary>Lag-1 sample autocorrelation r1 = Σ (x_i − x̄)(x_{i+1} − x̄) / Σ (x_i − x̄)², by sample index.</summary>
    /// <param name="x">The residuals, in sample order; at least 2.</param>
    /// <returns>r1 in [−1, 1]; 0 when every value is the same.</returns>
    /// <exception cref="ArgumentException">Fewer than two values.</exception>
    public static double Lag1(IReadOnlyList<double> x)
    {
        ArgumentNullException.ThrowIfNull(x);
        if (x.Count < 2)
            throw new ArgumentException("Need at least two residuals.", nameof(x));
        double mean = 0;
        for (int i = 0; i < x.Count; i++)
            mean += x[i];
        mean /= x.Count;
        double num = 0, den = 0;
        for (int i = 0; i < x.Count; i++)
        {
            double d = x[i] - mean;
            den += d * d;
            if (i + 1 < x.Count)
                num += d * (x[i + 1] - mean);
        }
        return den > 0 ? Math.Clamp(num / den, -1, 1) : 0;
    }

    /// <summary>Effective number of independent samples n·(1 − ρ)/(1 + ρ), with ρ = <paramref name="lag1"/> held to [0, <see cref="MaxLag1"/>].</summary>
    /// <param name="samples">Number of residuals n.</param>
    /// <param name="lag1">Their lag-1 autocorrelation.</param>
    /// <returns>n_eff, at most n.</returns>
    public static double EffectiveSamples(int samples, double lag1)
    {
        double rho = Held(lag1);
        return samples * (1 - rho) / (1 + rho);
    }

    /// <summary>Factor on every standard deviation: √(n/n_eff) = √((1 + ρ)/(1 − ρ)), with ρ held to [0, <see cref="MaxLag1"/>].</summary>
    /// <param name="lag1">The residuals' lag-1 autocorrelation.</param>
    /// <returns>The widening, at least 1.</returns>
    public static double Widening(double lag1)
    {
        double rho = Held(lag1);
        return Math.Sqrt((1 + rho) / (1 - rho));
    }

    static double Held(double lag1) => double.IsNaN(lag1) ? 0 : Math.Clamp(lag1, 0, MaxLag1);
}
