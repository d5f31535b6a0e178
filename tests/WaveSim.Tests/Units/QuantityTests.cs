using WaveSim.Core.Units;

namespace WaveSim.Tests.Units;

/// <summary>Unit reading. Conversion factors: SI brochure (BIPM, 9th ed., 2019) prefixes;
/// 1 in = 25.4 mm exactly and 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959);
/// c = 299 792 458 m/s exactly (SI definition).</summary>
public class QuantityTests
{
    [Theory]
    [InlineData("3.3 V", 3.3)]
    [InlineData("500 ps", 500e-12)]
    [InlineData("25 ohm", 25)]
    [InlineData("25 \u03a9", 25)]
    [InlineData("25 \u2126", 25)]
    [InlineData("2 kohm", 2000)]
    [InlineData("1 Mohm", 1e6)]
    [InlineData("2 mohm", 2e-3)]
    [InlineData("2 pF", 2e-12)]
    [InlineData("10 nH", 10e-9)]
    [InlineData("10ohm", 10)]
    [InlineData("2.5e-9 s", 2.5e-9)]
    [InlineData("1 GHz", 1e9)]
    [InlineData("3 µs", 3e-6)]
    [InlineData("3 μs", 3e-6)]
    [InlineData("3 us", 3e-6)]
    [InlineData("4 ms", 4e-3)]
    [InlineData("4 mS", 4e-3)]
    public void Reads_scalar_quantities_in_SI(string text, double expected)
    {
        var (value, _) = Quantity.ParseAny(text, Dimension.Voltage, Dimension.Time, Dimension.Resistance,
            Dimension.Capacitance, Dimension.Inductance, Dimension.Frequency, Dimension.Conductance);
        Assert.Equal(expected, value, expected * 1e-12);
    }

    [Theory]
    [InlineData("150 mm", 0.150)]
    [InlineData("6 in", 0.1524)]
    [InlineData("8 mil", 0.0002032)]
    [InlineData("1.2 ft", 0.36576)]
    [InlineData("2 cm", 0.02)]
    [InlineData("3 m", 3)]
    public void Reads_lengths_in_metres(string text, double metres) =>
        Assert.Equal(metres, Quantity.Parse(text, Dimension.Length), 1e-12);

    [Theory]
    [InlineData("5 ohm/m", 5, BaseKind.Resistance)]
    [InlineData("2 kohm/m", 2000, BaseKind.Resistance)]
    [InlineData("300 nH/m", 300e-9, BaseKind.Inductance)]
    [InlineData("120 pF/m", 120e-12, BaseKind.Capacitance)]
    [InlineData("0.01 S/m", 0.01, BaseKind.Conductance)]
    [InlineData("3 uS/m", 3e-6, BaseKind.Conductance)]
    [InlineData("6.5 ns/m", 6.5e-9, BaseKind.Time)]
    [InlineData("170 ps/in", 170e-12 / 0.0254, BaseKind.Time)]
    [InlineData("3.2 pF/in", 3.2e-12 / 0.0254, BaseKind.Capacitance)]
    [InlineData("1 ns/ft", 1e-9 / 0.3048, BaseKind.Time)]
    [InlineData("1 ohm/mil", 1 / 0.0254e-3, BaseKind.Resistance)]
    public void Reads_per_length_quantities_per_metre(string text, double expected, BaseKind kind)
    {
        var (value, dim) = Quantity.ParseAny(text, new Dimension(kind, true));
        Assert.Equal(expected, value, Math.Abs(expected) * 1e-12);
        Assert.True(dim.PerLength);
    }

    [Fact]
    public void A_bare_c_is_the_speed_of_light_and_cm_the_centimetre()
    {
        Assert.Equal(0.66 * 299_792_458.0, Quantity.Parse("0.66 c", Dimension.Velocity), 1e-6);
        Assert.Equal(0.05, Quantity.Parse("5 cm", Dimension.Length), 1e-15);
    }

    [Theory]
    [InlineData("5 nF", "is a capacitance, not a resistance")]
    [InlineData("50", "has no unit")]
    [InlineData("50 furlongs", "unknown unit 'furlongs'")]
    [InlineData("ohm", "is not a number")]
    public void Wrong_dimension_missing_or_unknown_unit_is_a_clear_error(string text, string fragment)
    {
        var ex = Assert.Throws<UnitException>(() => Quantity.Parse(text, Dimension.Resistance));
        Assert.Contains(fragment, ex.Message);
        Assert.Contains("ohm", ex.Message); // names the accepted units
    }

    [Theory]
    [InlineData(2.5e-9, "s", "2.5 ns")]
    [InlineData(0.0033, "V", "3.3 mV")]
    [InlineData(50, "Ω", "50 Ω")]
    public void Formats_with_an_engineering_prefix(double v, string unit, string expected) =>
        Assert.Equal(expected, Quantity.Format(v, unit));

    // Engineering notation puts one prefix per factor of 1000 and no exponent beside it (the SI prefixes, BIPM, The International
    // System of Units, 9th ed. 2019, §3; ReferenceData/edge-windows.md §5): a value is rounded to its digits before the prefix is chosen, and a value far below the
    // smallest prefix is zero to the shown resolution.
    [Theory]
    [InlineData(-5.19e-23, "s", 3, "0 s")]          // a delay that is zero up to rounding (two equal instants subtracted)
    [InlineData(5.19e-23, "s", 3, "0 s")]
    [InlineData(-0.0, "V", 3, "0 V")]
    [InlineData(0.5e-15, "s", 3, "0.5 fs")]         // below 1 fs: fixed resolution of 0.01 fs at 3 digits
    [InlineData(999.7e-9, "s", 3, "1 µs")]          // rounds up to 1000 ns: the next prefix, not "1E+03 ns"
    [InlineData(16e-9, "s", 1, "20 ns")]            // one digit: not "2E+01 ns"
    [InlineData(2.5e16, "V", 4, "25000 TV")]        // beyond the largest prefix: plain digits
    [InlineData(1.2345e-9, "s", 4, "1.234 ns")]     // as before: 1.2345 is 1.23449999... in binary
    [InlineData(-3.3e-3, "V", 3, "-3.3 mV")]
    public void Never_prints_an_exponent_beside_a_prefix(double v, string unit, int digits, string expected)
    {
        string text = Quantity.Format(v, unit, digits);
        Assert.Equal(expected, text);
        Assert.DoesNotContain("E", text.Replace(unit, ""));
    }
}
