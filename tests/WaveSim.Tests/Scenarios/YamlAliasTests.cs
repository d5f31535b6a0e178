using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Scenarios;

/// <summary>A stray YAML alias is a one-line scenario error, not an internal failure (common practice, no source).</summary>
public class YamlAliasTests
{
    [Fact]
    public void An_alias_after_a_flow_mapping_is_a_scenario_error_naming_the_file()
    {
        // Found by the garbage-bytes property test: "}*-E~(rf" made the YAML library throw ArgumentException (exit 3).
        var ex = Assert.Throws<ScenarioException>(() => ScenarioLoader.Parse("title: base\nsimulation: { duration: 5 ns }*-E~(rf\n", "a.yaml"));
        // The pre-scan of the YAML events (YamlShape) now meets it first, as an alias used as a key, and names the line.
        Assert.StartsWith("a.yaml:2:", ex.Message);
        Assert.Contains("alias", ex.Message);
    }
}
