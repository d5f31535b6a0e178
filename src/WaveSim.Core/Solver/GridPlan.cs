using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>How one segment is cut into cells.</summary>
/// <param name="Where">The segment's place, e.g. "line[0]" or "stub.line[1]".</param>
/// <param name="Segment">The segment.</param>
/// <param name="Cells">Whole number of cells.</param>
/// <param name="Courant">v·dt/dz = cells · dt / T, at most 1; exactly 1 means no numerical dispersion on a lossless line.</param>
public sealed record SegmentPlan(string Where, Segment Segment, int Cells, double Courant);

/// <summary>
/// The solver's grid: the time step, the cells of every segment, the number of steps and the cost.
/// </summary>
/// <remarks>
/// Every segment gets n = floor(T/dt) cells for its delay T (a whole number, so its delay and Z0 are exact), which keeps each
/// cell's delay T/n at least dt: the Courant number v·dt/dz = n·dt/T is then at most 1, the Courant-Friedrichs-Lewy bound of the
/// 1-D leapfrog (Courant, Friedrichs and Lewy 1928). Rounding up instead would put the number above 1 and the grid would blow up.
/// dt is picked, within the resolution's bound, to bring every Courant number as close to 1 as it can: at exactly 1
/// the lossless leapfrog is free of numerical dispersion (the "magic time step", Taflove and Hagness,
/// Computational Electrodynamics, 3rd ed. 2005, ch. 2).
/// A segment with a wideband dielectric is planned by its fastest wave (<see cref="Segment.FrontDelay"/>, from ε∞), which keeps
/// the dispersive update stable; for every other segment that is its delay.
/// </remarks>
public sealed record GridPlan
{
    /// <summary>The solver's time step, s.</summary>
    public required double Dt { get; init; }
    /// <summary>The upper bound on dt set by the resolution, s.</summary>
    public required double DtLimit { get; init; }
    /// <summary>Number of time steps to cover the duration.</summary>
    public required long Steps { get; init; }
    /// <summary>Every segment's cells and Courant number, main line first, then branches in order.</summary>
    public required IReadOnlyList<SegmentPlan> Segments { get; init; }
    /// <summary>Total cells.</summary>
    public long TotalCells => Segments.Sum(s => (long)s.Cells);
    /// <summary>Cell updates for the whole run (cells × steps).</summary>
    public double CellUpdates => (double)TotalCells * Steps;
    /// <summary>Number of output rows.</summary>
    public required long OutputRows { get; init; }
    /// <summary>Estimated memory, bytes: the grid arrays, the probe outputs and the figure record.</summary>
    public required long MemoryBytes { get; init; }
    /// <summary>
    /// Sample interval of the separate record the signal figures are computed from, s: a whole number of solver steps, at
    /// least <see cref="FigureSamplesPerFeature"/> samples per shortest edge and per shortest segment delay. Null when the output
    /// record is already that fine (no output_step, or a finer one); the figures then use the output record.
    /// </summary>
    public double? FigureStep { get; init; }
    /// <summary>Number of samples of the figure record (0 when <see cref="FigureStep"/> is null).</summary>
    public long FigureRows { get; init; }

    /// <summary>
    /// Samples per shortest edge and per shortest segment delay that the figures need at least: 20. At the default resolution
    /// (20 steps per edge) that is every solver step; at a higher resolution every k-th step.
    /// </summary>
    public const int FigureSamplesPerFeature = 20;

    /// <summary>
    /// Most memory the figure record may take, bytes: 256 MiB. A run whose record at <see cref="FigureSamplesPerFeature"/>
    /// would take more keeps every k-th step with a larger k instead (never coarser than the output step).
    /// </summary>
    public const long FigureRecordBudgetBytes = 256L << 20;

    /// <summary>
    /// The shortest source edge the grid carries, in time steps (10-90 %). A shorter edge, an ideal one included, is run as a
    /// Gaussian-filtered step of this 10-90 time (see docs/warnings.md): on a grid with Courant number 0.977 and a few hundred
    /// cells such an edge rings by about 0.1 % of the swing, where a discontinuous one overshoots by 15 to 25 %
    /// (the leapfrog's numerical dispersion; Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 2).
    /// </summary>
    public const double MinimumEdgeSteps = 6;

