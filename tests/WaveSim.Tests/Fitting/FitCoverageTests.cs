using WaveSim.Core.Fitting;
using Xunit.Abstractions;
using WaveSim.Core.Measurements;
using WaveSim.Tests.Measurements;

namespace WaveSim.Tests.Fitting;

/// <summary>
/// Monte Carlo check that the fit's ± values mean what they say: over many synthetic captures with known noise, the truth lies
/// inside ±1σ about as often as a normal distribution puts a draw within one standard deviation of its mean.
/// </summary>
/// <remarks>
/// Reference: for a normal distribution P(|Z| ≤ 1) = erf(1/√2) = 0.6827 and P(|Z| ≤ 2) = erf(√2) = 0.9545 (M. Abramowitz and
/// I. A. Stegun, Handbook of Mathematical Functions, Table 26.1; restated in ReferenceData/fit-uncertainty.md). Accepted band:
/// 60-76 % within ±1σ and at least 90 % within ±2σ (the acceptance band). Pooling 3 estimates from each of 80 captures
/// (240, correlated within a fit) puts the binomial scatter of the coverage at 3-5 %, so a correct estimator passes, while one
/// 1.5× too narrow (49 % within ±1σ) or too wide (87 %) cannot.
/// The captures are the truth's simulation plus noise from fixed seeds, so the run is repeatable.
/// </remarks>
public class FitCoverageTests(ITestOutputHelper output)
{
    const int Captures = 80;
    const double Sigma = 0.01;      // noise standard deviation, V
    const double Shift = 0.4e-9;    // the capture's clock runs this far behind the simulation's
    const double TrueZ0 = 50, TrueC = 2e-12;

    [Fact]
    public void White_noise_the_truth_lies_within_1_sigma_in_60_to_76_percent_and_within_2_sigma_in_90_percent()
    {
        var (within1, within2, unwidened1, widening) = Coverage(seed => SyntheticCapture.Noise(900, Sigma, seed), seedBase: 1000);
        output.WriteLine($"white: within 1 sigma {within1:P1}, within 2 sigma {within2:P1}, mean widening {widening:F3}; unwidened within 1 sigma {unwidened1:P1}");
        Assert.InRange(within1, 0.60, 0.76);
        Assert.True(within2 >= 0.90, $"within 2 sigma: {within2:P1}");
        Assert.InRange(widening, 1.0, 1.1);   // white residuals: hardly widened (lag-1 scatter 1/√900)
    }

    [Fact]
    public void Scope_bandwidth_noise_the_widened_truth_lies_within_1_sigma_in_60_to_76_percent_and_within_2_sigma_in_90_percent()
    {
        // Noise through a single-pole low-pass of 8 GHz (a scope's front end), sampled every 10 ps: an AR(1) process with
        // ρ = exp(-Δt/τ) = exp(-2π·8 GHz·10 ps) = 0.605 (the exact discretisation of a first-order filter driven by white
        // noise; from memory). Without the widening √((1 + ρ)/(1 − ρ)) ≈ 2 only about P(|Z| ≤ 0.5) = 38 % would be covered.
        double rho = Math.Exp(-2 * Math.PI * 8e9 * 10e-12);
        var (within1, within2, unwidened1, widening) = Coverage(seed => ResidualCorrelationTests.Ar1(900, rho, Sigma, seed), seedBase: 2000);
        output.WriteLine($"AR(1) rho {rho:F3}: within 1 sigma {within1:P1}, within 2 sigma {within2:P1}, mean widening {widening:F3}; unwidened within 1 sigma {unwidened1:P1}");
        Assert.InRange(within1, 0.60, 0.76);
        Assert.True(within2 >= 0.90, $"within 2 sigma: {within2:P1}");
        Assert.InRange(widening, 1.8, 2.2);
    }

    /// <summary>Fits z0, load C and the offset to every capture in parallel; the fractions of estimates within 1σ and 2σ of the truth
    /// (and within 1σ before the widening for correlation, for the log).</summary>
    static (double Within1, double Within2, double UnwidenedWithin1, double MeanWidening) Coverage(Func<int, double[]> noise, int seedBase)
    {
        var sim = TestScenarios.Run(FitScenarios.Truth);
        // 10 % off the truth, so every fit has to walk (our choice).
        var document = TestScenarios.Document(FitScenarios.Truth.Replace("z0: 50 ohm", "z0: 55 ohm").Replace("c: 2 pF", "c: 1.8 pF"));
        var start = document.Scenario;
        FreeParameter[] free = [FreeParameter.Parse(document, "line[0].segment.z0"), FreeParameter.Parse(document, "load.c")];
        double[] truth = [TrueZ0, TrueC, Shift];
        var results = new ScenarioFitResult[Captures];
        Parallel.For(0, Captures, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
        {
            // Samples 60..960 of the 1001 (0.6 ns to 9.6 ns): the capture lies inside the record with its offset.
            Capture capture = FitScenarios.Shifted(sim, Shift, 60, 960, noise(seedBase + i));
            results[i] = ScenarioFit.Run(start, capture, "rx", free);
        });

        int inside1 = 0, inside2 = 0, count = 0, plain1 = 0;
        foreach (ScenarioFitResult r in results)
        {
            Assert.True(r.Converged);
            double[] value = [r.Parameters[0].Value, r.Parameters[1].Value, r.OffsetS];
            double[] sigma = [r.Parameters[0].Uncertainty, r.Parameters[1].Uncertainty, r.OffsetUncertaintyS];
            for (int j = 0; j < 3; j++)
            {
                Assert.True(sigma[j] > 0, $"parameter {j}: sigma {sigma[j]}");
                double z = Math.Abs(value[j] - truth[j]) / sigma[j];
                if (z <= 1) inside1++;
                if (z <= 2) inside2++;
                if (z * r.Basis.Widening <= 1) plain1++;
                count++;
            }
        }
        return (inside1 / (double)count, inside2 / (double)count, plain1 / (double)count, results.Average(r => r.Basis.Widening));
    }
}
