using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>The leapfrog with frequency-dependent loss against the frequency-domain solution of the exact model.</summary>
public class AgreementTests
{
    public static IEnumerable<object[]> Lines() =>
    [
        ["microstrip", LossScenarios.Microstrip()],
        ["coax", LossScenarios.Coax()],
    ];

    [Theory]
    [MemberData(nameof(Lines))]
    public void Leapfrog_with_fitted_loss_matches_the_exact_frequency_domain_solution(string name, string yaml)
    {
        // Two independent methods: the time-stepped grid with the pole-residue fit and auxiliary states, against per-frequency
        // distributed two-ports with the exact √(1 + s/ω0) and Djordjevic-Sarkar functions (numerical Laplace transform).
        // Tolerance 1 % of each probe's swing (common practice, no source).
        var td = TestScenarios.Run(yaml);
        var diffs = FrequencyDomainCheck.Compare(td);
        foreach (var d in diffs)
        {
            Console.WriteLine($"{name} {d.Probe}: {d.MaxDiffV:E3} V = {d.MaxDiffPct:F3} % of the swing");
            Assert.True(d.MaxDiffPct < 1, $"{name} {d.Probe}: {d.MaxDiffV:E3} V = {d.MaxDiffPct:F3} % of the swing");
        }
    }

    [Fact]
    public void The_comparison_tells_frequency_dependent_from_constant_loss()
    {
        // The agreement above is not automatic: the same microstrip with the constant-R/G model (R_dc, G at 0.35/t_r) differs
        // from the exact frequency-dependent solution at the load by well over the 1 % tolerance (common practice, no source).
        var exact = TestScenarios.Parse(LossScenarios.Microstrip());
        var constant = TestScenarios.Run(LossScenarios.Microstrip(loss: "constant"));
        var fd = WaveSim.Core.FrequencyDomain.FrequencyDomainSolver.TimeResponse(exact, constant.Time).Probe("rx").Volts;
        var rx = constant.Probe("rx").Volts;
        double diff = rx.Zip(fd, (a, b) => Math.Abs(a - b)).Max(), swing = rx.Max() - rx.Min();
        Console.WriteLine($"constant-loss model vs exact: {100 * diff / swing:F2} % of the swing");
        Assert.True(diff > 0.03 * swing, $"only {100 * diff / swing:F2} % apart");
    }
}
