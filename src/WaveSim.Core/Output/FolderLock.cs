using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace WaveSim.Core.Output;

/// <summary>
/// An exclusive hold on an output folder for one command: the lock file <see cref="OutputFolder.LockName"/> inside it, opened
/// for this process alone (an advisory lock on Unix, a sharing lock on Windows, released when the process ends, even when it is
/// killed), so a second run into the same folder is refused at once. The lock file holds the holder's process id for a person
/// to read; another run cannot read a locked file, so it names the holder from its staging folder (".NAME.wavesim-staging-PID-…").
/// The holder deletes the lock file before it lets go, so the folder keeps no trace of the lock.
/// </summary>
internal sealed class FolderLock : IDisposable
{
    readonly FileStream _file;

    FolderLock(string path, FileStream file)
    {
        Path = path;
        _file = file;
    }

    /// <summary>The lock file.</summary>
    public string Path { get; }

    /// <summary>Takes the folder <paramref name="folder"/> (which exists), or throws an <see cref="InputException"/> naming the holder.</summary>
    /// <param name="folder">The full path of the output folder.</param>
    /// <param name="shown">The folder as the user named it, for the message.</param>
    public static FolderLock Take(string folder, string shown)
    {
        string path = System.IO.Path.Combine(folder, OutputFolder.LockName);
        if (OutputFolder.IsLink(path))
            throw new InputException($"{path}: is a symbolic link; WaveSim never writes through a link inside its output folder");
        for (int attempt = 0; ; attempt++)
        {
            FileStream file;
            try
            {
                file = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None);
            }
            catch (IOException) when (File.Exists(path))
            {
                throw InUse(shown, folder);
            }
            // The previous holder may have deleted the file between our open and our lock: then this lock is on a file that is
            // no longer there, and another run could lock a new one. Try again on the file that is there now.
            if (!File.Exists(path) && attempt < 3)
            {
                file.Dispose();
                continue;
            }
            try
            {
                file.SetLength(0);
                file.Write(Encoding.ASCII.GetBytes(Environment.ProcessId.ToString(CultureInfo.InvariantCulture) + "\n"));
                file.Flush();
                return new FolderLock(path, file);
            }
            catch
            {
                file.Dispose();
                throw;
            }
        }
    }

    /// <summary>Deletes the lock file (while still holding it, so no other run takes it half-deleted) and lets go.</summary>
    public void Dispose()
    {
        try { File.Delete(Path); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        _file.Dispose();
    }

    /// <summary>Whether process <paramref name="pid"/> is running (false also when it cannot be asked).</summary>
    public static bool IsRunning(int pid)
    {
        try
        {
            using var p = Process.GetProcessById(pid);
            return !p.HasExited;
        }
        catch (Exception ex) when (ex is ArgumentException or InvalidOperationException or System.ComponentModel.Win32Exception)
        {
            return false;
        }
    }

    static InputException InUse(string shown, string folder)
    {
        int? holder = OutputFolder.StagingProcesses(folder).Where(p => p == Environment.ProcessId || IsRunning(p)).Cast<int?>().FirstOrDefault();
        return new(holder is { } p ? $"{shown}: in use by process {p}" : $"{shown}: in use by another process");
    }
}
