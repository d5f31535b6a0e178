using System.Globalization;

namespace WaveSim.Core.Tolerances;

/// <summary>
/// Shard <paramref name="Number"/> of <paramref name="Count"/> (1-based): the points or samples whose index i has
/// i mod Count = Number − 1. Round-robin, so every shard gets a like share of a run whose cost grows along the index.
/// </summary>
/// <param name="Number">1 to <paramref name="Count"/>.</param>
/// <param name="Count">How many shards the run is cut into.</param>
public sealed record Shard(int Number, int Count)
{
    /// <summary>The whole run, unsharded.</summary>
    public static readonly Shard Whole = new(1, 1);

    /// <summary>Largest number of shards.</summary>
    public const int MaxCount = 10_000;

    /// <summary>True when point <paramref name="index"/> belongs to this shard.</summary>
    public bool Contains(int index) => index % Count == Number - 1;

    /// <summary>Reads K/N; an error names the <c>text</c> parameter.</summary>
    /// <exception cref="InputException">Not K/N with 1 ≤ K ≤ N ≤ <see cref="MaxCount"/>.</exception>
    public static Shard Parse(string text)
    {
        var parts = text.Split('/');
        if (parts.Length == 2 && int.TryParse(parts[0].Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int k)
            && int.TryParse(parts[1].Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n is >= 1 and <= MaxCount)
            return k >= 1 && k <= n ? new Shard(k, n) : throw new InputException($"'{text}': shard {k} is out of range; K runs from 1 to {n}") { Parameter = "text" };
        throw new InputException($"'{text}': expected K/N with 1 <= K <= N <= {MaxCount}, e.g. 2/4, or auto") { Parameter = "text" };
    }

    /// <summary>
    /// The shard of a Slurm job-array task: K = SLURM_ARRAY_TASK_ID − SLURM_ARRAY_TASK_MIN + 1 (the array's indices may
    /// start anywhere, e.g. an array of 0-3 or of 1-4), N = SLURM_ARRAY_TASK_COUNT. Needs a contiguous array.
    /// </summary>
    /// <param name="variable">Reads an environment variable (null when unset).</param>
    /// <exception cref="InputException">A variable is unset or not a whole number, or the task lies outside the count.</exception>
    public static Shard FromSlurm(Func<string, string?> variable)
    {
        ArgumentNullException.ThrowIfNull(variable);
        int Read(string name) => int.TryParse(variable(name), NumberStyles.None, CultureInfo.InvariantCulture, out int v) ? v
            : throw new InputException($"auto: {name} is {(variable(name) is null ? "not set" : $"'{variable(name)}', not a whole number")}; run inside a Slurm job array or give K/N") { Parameter = "text" };
        int id = Read("SLURM_ARRAY_TASK_ID"), count = Read("SLURM_ARRAY_TASK_COUNT");
        int min = variable("SLURM_ARRAY_TASK_MIN") is null ? 0 : Read("SLURM_ARRAY_TASK_MIN");
        int k = id - min + 1;
        if (count < 1 || count > MaxCount || k < 1 || k > count)
            throw new InputException($"auto: task {id} of an array of {count} starting at {min} is not shard 1 to {count}; use a contiguous array (indices 0-{Math.Max(count - 1, 0)})") { Parameter = "text" };
        return new Shard(k, count);
    }

    /// <summary>K/N.</summary>
    public override string ToString() => $"{Number.ToString(CultureInfo.InvariantCulture)}/{Count.ToString(CultureInfo.InvariantCulture)}";
}
