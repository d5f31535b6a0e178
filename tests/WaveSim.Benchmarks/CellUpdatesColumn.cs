using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Reports;
using BenchmarkDotNet.Running;

namespace WaveSim.Benchmarks;

/// <summary>
/// Cell updates per second, from the mean time per operation: the kernel benchmarks set OperationsPerInvoke to the
/// cells × steps of one invocation, so BenchmarkDotNet's Mean is already the time of one cell update.
/// </summary>
public sealed class CellUpdatesColumn : IColumn
{
    /// <inheritdoc/>
    public string Id => nameof(CellUpdatesColumn);
    /// <inheritdoc/>
    public string ColumnName => "Cell updates/s";
    /// <inheritdoc/>
    public bool AlwaysShow => true;
    /// <inheritdoc/>
    public ColumnCategory Category => ColumnCategory.Custom;
    /// <inheritdoc/>
    public int PriorityInCategory => 0;
    /// <inheritdoc/>
    public bool IsNumeric => true;
    /// <inheritdoc/>
    public UnitType UnitType => UnitType.Dimensionless;
    /// <inheritdoc/>
    public string Legend => "Cell updates per second on one thread (1e9 / Mean in ns per cell update)";

    /// <inheritdoc/>
    public bool IsDefault(Summary summary, BenchmarkCase benchmarkCase) => false;
    /// <inheritdoc/>
    public bool IsAvailable(Summary summary) => true;

    /// <inheritdoc/>
    public string GetValue(Summary summary, BenchmarkCase benchmarkCase) => GetValue(summary, benchmarkCase, SummaryStyle.Default);

    /// <inheritdoc/>
    public string GetValue(Summary summary, BenchmarkCase benchmarkCase, SummaryStyle style)
    {
        var stats = summary[benchmarkCase]?.ResultStatistics;
        return stats is null || stats.Mean <= 0 ? "NA" : (1e9 / stats.Mean).ToString("E3", System.Globalization.CultureInfo.InvariantCulture);
    }
}