    /// <summary>
    /// The shortest 10-90 % source edge the run carries, s: <see cref="MinimumEdgeSteps"/> time steps; 0 when every segment sits
    /// at Courant number 1, where the lossless leapfrog moves any waveform, a discontinuous one included, exactly one cell per step.
    /// </summary>
    public double MinimumEdge => CarriesAnyEdge ? 0 : MinimumEdgeSteps * Dt;

    /// <summary>Whether every segment sits at Courant number 1 (within the rounding tolerance), so no edge needs widening.</summary>
    public bool CarriesAnyEdge => Segments.All(p => p.Courant >= 1 - RoundingTolerance);

    /// <summary>Relative tolerance when rounding a delay to whole steps, so 80 mm at 7.5 ns/m over 20 ps is 30 cells, not 31.</summary>
    public const double RoundingTolerance = 1e-9;

    /// <summary>Unknowns of the per-step junction solve (junctions and lumped branches), as the network will have them.</summary>
    public long StepUnknowns { get; init; }
    /// <summary>
    /// The memory estimate the limits use, in floating point, bytes: <see cref="MemoryBytes"/> (which is held at long.MaxValue)
    /// plus <see cref="UnknownBytes"/> per unknown of the junction solve.
    /// </summary>
    public double EstimatedBytes { get; init; }
    /// <summary>
    /// The estimated run time on one core, s: cell updates at <see cref="CellSeconds"/>, steps at <see cref="StepSeconds"/> plus
    /// <see cref="UnknownSeconds"/> per unknown of the junction solve, and output and figure values at <see cref="OutputValueSeconds"/>.
    /// A rough figure (docs/PERFORMANCE.md says how it was measured): within a factor of about two on the machine it was measured on.
    /// </summary>
    public double EstimatedSeconds { get; init; }

    /// <summary>Time of one cell update, s: the vectorised kernel does 0.4 to 1 ns on one core (docs/PERFORMANCE.md).</summary>
    public const double CellSeconds = 1e-9;
    /// <summary>Time of one step beyond its cells and junctions, s: the source, the sampler, the figure record (measured).</summary>
    public const double StepSeconds = 5e-7;
    /// <summary>Time per step per unknown of the junction solve and per segment's end handling, s (measured).</summary>
    public const double UnknownSeconds = 2e-7;
    /// <summary>Time to record and write one output or figure value, s (measured).</summary>
    public const double OutputValueSeconds = 1e-7;
    /// <summary>
    /// Memory per unknown of the junction solve beyond the grid, bytes: the network's objects, the step's sparse factors and the
    /// DC solve's while it factors. A rough share: a run of 100,000 segments (3.25 million cells) peaked at 0.96 GB, about
    /// 10 kB per segment with every array of the grid and its kernel included (docs/PERFORMANCE.md).
    /// </summary>
    public const double UnknownBytes = 2048;
    /// <summary>Runs whose <see cref="EstimatedSeconds"/> is above this are refused unless forced: 10 minutes.</summary>
    public const double RunTimeLimitSeconds = 600;

    /// <summary>Runs above this memory estimate are refused unless forced.</summary>
    public const long MemoryLimitBytes = 2L << 30;
    /// <summary>Runs above this many cell updates are refused unless forced.</summary>
    public const double CellUpdateLimit = 1e11;

