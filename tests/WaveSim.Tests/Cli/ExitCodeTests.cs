using System.Text.Json.Nodes;
using WaveSim.Cli;
using WaveSim.Core;

namespace WaveSim.Tests.Cli;

/// <summary>The documented exit codes: 0 ok, 1 usage, 2 bad input, 3 numerical failure, 4 internal error, 130 cancelled (the README's table).</summary>
public class ExitCodeTests
{
    [Fact]
    public void An_unknown_option_is_a_usage_error()
    {
        var (code, _, _) = CliRunner.Run("run", "x.yaml", "--no-such-option");
        Assert.Equal(ExitCodes.Usage, code);
    }

    [Fact]
    public void Bad_input_numerical_failure_and_cancellation_map_to_their_codes()
    {
        var err = new StringWriter();
        Assert.Equal(2, CommandGuard.Run(err, () => throw new InputException("x.yaml:1:1: a: bad")));
        Assert.Equal(3, CommandGuard.Run(err, () => throw new NumericalException("not finite at step 3")));
        Assert.Equal(130, CommandGuard.Run(err, () => throw new OperationCanceledException()));
        // An exception no input check anticipated (here one from a type initializer) is a defect: one line, exit 4.
        Assert.Equal(4, CommandGuard.Run(err, () => throw new TypeInitializationException("X", new KeyNotFoundException("key 7"))));
        Assert.Contains("internal error (KeyNotFoundException: key 7)", err.ToString());
        Assert.Equal(0, CommandGuard.Run(err, () => 0));
        Assert.All(err.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries), l => Assert.StartsWith("error: ", l));
    }

    [Fact]
    public void About_reports_the_version_set_in_Directory_Build_props()
    {
        string props = File.ReadAllText(Repository.PathOf("Directory.Build.props"));
        string version = System.Text.RegularExpressions.Regex.Match(props, "<Version>([^<]+)</Version>").Groups[1].Value;
        var (code, json, _) = CliRunner.Run("about", "--json");
        Assert.Equal(0, code);
        Assert.Equal(version, JsonNode.Parse(json)!["version"]!.GetValue<string>());
    }
}
