namespace WaveSim.Core.Output;

/// <summary>
/// The list of files WaveSim wrote into an output folder (<see cref="OutputFolder.ManifestName"/>): one "producer TAB path"
/// a line, so a rerun of a command removes the files it wrote last time and does not write again, while files of other
/// commands and of the user stay.
/// </summary>
internal static class OutputManifest
{
    const string Header = "# Files WaveSim wrote into this folder, by command. A rerun of a command removes those of its files it does not write again; other files are left alone.";

    /// <summary>The entries of the manifest at <paramref name="path"/>; none when it is missing, a link or unreadable.</summary>
    public static List<(string Producer, string Key)> Read(string path)
    {
        var entries = new List<(string, string)>();
        if (OutputFolder.IsLink(path) || !File.Exists(path)) return entries;
        string[] lines;
        try { lines = File.ReadAllLines(path); }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException) { return entries; }
        foreach (string line in lines)
        {
            if (line.Length == 0 || line[0] == '#') continue;
            int tab = line.IndexOf('\t', StringComparison.Ordinal);
            // A line that is not ours (edited by hand, or hostile: an absolute path, "..") is ignored, never acted on.
            if (tab <= 0 || !OutputFolder.IsProducerName(line[..tab]) || OutputFolder.Key(line[(tab + 1)..]) is not { } key) continue;
            entries.Add((line[..tab], key));
        }
        return entries;
    }

    /// <summary>The manifest's text for <paramref name="entries"/>.</summary>
    public static string Text(IEnumerable<(string Producer, string Key)> entries) =>
        Header + "\n" + string.Concat(entries.Select(e => e.Producer + "\t" + e.Key + "\n"));
}
