using System.Globalization;

namespace WaveSim.Core.Output;

/// <summary>
/// The one writer of a command's files (docs/outputs.md). It holds the folder for the whole command (a lock naming this
/// process), gathers the files in a staging folder beside it, and on <see cref="Commit"/> checks every destination, then moves
/// all the files in together, with any file outside the folder (<see cref="WriteBeside"/>), undoing every move if one fails.
/// Without a commit the folder is left as it was, and the folders this run created are removed. A manifest
/// (<see cref="ManifestName"/>) lets a rerun remove the files it wrote last time and does not write again; files it did not
/// write are left alone. Nothing is ever written through a symbolic link inside the folder.
/// </summary>
public sealed class OutputFolder : IDisposable
{
    /// <summary>The manifest inside the folder: the files WaveSim wrote there, by command.</summary>
    public const string ManifestName = ".wavesim-outputs";

    /// <summary>The lock file inside the folder while a command writes it: it holds the id of the process writing the folder.</summary>
    public const string LockName = ".wavesim-lock";

    /// <summary>What the staging folder's name holds after the target's name: ".NAME.wavesim-staging-PID-…".</summary>
    internal const string StagingMark = ".wavesim-staging-";

    readonly string _shown;
    readonly string _producer;
    readonly string _staging;
    readonly string _files;
    readonly string _backups;
    readonly List<string> _createdFolders = [];
    readonly FolderLock _lock;
    readonly object _gate = new();
    readonly SortedSet<string> _written = new(StringComparer.Ordinal);
    readonly List<(string Full, string Shown, string Text)> _beside = [];
    bool _committed, _disposed;

