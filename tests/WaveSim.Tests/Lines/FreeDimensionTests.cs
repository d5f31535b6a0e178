using WaveSim.Core;
using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>
/// Which dimension a synthesis solves for (it used to be chosen inside the xsection command): the one asked for, or the one
/// required dimension left out. A rule of the tool itself (common practice, no source).
/// </summary>
public class FreeDimensionTests
{
    static Dictionary<string, string> Given(params string[] keys) => keys.ToDictionary(k => k, _ => "1mm", StringComparer.OrdinalIgnoreCase);

    [Fact]
    public void The_one_required_dimension_left_out_is_solved_for()
    {
        var raw = Given("height", "er");
        Assert.Equal("width", CrossSection.FreeDimension("microstrip", raw, null, "x"));
        Assert.Equal(2, raw.Count);
    }

    [Fact]
    public void A_dimension_asked_for_replaces_a_given_value()
    {
        var raw = Given("width", "height", "er");
        Assert.Equal("height", CrossSection.FreeDimension("microstrip", raw, "HEIGHT", "x"));
        Assert.False(raw.ContainsKey("height"));
        Assert.True(raw.ContainsKey("width"));
    }

    [Fact]
    public void Nothing_or_two_left_out_and_an_unsolvable_key_are_errors_in_the_callers_names()
    {
        static string Flag(string k) => "--" + k;
        var none = Assert.Throws<InputException>(() => CrossSection.FreeDimension("microstrip", Given("width", "height", "er"), null, "x", Flag));
        Assert.Equal("x: --z0 needs one dimension left out, or --solve KEY (solvable: width, height, er)", none.Message);
        var two = Assert.Throws<InputException>(() => CrossSection.FreeDimension("microstrip", Given("er"), null, "x", Flag));
        Assert.Equal("x: --z0 solves for one dimension, but --width, --height are missing", two.Message);
        var plain = Assert.Throws<InputException>(() => CrossSection.FreeDimension("microstrip", Given("er"), null, "g"));
        Assert.Equal("g: z0 solves for one dimension, but width, height are missing", plain.Message);
        var bad = Assert.Throws<InputException>(() => CrossSection.FreeDimension("microstrip", Given("er"), "tand", "x", Flag));
        Assert.Equal("x: cannot solve microstrip for 'tand'; solvable: width, height, er", bad.Message);
    }
}
