using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Scenarios;

/// <summary>The <c>iv:</c> key: what it reads into, and the one-line errors for bad tables (file, line, key, what was expected).</summary>
public class IvTableTests
{
    static string Net(string load, string shunt = "") => $@"
source: {{ waveform: step, high: 1 V, rise: 100 ps }}
line:
  - segment: {{ length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }}
{shunt}
load: {load}
simulation: {{ duration: 2 ns }}
";

    [Fact]
    public void A_load_table_reads_into_the_model_in_SI_units()
    {
        var s = TestScenarios.Parse(Net("{ r: 1 kohm, to: 1 V, iv: [[-0.6 V, -50 mA], [0 V, 0 A], [600 mV, 50 mA]] }"));
        Assert.Equal([-0.6, 0, 0.6], s.Load.Iv!.Voltages);
        Assert.Equal([-0.05, 0, 0.05], s.Load.Iv!.Currents);
        Assert.Equal(1, s.Load.To);
        var sh = TestScenarios.Parse(Net("open", "  - shunt: { iv: [[0 V, 0 A], [1 V, 1 mA]] }"));
        Assert.NotNull(((Shunt)sh.Line[1]).Parts.Iv);
        Assert.Contains("I-V table (3 points)", s.Load.Describe());
    }

    [Theory]
    [InlineData("{ iv: [[0 V, 0 A]] }", "test.yaml:6:", "load.iv: needs at least two [V, I] points, got 1")]
    [InlineData("{ iv: [[0 V, 0 A], [0 V, 1 mA]] }", "test.yaml:6:", "load.iv[1]: voltage 0 V does not exceed the point before it")]
    [InlineData("{ iv: [[0 V, 0 A], [1 V, 5]] }", "test.yaml:6:", "load.iv[1] current: '5' has no unit; expected a current")]
    [InlineData("{ iv: [[0 V, 0 A], [1 A, 5 mA]] }", "test.yaml:6:", "load.iv[1] voltage: '1 A' is a current, not a voltage")]
    [InlineData("{ iv: [0 V, 0 A] }", "test.yaml:6:", "load.iv[0]: expected one pair [V, I] with units")]
    [InlineData("{ iv: 5 mA }", "test.yaml:6:", "load.iv: expected a list of [V, I] pairs")]
    public void A_bad_table_is_a_one_line_error_naming_file_line_and_key(string load, string where, string message)
    {
        var ex = Assert.Throws<ScenarioException>(() => TestScenarios.Parse(Net(load)));
        Assert.StartsWith(where, ex.Message);
        Assert.Contains(message, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void A_shunt_table_stands_alone_and_the_frequency_check_refuses_tables()
    {
        var ex = Assert.Throws<ScenarioException>(() => TestScenarios.Parse(Net("open", "  - shunt: { r: 1 ohm, iv: [[0 V, 0 A], [1 V, 1 mA]] }")));
        Assert.Contains("line[1].shunt.iv: an I-V table is a part of its own here", ex.Message);
        var s = TestScenarios.Parse(Net("{ iv: [[0 V, 0 A], [1 V, 1 mA]] }"));
        var check = Assert.Throws<InputException>(() => Simulate.Run(s, new RunOptions { Analysis = new() { FrequencyCheck = true } }));
        Assert.Contains("needs a linear network", check.Message);
    }
}
