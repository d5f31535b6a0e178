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
        Assert.StartsWith("a.yaml: not valid YAML", ex.Message);
    }
}
