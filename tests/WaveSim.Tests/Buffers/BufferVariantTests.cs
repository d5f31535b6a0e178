using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Terminations;
using WaveSim.Core.Units;

namespace WaveSim.Tests.Buffers;

/// <summary>Buffer scenarios through the key-path API (the corner as a discrete key), sweeps and terminations.</summary>
public class BufferVariantTests
{
    static Scenario Demo() => ScenarioLoader.Load(Path.Combine(Repository.Root, "scenarios", "buffer-to-buffer.yaml"));

    [Fact]
    public void The_corner_is_a_key_path_value_and_the_driver_takes_that_columns_levels_and_edge()
    {
        var s = Demo();
        var max = ScenarioValues.With(s, [new KeyChange("source.buffer.corner", 2, Dimension.Number)]);
        Assert.Equal(Corner.Max, max.Source.Buffer!.Corner);
        // demo33.ibs writes [Voltage Range] 3.3V 3.0V 3.6V and its [Ramp] times per corner: the max column's.
        Assert.Equal(3.6, max.Source.High, 12);
        var ramp = max.Source.Buffer.Model.Ramp!;
        Assert.Equal(Math.Min(ramp.Rising.DeltaT.At(Corner.Max), ramp.Falling.DeltaT.At(Corner.Max)), max.Source.Rise, 1e-20);
        Assert.Equal(Corner.Typ, s.Source.Buffer!.Corner);   // the original is left as it was
        var rxMin = ScenarioValues.With(s, [new KeyChange("load.buffer.corner", 1, Dimension.Number)]);
        Assert.Equal(Corner.Min, rxMin.Load.Buffer!.Corner);
        var noBuffer = TestScenarios.Parse("""
source: { waveform: step, high: 1 V }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
simulation: { duration: 5 ns }
""");
        Assert.Contains("has no buffer", Assert.Throws<InputException>(() => ScenarioValues.With(noBuffer, [new KeyChange("source.buffer.corner", 1, Dimension.Number)])).Message);
    }

    [Fact]
    public void A_sweep_over_corners_runs_each_corner()
    {
        var axis = SweepAxis.Parse("source.buffer.corner=typ,min,max");
        Assert.Equal([0.0, 1.0, 2.0], axis.Values);
        Assert.Equal("min", axis.Text(1));
        Assert.Contains("not a corner", Assert.Throws<InputException>(() => SweepAxis.Parse("load.buffer.corner=typ,slow")).Message);
        var grid = SweepGrid.Build(Demo(), [axis]);
        Assert.Equal([Corner.Typ, Corner.Min, Corner.Max], grid.Points.Select(p => p.Scenario.Source.Buffer!.Corner));
        // The weak (min) corner drives a 3.0 V supply: its high level is the min column's [Voltage Range].
        Assert.Equal(3.0, grid.Points[1].Scenario.Source.High, 12);
    }

    [Fact]
    public void The_series_termination_takes_the_drivers_resistance_from_its_curves()
    {
        // Series termination: R = Z0 − R_driver (a matched source, Johnson and Graham, High-Speed Digital Design, 1993, the chapter on terminations,
        // from memory); R_driver of a buffer is the mean of 1/slope of its I-V curves near its two levels.
        var s = Demo();
        double rd = s.Source.Buffer!.OutputResistance!.Value;
        var c = s.Source.Buffer.Curves;
        Assert.Equal(0.5 * (c.OutputResistanceHigh!.Value + c.OutputResistanceLow!.Value), rd, 12);
        Assert.InRange(rd, 5, 50);
        var series = TerminationPlanner.Design(s).Single(d => d.Kind == TerminationKind.Series);
        Assert.Equal(55 - rd, series.Parts[0].Ideal, 9);
        Assert.NotNull(series.Variant!.Source.Buffer);   // simulated with the real driver
        Assert.NotNull(series.Variant.Load.Buffer);
    }
}
