using WaveSim.Core.FrequencyDomain;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.FrequencyLoss;

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
}
