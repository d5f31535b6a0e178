using BenchmarkDotNet.Running;

namespace WaveSim.Benchmarks;

/// <summary>
/// Benchmark entry: `dotnet run -c Release --project tests/WaveSim.Benchmarks -- --filter '*'`
/// (add `--job Dry` for a one-pass smoke run). Returns 1 when any benchmark failed.
/// </summary>
public static class Program
{
    /// <summary>Runs the benchmarks selected on the command line.</summary>
    public static int Main(string[] args)
    {
        var summaries = BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
        return summaries.Any(s => s.HasCriticalValidationErrors || s.Reports.Any(r => !r.Success)) ? 1 : 0;
    }
}
