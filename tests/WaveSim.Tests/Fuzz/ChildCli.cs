using System.Diagnostics;

namespace WaveSim.Tests.Fuzz;

/// <summary>
/// Runs the built command line (wavesim.dll beside the tests) as a child process, so that its memory and time can be
/// bounded: the peak resident size is read from /proc/PID/status (VmHWM, the high-water mark) every few milliseconds while it
/// runs, and the child is killed as soon as it passes the memory bound or the timeout.
/// </summary>
internal static class ChildCli
{
    /// <summary>What one run did. <see cref="PeakBytes"/> is 0 where /proc is not available.</summary>
    public sealed record Outcome(int Code, string Out, string Err, long PeakBytes, bool TimedOut, bool OverMemory);

    static string Dotnet =>
        Environment.ProcessPath is { } p && Path.GetFileNameWithoutExtension(p) == "dotnet" ? p : "dotnet";

    /// <summary>Runs wavesim with <paramref name="args"/> in <paramref name="workDir"/>.</summary>
    public static Outcome Run(string workDir, TimeSpan timeout, long memoryBound, params string[] args)
    {
        var start = new ProcessStartInfo(Dotnet)
        {
            WorkingDirectory = workDir,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "wavesim.dll"));
        foreach (string a in args) start.ArgumentList.Add(a);
        start.Environment.Remove("WAVESIM_DEBUG");

        using var p = Process.Start(start)!;
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        var clock = Stopwatch.StartNew();
        long peak = 0;
        bool timedOut = false, overMemory = false;
        while (!p.WaitForExit(20))
        {
            peak = Math.Max(peak, HighWaterMark(p.Id));
            if (peak > memoryBound) overMemory = true;
            else if (clock.Elapsed > timeout) timedOut = true;
            else continue;
            try { p.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
            p.WaitForExit();
            break;
        }
        p.WaitForExit();
        return new Outcome(p.ExitCode, stdout.Result, stderr.Result, peak, timedOut, overMemory);
    }

    /// <summary>VmHWM of a running process, bytes; 0 when it cannot be read (gone, or not Linux).</summary>
    static long HighWaterMark(int pid)
    {
        try
        {
            foreach (string line in File.ReadLines($"/proc/{pid}/status"))
                if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
                    return long.Parse(line[6..].Trim().Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture) * 1024;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or FormatException) { }
        return 0;
    }
}
