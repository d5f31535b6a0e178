using WaveSim.Core.Solver;

namespace WaveSim.Core.Coupled;

/// <summary>How one section is cut into cells, with its modes' Courant numbers.</summary>
/// <param name="Where">"coupled[i]".</param>
/// <param name="Section">The section.</param>
/// <param name="Modes">Its modes.</param>
/// <param name="Cells">Whole number of cells.</param>
/// <param name="Courant">Each mode's Courant number v·dt/dz, fastest first (the first at most 1).</param>
public sealed record CoupledSectionPlan(string Where, CoupledSection Section, SectionModes Modes, int Cells, IReadOnlyList<double> Courant);

/// <summary>
/// The grid of a coupled run: one time step for every section, chosen from each section's fastest mode the way the
/// single-line plan chooses it from each segment's delay (<see cref="GridPlan.ChooseDt(double[], double)"/>,
/// <see cref="GridPlan.CellsFor"/>): the fastest mode sits at Courant number ≤ 1, the slower modes below it.
/// </summary>
/// <remarks>
/// In a lossless section the leapfrog in matrix form splits into independent scalar leapfrogs, one per eigenvector of L·C,
/// each with its own velocity on the same grid, so the Courant-Friedrichs-Lewy bound is the fastest mode's
/// (Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, FDTD chapter; from memory). An inhomogeneous section
/// (microstrip) cannot put every mode at Courant number 1; the slower modes carry the leapfrog's numerical dispersion.
/// </remarks>
public sealed record CoupledPlan
{
    /// <summary>Time step, s.</summary>
    public required double Dt { get; init; }
    /// <summary>The bound on dt set by the resolution, s.</summary>
    public required double DtLimit { get; init; }
    /// <summary>Number of steps.</summary>
    public required long Steps { get; init; }
    /// <summary>Every section's cells and modes.</summary>
    public required IReadOnlyList<CoupledSectionPlan> Sections { get; init; }
    /// <summary>Cell updates of the whole run (conductor-cells × steps).</summary>
    public double CellUpdates { get; init; }

    /// <summary>Whether every mode of every section sits at Courant number 1, so edges need no widening.</summary>
    public bool CarriesAnyEdge => Sections.All(p => p.Courant.All(c => c >= 1 - GridPlan.RoundingTolerance));

    /// <summary>The shortest 10-90 % source edge the run carries, s (as <see cref="GridPlan.MinimumEdge"/>).</summary>
    public double MinimumEdge => CarriesAnyEdge ? 0 : GridPlan.MinimumEdgeSteps * Dt;

    /// <summary>The lowest Courant number of any mode: below about 0.9 a fast edge on a long run rings (the dispersion warning).</summary>
    public double LowestCourant => Sections.SelectMany(p => p.Courant).Min();

    /// <summary>Plans the grid of <paramref name="s"/>.</summary>
    public static CoupledPlan For(CoupledScenario s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var modes = s.Sections.Select(SectionModes.Of).ToArray();
        var delays = s.Sections.Select((x, i) => x.Length / modes[i].Fastest).ToArray();
        double feature = s.Sources.Select(x => x.Spec.ShortestFeature).DefaultIfEmpty(double.PositiveInfinity).Min();
        double limit = Math.Min(delays.Min(), feature) / s.Simulation.Resolution;
        double dt = GridPlan.ChooseDt(delays, limit);
        var plans = s.Sections.Select((x, i) =>
        {
            int n = GridPlan.CellsFor(delays[i], dt);
            double dz = x.Length / n;
            return new CoupledSectionPlan($"coupled[{i}]", x, modes[i], n, modes[i].Velocities.Select(v => v * dt / dz).ToArray());
        }).ToArray();
        double steps = Math.Ceiling(s.Simulation.Duration / dt * (1 - GridPlan.RoundingTolerance));
        double cells = plans.Sum(p => (double)p.Cells) * s.Conductors.Count;
        return new CoupledPlan
        {
            Dt = dt, DtLimit = limit, Steps = steps >= long.MaxValue ? long.MaxValue : (long)steps, Sections = plans,
            CellUpdates = cells * steps,
        };
    }
}
