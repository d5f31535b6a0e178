using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>The small-signal output resistance at each level, 1/(dI/dV), from the slope of the I-V tables.</summary>
public class OutputResistanceTests
{
    [Fact]
    public void A_resistive_driver_has_its_resistors_as_output_resistance()
    {
        // Ohm's law: a table I = V/R has dI/dV = 1/R everywhere.
        BufferCurves c = ResistiveDriver.Model(40, 30).Curves(Corner.Typ);
        Assert.Equal(40, c.OutputResistanceHigh!.Value, 9);
        Assert.Equal(30, c.OutputResistanceLow!.Value, 9);
    }

    [Fact]
    public void A_square_law_pulldown_has_the_triode_resistance_at_its_low_level()
    {
        // A MOSFET in triode near V_DS = 0: I = k((V_GS − V_t)V_DS − V_DS²/2), so r_DS = 1/(k (V_GS − V_t)) (Sedra & Smith,
        // Microelectronic Circuits, MOSFET triode region; from memory). With the channel conducting backwards below 0
        // (gate drive V_GS − V_DS), I(−a) = −k((V_GS − V_t)a + a²/2), and the mean of the slopes either side of 0 on a
        // symmetric grid is the exact derivative k (V_GS − V_t) (derived; ReferenceData/buffers.md §4).
        const double k = 0.02, vgs = 3.3, vt = 0.6;
        double Law(double v) => v >= 0 ? k * ((vgs - vt) * v - v * v / 2) : -k * ((vgs - vt) * -v + v * v / 2);
        var table = ResistiveDriver.Table("[Pulldown]", Law);
        BufferModel m = ResistiveDriver.Model(40, 30) with { Pulldown = table };
        Assert.Equal(1 / (k * (vgs - vt)), m.Curves(Corner.Typ).OutputResistanceLow!.Value, 9);
    }

    [Fact]
    public void An_open_drain_has_no_high_level()
    {
        BufferCurves c = ResistiveDriver.Model(40, 30, type: BufferModelType.OpenDrain).Curves(Corner.Typ);
        Assert.Null(c.OutputResistanceHigh);
        Assert.Equal(30, c.OutputResistanceLow!.Value, 9);
    }
}
