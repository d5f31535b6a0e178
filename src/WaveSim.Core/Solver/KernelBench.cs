using System.Diagnostics;
using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// Times the solver's own segment kernel (the code a run uses) on one uniform line, on the calling thread.
/// </summary>
/// <remarks>
/// The line is 50 ohm at Courant number 1. Lossy: 10 ohm series and 1 mS shunt in total, driven by 1 V at the near end and
/// shorted at the far end, so it settles to its DC profile instead of decaying into subnormal numbers that would slow the
/// arithmetic. Lossless: a standing half sine between two grounded ends, which keeps its amplitude.
/// </remarks>
public static class KernelBench
{
    /// <summary>Cells × steps one timed repetition aims at by default: about 1 s at 2.5e9 cell updates per second.</summary>
    public const double DefaultCellUpdates = 2.5e9;

    /// <summary>Timed repetitions by default; the fastest is reported.</summary>
    public const int DefaultRepeats = 3;

    /// <summary>A short name of the vector width in use, e.g. "Vector256 (4 doubles)" or "scalar".</summary>
    public static string VectorDescription => LeapfrogKernel.VectorBits switch
    {
        0 => "scalar",
        int b => $"Vector{b} ({b / 64} doubles)",
    };

    /// <summary>The number of steps that makes <paramref name="cells"/> take about <see cref="DefaultCellUpdates"/> cell updates.</summary>
    /// <param name="cells">Cells in the line, at least 2.</param>
    public static int DefaultSteps(int cells) => (int)Math.Clamp(Math.Round(DefaultCellUpdates / cells), 1, int.MaxValue);

    /// <summary>
    /// Times <paramref name="repeats"/> runs of <paramref name="steps"/> steps each on one line, after one warm-up, each with the
    /// process's CPU time over it, which tells how much of a core the run had. Other work on the machine only ever slows a run,
    /// so the fastest is the best estimate of what the kernel can do.
    /// </summary>
    /// <param name="cells">Cells in the line, at least 2.</param>
    /// <param name="steps">Timed steps per repetition, at least 1.</param>
    /// <param name="lossless">True for a lossless line (R = G = 0), otherwise a lossy one.</param>
    /// <param name="repeats">Timed repetitions, at least 1.</param>
    /// <returns>One result per repetition, in the order run.</returns>
    /// <exception cref="InputException"><paramref name="cells"/>, <paramref name="steps"/> or <paramref name="repeats"/> is out of range.</exception>
    /// <exception cref="NumericalException">The line's state is not finite at the end.</exception>
    public static IReadOnlyList<KernelBenchResult> Measure(int cells, int steps, bool lossless, int repeats)
    {
        if (cells < 2) throw new InputException($"must be at least 2 (got {cells})") { Parameter = nameof(cells) };
        if (steps < 1) throw new InputException($"must be at least 1 (got {steps})") { Parameter = nameof(steps) };
        if (repeats < 1) throw new InputException($"must be at least 1 (got {repeats})") { Parameter = nameof(repeats) };
        var kernel = TestLine(cells, lossless, out double[] v, out double[] i);

        // Warm-up: about 1e8 cell updates, enough for the JIT and the caches.
        int warm = Math.Max(1, (int)Math.Min(steps, 1e8 / cells));
        for (int n = 0; n < warm; n++) kernel.Step(v, i);
        var results = new List<KernelBenchResult>(repeats);
        using var process = Process.GetCurrentProcess();
        for (int r = 0; r < repeats; r++)
        {
            process.Refresh();
            var cpu0 = process.TotalProcessorTime;
            var clock = Stopwatch.StartNew();
            for (int n = 0; n < steps; n++) kernel.Step(v, i);
            double seconds = clock.Elapsed.TotalSeconds;
            process.Refresh();
            results.Add(new KernelBenchResult(cells, steps, seconds, (process.TotalProcessorTime - cpu0).TotalSeconds));
        }
        for (int k = 0; k < cells; k++)
            if (!double.IsFinite(v[k]) || !double.IsFinite(i[k]))
                throw new NumericalException($"the benchmark line is not finite at cell {k} after {warm + (long)repeats * steps} steps");
        return results;
    }

    /// <summary>The benchmark line described in the remarks: its kernel and its state arrays, ready to step.</summary>
    internal static SegmentKernel TestLine(int cells, bool lossless, out double[] v, out double[] i)
    {
        const double dt = 1e-12, z0 = 50;
        var segment = Segment.FromZ0(1, z0, cells * dt, lossless ? 0 : 10, lossless ? 0 : 1e-3);
        var grid = new GridSegment
        {
            Plan = new SegmentPlan("bench", segment, cells, 1), Start = 0, End = 1, StartPosition = 0, LinePath = "",
            V = new double[cells + 1], I = new double[cells],
        };
        v = grid.V; i = grid.I;
        for (int k = 1; k < cells; k++) v[k] = Math.Sin(Math.PI * k / cells);
        v[0] = lossless ? 0 : 1;
        return new SegmentKernel(grid, dt);
    }
}