    /// <summary>
    /// Takes <paramref name="target"/> for this command (creating it and its parents if missing) before any work is done, removes
    /// staging folders that earlier, killed runs left beside it, and starts a staging folder. Throws an
    /// <see cref="InputException"/> when another process holds the folder (naming it) or the path cannot be an output folder.
    /// </summary>
    /// <param name="target">The output folder.</param>
    /// <param name="producer">The command writing it (letters, digits, '-'), under which the manifest records its files.</param>
    public OutputFolder(string target, string producer = "wavesim")
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(target);
        if (!IsProducerName(producer)) throw new ArgumentException($"'{producer}' is not a producer name (letters, digits, '-')", nameof(producer));
        _shown = target;
        _producer = producer;
        Target = Path.TrimEndingDirectorySeparator(Path.GetFullPath(target));
        string parent = Path.GetDirectoryName(Target) ?? throw new InputException($"{target}: the root folder cannot be an output folder");
        string name = Path.GetFileName(Target);
        if (File.Exists(Target)) throw new InputException($"{target}: is a file, not a folder");
        try
        {
            CreateFolders(Target);
            _lock = FolderLock.Take(Target, target);
        }
        catch
        {
            RemoveCreatedFolders();
            throw;
        }
        try
        {
            RemoveStaleStaging();
            _staging = Path.Combine(parent, $".{name}{StagingMark}{Environment.ProcessId}-{Guid.NewGuid():N}");
            _files = Path.Combine(_staging, "files");
            _backups = Path.Combine(_staging, "backups");
            Directory.CreateDirectory(_files);
        }
        catch
        {
            _lock.Dispose();
            RemoveCreatedFolders();
            throw;
        }
    }

    /// <summary>The final folder (full path).</summary>
    public string Target { get; }

    /// <summary>For tests: called with each destination just before a file is moved there during <see cref="Commit"/>.</summary>
    internal Action<string>? BeforeMove { get; set; }

    /// <summary>Writes <paramref name="bytes"/> as <paramref name="relative"/> (staged until <see cref="Commit"/>).</summary>
    /// <param name="relative">A path inside the folder, '/'-separated (e.g. "frames/frame_00001.png").</param>
    /// <param name="bytes">The file's content.</param>
    public void Write(string relative, byte[] bytes)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        File.WriteAllBytes(Stage(relative), bytes);
    }

    /// <summary>Writes <paramref name="text"/> (UTF-8) as <paramref name="relative"/> (staged until <see cref="Commit"/>).</summary>
    /// <param name="relative">A path inside the folder, '/'-separated.</param>
    /// <param name="text">The file's content.</param>
    public void WriteText(string relative, string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        File.WriteAllText(Stage(relative), text);
    }

    /// <summary>Writes a text file (UTF-8) as <paramref name="relative"/> through a writer, without holding it in memory.</summary>
    /// <param name="relative">A path inside the folder, '/'-separated.</param>
    /// <param name="write">Writes the content.</param>
    public void WriteText(string relative, Action<TextWriter> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        using var writer = new StreamWriter(new FileStream(Stage(relative), FileMode.Create, FileAccess.Write));
        write(writer);
    }

    /// <summary>Streams a large file (a probe CSV) as <paramref name="relative"/> without holding it in memory.</summary>
    /// <param name="relative">A path inside the folder, '/'-separated.</param>
    /// <param name="write">Writes the content.</param>
    public void Write(string relative, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        using var stream = new FileStream(Stage(relative), FileMode.Create, FileAccess.Write);
        write(stream);
    }

    /// <summary>
    /// Writes a file outside the folder (a scenario found by tdr) in the same commit: it appears together with the folder's files
    /// or not at all. A path inside the folder is written as one of its files.
    /// </summary>
    /// <param name="path">The file, as the user named it.</param>
    /// <param name="text">Its content (UTF-8).</param>
    public void WriteBeside(string path, string text)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        ArgumentNullException.ThrowIfNull(text);
        ThrowIfDone();
        string full = Path.GetFullPath(path);
        if (full.StartsWith(Target + Path.DirectorySeparatorChar, StringComparison.Ordinal))
        {
            WriteText(Path.GetRelativePath(Target, full), text);
            return;
        }
        if (full == Target || Target.StartsWith(Path.TrimEndingDirectorySeparator(full) + Path.DirectorySeparatorChar, StringComparison.Ordinal))
            throw new InputException($"{path}: is the output folder or a folder around it, not a file");
        if (Directory.Exists(full)) throw new InputException($"{path}: is a folder, not a file");
        lock (_gate)
        {
            _beside.RemoveAll(b => b.Full == full);
            _beside.Add((full, path, text));
        }
    }

    /// <summary>
    /// Puts every written file in place together: first checks each destination (no folder, file or link in the way, every
    /// receiving folder writable), then moves the files in, replaces the manifest and removes this command's files of the
    /// previous run that this one did not write. If a move still fails, every step is undone and the exception is rethrown.
    /// </summary>
    public void Commit()
    {
        ThrowIfDone();
        string[] written;
        (string Full, string Shown, string Text)[] beside;
        lock (_gate)
        {
            written = [.. _written];
            beside = [.. _beside];
        }
        var now = new HashSet<string>(written, StringComparer.Ordinal);
        var previous = OutputManifest.Read(Path.Combine(Target, ManifestName));
        var others = previous.Where(e => e.Producer != _producer && !now.Contains(e.Key) && IsPlainFile(e.Key)).Distinct().ToList();
        var stale = previous.Where(e => e.Producer == _producer && !now.Contains(e.Key) && IsPlainFile(e.Key)).Select(e => e.Key).Distinct().ToList();
        File.WriteAllText(Path.Combine(_files, ManifestName), OutputManifest.Text(others.Concat(written.Select(k => (_producer, k)))));
        string[] files = [.. written, ManifestName];

        // Check everything before anything changes.
        foreach (string key in files)
            if (Obstacle(key) is { } problem) throw new InputException(problem + "; nothing was changed");
        foreach (var b in beside) CheckBeside(b.Full, b.Shown);
        foreach (string folder in ReceivingFolders(files, stale, beside.Select(b => b.Full))) ProbeWritable(folder);

        var undo = new Stack<Action>();
        var besideBackups = new List<string>();
        try
        {
            var temps = beside.Select(b => PrepareBeside(b.Full, b.Text, undo)).ToArray();
            foreach (string key in files) Place(key, undo);
            foreach (string key in stale) MoveAside(key, undo);
            for (int i = 0; i < beside.Length; i++) PlaceBeside(beside[i].Full, temps[i], undo, besideBackups);
        }
        catch
        {
            while (undo.Count > 0)
                try { undo.Pop()(); } catch (Exception ex) when (ex is IOException or UnauthorizedAccessException) { }
            throw;
        }
        _committed = true;
        DeleteQuietly(_staging);
        foreach (string b in besideBackups) try { File.Delete(b); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        foreach (string key in stale) RemoveEmptyFolders(key);
    }

    /// <summary>Releases the folder; without a commit, removes the staging folder, the lock file and the folders this run created.</summary>
    public void Dispose()
    {
        if (_disposed) return;
        _disposed = true;
        DeleteQuietly(_staging);
        _lock.Dispose();
        if (!_committed) RemoveCreatedFolders();
    }

    /// <summary>A name under which the manifest records files: letters, digits and '-'.</summary>
    internal static bool IsProducerName(string name) =>
        name.Length is > 0 and <= 64 && name.All(c => char.IsAsciiLetterOrDigit(c) || c == '-');

    /// <summary>
    /// <paramref name="relative"/> as a '/'-separated path inside the folder, or null when it is not one (rooted, empty parts,
    /// "." or "..", control characters).
    /// </summary>
    internal static string? Key(string relative)
    {
        if (string.IsNullOrEmpty(relative) || Path.IsPathRooted(relative)) return null;
        string[] parts = relative.Split('/', '\\');
        foreach (string p in parts)
            if (p.Length == 0 || p == "." || p == ".." || p.Any(char.IsControl)) return null;
        return string.Join('/', parts);
    }

    /// <summary>Whether <paramref name="path"/> is a symbolic link (to anything, or dangling).</summary>
    internal static bool IsLink(string path)
    {
        try { return new FileInfo(path).LinkTarget is not null; }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException) { return false; }
    }

    string Stage(string relative)
    {
        ThrowIfDone();
        string key = Key(relative) ?? throw new InputException($"output name '{relative}' would fall outside the output folder");
        if (key.Split('/')[0] is ManifestName or LockName) throw new InputException($"output name '{relative}' is reserved for WaveSim's own records");
        if (Obstacle(key) is { } problem) throw new InputException(problem);
        string full = Local(_files, key);
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        lock (_gate) _written.Add(key);
        return full;
    }

    void ThrowIfDone()
    {
        ObjectDisposedException.ThrowIf(_disposed, this);
        if (_committed) throw new InvalidOperationException("The output folder was already committed.");
    }

    static string Local(string root, string key) => Path.Combine(root, key.Replace('/', Path.DirectorySeparatorChar));

    /// <summary>What stands in the way of the file <paramref name="key"/> in the target, or null when nothing does.</summary>
    string? Obstacle(string key)
    {
        string current = Target;
        string[] parts = key.Split('/');
        for (int i = 0; i < parts.Length; i++)
        {
            current = Path.Combine(current, parts[i]);
            if (IsLink(current)) return $"{current}: is a symbolic link; WaveSim never writes through a link inside its output folder";
            if (i == parts.Length - 1)
            {
                if (Directory.Exists(current)) return $"{current}: is a folder where the output file {key} goes";
            }
            else if (File.Exists(current)) return $"{current}: is a file where the output folder of {key} goes";
            else if (!Directory.Exists(current)) return null;
        }
        return null;
    }

    /// <summary>Whether <paramref name="key"/> is a regular file reached through real folders only (so it may be removed).</summary>
    bool IsPlainFile(string key)
    {
        string current = Target;
        string[] parts = key.Split('/');
        for (int i = 0; i < parts.Length; i++)
        {
            current = Path.Combine(current, parts[i]);
            if (IsLink(current)) return false;
            if (i < parts.Length - 1 && !Directory.Exists(current)) return false;
        }
        return File.Exists(current);
    }

    static void CheckBeside(string full, string shown)
    {
        if (Directory.Exists(full)) throw new InputException($"{shown}: is a folder, not a file; nothing was changed");
        for (string? d = Path.GetDirectoryName(full); d is not null && !Directory.Exists(d); d = Path.GetDirectoryName(d))
            if (File.Exists(d)) throw new InputException($"{d}: is a file, so {shown} cannot be written; nothing was changed");
    }

    /// <summary>The existing folders that receive a file, a new folder or lose a file in the commit.</summary>
    IEnumerable<string> ReceivingFolders(IEnumerable<string> files, IEnumerable<string> stale, IEnumerable<string> beside) =>
        files.Concat(stale).Select(k => Path.GetDirectoryName(Local(Target, k))!).Concat(beside.Select(b => Path.GetDirectoryName(b)!))
            .Select(NearestExisting).Distinct(StringComparer.Ordinal);

    static string NearestExisting(string folder)
    {
        string d = folder;
        while (!Directory.Exists(d) && Path.GetDirectoryName(d) is { } up) d = up;
        return d;
    }

    static void ProbeWritable(string folder)
    {
        string probe = Path.Combine(folder, $".wavesim-probe-{Environment.ProcessId}-{Guid.NewGuid():N}");
        try
        {
            using (new FileStream(probe, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1, FileOptions.DeleteOnClose)) { }
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"{folder}: cannot write files there; nothing was changed");
        }
    }

    void Place(string key, Stack<Action> undo)
    {
        string dest = Local(Target, key), source = Local(_files, key);
        EnsureFolder(Path.GetDirectoryName(dest)!, undo);
        if (File.Exists(dest) || IsLink(dest)) MoveAside(key, undo);
        BeforeMove?.Invoke(dest);
        File.Move(source, dest);
        undo.Push(() => File.Move(dest, source, overwrite: true));
    }

    void MoveAside(string key, Stack<Action> undo)
    {
        string dest = Local(Target, key), backup = Local(_backups, key);
        Directory.CreateDirectory(Path.GetDirectoryName(backup)!);
        BeforeMove?.Invoke(dest);
        File.Move(dest, backup);
        undo.Push(() => File.Move(backup, dest, overwrite: true));
    }

    static void EnsureFolder(string folder, Stack<Action> undo)
    {
        if (Directory.Exists(folder)) return;
        if (Path.GetDirectoryName(folder) is { } up) EnsureFolder(up, undo);
        Directory.CreateDirectory(folder);
        undo.Push(() => Directory.Delete(folder));
    }

    static string PrepareBeside(string full, string text, Stack<Action> undo)
    {
        string folder = Path.GetDirectoryName(full)!;
        EnsureFolder(folder, undo);
        string temp = Path.Combine(folder, $".{Path.GetFileName(full)}{StagingMark}{Environment.ProcessId}-{Guid.NewGuid():N}");
        using (var w = new StreamWriter(new FileStream(temp, FileMode.CreateNew, FileAccess.Write))) w.Write(text);
        undo.Push(() => File.Delete(temp));
        return temp;
    }

    void PlaceBeside(string full, string temp, Stack<Action> undo, List<string> backups)
    {
        if (File.Exists(full) || IsLink(full))
        {
            string backup = Path.Combine(Path.GetDirectoryName(full)!, $".{Path.GetFileName(full)}.wavesim-backup-{Environment.ProcessId}-{Guid.NewGuid():N}");
            BeforeMove?.Invoke(full);
            File.Move(full, backup);
            undo.Push(() => File.Move(backup, full, overwrite: true));
            backups.Add(backup);
        }
        BeforeMove?.Invoke(full);
        File.Move(temp, full);
        undo.Push(() => File.Move(full, temp, overwrite: true));
    }

    /// <summary>Removes the folders of <paramref name="key"/> that its removal left empty (frames/ after a run without frames).</summary>
    void RemoveEmptyFolders(string key)
    {
        for (string? d = Path.GetDirectoryName(Local(Target, key)); d is not null && d != Target; d = Path.GetDirectoryName(d))
        {
            if (IsLink(d) || !Directory.Exists(d) || Directory.EnumerateFileSystemEntries(d).Any()) return;
            try { Directory.Delete(d); } catch (IOException) { return; } catch (UnauthorizedAccessException) { return; }
        }
    }

    void CreateFolders(string folder)
    {
        var missing = new Stack<string>();
        for (string? d = folder; d is not null && !Directory.Exists(d); d = Path.GetDirectoryName(d))
        {
            if (File.Exists(d)) throw new InputException($"{d}: is a file, so the output folder {_shown} cannot be made");
            missing.Push(d);
        }
        while (missing.Count > 0)
        {
            string d = missing.Pop();
            Directory.CreateDirectory(d);
            _createdFolders.Add(d);
        }
    }

    void RemoveCreatedFolders()
    {
        for (int i = _createdFolders.Count - 1; i >= 0; i--)
            try { Directory.Delete(_createdFolders[i]); } catch (IOException) { return; } catch (UnauthorizedAccessException) { return; }
        _createdFolders.Clear();
    }

    /// <summary>The staging folders beside <paramref name="target"/> (a full path) with the process id in each name.</summary>
    internal static IEnumerable<(string Folder, int Pid)> Stagings(string target)
    {
        string parent = Path.GetDirectoryName(target)!, prefix = "." + Path.GetFileName(target) + StagingMark;
        if (!Directory.Exists(parent)) yield break;
        foreach (string d in Directory.EnumerateDirectories(parent, prefix + "*"))
        {
            string rest = Path.GetFileName(d)[prefix.Length..];
            int dash = rest.IndexOf('-', StringComparison.Ordinal);
            if (dash > 0 && int.TryParse(rest[..dash], NumberStyles.None, CultureInfo.InvariantCulture, out int pid)) yield return (d, pid);
        }
    }

    /// <summary>The process ids in the names of the staging folders beside <paramref name="target"/>.</summary>
    internal static IEnumerable<int> StagingProcesses(string target) => Stagings(target).Select(s => s.Pid);

    /// <summary>
    /// Removes staging folders beside the target whose process is gone (a run killed outright). The lock is held, so no live
    /// run of this version can own one; a folder whose process still runs is left, in case it is an older version's.
    /// </summary>
    void RemoveStaleStaging()
    {
        foreach (var (d, pid) in Stagings(Target).ToList())
            if (!IsLink(d) && (pid == Environment.ProcessId || !FolderLock.IsRunning(pid))) DeleteQuietly(d);
    }

    static void DeleteQuietly(string folder)
    {
        try { if (Directory.Exists(folder)) Directory.Delete(folder, recursive: true); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }
}
