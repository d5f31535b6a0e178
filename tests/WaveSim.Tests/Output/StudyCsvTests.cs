using System.Globalization;
using WaveSim.Core.Output;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Output;

/// <summary>The sweep and termination tables (SweepCsv, TerminationsCsv) do not depend on how the runs were scheduled.</summary>
public class StudyCsvTests
{
    [Fact]
    public void Parallel_and_serial_sweeps_give_identical_csv()
    {
        // No outside source: a property of the engine. Each point is an independent run stored by its index,
        // so scheduling on several cores must not change the order or a single digit of the output.
        var s = TestScenarios.Parse(Sweeps.SweepTests.Net);
        var grid = SweepGrid.Build(s, [SweepAxis.Parse("load.r=25,50,100 ohm"), SweepAxis.Parse("load.c=0.5pF,2pF")]);
        string Csv(bool serial)
        {
            var w = new StringWriter();
            SweepCsv.Write(SweepRunner.Run(grid, new SweepRunOptions { Serial = serial }), w);
            return w.ToString();
        }
        string parallel = Csv(false), serial = Csv(true);
        Assert.Equal(serial, parallel);
        Assert.Equal(7, serial.TrimEnd().Split('\n').Length);
        // The first axis changes fastest: rows 1-3 are the three resistors at 0.5 pF.
        var second = serial.Split('\n')[2].Split(',');
        Assert.Equal(50, double.Parse(second[0], CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal(0.5e-12, double.Parse(second[1], CultureInfo.InvariantCulture), 1e-24);
    }

    [Fact]
    public void Strategies_run_in_parallel_give_the_same_figures_as_one_at_a_time()
    {
        // No outside source: a property of the engine (independent runs stored by index).
        var s = TestScenarios.Parse(Terminations.TerminationTests.B1);
        var a = TerminationStudy.Run(s, new TerminationOptions { Serial = true });
        var b = TerminationStudy.Run(s);
        var wa = new StringWriter(); TerminationsCsv.Write(a, wa);
        var wb = new StringWriter(); TerminationsCsv.Write(b, wb);
        Assert.Equal(wa.ToString(), wb.ToString());
        Assert.Equal(7, wa.ToString().TrimEnd().Split('\n').Length);
    }
}
