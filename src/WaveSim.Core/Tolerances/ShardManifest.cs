using System.Globalization;
using System.Security.Cryptography;
using System.Text.Json.Nodes;

namespace WaveSim.Core.Tolerances;

/// <summary>
/// What a partial (sharded) output folder holds, written beside its rows as <see cref="FileName"/>: the kind of run, the
/// scenario's SHA-256, the settings that shape the output (as plain named values), the shard and the run's total size.
/// Merging checks that every partial agrees on all but the shard, and that the shards are 1..N, each once.
/// </summary>
/// <param name="Kind">"sweep" or "montecarlo".</param>
/// <param name="ScenarioPath">The scenario file as given (merge reads it again).</param>
/// <param name="ScenarioHash">SHA-256 of the scenario file's bytes, lower-case hex.</param>
/// <param name="Settings">The settings, name → text, in a fixed order.</param>
/// <param name="Shard">Which shard this is.</param>
/// <param name="Total">Points or samples of the whole run.</param>
public sealed record ShardManifest(string Kind, string ScenarioPath, string ScenarioHash, IReadOnlyList<KeyValuePair<string, string>> Settings, Shard Shard, int Total)
{
    /// <summary>The manifest's file name in a partial folder.</summary>
    public const string FileName = "shard.json";

    /// <summary>SHA-256 of a file's bytes, lower-case hex.</summary>
    public static string HashFile(string path) => Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(path)));

    /// <summary>The manifest as JSON.</summary>
    public JsonObject ToJson() => new()
    {
        ["kind"] = Kind,
        ["scenario"] = ScenarioPath,
        ["scenario_sha256"] = ScenarioHash,
        ["settings"] = new JsonObject(Settings.Select(s => KeyValuePair.Create(s.Key, (JsonNode?)JsonValue.Create(s.Value)))),
        ["shard"] = Shard.Number,
        ["shards"] = Shard.Count,
        ["total"] = Total,
    };

    /// <summary>Reads a manifest; <paramref name="name"/> names the file in messages.</summary>
    /// <exception cref="InputException">Not a manifest of this program.</exception>
    public static ShardManifest Parse(string text, string name)
    {
        try
        {
            var o = JsonNode.Parse(text)!.AsObject();
            string S(string k) => o[k]!.GetValue<string>();
            int I(string k) => o[k]!.GetValue<int>();
            var settings = o["settings"]!.AsObject().Select(p => KeyValuePair.Create(p.Key, p.Value!.GetValue<string>())).ToArray();
            int k = I("shard"), n = I("shards");
            if (n < 1 || k < 1 || k > n) throw new InputException($"{name}: shard {k} of {n} is out of range");
            return new ShardManifest(S("kind"), S("scenario"), S("scenario_sha256"), settings, new Shard(k, n), I("total"));
        }
        catch (Exception ex) when (ex is System.Text.Json.JsonException or InvalidOperationException or NullReferenceException or FormatException)
        { throw new InputException($"{name}: not a shard manifest (expected the {FileName} a sharded run writes)"); }
    }

    /// <summary>
    /// Checks that <paramref name="parts"/> are the shards 1..N of one run (same kind, scenario, settings, N and total), each
    /// once, and returns them in shard order.
    /// </summary>
    /// <param name="parts">Each partial's folder and manifest.</param>
    /// <exception cref="InputException">Partials of different runs, a missing or duplicate shard (one line, naming the folders).</exception>
    public static IReadOnlyList<(string Folder, ShardManifest Manifest)> CheckComplete(IReadOnlyList<(string Folder, ShardManifest Manifest)> parts)
    {
        ArgumentNullException.ThrowIfNull(parts);
        if (parts.Count == 0) throw new InputException("no partial folders to merge") { Parameter = "parts" };
        var (f0, m0) = parts[0];
        foreach (var (f, m) in parts.Skip(1))
        {
            string? why = m.Kind != m0.Kind ? $"a {m.Kind} run, not a {m0.Kind} run"
                : m.ScenarioHash != m0.ScenarioHash ? "another scenario (its SHA-256 differs)"
                : !m.Settings.SequenceEqual(m0.Settings) ? "other settings (" + Differing(m0, m) + ")"
                : m.Shard.Count != m0.Shard.Count ? $"a run cut into {m.Shard.Count} shards, not {m0.Shard.Count}"
                : m.Total != m0.Total ? $"a run of {m.Total}, not {m0.Total}"
                : null;
            if (why is not null) throw new InputException($"{f}: a partial of {why} than {f0}") { Parameter = "parts" };
        }
        var dup = parts.GroupBy(p => p.Manifest.Shard.Number).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new InputException($"shard {dup.Key}/{m0.Shard.Count} is given twice: {string.Join(" and ", dup.Select(p => p.Folder))}") { Parameter = "parts" };
        var missing = Enumerable.Range(1, m0.Shard.Count).Except(parts.Select(p => p.Manifest.Shard.Number)).ToArray();
        if (missing.Length > 0)
            throw new InputException($"shard{(missing.Length > 1 ? "s" : "")} {string.Join(", ", missing.Take(10).Select(k => k.ToString(CultureInfo.InvariantCulture)))}{(missing.Length > 10 ? ", …" : "")} of {m0.Shard.Count} missing") { Parameter = "parts" };
        return parts.OrderBy(p => p.Manifest.Shard.Number).ToArray();
    }

    static string Differing(ShardManifest a, ShardManifest b)
    {
        var da = a.Settings.ToDictionary(s => s.Key, s => s.Value);
        var db = b.Settings.ToDictionary(s => s.Key, s => s.Value);
        var k = da.Keys.Union(db.Keys).FirstOrDefault(k => da.GetValueOrDefault(k) != db.GetValueOrDefault(k)) ?? "order";
        return $"{k}: '{db.GetValueOrDefault(k)}' vs '{da.GetValueOrDefault(k)}'";
    }
}
