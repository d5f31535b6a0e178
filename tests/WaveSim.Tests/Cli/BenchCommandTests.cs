using System.CommandLine;
using System.Text.Json;
using WaveSim.Cli;

namespace WaveSim.Tests.Cli;

/// <summary>`wavesim bench`: output shape and input errors (speed itself is measured in benchmarks, never asserted here).</summary>
public class BenchCommandTests
{
    static (int Code, string Out, string Err) Invoke(string args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = Program.BuildRoot().Parse(args).Invoke(new InvocationConfiguration { Output = o, Error = e });
        return (code, o.ToString(), e.ToString());
    }

    [Fact]
    public void Json_output_is_one_object_with_the_four_keys()
    {
        var (code, output, err) = Invoke("bench --cells 1000 --steps 200 --json");
        Assert.Equal(0, code);
        Assert.Equal("", err);
        Assert.Single(output.Trim().Split('\n'));
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(["cells", "steps", "seconds", "cell_updates_per_s"], root.EnumerateObject().Select(p => p.Name).ToArray());
        Assert.Equal(1000, root.GetProperty("cells").GetInt32());
        Assert.Equal(200, root.GetProperty("steps").GetInt32());
        double s = root.GetProperty("seconds").GetDouble(), rate = root.GetProperty("cell_updates_per_s").GetDouble();
        Assert.True(s > 0 && double.IsFinite(rate));
        // The rate is cells × steps over the time (definition of the figure), to rounding.
        Assert.Equal(1000.0 * 200 / s, rate, 1e-9 * rate);
    }

    [Fact]
    public void Lossless_text_output_names_the_line_and_the_rate()
    {
        var (code, output, _) = Invoke("bench --cells 300 --steps 50 --lossless");
        Assert.Equal(0, code);
        Assert.Contains("lossless line, 300 cells x 50 steps", output);
        Assert.Contains("cell updates/s", output);
        Assert.Contains("fastest of 3 repetitions", output);
    }

    [Theory]
    [InlineData("bench --cells 1", "--cells")]
    [InlineData("bench --steps 0", "--steps")]
    [InlineData("bench --cells many", "--cells")]
    [InlineData("bench --repeat 0", "--repeat")]
    public void Bad_sizes_give_a_one_line_error_naming_the_option(string args, string option)
    {
        // A value the option cannot read is bad input (exit 2, one "error:" line), as the README's exit-code table says.
        var (code, output, err) = Invoke(args);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("", output);
        Assert.StartsWith("error: " + option + ": ", err);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.Contains(option, err);
        Assert.DoesNotContain("   at ", err);
    }
}
