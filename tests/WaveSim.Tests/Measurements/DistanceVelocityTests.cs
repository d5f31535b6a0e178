using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>The velocity a reflectometer trace is read with (it used to be chosen inside the tdr command).</summary>
public class DistanceVelocityTests
{
    const string Line = @"title: two sections
source: { waveform: step, high: 1 V, rise: 35 ps }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 5 ns/m }
  - segment: { length: 0.1 m, z0: 75 ohm, delay: 4 ns/m }
load: { r: 50 ohm }
simulation: { duration: 5 ns, resolution: 10 }
";

    [Fact]
    public void Without_a_choice_the_first_segments_velocity_is_used()
    {
        // v = 1/(delay per length): 5 ns/m is 2e8 m/s (definition of the per-length delay; common practice, no source).
        Assert.Equal(2e8, Reflectometer.DistanceVelocity(TestScenarios.Parse(Line), null, null), 1e-3);
    }

    [Fact]
    public void An_effective_permittivity_gives_c_over_its_root_and_a_velocity_is_taken_as_given()
    {
        // v = c/√εeff for a quasi-TEM line (Pozar, Microwave Engineering, 4th ed., §3.8, from memory): εeff = 4 halves c.
        var s = TestScenarios.Parse(Line);
        Assert.Equal(299_792_458.0 / 2, Reflectometer.DistanceVelocity(s, null, 4), 1e-6);
        Assert.Equal(1.5e8, Reflectometer.DistanceVelocity(s, 1.5e8, null));
    }

    [Theory]
    [InlineData(1.5e8, 4.0, "epsEff", "not both")]
    [InlineData(3.1e8, null, "velocity", "faster than light")]
    [InlineData(-1.0, null, "velocity", "positive velocity")]
    [InlineData(null, 0.5, "epsEff", "at least 1")]
    public void Bad_choices_name_their_parameter_and_no_flag(double? velocity, double? epsEff, string parameter, string fragment)
    {
        var ex = Assert.Throws<InputException>(() => Reflectometer.DistanceVelocity(TestScenarios.Parse(Line), velocity, epsEff));
        Assert.Equal(parameter, ex.Parameter);
        Assert.Contains(fragment, ex.Message);
        Assert.DoesNotContain("--", ex.Message);
    }
}
