using CsCheck;

namespace WaveSim.Tests.Properties;

/// <summary>
/// How the property tests pick their cases. On every run (CI included) each property replays a fixed list of CsCheck seeds
/// as theory rows, one generated case per seed, so a run is repeatable and a failure names its seed in the test's name.
/// Fresh random cases are drawn only in a soak (WAVESIM_SOAK=N), whose failure message prints the seed to add as a row.
/// </summary>
internal static class PropertySeeds
{
    /// <summary>
    /// Seeds every property replays. The first was the single fixed seed CI used before; the rest were drawn once at random
    /// (any 12 characters of CsCheck's seed alphabet are a valid seed) and are kept as they are so runs stay comparable.
    /// </summary>
    public static readonly string[] Fixed =
    [
        "4aYKXIh7kn24", "5D1guu1CY4Gj", "498GDL-QsUBS", "3NhMYmIpzYYp", "dGsaczySJMWz", "8WjzX0OpXDnM", "3e8Fk9VvtPGb", "4SVmoQE8MRP9",
        "3Axjq9R5ZUk3", "3tYEQmSyDOr0", "8J5y3BOPR9PI", "aStV0l4HdpmR", "0dkVOqCwbb7p", "3HZGeJvZG14R", "f-QCG5Lovlyn", "6AsGLYesryUc",
        "83K1KEdLWo4Z", "aTfvyuxZvpxP", "1zhrd8Af3OYj", "5pBacTQ534U1", "1ybNoilSU83Q", "1G9koU5WwbtW", "1Zzxue17JT5M", "8xOtazOFIY-B",
    ];

    /// <summary>
    /// For the cheap properties (one in-process <c>check</c> each): <paramref name="count"/> further fixed seeds, made from
    /// their index by a fixed rule (PCG stream 12, state = index), so the list is the same on every run without writing it out.
    /// </summary>
    public static IEnumerable<string> Numbered(int count) =>
        Enumerable.Range(1, count).Select(i => new PCG(12, (ulong)i * 0x9E3779B97F4A7C15UL).ToString());

    /// <summary>The seeds as theory rows: <see cref="Fixed"/>, then <paramref name="extra"/> (numbered or formerly failing seeds).</summary>
    public static TheoryData<string> Rows(IEnumerable<string>? extra = null)
    {
        var rows = new TheoryData<string>();
        foreach (string s in Fixed.Concat(extra ?? []).Distinct()) rows.Add(s);
        return rows;
    }

    /// <summary>The one case a seed stands for: the generator run once from that seed, as CsCheck does when it replays one.</summary>
    public static T Replay<T>(Gen<T> gen, string seed) => gen.Generate(PCG.Parse(seed), null, out _);

    /// <summary>WAVESIM_SOAK=N: the number of fresh random cases each soak test draws; 0 (soak tests skipped) when unset.</summary>
    public static int Soak => int.TryParse(Environment.GetEnvironmentVariable("WAVESIM_SOAK"), out int n) && n > 0 ? n : 0;

    /// <summary>
    /// Runs <paramref name="property"/> on <see cref="Soak"/> fresh random cases (CsCheck, shrinking a failure to a small case
    /// and printing its seed), or reports the test as skipped when WAVESIM_SOAK is not set.
    /// </summary>
    public static void Explore<T>(Gen<T> gen, Func<T, bool> property)
    {
        Skip.If(Soak == 0, "random exploration runs only with WAVESIM_SOAK=N (N fresh cases); every run replays the fixed seeds");
        gen.Sample(property, iter: Soak, seed: null);
    }
}
