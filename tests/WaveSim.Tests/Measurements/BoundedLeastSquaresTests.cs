using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Least-squares fitting against certified results: NIST Statistical Reference Datasets, nonlinear regression,
/// "Misra1a" (y = b1*(1 - exp(-b2*x)), 14 observations, lower difficulty). Certified values, standard deviations
/// and the 14 data points are all from memory of the NIST page; the fit reproducing the certified values to 6 digits
/// and the standard deviations to 4 is itself the check that the typed-in data are right.
/// </summary>
public class BoundedLeastSquaresTests
{
    // NIST StRD Misra1a data (from memory).
    static readonly double[] X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];
    static readonly double[] Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.40, 75.47, 81.78];

    // NIST certified values and standard deviations (from memory).
    const double B1 = 2.3894212918E+02, B2 = 5.5015643181E-04;
    const double Sd1 = 2.7070075241E+00, Sd2 = 7.2668688436E-06;

    static double[] Misra1a(double[] b) => X.Select((x, i) => Y[i] - b[0] * (1 - Math.Exp(-b[1] * x))).ToArray();

    [Theory]
    [InlineData(500.0, 1e-4)]     // NIST start 1
    [InlineData(250.0, 5e-4)]     // NIST start 2
    public void Misra1a_reaches_the_certified_values_and_standard_deviations(double s1, double s2)
    {
        LeastSquaresResult r = BoundedLeastSquares.Fit(Misra1a, [s1, s2], [0, 0], [double.PositiveInfinity, double.PositiveInfinity], 500, default);

        Assert.True(r.Converged);
        Assert.Equal(1, r.Values[0] / B1, 1e-6);   // 6 significant digits
        Assert.Equal(1, r.Values[1] / B2, 1e-6);
        Assert.Equal(1, r.Uncertainty[0] / Sd1, 1e-4);   // forward-difference Jacobian: 4 digits
        Assert.Equal(1, r.Uncertainty[1] / Sd2, 1e-4);
        Assert.True(r.Evaluations <= 500);
    }

    [Fact]
    public void Misra1a_with_both_bounds_finite_gives_the_same_answer()
    {
        LeastSquaresResult r = BoundedLeastSquares.Fit(Misra1a, [500, 1e-4], [100, 1e-5], [1000, 1e-2], 500, default);

        Assert.True(r.Converged);
        Assert.Equal(1, r.Values[0] / B1, 1e-6);
        Assert.Equal(1, r.Values[1] / B2, 1e-6);
        Assert.Equal(1, r.Uncertainty[0] / Sd1, 1e-4);
    }

    [Fact]
    public void An_active_bound_holds_the_parameter_on_it()
    {
        // Exact data y = 2x; the slope is capped at 1.5, so the constrained least-squares answer is the bound itself.
        double[] x = [1, 2, 3, 4];
        LeastSquaresResult r = BoundedLeastSquares.Fit(p => x.Select(v => 2 * v - p[0] * v).ToArray(), [1.0], [0.0], [1.5], 200, default);

        Assert.Equal(1.5, r.Values[0], 1e-6);
        Assert.InRange(r.Values[0], 0.0, 1.5);
    }

    [Fact]
    public void The_evaluation_budget_is_kept_and_reported()
    {
        LeastSquaresResult r = BoundedLeastSquares.Fit(Misra1a, [500, 1e-4], [0, 0], [double.PositiveInfinity, double.PositiveInfinity], 12, default);

        Assert.False(r.Converged);
        Assert.True(r.Evaluations <= 12, $"{r.Evaluations} evaluations");
    }

    [Fact]
    public void Cancellation_stops_the_fit()
    {
        using var cts = new CancellationTokenSource();
        int calls = 0;
        double[] Residuals(double[] b)
        {
            if (++calls == 5)
                cts.Cancel();
            return Misra1a(b);
        }
        Assert.ThrowsAny<OperationCanceledException>(() =>
            BoundedLeastSquares.Fit(Residuals, [500, 1e-4], [0, 0], [1e4, 1], 500, cts.Token));
        Assert.Equal(5, calls);
    }

    [Fact]
    public void A_start_at_the_centre_of_symmetric_bounds_still_moves()
    {
        // Regression: the fit's time offset starts at the centre of [start - w, start + w], where asin(2(x - lo)/(hi - lo) - 1)
        // rounds to about 1e-16 instead of 0. The difference step used to be scaled by that |u|, so it was 1e-24 in u, the
        // Jacobian column came out zero and the parameter never moved. The start and window are the values of a fit that stuck
        // (1.0105 ns, 1 ns). Known answer: the least-squares solution of the linear residual x - target is target.
        const double centre = 1.0105240531393502e-09, window = 1e-9, target = centre + 0.29e-9;
        LeastSquaresResult r = BoundedLeastSquares.Fit(p => [p[0] - target, 2 * (p[0] - target)], [centre], [centre - window], [centre + window], 100, default);

        Assert.Equal(target, r.Values[0], 1e-18);
    }

    [Fact]
    public void A_start_outside_its_bounds_is_an_input_error()
    {
        var ex = Assert.Throws<InputException>(() => BoundedLeastSquares.Fit(Misra1a, [500, 1e-4], [0, 0], [400, 1], 100, default));
        Assert.Equal("fit parameter 1: start 500 is outside [0, 400]", ex.Message);
    }
}
