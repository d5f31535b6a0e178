using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>How far a time-domain run is from the frequency-domain solution at one probe.</summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="MaxDiffV">Largest |V_time-domain − V_frequency-domain| over the run, V.</param>
/// <param name="MaxDiffPct">The same as a percentage of the time-domain voltage's swing (max − min; the driver's swing if that is 0).</param>
/// <param name="MaxDiffA">Largest current difference, A.</param>
public sealed record ProbeDifference(string Probe, double MaxDiffV, double MaxDiffPct, double MaxDiffA);

/// <summary>
/// Checks a leapfrog run against the frequency-domain solution of the same scenario: two independent methods (distributed
/// two-ports solved per frequency and a numerical Laplace transform, against the time-stepped grid).
/// </summary>
public static class FrequencyDomainCheck
{
    /// <summary>
    /// Per probe, the largest difference between <paramref name="timeDomain"/> and the frequency-domain response at the same
    /// output instants. Distance probes are evaluated at the grid node the time-domain run snapped them to.
    /// </summary>
    /// <exception cref="InputException">The DC operating point is undefined.</exception>
    public static IReadOnlyList<ProbeDifference> Compare(SimulationResult timeDomain)
    {
        var scenario = timeDomain.Scenario;
        var probes = scenario.Probes.Select((p, i) => p.Anchor == ProbeAnchor.Distance
            ? p with { Distance = timeDomain.Probes[i].Position } : p).ToArray();
        var fd = FrequencyDomainSolver.TimeResponse(scenario, timeDomain.Time, probes);
        double driverSwing = Math.Abs(scenario.Source.High - scenario.Source.Low);
        var result = new ProbeDifference[probes.Length];
        for (int p = 0; p < probes.Length; p++)
        {
            var td = timeDomain.Probes[p];
            double dv = 0, di = 0;
            for (int k = 0; k < td.Volts.Length; k++)
            {
                dv = Math.Max(dv, Math.Abs(td.Volts[k] - fd.Probes[p].Volts[k]));
                di = Math.Max(di, Math.Abs(td.Amps[k] - fd.Probes[p].Amps[k]));
            }
            double swing = td.Volts.Length > 0 ? td.Volts.Max() - td.Volts.Min() : 0;
            if (!(swing > 0)) swing = driverSwing > 0 ? driverSwing : 1;
            result[p] = new ProbeDifference(td.Name, dv, 100 * dv / swing, di);
        }
        return result;
    }
}
