using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// Numbers as the IBIS standard writes them (ANSI/EIA-656-B, "numerical values" rule; from memory; ReferenceData/buffers.md §1): a decimal number with an
/// optional exponent, an optional case-sensitive scale suffix T G M k m u n p f, and trailing unit letters that are ignored.
/// </summary>
public class BufferNumberTests
{
    [Theory]
    [InlineData("3.3", 3.3)]
    [InlineData("3.3V", 3.3)]
    [InlineData("-1.5e-3", -1.5e-3)]
    [InlineData("10pF", 10e-12)]
    [InlineData("5mA", 5e-3)]
    [InlineData("2.5nH", 2.5e-9)]
    [InlineData("1kohm", 1e3)]
    [InlineData("50ohm", 50)]      // 'o' is no scale: the unit is ignored
    [InlineData("2M", 2e6)]        // M is mega, m is milli
    [InlineData("2m", 2e-3)]
    [InlineData("3T", 3e12)]
    [InlineData("4G", 4e9)]
    [InlineData("7u", 7e-6)]
    [InlineData("8f", 8e-15)]
    [InlineData(".5n", 0.5e-9)]
    public void Scale_suffixes_and_units(string text, double expected)
    {
        Assert.True(BufferNumber.TryParse(text, out double v));
        Assert.Equal(expected, v, Math.Abs(expected) * 1e-15);
    }

    [Theory]
    [InlineData("NA")]
    [InlineData("abc")]
    [InlineData("1.2x3")]
    [InlineData("1,5")]
    [InlineData("")]
    [InlineData("1e999")]
    public void Not_numbers(string text) => Assert.False(BufferNumber.TryParse(text, out _));

    [Fact]
    public void NA_is_recognised_in_any_case() => Assert.True(BufferNumber.IsNa("na") && BufferNumber.IsNa("NA") && !BufferNumber.IsNa("N/A"));
}
