using WaveSim.Core;
using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// The piecewise-linear I-V law against the two-point form of a straight line, I = I_k + (I_k+1 − I_k)(V − V_k)/(V_k+1 − V_k)
/// (any analytic-geometry text), between the points and, with the end segments, beyond them.
/// </summary>
public class IvCurveTests
{
    static readonly IvCurve Table = IvCurve.Create([(-1.0, -0.2), (0.0, 0.0), (0.5, 0.05), (2.0, 0.08)], "t");

    static double Line((double V, double I) a, (double V, double I) b, double v) => a.I + (b.I - a.I) * (v - a.V) / (b.V - a.V);

    [Theory]
    [InlineData(-1.0)]
    [InlineData(-0.3)]
    [InlineData(0.0)]
    [InlineData(0.25)]
    [InlineData(0.5)]
    [InlineData(1.7)]
    [InlineData(2.0)]
    public void Between_the_points_it_is_the_straight_line_through_the_neighbours(double v)
    {
        (double, double)[] p = [(-1.0, -0.2), (0.0, 0.0), (0.5, 0.05), (2.0, 0.08)];
        int k = v < 0 ? 0 : v < 0.5 ? 1 : 2;
        Assert.Equal(Line(p[k], p[k + 1], v), Table.Current(v), 15);
        Assert.Equal((p[k + 1].Item2 - p[k].Item2) / (p[k + 1].Item1 - p[k].Item1), Table.Slope(v), 12);
    }

    [Fact]
    public void Beyond_the_ends_it_continues_the_end_segments()
    {
        Assert.Equal(Line((-1, -0.2), (0, 0), -3), Table.Current(-3), 15);   // −0.6 A
        Assert.Equal(Line((0.5, 0.05), (2, 0.08), 10), Table.Current(10), 15); // 0.24 A
        Assert.Equal(0.2, Table.Slope(-50), 12);
        Assert.Equal(0.02, Table.Slope(50), 12);
    }

    [Fact]
    public void The_slope_around_a_point_is_the_mean_of_its_two_segments()
    {
        Assert.Equal(0.5 * (0.2 + 0.1), Table.SlopeAround(0.0), 12);
        Assert.Equal(0.1, Table.SlopeAround(0.25), 12);
        Assert.Equal(0.2, Table.SlopeAround(-1.0), 12); // an end point: its one segment
    }

    [Fact]
    public void Fewer_than_two_points_are_refused()
    {
        Assert.Equal("net.yaml:4:7: iv: needs at least two [V, I] points, got 1",
            Assert.Throws<InputException>(() => IvCurve.Create([(0.0, 0.0)], "net.yaml:4:7: iv")).Message);
        Assert.Contains("got 0", Assert.Throws<InputException>(() => IvCurve.Create([], "iv")).Message);
    }

    [Fact]
    public void A_repeated_or_falling_voltage_is_refused_naming_the_point()
    {
        Assert.Equal("iv: point 3 [1 V, 2 mA] does not exceed point 2's voltage 1 V; voltages must increase strictly",
            Assert.Throws<InputException>(() => IvCurve.Create([(0.0, 0.0), (1.0, 1e-3), (1.0, 2e-3)], "iv")).Message);
        Assert.StartsWith("iv: point 2 [-1 V",
            Assert.Throws<InputException>(() => IvCurve.Create([(0.0, 0.0), (-1.0, 1e-3)], "iv")).Message);
        Assert.Contains("point 2 [NaN, 0] is not a pair of finite numbers",
            Assert.Throws<InputException>(() => IvCurve.Create([(0.0, 0.0), (double.NaN, 0)], "iv")).Message);
    }

    [Fact]
    public void A_resistor_table_is_passive_and_a_shifted_one_is_not()
    {
        // P = V·I ≥ 0 for a resistor I = V/R (Ohm's law), and for no table with I(0) ≠ 0 (derived in IvCurve.IsPassive).
        Assert.True(IvCurve.Create([(-1.0, -0.01), (1.0, 0.01)], "r").IsPassive);
        Assert.False(IvCurve.Create([(-1.0, -0.005), (1.0, 0.015)], "r").IsPassive);
        Assert.False(IvCurve.Create([(0.0, 0.0), (1.0, 0.02), (2.0, 0.01)], "r").IsPassive); // falling end: active far out
        Assert.True(Table.IsPassive);
    }
}
