namespace WaveSim.Core.Output;

/// <summary>
/// Gathers a command's output files in a staging folder beside the target and moves them into place only when all are written,
/// so an interrupted or failed run leaves no truncated or partial outputs.
/// </summary>
public sealed class OutputFolder : IDisposable
{
    readonly string _target;
    readonly string _staging;
    bool _committed;

    /// <summary>Starts a staging folder for <paramref name="target"/> (which is not touched until <see cref="Commit"/>).</summary>
    public OutputFolder(string target)
    {
        _target = Path.GetFullPath(target);
        string parent = Path.GetDirectoryName(_target) ?? ".";
        Directory.CreateDirectory(parent);
        _staging = Path.Combine(parent, $".{Path.GetFileName(_target)}.partial-{Guid.NewGuid():N}");
        Directory.CreateDirectory(_staging);
    }

    /// <summary>The final folder.</summary>
    public string Target => _target;

    /// <summary>The path to write <paramref name="relative"/> to while staging (its folders are created).</summary>
    public string File(string relative)
    {
        string full = Path.GetFullPath(Path.Combine(_staging, relative));
        if (!full.StartsWith(_staging + Path.DirectorySeparatorChar, StringComparison.Ordinal))
            throw new InputException($"output name '{relative}' would fall outside the output folder");
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        return full;
    }

    /// <summary>Writes <paramref name="bytes"/> as <paramref name="relative"/> (staged until <see cref="Commit"/>).</summary>
    public void Write(string relative, byte[] bytes) => System.IO.File.WriteAllBytes(File(relative), bytes);

    /// <summary>Writes <paramref name="text"/> (UTF-8) as <paramref name="relative"/> (staged until <see cref="Commit"/>).</summary>
    public void WriteText(string relative, string text) => System.IO.File.WriteAllText(File(relative), text);

    /// <summary>Streams a large file (a probe CSV) as <paramref name="relative"/> without holding it in memory.</summary>
    public void Write(string relative, Action<Stream> write)
    {
        using var stream = new FileStream(File(relative), FileMode.CreateNew, FileAccess.Write);
        write(stream);
    }

    /// <summary>Moves every staged file into the target folder (replacing files of the same name).</summary>
    public void Commit()
    {
        if (!Directory.Exists(_target))
            Directory.Move(_staging, _target);
        else
        {
            foreach (string f in Directory.EnumerateFiles(_staging, "*", SearchOption.AllDirectories))
            {
                string dest = Path.Combine(_target, Path.GetRelativePath(_staging, f));
                Directory.CreateDirectory(Path.GetDirectoryName(dest)!);
                System.IO.File.Move(f, dest, overwrite: true);
            }
            Directory.Delete(_staging, recursive: true);
        }
        _committed = true;
    }

    /// <summary>Removes the staging folder if the outputs were not committed.</summary>
    public void Dispose()
    {
        if (!_committed && Directory.Exists(_staging))
            try { Directory.Delete(_staging, recursive: true); } catch (IOException) { }
    }
}
