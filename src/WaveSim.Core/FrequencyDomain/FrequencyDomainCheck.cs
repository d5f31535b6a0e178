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
    /// <summary>Time of one nodal solve per unknown, s: the sparse refactor and solve of one frequency (measured, docs/PERFORMANCE.md).</summary>
    public const double UnknownSeconds = 4e-7;

    /// <summary>
    /// The estimated time (s) and memory (bytes) of checking a run of <paramref name="scenario"/> on <paramref name="plan"/>: one
    /// nodal solve per transform frequency (half the transform's points) over every unknown, and each probe's two spectra.
    /// </summary>
    public static (double Seconds, double Bytes) Estimate(Scenario scenario, GridPlan plan)
    {
        var circuit = CircuitBuilder.Build(scenario, scenario.Probes);
        double h = scenario.Simulation.OutputStep ?? plan.Dt;
        var transform = TransientTransform.For(scenario, scenario.Simulation.Duration, h);
        double frequencies = transform.Points / 2 + 1, probes = scenario.Probes.Count;
        double seconds = frequencies * circuit.Size * UnknownSeconds + probes * transform.Points * Math.Log2(transform.Points) * 1e-8;
        double bytes = 16.0 * (transform.Points * 2 + frequencies * 2 * probes) + 400.0 * circuit.Size
            + plan.OutputRows * 2.0 * probes * sizeof(double);
        return (seconds, bytes);
    }

    /// <summary>Throws when checking a run would go beyond the limits a run accepts unless forced (the time-domain plan's).</summary>
    /// <exception cref="PlanLimitException">The check's estimate is above <see cref="GridPlan.RunTimeLimitSeconds"/> or the memory limit.</exception>
    public static void CheckLimits(Scenario scenario, GridPlan plan)
    {
        var (seconds, bytes) = Estimate(scenario, plan);
        if (seconds <= GridPlan.RunTimeLimitSeconds && bytes <= GridPlan.MemoryLimitBytes) return;
        string what = $"the frequency-domain check would take about {PlanLimits.Duration(seconds)} and {Units.Quantity.Format(bytes, "B", 3)} "
            + $"(limits 10 min and 2 GB); shorten simulation.duration or make the net shorter";
        throw new PlanLimitException([seconds > GridPlan.RunTimeLimitSeconds
            ? new PlanLimitExcess("run time", seconds, GridPlan.RunTimeLimitSeconds, what)
            : new PlanLimitExcess("memory", bytes, GridPlan.MemoryLimitBytes, what)]);
    }

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