    /// <summary>Plans the grid for <paramref name="scenario"/>.</summary>
    public static GridPlan For(Scenario scenario)
    {
        var segs = AllSegments(scenario.Line, "line").ToList();
        double tMin = segs.Min(s => s.Seg.FrontDelay);
        double limit = Math.Min(tMin, scenario.Source.ShortestFeature) / scenario.Simulation.Resolution;
        double dt = ChooseDt(segs.Select(s => s.Seg.FrontDelay).ToArray(), limit);
        var plans = segs.Select(s =>
        {
            int n = CellsFor(s.Seg.FrontDelay, dt);
            return new SegmentPlan(s.Where, s.Seg, n, n * dt / s.Seg.FrontDelay);
        }).ToList();
        // Counts and bytes in floating point: an absurd duration or output step must give an absurd estimate, never a wrapped one.
        double stepCount = Math.Ceiling(scenario.Simulation.Duration / dt * (1 - RoundingTolerance));
        double h = scenario.Simulation.OutputStep ?? dt;
        double rowCount = Rows(scenario.Simulation.Duration, h);
        // The figures need samples finer than the output step may be: every k-th solver step, kept apart from the CSV.
        double spacing = Math.Min(tMin, scenario.Source.ShortestFeature) / FigureSamplesPerFeature;
        double stride = Math.Max(1, Math.Floor(spacing / dt * (1 + RoundingTolerance)));
        // A long run thins the figure record to stay within its budget rather than hold every step of every probe.
        long maxRows = FigureRecordBudgetBytes / ((1L + scenario.Probes.Count) * sizeof(double));
        stride = Math.Max(stride, Math.Ceiling(scenario.Simulation.Duration / (dt * (maxRows - 2))));
        double figureStep = dt * stride;
        double? figure = h > figureStep * (1 + RoundingTolerance) ? figureStep : null;
        double figureCount = figure is { } hf ? Rows(scenario.Simulation.Duration, hf) : 0;
        double cells = plans.Sum(p => (double)p.Cells);
        int probes = scenario.Probes.Count;
        double memory = cells * 2 * sizeof(double) + rowCount * (1 + 2.0 * probes) * sizeof(double)
            + figureCount * (1.0 + probes) * sizeof(double);
        // Frequency-dependent segments hold one state per cell per pole on each side (at most 12 poles each).
        memory += plans.Where(p => p.Segment.Loss is not null).Sum(p => (double)p.Cells) * 2 * 12 * sizeof(double);
        long unknowns = StepUnknownsOf(scenario.Line, scenario.Load, main: true);
        double seconds = cells * stepCount * CellSeconds + stepCount * (StepSeconds + unknowns * UnknownSeconds)
            + (rowCount * (1 + 2.0 * probes) + figureCount * (1.0 + probes)) * OutputValueSeconds;
        return new GridPlan
        {
            Dt = dt, DtLimit = limit, Steps = Saturate(stepCount), Segments = plans, OutputRows = Saturate(rowCount),
            MemoryBytes = Saturate(memory), FigureStep = figure, FigureRows = Saturate(figureCount),
            StepUnknowns = unknowns, EstimatedBytes = memory + unknowns * UnknownBytes, EstimatedSeconds = seconds,
        };
    }

    /// <summary>A count or a size as a long, held at long.MaxValue when it is beyond it (the estimates then refuse the run).</summary>
    static long Saturate(double x) => x >= long.MaxValue ? long.MaxValue : (long)x;

    /// <summary>
    /// The unknowns of the per-step junction solve (junctions and lumped branches) that <paramref name="line"/> makes, as
    /// <see cref="NetworkBuilder"/> builds them: a junction per segment end and per series part, a branch per lumped part and
    /// per load part, the driver's branch and its junction, and at most 12 dielectric branches at each end of a wideband segment.
    /// </summary>
    static long StepUnknownsOf(IReadOnlyList<LineElement> line, LoadSpec load, bool main)
    {
        long n = main ? 2 : 0;
        foreach (var e in line)
            n += e switch
            {
                Segment s => 1 + (s.Loss is null ? 0 : 2 * 12),
                Model.Series => 2,
                Shunt => 1,
                Branch b => StepUnknownsOf(b.Line, b.Load, main: false),
                _ => 1,
            };
        return n + (load.Short ? 1 : (load.R is null ? 0 : 1) + (load.C is null ? 0 : 1) + (load.L is null ? 0 : 1));
    }

    /// <summary>Samples from 0 to <paramref name="duration"/> inclusive at interval <paramref name="h"/>, the last one at the duration.</summary>
    static double Rows(double duration, double h)
    {
        double rows = Math.Floor(duration / h * (1 + RoundingTolerance)) + 1;
        if ((rows - 1) * h < duration * (1 - RoundingTolerance)) rows++;
        return rows;
    }

