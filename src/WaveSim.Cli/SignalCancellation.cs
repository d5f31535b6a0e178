using System.Runtime.InteropServices;

namespace WaveSim.Cli;

/// <summary>
/// Turns the first SIGINT or SIGTERM into a cancellation of the running command, which then removes its staging folder and
/// prints `error: cancelled`; the exit code is 128 + the signal's number (130, 143). A second signal is left to its default
/// action and ends the process at once (its staging folder is removed by the next run into the same place).
/// </summary>
public sealed class SignalCancellation : IDisposable
{
    readonly CancellationTokenSource _cancel = new();
    readonly PosixSignalRegistration[] _registrations;
    int _exitCode;

    /// <summary>Starts handling SIGINT and SIGTERM.</summary>
    public SignalCancellation() =>
        _registrations = [PosixSignalRegistration.Create(PosixSignal.SIGINT, Handle), PosixSignalRegistration.Create(PosixSignal.SIGTERM, Handle)];

    /// <summary>Cancelled by the first signal.</summary>
    public CancellationToken Token => _cancel.Token;

    /// <summary>
    /// Waits for <paramref name="command"/> and returns the process's exit code: the command's own, except that a command cancelled
    /// by a signal exits with that signal's code. After a signal the command has <paramref name="grace"/> to stop and clean up.
    /// </summary>
    /// <param name="command">The running command (its exit code).</param>
    /// <param name="grace">How long a cancelled command may take to stop before the process exits anyway.</param>
    /// <param name="error">Where the message goes when the command does not stop in time.</param>
    public async Task<int> ExitCodeAsync(Task<int> command, TimeSpan grace, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(command);
        ArgumentNullException.ThrowIfNull(error);
        var signalled = Task.Delay(Timeout.Infinite, _cancel.Token).ContinueWith(_ => { }, TaskScheduler.Default);
        if (await Task.WhenAny(command, signalled).ConfigureAwait(false) != command
            && await Task.WhenAny(command, Task.Delay(grace)).ConfigureAwait(false) != command)
        {
            error.WriteLine("error: cancelled");
            return Volatile.Read(ref _exitCode);
        }
        int code = await command.ConfigureAwait(false);
        int signal = Volatile.Read(ref _exitCode);
        return signal != 0 && code == ExitCodes.Cancelled ? signal : code;
    }

    void Handle(PosixSignalContext context)
    {
        int code = context.Signal == PosixSignal.SIGTERM ? ExitCodes.Terminated : ExitCodes.Cancelled;
        if (Interlocked.CompareExchange(ref _exitCode, code, 0) != 0) return; // a second signal: the default action ends the process
        context.Cancel = true;
        _cancel.Cancel();
    }

    /// <summary>Stops handling the signals.</summary>
    public void Dispose()
    {
        foreach (var r in _registrations) r.Dispose();
        _cancel.Dispose();
    }
}
