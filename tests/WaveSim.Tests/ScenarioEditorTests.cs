using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests;

/// <summary>Variants made by key path read back like files (checked against the loader's own values; no outside source needed).</summary>
public class ScenarioEditorTests
{
    const string Yaml = @"# a comment that must survive
source: { waveform: step, high: 1 V, rise: 100 ps }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }   # trace
  - shunt: { c: 1 pF }
load: open
simulation: { duration: 10 ns }
";

    [Fact]
    public void Changing_values_keeps_comments_and_reads_back_in_SI()
    {
        var s = TestScenarios.Parse(Yaml);
        var v = ScenarioEditor.With(s, [("line[0].segment.z0", "75 ohm"), ("line[1].shunt.c", "2 pF"), ("load.r", "33 ohm"), ("source.resistance", "10 ohm")]);
        Assert.Equal(75, ((Segment)v.Line[0]).Z0, 1e-9);
        Assert.Equal(2e-12, ((Shunt)v.Line[1]).Parts.C!.Value, 1e-24);
        Assert.Equal(33, v.Load.R!.Value, 1e-12);
        Assert.Equal(10, v.Source.Resistance, 1e-12);
        Assert.Contains("# trace", ScenarioEditor.EditedText(s, [("line[0].segment.z0", "75 ohm")]));
    }

    [Theory]
    [InlineData("line[5].segment.z0", "no item [5]")]
    [InlineData("line[0].segment.z0", "is a capacitance")]
    [InlineData("simulation.nonsense", "unknown key 'nonsense'")]
    [InlineData("loud.r", "no 'loud'")]
    public void A_key_that_does_not_exist_or_a_wrong_unit_is_a_clear_error(string path, string fragment)
    {
        var s = TestScenarios.Parse(Yaml);
        var ex = Assert.ThrowsAny<InputException>(() => ScenarioEditor.With(s, [(path, "3 pF")]));
        Assert.Contains(fragment, ex.Message);
    }
}
