namespace WaveSim.Core.Solver;

/// <summary>One timed kernel run of <see cref="KernelBench"/>.</summary>
/// <param name="Cells">Cells in the line.</param>
/// <param name="Steps">Timed steps.</param>
/// <param name="Seconds">Wall time of the timed steps, s.</param>
/// <param name="CpuTimeS">CPU time the process used meanwhile, s; well below <paramref name="Seconds"/> when other work shared the core.</param>
public sealed record KernelBenchResult(int Cells, int Steps, double Seconds, double CpuTimeS)
{
    /// <summary>Cells × steps per second of wall time: the figure the benchmark reports.</summary>
    public double CellUpdatesPerSecond => (double)Cells * Steps / Seconds;

    /// <summary>Cells × steps per second of CPU time: what the kernel does while it runs.</summary>
    public double CellUpdatesPerCpuSecond => CpuTimeS > 0 ? (double)Cells * Steps / CpuTimeS : double.NaN;

    /// <summary>CPU time over wall time: about 1 on an idle core.</summary>
    public double CoreShare => CpuTimeS / Seconds;
}
