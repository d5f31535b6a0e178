using WaveSim.Core.Fitting;
using WaveSim.Tests.Measurements;

namespace WaveSim.Tests.Fitting;

/// <summary>The lag-1 autocorrelation and the AR(1) effective sample size behind the fit's widened uncertainties.</summary>
public class ResidualCorrelationTests
{
    [Fact]
    public void The_lag1_autocorrelation_of_a_long_AR1_series_is_its_coefficient()
    {
        // An AR(1) process x_i = ρ·x_{i−1} + e_i has autocorrelation ρ^k at lag k (G. E. P. Box and G. M. Jenkins, Time Series
        // Analysis, AR(1) autocorrelation function; from memory). The sample r1 of n points scatters by about √((1 − ρ²)/n)
        // (Bartlett 1946, from memory): 0.0025 here, so 0.01 is four of those.
        const double rho = 0.6;
        double[] x = Ar1(100_000, rho, sigma: 1, seed: 3);
        Assert.Equal(rho, ResidualCorrelation.Lag1(x), 0.01);
    }

    [Fact]
    public void White_noise_has_a_lag1_autocorrelation_near_zero_and_no_widening_beyond_its_scatter()
    {
        // Independent samples: r1 scatters by 1/√n about 0 (Bartlett 1946, from memory); 4/√n is the bound.
        double[] x = SyntheticCapture.Noise(10_000, 1, seed: 8);
        double r1 = ResidualCorrelation.Lag1(x);
        Assert.InRange(r1, -0.04, 0.04);
        Assert.InRange(ResidualCorrelation.Widening(r1), 1.0, Math.Sqrt(1.04 / 0.96));
    }

    [Theory]
    // n_eff = n(1 − ρ)/(1 + ρ) and widening √((1 + ρ)/(1 − ρ)) (AR(1) effective sample size; Bartlett 1946; D. S. Wilks,
    // Statistical Methods in the Atmospheric Sciences; from memory), evaluated by hand: ρ = 0.6 → 1000·0.4/1.6 = 250, √4 = 2;
    // ρ = 0.8 → 1000·0.2/1.8 = 111.1, √9 = 3.
    [InlineData(0.6, 250.0, 2.0)]
    [InlineData(0.8, 1000.0 / 9, 3.0)]
    [InlineData(0.0, 1000.0, 1.0)]
    // A negative ρ would narrow the uncertainties; it is held at 0 (our rule: never narrower than the white-noise value).
    [InlineData(-0.5, 1000.0, 1.0)]
    public void Effective_samples_and_widening_follow_the_AR1_formula(double rho, double nEff, double widening)
    {
        Assert.Equal(nEff, ResidualCorrelation.EffectiveSamples(1000, rho), 1e-9);
        Assert.Equal(widening, ResidualCorrelation.Widening(rho), 1e-12);
    }

    [Fact]
    public void A_constant_residual_has_zero_autocorrelation_and_perfect_correlation_stays_finite()
    {
        Assert.Equal(0.0, ResidualCorrelation.Lag1([2.0, 2.0, 2.0]));
        Assert.True(double.IsFinite(ResidualCorrelation.Widening(1.0)));
    }

    /// <summary>Stationary AR(1) noise of marginal standard deviation <paramref name="sigma"/>: x_i = ρ·x_{i−1} + √(1 − ρ²)·σ·w_i.</summary>
    internal static double[] Ar1(int count, double rho, double sigma, int seed)
    {
        double[] w = SyntheticCapture.Noise(count, 1, seed);
        var x = new double[count];
        x[0] = sigma * w[0];
        double scale = Math.Sqrt(1 - rho * rho) * sigma;
        for (int i = 1; i < count; i++)
            x[i] = rho * x[i - 1] + scale * w[i];
        return x;
    }
}
