using System.Text.Json;
using WaveSim.Core.Io;

namespace WaveSim.Core.Measurements;

/// <summary>One probe's voltage read back from a run folder (probes.csv and summary.json as <c>run</c> writes them).</summary>
/// <param name="Folder">The folder as given.</param>
/// <param name="Title">The run's scenario title from summary.json, or the folder's name when there is none.</param>
/// <param name="Time">Instants, s.</param>
/// <param name="Volts">The probe's voltage, V.</param>
public sealed record RunFolderTrace(string Folder, string Title, double[] Time, double[] Volts)
{
    /// <summary>The file of a run folder that holds the probes.</summary>
    public const string ProbesFile = "probes.csv";

    /// <summary>
    /// Reads <paramref name="probe"/> from the run folder <paramref name="folder"/>.
    /// </summary>
    /// <exception cref="InputException">The folder is missing, holds no probes.csv, or its probes.csv has no such probe (the message names the folder and the probes it has).</exception>
    public static RunFolderTrace Read(string folder, string probe)
    {
        ArgumentNullException.ThrowIfNull(folder);
        ArgumentNullException.ThrowIfNull(probe);
        if (!Directory.Exists(folder)) throw new InputException($"{folder}: no such folder; expected the output folder of a run");
        string csv = Path.Combine(folder, ProbesFile);
        if (!File.Exists(csv)) throw new InputException($"{folder}: no {ProbesFile}; expected the output folder of a run");
        string header = BoundedText.Lines(csv, InputLimits.CaptureBytes, "probes", InputLimits.LineChars, EchoText.Excerpt(ProbesFile, 100)).FirstOrDefault() ?? "";
        var columns = header.Trim().Split(',');
        var probes = columns.Where(c => c.EndsWith("_V", StringComparison.Ordinal)).Select(c => c[..^2]).ToList();
        if (columns.Length == 0 || columns[0] != "time_s" || probes.Count == 0)
            throw new InputException($"{csv} line 1: expected the header of a run's {ProbesFile} (time_s, then <probe>_V and <probe>_A)");
        if (!probes.Contains(probe))
            throw new InputException($"{folder}: no probe '{EchoText.Excerpt(probe, 60)}' in {ProbesFile}; it has {string.Join(", ", probes)}");
        var capture = CaptureReader.Read(csv, new CaptureOptions { TimeColumn = "time_s", VoltColumn = probe + "_V" });
        return new RunFolderTrace(folder, TitleOf(folder), capture.Time, capture.Volts);
    }

    /// <summary>The title in summary.json, else the folder's name.</summary>
    static string TitleOf(string folder)
    {
        string summary = Path.Combine(folder, "summary.json");
        string name = Path.GetFileName(Path.TrimEndingDirectorySeparator(Path.GetFullPath(folder)));
        if (!File.Exists(summary)) return name;
        try
        {
            using var doc = JsonDocument.Parse(BoundedText.Read(summary, InputLimits.CaptureBytes, "summary"));
            return doc.RootElement.TryGetProperty("title", out var t) && t.ValueKind == JsonValueKind.String && t.GetString() is { Length: > 0 } s ? s : name;
        }
        catch (JsonException) { return name; }
    }
}
