using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// An invented driver made of resistors, for checks with closed forms: a pullup R_u to the supply, a pulldown R_d to
/// ground, optionally a linear "clamp" R_c to ground, written as the standard's tables (the pullup against supply − pin).
/// </summary>
internal static class ResistiveDriver
{
    public const double Supply = 3.3;

    /// <summary>A table of the law <paramref name="current"/> of the table voltage, on a grid from −supply to 2·supply.</summary>
    public static CornerTable Table(string keyword, Func<double, double> current, Func<double, double>? minCorner = null)
    {
        var rows = Enumerable.Range(0, 31).Select(k =>
        {
            double v = -Supply + k * 0.1 * Supply;
            return new TableRow(v, new CornerValue(current(v), minCorner?.Invoke(v), null), 0);
        }).ToList();
        return new CornerTable(keyword, 1, rows);
    }

    /// <summary>
    /// The model: pullup I = −V_table/R_u (the pin below the supply by V_table sources V_table/R_u), pulldown I = V/R_d, and
    /// the clamp I = V/R_c when given. <paramref name="ruMin"/> gives the min corner its own pullup resistance.
    /// </summary>
    public static BufferModel Model(double ru, double rd, double? rc = null, double cComp = 0, double? ruMin = null,
                                    BufferModelType type = BufferModelType.Output, BufferRamp? ramp = null,
                                    IReadOnlyList<SwitchingWaveform>? rising = null, IReadOnlyList<SwitchingWaveform>? falling = null) => new()
    {
        Source = "resistive.ibs",
        Name = "resistive",
        Type = type,
        Line = 1,
        CComp = new CornerValue(cComp, null, null),
        VoltageRange = new CornerValue(Supply, ruMin is null ? null : Supply, null),
        Pullup = type == BufferModelType.OpenDrain ? null : Table("[Pullup]", v => -v / ru, ruMin is { } m ? v => -v / m : null),
        Pulldown = Table("[Pulldown]", v => v / rd),
        GndClamp = rc is { } r ? Table("[GND Clamp]", v => v / r) : null,
        Ramp = ramp ?? new BufferRamp(new RampRate(new CornerValue(1.2, null, null), new CornerValue(0.3e-9, 0.45e-9, null)),
                                      new RampRate(new CornerValue(1.2, null, null), new CornerValue(0.4e-9, null, null)), 50, 1),
        RisingWaveforms = rising ?? [],
        FallingWaveforms = falling ?? [],
    };

    /// <summary>A waveform of the given instants and pin voltages (typ; <paramref name="vMin"/> for the min column).</summary>
    public static SwitchingWaveform Waveform(bool rising, double rFixture, double vFixture, double[] t, double[] v,
                                             double cFixture = 0, double? vFixtureMin = null, double[]? vMin = null) =>
        new(rising, rFixture, new CornerValue(vFixture, vFixtureMin, null), cFixture,
            new CornerTable(rising ? "[Rising Waveform]" : "[Falling Waveform]", 1,
                t.Select((x, k) => new TableRow(x, new CornerValue(v[k], vMin?[k], null), 0)).ToList()), 1);
}
