using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Units;

namespace WaveSim.Cli;

/// <summary>
/// Runs a command's body and turns every expected failure into one "error: ..." line on stderr
/// and the matching exit code, so that no stack trace ever reaches the user.
/// </summary>
public static class CommandGuard
{
    /// <summary>
    /// Runs <paramref name="body"/> on the thread pool, as <see cref="Run"/> does in line, so the action returns its task at once
    /// and <see cref="Program.Main"/> can wait for it with the signal handling of <see cref="SignalCancellation"/>: a signal
    /// cancels the body's token, and the body then removes its staging folder and ends in `error: cancelled`.
    /// </summary>
    public static Task<int> RunAsync(TextWriter error, Func<int> body) => Task.Run(() => Run(error, body));

    /// <summary>Runs <paramref name="body"/>, mapping exceptions to exit codes.</summary>
    public static int Run(TextWriter error, Func<int> body)
    {
        // Every number the tool writes is invariant (a decimal point, never a comma), whatever the user's locale:
        // the command runs under the invariant culture, which flows into its tasks, and the caller's is restored after.
        var (culture, uiCulture) = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = CultureInfo.InvariantCulture;
        try
        {
            return body();
        }
        catch (OperationCanceledException)
        {
            error.WriteLine("error: cancelled");
            return ExitCodes.Cancelled;
        }
        catch (NumericalException ex)
        {
            error.WriteLine("error: " + ex.Message);
            return ExitCodes.NumericalFailure;
        }
        catch (Core.Solver.PlanLimitException ex)
        {
            // The library knows no flags: the command line says how to run beyond the limits.
            error.WriteLine("error: " + OneLine(ex.Message) + " " + ForceHint);
            return ExitCodes.BadInput;
        }
        catch (Core.Scenarios.CoupledFormRefused ex) when (CurrentCommand.Value is { } command)
        {
            error.WriteLine("error: " + ex.ForCommand(command));
            return ExitCodes.BadInput;
        }
        catch (Exception ex) when (ex is InputException or UnitException or IOException or UnauthorizedAccessException)
        {
            error.WriteLine("error: " + OneLine(ex.Message));
            return ExitCodes.BadInput;
        }
        catch (Exception ex) when (ex is ArgumentException or InvalidOperationException or ArithmeticException && Environment.GetEnvironmentVariable("WAVESIM_DEBUG") is null)
        {
            // A check deeper in the library caught something the input checks missed: still one line, no stack trace.
            error.WriteLine("error: " + OneLine(ex.Message));
            return ExitCodes.NumericalFailure;
        }
        catch (Exception ex) when (Environment.GetEnvironmentVariable("WAVESIM_DEBUG") is null)
        {
            // Anything else is a defect of ours, not the user's: still one line, with what to send us.
            var inner = ex is TypeInitializationException { InnerException: { } i } ? i : ex;
            error.WriteLine($"error: internal error ({inner.GetType().Name}: {OneLine(inner.Message)}); please report it with the scenario (WAVESIM_DEBUG=1 shows the stack trace)");
            return ExitCodes.InternalError;
        }
        finally
        {
            (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = (culture, uiCulture);
        }
    }

    static string OneLine(string s) => s.ReplaceLineEndings(" ");

    /// <summary>What every command that runs a plan adds to a limit message: its option to go beyond the limits.</summary>
    public const string ForceHint = "(use --force to run anyway)";
}
