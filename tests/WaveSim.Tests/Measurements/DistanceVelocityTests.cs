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

/// <summary>A captured trace read with a given or a measured rise time (the choice used to be made inside the tdr command).</summary>
public class CaptureRiseTests
{
    // A 1 V step through a first-order edge (time constant 20 ps) at 1 ns, sampled every 1 ps: its 10-90 % rise is
    // τ·ln 9 (single-pole response; common practice, no source).
    static Capture Trace()
    {
        double[] t = Enumerable.Range(0, 4000).Select(i => i * 1e-12).ToArray();
        double[] v = t.Select(x => x < 1e-9 ? 0 : 1 - Math.Exp(-(x - 1e-9) / 20e-12)).ToArray();
        return new Capture(t, v, "trace.csv");
    }

    [Fact]
    public void A_given_rise_sets_the_ramp_and_a_missing_one_is_measured()
    {
        var given = Reflectometer.FromCapture(Trace(), 50, null, (double?)100e-12);
        Assert.Equal(1.25 * 100e-12, given.RampS, 1e-18);
        var measured = Reflectometer.FromCapture(Trace(), 50, null, (double?)null);
        Assert.InRange(measured.RampS, 1.25 * 20e-12 * Math.Log(9) * 0.8, 1.25 * 20e-12 * Math.Log(9) * 1.2);
    }
}
