namespace WaveSim.Cli;

/// <summary>The process exit codes, documented in the README.</summary>
public static class ExitCodes
{
    /// <summary>Success.</summary>
    public const int Ok = 0;
    /// <summary>The command line itself was wrong (unknown option, missing argument).</summary>
    public const int Usage = 1;
    /// <summary>An input file (scenario, capture) or an option value was wrong.</summary>
    public const int BadInput = 2;
    /// <summary>The computation failed (NaN, infinity, no convergence).</summary>
    public const int NumericalFailure = 3;
    /// <summary>A defect in WaveSim itself: an exception no input check anticipated (reported in one line, never a stack trace).</summary>
    public const int InternalError = 4;
    /// <summary>Stopped by Ctrl+C (SIGINT): 128 + 2, as shells report a process ended by that signal.</summary>
    public const int Cancelled = 130;
    /// <summary>Stopped by SIGTERM: 128 + 15.</summary>
    public const int Terminated = 143;
}
