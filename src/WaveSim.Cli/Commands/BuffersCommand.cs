using System.CommandLine;
using System.Text;
using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Core.Output;

namespace WaveSim.Cli.Commands;

/// <summary>
/// `wavesim buffers FILE.ibs`: lists a buffer model file's components, pins and models with their types and corners, and
/// writes buffers.json and, per model, its I-V curves and (for a driver) its switching as pictures.
/// </summary>
public static class BuffersCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var file = new Argument<string>("file") { Description = "Buffer model file (IBIS, .ibs)" };
        var model = new Option<string?>("--model") { Description = "Only this model (default: every model of the file)", HelpName = "NAME" };
        var corner = new Option<string?>("--corner") { Description = "Only this corner: typ, min or max (default: every corner the model gives)", HelpName = "CORNER" };
        var outDir = new Option<string?>("--out", "-o") { Description = "Output folder (default: out/<file name>-buffers)" };
        var json = CommonOptions.Json();
        var cmd = new Command("buffers", "List the components, pins and models of a buffer model file and draw each model's curves")
        { file, model, corner, outDir, json };
        cmd.SetAction(pr => CommandGuard.Run(pr.InvocationConfiguration.Error, () =>
        {
            string path = pr.GetValue(file)!;
            BufferFile f = BufferFileReader.Read(path);
            IReadOnlyList<BufferModel> models = pr.GetValue(model) is { } name ? [f.Model(name)] : f.Models;
            IReadOnlyList<Corner>? only = pr.GetValue(corner) is { } c ? [ParseCorner(c)] : null;
            foreach (BufferModel m in models)
                foreach (Corner k in only ?? []) m.RequireCorner(k);
            IReadOnlyList<Corner> corners = only ?? [Corner.Typ, Corner.Min, Corner.Max];

            // Everything is computed before anything is written, so a model that fails leaves no output.
            var pictures = new List<(string Name, byte[] Bytes)>();
            var used = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
            foreach (BufferModel m in models)
            {
                var mc = corners.Where(m.HasCorner).ToList();
                string stem = Unique(SafeName(m.Name), used);
                if (m.HasIvTables) pictures.Add((stem + "-iv.png", BufferCharts.IvPng(m, mc)));
                if (m.Drives) pictures.Add((stem + "-switching.png", BufferCharts.SwitchingPng(m, mc)));
            }
            var summary = BufferSummary.Json(f, models, corners);
            string dir = CommonOptions.OutputDir(pr.GetValue(outDir), path, "-buffers");
            using (var output = new OutputFolder(dir, "buffers"))
            {
                output.WriteText("buffers.json", JsonText.Write(summary));
                foreach (var (n, bytes) in pictures) output.Write(n, bytes);
                output.Commit();
            }

            var err = pr.InvocationConfiguration.Error;
            foreach (string w in f.Warnings.Concat(BufferSummary.SwitchingNotes(models, corners))) err.WriteLine("warning: " + w);
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json)) o.WriteLine(JsonText.Write(summary));
            else
            {
                foreach (string line in BufferSummary.Lines(f, models, corners)) o.WriteLine(line);
                o.WriteLine($"wrote {Path.Combine(dir, "buffers.json")}, {string.Join(", ", pictures.Select(p => p.Name))}");
            }
            return ExitCodes.Ok;
        }));
        return cmd;
    }

    static Corner ParseCorner(string text) => text.Trim().ToLowerInvariant() switch
    {
        "typ" => Corner.Typ,
        "min" => Corner.Min,
        "max" => Corner.Max,
        _ => throw new InputException($"--corner: expected typ, min or max, got '{text}'"),
    };

    /// <summary>A model name as a file name: letters, digits, '-', '_' and '.' kept, anything else '_'.</summary>
    static string SafeName(string name)
    {
        var sb = new StringBuilder(name.Length);
        foreach (char ch in name) sb.Append(char.IsAsciiLetterOrDigit(ch) || ch is '-' or '_' or '.' ? ch : '_');
        string s = sb.ToString().Trim('.');
        return s.Length == 0 ? "model" : s;
    }

    static string Unique(string stem, HashSet<string> used)
    {
        string s = stem;
        for (int k = 2; !used.Add(s); k++) s = $"{stem}-{k}";
        return s;
    }
}
