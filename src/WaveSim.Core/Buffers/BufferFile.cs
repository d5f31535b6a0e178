namespace WaveSim.Core.Buffers;

/// <summary>
/// A buffer model file (an I/O buffer model in the open IBIS format, ANSI/EIA-656-B, version 5.0 keywords) as read by
/// <see cref="BufferFileReader"/>: its components with their pins and package, and its models.
/// </summary>
/// <param name="Source">The file's path as given, for messages.</param>
/// <param name="Version">[IBIS Ver] as written, e.g. "5.0".</param>
/// <param name="FileName">[File Name], when given.</param>
/// <param name="Components">The components in file order.</param>
/// <param name="Models">The models in file order.</param>
/// <param name="ModelSelectors">Names of [Model Selector]s (not read further), which pins may name instead of a model.</param>
/// <param name="Warnings">One line per keyword or sub-parameter skipped, each naming the file and line.</param>
public sealed record BufferFile(string Source, string Version, string? FileName, IReadOnlyList<BufferComponent> Components,
                                IReadOnlyList<BufferModel> Models, IReadOnlyList<string> ModelSelectors, IReadOnlyList<string> Warnings)
{
    /// <summary>The reserved model names of a [Pin] row that are not models: POWER, GND and NC.</summary>
    public static IReadOnlySet<string> ReservedModelNames { get; } = new HashSet<string>(["POWER", "GND", "NC"], StringComparer.OrdinalIgnoreCase);

    /// <summary>The model called <paramref name="name"/> (case-insensitive).</summary>
    /// <exception cref="InputException">No model has that name; the message lists the names there are.</exception>
    public BufferModel Model(string name) =>
        Models.FirstOrDefault(m => string.Equals(m.Name, name, StringComparison.OrdinalIgnoreCase))
        ?? throw new InputException($"{Source}: [Model] '{name}' is not in the file; its models are {string.Join(", ", Models.Select(m => m.Name))}");
}
