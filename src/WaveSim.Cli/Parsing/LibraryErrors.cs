using WaveSim.Core;

namespace WaveSim.Cli.Parsing;

/// <summary>
/// Puts the flag before a library error about one of its parameters: the library names its own parameter
/// (<see cref="InputException.Parameter"/>), the command line knows which of its options gave that value.
/// </summary>
public static class LibraryErrors
{
    /// <summary>Runs <paramref name="f"/>; an input error naming one of the mapped parameters comes back as "--flag: message".</summary>
    /// <typeparam name="T">The result's type.</typeparam>
    /// <param name="f">The library call.</param>
    /// <param name="flags">Library parameter names and the flags that give them.</param>
    public static T Naming<T>(Func<T> f, params (string Parameter, string Flag)[] flags)
    {
        try { return f(); }
        catch (InputException ex) when (ex.Parameter is { } p && flags.Any(x => x.Parameter == p))
        {
            throw new InputException($"{flags.First(x => x.Parameter == p).Flag}: {ex.Message}");
        }
    }

    /// <summary>Like <see cref="Naming{T}"/> for a call without a result.</summary>
    /// <param name="f">The library call.</param>
    /// <param name="flags">Library parameter names and the flags that give them.</param>
    public static void Naming(Action f, params (string Parameter, string Flag)[] flags) =>
        Naming<int>(() => { f(); return 0; }, flags);
}
