using System.Diagnostics;
using System.Runtime.InteropServices;
using System.Text;

namespace WaveSim.Tests.Cli;

/// <summary>
/// The built command line (wavesim.dll, copied beside the tests) run as a child process, so a test can signal it, kill it or
/// race it for an output folder. Linux only: signals go through kill(2), and GNU env resets their handling first.
/// </summary>
internal sealed class ChildCli : IDisposable
{
    public const int SigInt = 2, SigKill = 9, SigTerm = 15;

    readonly Process _process;
    readonly StringBuilder _err = new();

    ChildCli(Process process)
    {
        _process = process;
        _process.ErrorDataReceived += (_, e) => { if (e.Data is not null) lock (_err) _err.AppendLine(e.Data); };
        _process.OutputDataReceived += (_, _) => { };
        _process.BeginErrorReadLine();
        _process.BeginOutputReadLine();
    }

    static string Dll => Path.Combine(AppContext.BaseDirectory, "wavesim.dll");

    /// <summary>Why a child cannot be started and signalled here, or null when it can.</summary>
    public static string? WhyNot()
    {
        if (!OperatingSystem.IsLinux()) return "child processes are signalled with kill(2) through GNU env, which this test needs Linux for";
        if (!File.Exists("/usr/bin/env")) return "/usr/bin/env is missing";
        if (!File.Exists(Dll)) return $"{Dll} was not built beside the tests";
        return null;
    }

    /// <summary>Starts `dotnet wavesim.dll ARGS` with SIGINT and SIGTERM at their default handling.</summary>
    public static ChildCli Start(params string[] args)
    {
        // A test host may run with SIGINT ignored (as a shell's background job does), and an ignored signal stays ignored in
        // every child, so the runtime would never see it: env --default-signal puts both signals back to their default first.
        var psi = new ProcessStartInfo("/usr/bin/env")
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        psi.ArgumentList.Add("--default-signal=INT,TERM");
        psi.ArgumentList.Add(Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host && File.Exists(host) ? host : "dotnet");
        psi.ArgumentList.Add(Dll);
        foreach (string a in args) psi.ArgumentList.Add(a);
        psi.Environment.Remove("WAVESIM_DEBUG");
        return new ChildCli(Process.Start(psi) ?? throw new InvalidOperationException("could not start the child process"));
    }

    /// <summary>The child's process id (env execs dotnet, which runs the tool in the same process).</summary>
    public int Pid => _process.Id;

    /// <summary>What the child wrote to stderr so far.</summary>
    public string Err { get { lock (_err) return _err.ToString(); } }

    /// <summary>Whether the child has exited.</summary>
    public bool HasExited => _process.HasExited;

    /// <summary>Sends <paramref name="signal"/> to the child.</summary>
    public void Signal(int signal)
    {
        if (kill(_process.Id, signal) != 0) throw new InvalidOperationException($"kill({_process.Id}, {signal}) failed: errno {Marshal.GetLastPInvokeError()}");
    }

    /// <summary>Waits until <paramref name="condition"/> holds; false when the child exits or the time runs out first.</summary>
    public bool WaitUntil(Func<bool> condition, TimeSpan timeout)
    {
        var clock = Stopwatch.StartNew();
        while (clock.Elapsed < timeout)
        {
            if (condition()) return true;
            if (_process.HasExited) return condition();
            Thread.Sleep(20);
        }
        return false;
    }

    /// <summary>Waits for the child to exit and returns its exit code (-1 when it had to be killed after the timeout).</summary>
    public int WaitForExit(TimeSpan timeout)
    {
        if (!_process.WaitForExit(timeout))
        {
            _process.Kill(entireProcessTree: true);
            _process.WaitForExit();
            return -1;
        }
        _process.WaitForExit(); // drains the redirected streams
        return _process.ExitCode;
    }

    public void Dispose()
    {
        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
            _process.WaitForExit();
        }
        _process.Dispose();
    }

    [DllImport("libc", SetLastError = true)]
    static extern int kill(int pid, int sig);
}
