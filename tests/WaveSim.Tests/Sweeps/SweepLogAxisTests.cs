using WaveSim.Core.Analysis;
using WaveSim.Core.Rendering;
using WaveSim.Core.Sweeps;

namespace WaveSim.Tests.Sweeps;

/// <summary>Which sweeps chart on a logarithmic X axis. The rule is this product's choice (common practice, no source).</summary>
public class SweepLogAxisTests
{
    [Theory]
    [InlineData("load.c=1pF..1nF:30:log", SweepSpacing.Logarithmic, true)]
    [InlineData("load.c=1pF..1nF:30", SweepSpacing.Linear, false)]    // evenly spaced values chart evenly
    [InlineData("load.c=1,10,100 pF", SweepSpacing.List, true)]       // two decades of positive values
    [InlineData("load.c=1,2,5,10,20,50 pF", SweepSpacing.List, false)] // 1.7 decades: linear
    [InlineData("load.r=0,10,1000 ohm", SweepSpacing.List, false)]    // a zero cannot go on a log axis
    public void Log_ranges_and_wide_positive_lists_chart_on_a_log_axis(string text, SweepSpacing spacing, bool log)
    {
        var a = SweepAxis.Parse(text);
        Assert.Equal(spacing, a.Spacing);
        Assert.Equal(log, a.ChartsOnLogAxis);
    }

    static SweepResult Result(params SweepAxis[] axes)
    {
        // Invented figures (the chart's axis choice does not depend on them): overshoot falls with the point index.
        var points = new List<SweepPointResult>();
        int total = axes.Aggregate(1, (n, a) => n * a.Values.Count);
        for (int i = 0; i < total; i++)
        {
            int[] idx = SweepGrid.Indices(axes, i);
            points.Add(new SweepPointResult(i, axes.Select((a, k) => a.Values[idx[k]]).ToArray(), [new SignalFigures { OvershootPct = 40.0 / (1 + i) }]));
        }
        return new SweepResult(axes, ["rx"], points);
    }

    [Fact]
    public void A_log_sweep_gives_a_chart_with_a_log_x_axis_and_decade_labels()
    {
        ChartSpec chart = SweepPictures.Chart(Result(SweepAxis.Parse("load.c=1pF..1nF:30:log")), "overshoot_pct");
        Assert.Equal(AxisKind.Logarithmic, chart.XKind);
        AxisScale x = XyChart.Layout(chart, 1200, 600).Panels[0].Geometry.X;
        Assert.Equal(AxisKind.Logarithmic, x.Kind);
        Assert.Equal(["1 p", "10 p", "100 p", "1 n"], x.Ticks.Select(x.FormatTick));
    }

    [Fact]
    public void A_linear_sweep_keeps_its_linear_x_axis()
    {
        ChartSpec chart = SweepPictures.Chart(Result(SweepAxis.Parse("load.r=10..200 ohm:20")), "overshoot_pct");
        Assert.Equal(AxisKind.Linear, chart.XKind);
    }

    [Fact]
    public void In_a_grid_sweep_the_x_axis_follows_the_first_key_which_it_charts_against()
    {
        SweepAxis logC = SweepAxis.Parse("load.c=1pF..100pF:3:log"), linR = SweepAxis.Parse("load.r=25,50,100 ohm");
        Assert.Equal(AxisKind.Logarithmic, SweepPictures.Chart(Result(logC, linR), "overshoot_pct").XKind);
        // The second key only names the lines, so a log second key leaves the x axis (load.r) linear.
        ChartSpec swapped = SweepPictures.Chart(Result(linR, logC), "overshoot_pct");
        Assert.Equal(AxisKind.Linear, swapped.XKind);
        Assert.Equal(3, swapped.Panels[0].Series.Count);
    }
}
