using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Core.Model;
using WaveSim.Core.Output;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;
using WaveSim.Tests.Buffers;

namespace WaveSim.Tests.Tolerances;

/// <summary>
/// A buffer's corner as a discrete choice of a tolerance run (<c>source.buffer.corner=typ,min,max</c>): the levels at each
/// corner against the load line solved here by bisection (Ohm's law), the draw frequencies against the binomial
/// distribution, the sensitivity by listed position against MathNet's Spearman. The model file is invented here.
/// </summary>
public class BufferCornerToleranceTests
{
    static string N(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    // A pullup whose min column is 0.7 and max column 1.3 times the typ one, and a supply of 3.3 / 3.0 / 3.6 V: each corner
    // meets the load line at a different level. [Pullup] is read against the supply minus the pin voltage (the IBIS convention).
    static readonly (double V, double I)[] Pullup = [(-1, 0.036), (0, 0), (0.5, -0.036), (1.0, -0.060), (2.0, -0.082), (3.3, -0.090), (5, -0.094)];
    static readonly (double V, double I)[] Pulldown = [(-1, -0.04), (0, 0), (0.5, 0.040), (1.0, 0.068), (2.0, 0.092), (3.3, 0.100), (5, 0.104)];
    static readonly double[] Scale = [1.0, 0.7, 1.3];
    static readonly double[] Supply = [3.3, 3.0, 3.6];
    const double R = 100;

    static string Table((double V, double I)[] t) => string.Join("\n", t.Select(r => $"  {N(r.V)}  {N(r.I)}  {N(Scale[1] * r.I)}  {N(Scale[2] * r.I)}"));

    static Scenario Net(ReceiverFiles files)
    {
        File.WriteAllText(Path.Combine(files.Folder, "drv.ibs"), $"""
[IBIS Ver] 5.0
[File Name] drv.ibs
[Component] TESTDRV
[Manufacturer] Invented
[Pin] signal_name model_name
1 OUT drv
[Model] drv
Model_type Output
C_comp 0pF 0pF 0pF
[Voltage Range] 3.3V 3.0V 3.6V
[Pulldown]
{Table(Pulldown)}
[Pullup]
{Table(Pullup)}
[Ramp]
dV/dt_r 1.98/0.6n NA NA
dV/dt_f 1.98/0.6n NA NA
R_load = 50
[End]
""");
        File.WriteAllText(files.Scenario, $"""
source: {"{"} buffer: {"{"} file: drv.ibs, model: drv {"}"}, waveform: step, delay: 2 ns {"}"}
line: [ {"{"} segment: {"{"} length: 0.1 m, z0: 50 ohm, delay: 0.5 ns {"}"} {"}"} ]
load: {"{"} r: {N(R)} ohm {"}"}
probes: [ {"{"} name: rx, at: load {"}"} ]
simulation: {"{"} duration: 40 ns {"}"}
""");
        return ScenarioLoader.Load(files.Scenario);
    }

    static readonly ProbeFigure High = new("rx", "high_V");

    [Fact]
    public void At_each_corner_the_high_level_is_that_corners_pullup_meeting_the_load_line()
    {
        // DC (Ohm's and Kirchhoff's laws): the pullup sources what R takes to ground, V/R = −I_pu,c(Vcc,c − V), with corner c's
        // column and supply; solved here by bisection on the tables as written. Corner 0 is nominal (typ), then min and max.
        using var files = new ReceiverFiles();
        var set = ToleranceSet.Build(Net(files), [ToleranceKey.Parse("source.buffer.corner=min,max")], new ToleranceSetOptions { Corners = true });
        var r = ToleranceRunner.Run(set, [], new SweepRunOptions { Serial = true });
        Assert.Equal([0.0, 1.0, 2.0], r.Points.Select(p => p.Values[0]));
        foreach (var p in r.Points)
        {
            int c = (int)p.Values[0];
            var pu = IvCurve.Create([.. Pullup.Select(t => (t.V, Scale[c] * t.I))], "pu");
            double expected = Bisection.Root(v => v / R + pu.Current(Supply[c] - v), 0, Supply[c]);
            double got = r.Value(p, High)!.Value;
            Assert.True(Math.Abs(got - expected) <= 1e-3 * expected, $"corner {BufferCorners.Names[c]}: {got:F5} V vs {expected:F5} V");
        }
        var csv = new StringWriter();
        MonteCarloCsv.Write(r, [], csv);
        var rows = csv.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(["typ", "min", "max"], rows.Skip(1).Select(l => l.Split(',')[1]));
        // The rows read back (as a merge does) give the corners' codes again.
        var back = MonteCarloCsv.Read(r, [], new StringReader(csv.ToString()), "montecarlo.csv");
        Assert.Equal(r.Points.Select(p => p.Values[0]), back.Select(p => p.Values[0]));
    }

    [Fact]
    public void Each_corner_is_drawn_about_a_third_of_the_time_from_the_samples_own_generator()
    {
        // Each of n = 3000 draws picks a corner with p = 1/3: the count is binomial, mean np, σ = √(np(1 − p)); a 4σ band fails
        // by chance about once in 16,000 (the normal approximation; any textbook of probability). Seed fixed.
        var key = ToleranceKey.Parse("source.buffer.corner=typ,min,max");
        const int n = 3000;
        var counts = new int[3];
        for (int i = 0; i < n; i++) counts[(int)ToleranceSet.Sample([key], 7, i)[0]]++;
        double mean = n / 3.0, sigma = Math.Sqrt(n * (1 / 3.0) * (2 / 3.0));
        foreach (int c in counts) Assert.InRange(c, mean - 4 * sigma, mean + 4 * sigma);
        // The same generator as the numeric choice 0,1,2: the draw of sample i is the same position in the list.
        var numeric = ToleranceKey.Parse("x=0,1,2");
        for (int i = 0; i < 50; i++) Assert.Equal(ToleranceSet.Sample([numeric], 7, i)[0], ToleranceSet.Sample([key], 7, i)[0]);
        // Listed in another order, sample i takes the name at that same position.
        var reversed = ToleranceKey.Parse("source.buffer.corner=max,min,typ");
        string[] listed = ["max", "min", "typ"];
        for (int i = 0; i < 50; i++)
        {
            double code = ToleranceSet.Sample([reversed], 7, i)[0], position = ToleranceSet.Sample([numeric], 7, i)[0];
            Assert.Equal(listed[(int)position], BufferCorners.Names[(int)code]);
            Assert.Equal(position, reversed.Distribution.RankValue(code));
        }
    }

    [Fact]
    public void The_sensitivity_of_a_corner_ranks_it_by_its_position_in_the_listed_order()
    {
        // The high level rises from min to typ to max (the test above): listed min,typ,max, the position rises with the figure
        // (ρ = +1); listed max,typ,min it falls (ρ = −1). Both against MathNet's Spearman of the positions.
        using var files = new ReceiverFiles();
        var s = Net(files);
        foreach (var (list, sign) in new[] { ("min,typ,max", 1.0), ("max,typ,min", -1.0) })
        {
            var set = ToleranceSet.Build(s, [ToleranceKey.Parse("source.buffer.corner=" + list)], new ToleranceSetOptions { Samples = 9, Seed = 5 });
            var r = ToleranceRunner.Run(set, [], new SweepRunOptions { Serial = true });
            Assert.True(r.Points.Select(p => p.Values[0]).Distinct().Count() > 1, "the samples must draw more than one corner");
            var rho = ToleranceSummary.Sensitivity(r, High).Single();
            var positions = r.Points.Select(p => (double)list.Split(',').ToList().IndexOf(BufferCorners.Names[(int)p.Values[0]])).ToArray();
            double reference = MathNet.Numerics.Statistics.Correlation.Spearman(positions, r.Points.Select(p => r.Value(p, High)!.Value).ToArray());
            Assert.Equal(reference, rho.Rho, 12);
            Assert.Equal(sign, rho.Rho, 9);
        }
    }

    [Fact]
    public void A_corner_key_takes_only_a_list_of_corners_on_a_buffer()
    {
        Assert.Contains("not a distribution", Assert.Throws<InputException>(() => ToleranceKey.Parse("source.buffer.corner=uniform(0..2)")).Message);
        Assert.Contains("'slow' is not a corner", Assert.Throws<InputException>(() => ToleranceKey.Parse("load.buffer.corner=typ,slow")).Message);
        var plain = TestScenarios.Parse("""
source: { waveform: step, high: 1 V }
line: [ { segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns } } ]
simulation: { duration: 5 ns }
""");
        var ex = Assert.Throws<InputException>(() => ToleranceSet.Build(plain, [ToleranceKey.Parse("source.buffer.corner=typ,max")]));
        Assert.Equal("keys", ex.Parameter);
        Assert.Contains("has no buffer", ex.Message);
    }
}
