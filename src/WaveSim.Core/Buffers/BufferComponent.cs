namespace WaveSim.Core.Buffers;

/// <summary>A [Component] of a buffer model file: its maker, package and pins.</summary>
/// <param name="Name">The component name.</param>
/// <param name="Manufacturer">[Manufacturer], when given.</param>
/// <param name="Package">[Package], when given.</param>
/// <param name="Pins">[Pin] rows in file order.</param>
/// <param name="Line">The keyword's line.</param>
public sealed record BufferComponent(string Name, string? Manufacturer, PackageParasitics? Package, IReadOnlyList<BufferPin> Pins, int Line);
