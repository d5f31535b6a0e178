using System.Text.Json.Nodes;

namespace WaveSim.Tests.Tolerances;

/// <summary>`--shard` and `merge`: shards merged in any order give exactly the files of an unsharded run.</summary>
public class ShardMergeTests
{
    static readonly string[] Vary = ["--vary", "load.r=tol(20%)", "--vary", "source.resistance=normal(50, 5 ohm)"];

    static string[] MonteCarlo(string file, string outDir, params string[] more) =>
        ["montecarlo", file, .. Vary, "--samples", "9", "--seed", "11", "--limit", "rx.high>0.45V", "--out", outDir, .. more];

    static string[] Sweep(string file, string outDir, params string[] more) =>
        ["sweep", file, "--vary", "load.r=20..80 ohm:4", "--vary", "source.resistance=40,60 ohm", "--out", outDir, .. more];

    static void Same(string a, string b)
    {
        var files = Directory.GetFiles(a).Select(Path.GetFileName).Where(f => !f!.StartsWith('.')).Order().ToArray();
        Assert.Equal(files, Directory.GetFiles(b).Select(Path.GetFileName).Where(f => !f!.StartsWith('.')).Order().ToArray());
        foreach (string f in files!)
        {
            if (f.EndsWith(".json", StringComparison.Ordinal))
                Assert.True(JsonNode.DeepEquals(JsonNode.Parse(File.ReadAllText(Path.Combine(a, f))), JsonNode.Parse(File.ReadAllText(Path.Combine(b, f)))), f);
            else Assert.Equal(File.ReadAllBytes(Path.Combine(a, f)), File.ReadAllBytes(Path.Combine(b, f)));
        }
    }

    [Theory]
    [InlineData("montecarlo")]
    [InlineData("sweep")]
    public void Shards_merged_out_of_order_equal_the_unsharded_run(string kind)
    {
        using var t = new CliRunner();
        string file = t.Write("divider.yaml", ToleranceSetTests.Divider);
        Func<string, string, string[], string[]> args = kind == "montecarlo" ? MonteCarlo : Sweep;
        var whole = CliRunner.Run(args(file, t.PathOf("whole"), []));
        Assert.True(whole.Code == 0, whole.Err);
        foreach (int n in new[] { 1, 3, 4 })
        {
            string parts = t.PathOf($"parts{n}");
            foreach (int k in Enumerable.Range(1, n).Reverse())
                Assert.Equal(0, CliRunner.Run(args(file, parts, ["--shard", $"{k}/{n}"])).Code);
            var dirs = Directory.GetDirectories(parts).OrderByDescending(d => d).ToArray();
            var merged = CliRunner.Run(["merge", t.PathOf($"merged{n}"), .. dirs]);
            Assert.True(merged.Code == 0, merged.Err);
            Same(t.PathOf("whole"), t.PathOf($"merged{n}"));
        }
    }

    [Fact]
    public void Merge_refuses_missing_duplicate_and_foreign_shards()
    {
        using var t = new CliRunner();
        string file = t.Write("divider.yaml", ToleranceSetTests.Divider);
        for (int k = 1; k <= 3; k++) Assert.Equal(0, CliRunner.Run(MonteCarlo(file, t.PathOf("a"), "--shard", $"{k}/3")).Code);
        Assert.Equal(0, CliRunner.Run(["montecarlo", file, .. Vary, "--samples", "9", "--seed", "12", "--limit", "rx.high>0.45V", "--out", t.PathOf("b"), "--shard", "3/3"]).Code);
        string P(string run, int k) => Path.Combine(t.PathOf(run), $"part-{k}-of-3");
        (string, string[])[] cases =
        [
            ("missing", [P("a", 1), P("a", 2)]),
            ("twice", [P("a", 1), P("a", 2), P("a", 2), P("a", 3)]),
            ("seed", [P("a", 1), P("a", 2), P("b", 3)]),
        ];
        foreach (var (why, dirs) in cases)
        {
            var (code, _, err) = CliRunner.Run(["merge", t.PathOf("m"), .. dirs]);
            Assert.Equal(2, code);
            Assert.Contains(why, err);
            Assert.Single(err.Trim().Split('\n'));
            Assert.False(Directory.Exists(t.PathOf("m")));
        }
    }
}
