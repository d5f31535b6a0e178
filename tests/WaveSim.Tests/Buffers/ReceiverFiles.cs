using System.Globalization;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// Writes small buffer model files (the IBIS keyword layout, from memory) with an Input model of given clamps into a fresh
/// folder, with a scenario beside them. Every number is invented for the test that writes it.
/// </summary>
internal sealed class ReceiverFiles : IDisposable
{
    public string Folder { get; } = Directory.CreateTempSubdirectory("wavesim-rx-").FullName;

    static string N(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>One table in the file's layout: V then typ, min and max (min and max NA when <paramref name="naCorners"/>).</summary>
    static string Rows(IEnumerable<(double V, double I)> rows, bool naCorners) =>
        string.Join("\n", rows.Select(r => $"  {N(r.V)}  {N(r.I)}  {(naCorners ? "NA" : N(0.9 * r.I))}  {(naCorners ? "NA" : N(1.1 * r.I))}"));

    /// <summary>Writes <paramref name="name"/>: one component (package given when <paramref name="package"/> is set) and an
    /// Input model "rx" with the clamps given (pad voltage for the ground clamp; supply minus pad for the power clamp).</summary>
    public string Write(string name, (double V, double I)[] gnd, (double V, double I)[]? power, double cComp,
        (double R, double L, double C)? package = null, bool naCorners = false, double supply = 3.3)
    {
        string pkg = package is { } p ? $"[Package]\nR_pkg {N(p.R)} NA NA\nL_pkg {N(p.L)} NA NA\nC_pkg {N(p.C)} NA NA\n" : "";
        string text = $"""
[IBIS Ver] 5.0
[File Name] {name}
[Component] TESTRX
[Manufacturer] Invented
{pkg}[Pin] signal_name model_name
1 IN rx
2 GND GND
[Model] rx
Model_type Input
Vinl = 0.8V
Vinh = 2.0V
C_comp {N(cComp)} {(naCorners ? "NA" : N(cComp))} {(naCorners ? "NA" : N(cComp))}
[Voltage Range] {N(supply)} {(naCorners ? "NA" : N(supply))} {(naCorners ? "NA" : N(supply))}
[GND Clamp]
{Rows(gnd, naCorners)}
{(power is null ? "" : "[POWER Clamp]\n" + Rows(power, naCorners))}
[End]
""";
        string path = Path.Combine(Folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    /// <summary>The scenario file path in the folder (the buffer files are relative to it).</summary>
    public string Scenario => Path.Combine(Folder, "net.yaml");

    public void Dispose()
    {
        try { Directory.Delete(Folder, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}
