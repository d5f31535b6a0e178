using WaveSim.Core.Buffers;
using WaveSim.Core.Model;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Reads a <c>buffer:</c> key (<c>{ file: parts.ibs, model: NAME, corner: typ|min|max }</c>): the file relative to the scenario
/// file, the model in it, the corner (typ when not written). Every problem is one line naming the scenario file, the line and
/// the key, with the buffer file's own message where it is the file that is wrong.
/// </summary>
internal static class BufferReference
{
    /// <summary>The keys accepted under <c>buffer</c>.</summary>
    public static readonly string[] Keys = ["file", "model", "corner"];

    /// <summary>The buffer under <paramref name="key"/> in <paramref name="m"/>, or null when the key is absent.</summary>
    /// <param name="m">The mapping holding the key (a load, or the source).</param>
    /// <param name="key">The key, <c>buffer</c>.</param>
    /// <param name="receiving">True for a load: the model must be able to receive (Input or I/O).</param>
    public static BufferSpec? Read(YamlMap m, string key, bool receiving)
    {
        if (!m.Has(key)) return null;
        var b = m.Map(key, Keys)!;
        string rel = b.Text("file") ?? throw b.Error($"missing required key '{b.Join("file")}' (the buffer model file, relative to the scenario file)");
        string name = b.Text("model") ?? throw b.Error($"missing required key '{b.Join("model")}' (a [Model] name of the file)");
        string cornerText = b.Text("corner") ?? "typ";
        if (!Enum.TryParse<Corner>(cornerText, ignoreCase: true, out var corner) || int.TryParse(cornerText, out _))
            throw b.Error(b.Node("corner")!, b.Join("corner"), $"'{Io.EchoText.Excerpt(cornerText)}' is not a corner; expected typ, min or max");
        string dir = Path.GetDirectoryName(Path.GetFullPath(m.File)) ?? ".";
        BufferFile file;
        try { file = BufferFileReader.Read(Path.Combine(dir, rel)); }
        catch (InputException ex) { throw b.Error(b.Node("file")!, b.Join("file"), ex.Message); }
        BufferModel model;
        try { model = file.Model(name); }
        catch (InputException ex) { throw b.Error(b.Node("model")!, b.Join("model"), ex.Message); }
        if (receiving && model.Type is not (BufferModelType.Input or BufferModelType.InputOutput))
            throw b.Error(b.Node("model")!, b.Join("model"),
                $"[Model] {model.Name} is Model_type {model.TypeName}, which does not receive; a load takes an Input or I/O model");
        if (!receiving && !model.Drives)
            throw b.Error(b.Node("model")!, b.Join("model"), $"[Model] {model.Name} is Model_type Input, which does not drive; a source takes an Output, I/O, 3-state or Open_drain model");
        try { model.RequireCorner(corner); _ = model.Curves(corner); }
        catch (InputException ex) { throw b.Error(b.Node("corner") ?? b.Node("model")!, b.Join("corner"), ex.Message); }
        return new BufferSpec(rel, model, corner, PackageOf(file, model));
    }

    /// <summary>The [Package] of the first component whose [Pin] list names the model; null when none does or it has none.</summary>
    static PackageParasitics? PackageOf(BufferFile file, BufferModel model) =>
        file.Components.FirstOrDefault(c => c.Pins.Any(p => string.Equals(p.Model, model.Name, StringComparison.OrdinalIgnoreCase)))?.Package;
}