    /// <summary>The whole number of cells for a delay: floor(T/dt) with a relative tolerance, at least 1.</summary>
    public static int CellsFor(double delay, double dt)
    {
        double ratio = delay / dt;
        double n = Math.Floor(ratio * (1 + RoundingTolerance));
        if (n > int.MaxValue) throw new InputException($"a segment needs {n:G3} cells, more than one segment can hold; lower simulation.resolution");
        return Math.Max(1, (int)n);
    }

    /// <summary>
    /// Most segment visits <see cref="ChooseDt(double[], double)"/> spends on candidates: it tries up to 2000 candidates per distinct delay, each
    /// checked against every distinct delay, which grew with the square of the number of segments (a minute for 100,000 distinct
    /// ones). The check stops at the first delay that rules a candidate out and the search stops when this budget is spent, so the
    /// choice costs at most this much beyond sorting; a net of a few hundred distinct delays never reaches it.
    /// </summary>
    internal const long ChooseDtBudget = 20_000_000;

    /// <summary>Picks dt ≤ <paramref name="limit"/> that makes every delay as close to a whole number of steps as practical.</summary>
    internal static double ChooseDt(double[] delays, double limit) => ChooseDt(delays, limit, out _);

    /// <summary>As <see cref="ChooseDt(double[], double)"/>, also giving the segment visits spent (for the tests of its bound).</summary>
    internal static double ChooseDt(double[] delays, double limit, out long visits)
    {
        var candidates = delays.Distinct().ToArray();
        // The checks visit the shortest delays first: they have the fewest cells, so the largest rounding, and rule most out.
        var sorted = candidates.OrderBy(t => t).ToArray();
        long budget = ChooseDtBudget;
        double best = limit, bestCost = Cost(sorted, limit, double.PositiveInfinity, ref budget);
        visits = ChooseDtBudget - budget;
        if (bestCost < RoundingTolerance) return limit;
        // Candidates dt = T_i / m: they make segment i exact; keep the one whose worst segment is closest to S = 1.
        // Among exact candidates the largest dt wins (fewest steps); otherwise stay within 2x of the limit.
        double exactBest = 0;
        foreach (double t in candidates)
        {
            double mMin = Math.Ceiling(t / limit * (1 - RoundingTolerance));
            double mMax = Math.Min(2 * mMin, mMin + 2000);
            for (double m = mMin; m <= mMax && budget > 0; m++)
            {
                double dt = t / m;
                // A candidate worse than the best by more than the tie tolerance can be dropped at the first delay that shows it.
                double cost = Cost(sorted, dt, bestCost + 1e-12, ref budget);
                if (cost < RoundingTolerance) { exactBest = Math.Max(exactBest, dt); break; }
                if (cost < bestCost - 1e-12 || (Math.Abs(cost - bestCost) <= 1e-12 && dt > best)) { best = dt; bestCost = cost; }
            }
            if (budget <= 0) break;
        }
        visits = ChooseDtBudget - budget;
        return exactBest > 0 ? exactBest : best;
    }

    /// <summary>The worst 1 − Courant number over the delays, or the first one above <paramref name="bound"/> as soon as it is seen.</summary>
    static double Cost(double[] delays, double dt, double bound, ref long budget)
    {
        double worst = 0;
        foreach (double t in delays)
        {
            budget--;
            int n = CellsFor(t, dt);
            worst = Math.Max(worst, 1 - Math.Min(1, n * dt / t));
            if (worst > bound) break;
        }
        return worst;
    }

    internal static IEnumerable<(string Where, Segment Seg)> AllSegments(IReadOnlyList<LineElement> line, string prefix)
    {
        for (int i = 0; i < line.Count; i++)
        {
            if (line[i] is Segment s) yield return ($"{prefix}[{i}]", s);
            else if (line[i] is Branch b)
                foreach (var x in AllSegments(b.Line, $"{b.Name}.line")) yield return x;
        }
    }
}
