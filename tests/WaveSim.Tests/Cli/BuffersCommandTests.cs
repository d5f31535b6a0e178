using System.Text.Json.Nodes;
using WaveSim.Core.Output;
using WaveSim.Tests.Buffers;

namespace WaveSim.Tests.Cli;

/// <summary><c>wavesim buffers</c>: what it lists and writes, and one-line errors with nothing written for bad input.</summary>
public class BuffersCommandTests
{
    static readonly string Demo33 = Repository.PathOf("scenarios", "buffers", "demo33.ibs");

    static void OneLineError((int Code, string Out, string Err) r, string contains)
    {
        Assert.Equal(2, r.Code);
        Assert.StartsWith("error: ", r.Err);
        Assert.Single(r.Err.TrimEnd('\n', '\r').Split('\n'));
        Assert.Contains(contains, r.Err);
    }

    [Fact]
    public void The_demo_is_listed_and_its_pictures_and_summary_are_written()
    {
        using var cli = new CliRunner();
        string dir = cli.PathOf("out");
        var (code, stdout, stderr) = CliRunner.Run("buffers", Demo33, "--out", dir);
        Assert.True(code == 0, stderr);
        Assert.Equal("", stderr);
        Assert.Contains("component DEMO33-IO4", stdout);
        Assert.Contains("pin 1      IO0          demo33_io", stdout);
        Assert.Contains("model demo33_io: I/O, corners typ/min/max", stdout);
        Assert.Contains("model demo33_in: Input", stdout);
        Assert.Contains("rising: two-equation method", stdout);
        Assert.Equal<string>(["buffers.json", "demo33_in-iv.png", "demo33_io-iv.png", "demo33_io-switching.png"],
                     Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).Where(n => n != OutputFolder.ManifestName).Order().ToArray());
        foreach (string png in Directory.GetFiles(dir, "*.png"))
            Assert.Equal([0x89, (byte)'P', (byte)'N', (byte)'G'], File.ReadAllBytes(png)[..4]);
        var json = JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "buffers.json")))!;
        Assert.Equal("5.0", (string?)json["ibis_version"]);
        Assert.Equal("I/O", (string?)json["models"]![0]!["type"]);
        Assert.Equal("two_waveforms", (string?)json["models"]![0]!["by_corner"]!["max"]!["rising"]!["method"]);
    }

    [Fact]
    public void Json_prints_the_summary_and_one_model_one_corner_can_be_chosen()
    {
        using var cli = new CliRunner();
        string dir = cli.PathOf("out");
        var (code, stdout, stderr) = CliRunner.Run("buffers", Demo33, "--model", "demo33_in", "--corner", "min", "--out", dir, "--json");
        Assert.True(code == 0, stderr);
        var json = JsonNode.Parse(stdout)!;
        JsonNode model = Assert.Single(json["models"]!.AsArray())!;
        Assert.Equal("demo33_in", (string?)model["name"]);
        Assert.Equal(["min"], model["by_corner"]!.AsObject().Select(p => p.Key).ToArray());
        Assert.Equal<string>(["buffers.json", "demo33_in-iv.png"], Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).Where(n => n != OutputFolder.ManifestName).Order().ToArray());
    }

    [Fact]
    public void Skipped_keywords_and_ramp_fall_backs_are_warned_on_stderr()
    {
        using var cli = new CliRunner();
        string file = cli.Write(FullFeatureFile.Name, FullFeatureFile.Text);
        var (code, _, stderr) = CliRunner.Run("buffers", file, "--out", cli.PathOf("out"));
        Assert.True(code == 0, stderr);
        string[] lines = stderr.TrimEnd('\n').Split('\n');
        Assert.All(lines, l => Assert.StartsWith("warning: ", l));
        Assert.Contains(lines, l => l.Contains("[Temperature Range]: skipped", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("[Model] out_only, rising edge: one [Rising Waveform]", StringComparison.Ordinal));
    }

    [Fact]
    public void A_receiver_with_no_tables_is_listed_without_a_picture()
    {
        using var cli = new CliRunner();
        string file = cli.Write("bare.ibs", "[IBIS Ver] 5.0\n[Component] X\n[Pin] signal_name model_name\n1 A bare\n" +
                                            "[Model] bare\nModel_type Input\nC_comp 1pF NA NA\n[End]\n");
        string dir = cli.PathOf("out");
        var (code, stdout, stderr) = CliRunner.Run("buffers", file, "--out", dir);
        Assert.True(code == 0, stderr);
        Assert.Contains("model bare: Input, corners typ, C_comp 1 pF", stdout);
        Assert.Equal<string>(["buffers.json"], Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).Where(n => n != OutputFolder.ManifestName).ToArray());
    }

    [Fact]
    public void A_model_not_in_the_file_lists_the_models_and_writes_nothing()
    {
        using var cli = new CliRunner();
        string dir = cli.PathOf("out");
        OneLineError(CliRunner.Run("buffers", Demo33, "--model", "nosuch", "--out", dir), "[Model] 'nosuch' is not in the file; its models are demo33_io, demo33_in");
        Assert.False(Directory.Exists(dir));
        Assert.Empty(Directory.GetFileSystemEntries(cli.Dir));
    }

    [Fact]
    public void A_corner_the_file_lacks_is_an_error_and_writes_nothing()
    {
        using var cli = new CliRunner();
        string file = cli.Write(FullFeatureFile.Name, FullFeatureFile.Text);
        string dir = cli.PathOf("out");
        OneLineError(CliRunner.Run("buffers", file, "--corner", "max", "--out", dir), "[Model] tri: has no max corner");
        OneLineError(CliRunner.Run("buffers", file, "--corner", "fast", "--out", dir), "--corner: expected typ, min or max, got 'fast'");
        Assert.False(Directory.Exists(dir));
    }

    [Fact]
    public void A_missing_malformed_or_oversized_file_is_a_one_line_error()
    {
        using var cli = new CliRunner();
        string dir = cli.PathOf("out");
        OneLineError(CliRunner.Run("buffers", cli.PathOf("none.ibs"), "--out", dir), "none.ibs: no such buffer model file");
        string bad = cli.Write("bad.ibs", FullFeatureFile.Text.Replace("1.0        50mA      40mA     60mA", "1.0        50mA", StringComparison.Ordinal));
        int line = FullFeatureFile.LineOf(FullFeatureFile.Text, "1.0        50mA");
        OneLineError(CliRunner.Run("buffers", bad, "--out", dir), $"bad.ibs:{line}: [Model] pp_io: [pulldown]: a row needs 4 columns");
        string big = cli.PathOf("big.ibs");
        using (var fs = new FileStream(big, FileMode.CreateNew)) fs.SetLength(51L * 1024 * 1024);
        OneLineError(CliRunner.Run("buffers", big, "--out", dir), "buffer model files above 50 MB are refused");
        Assert.False(Directory.Exists(dir));
    }
}
