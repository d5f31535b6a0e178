using System.Numerics;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>The <c>loss</c> keys of a segment: what they build and how bad input is reported.</summary>
public class ScenarioKeyTests
{
    const string Yaml = @"
source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment:
      length: 0.3 m
      z0: 50 ohm
      delay: 6 ns/m
      loss: { r_dc: 5 ohm/m, skin_at: 1 GHz, r_skin: 40 ohm/m, tand: 0.02, er: 4.3, at: 1 GHz }
load: { r: 50 ohm }
simulation: { duration: 3 ns }
";

    [Fact]
    public void Explicit_keys_give_the_stated_resistance_and_conductance_at_their_frequencies()
    {
        // Derived from the key definitions: R(skin_at) = r_skin, R(0) = r_dc; at 'at' Y = jωC + ωC tan d (G = ωC tan d, Pozar).
        var seg = (Segment)TestScenarios.Parse(Yaml).Line[0];
        Assert.NotNull(seg.Loss);
        var s = new Complex(0, 2 * Math.PI * 1e9);
        Assert.Equal(5, seg.SeriesImpedance(Complex.Zero).Real, 1e-12);
        Assert.Equal(40, seg.SeriesImpedance(s).Real, 1e-9);
        double c = 6e-9 / 50;
        Assert.Equal(2 * Math.PI * 1e9 * c * 0.02, seg.ShuntAdmittance(s).Real, 1e-12);
        Assert.Equal(2 * Math.PI * 1e9 * c, seg.ShuntAdmittance(s).Imaginary, 1e-12);
        Assert.Equal(0, seg.ShuntAdmittance(Complex.Zero).Magnitude);
    }

    [Theory]
    [InlineData("r_skin: 40 ohm/m, ", "", "line[0].segment.loss", "r_skin")]
    [InlineData("r_skin: 40 ohm/m", "r_skin: 4 ohm/m", "line[0].segment.loss.r_skin", "greater than r_dc")]
    [InlineData("at: 1 GHz }", "at: 1 GHz, q: 2 }", "line[0].segment.loss.q", "unknown key")]
    [InlineData("er: 4.3", "er: 0.5", "line[0].segment.loss.er", "at least 1")]
    [InlineData("tand: 0.02", "tand: lots", "line[0].segment.loss.tand", "")]
    [InlineData("delay: 6 ns/m", "delay: 6 ns/m\n      r: 1 ohm/m", "line[0].segment.r", "not both")]
    [InlineData("loss: { r_dc: 5 ohm/m, skin_at: 1 GHz, r_skin: 40 ohm/m, tand: 0.02, er: 4.3, at: 1 GHz }", "loss: frequency", "line[0].segment.loss", "geometry")]
    public void Bad_loss_input_names_file_line_column_and_key(string from, string to, string key, string words)
    {
        var ex = Assert.ThrowsAny<ScenarioException>(() => TestScenarios.Parse(Yaml.Replace(from, to)));
        Assert.Matches(@"^test\.yaml:\d+:\d+: ", ex.Message);
        Assert.Contains(key, ex.Message);
        Assert.Contains(words, ex.Message);
        Assert.DoesNotContain("\n", ex.Message);
    }

    [Fact]
    public void A_geometry_takes_only_frequency_or_constant()
    {
        var ex = Assert.ThrowsAny<ScenarioException>(() => TestScenarios.Parse(LossScenarios.Microstrip(loss: "{ tand: 0.02 }")));
        Assert.Contains("line[0].segment.loss", ex.Message);
        Assert.Matches(@"^test\.yaml:\d+:\d+: ", ex.Message);
    }
}
