using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// How finely the figures are sampled when output_step thins the CSV. The rule, at least 20 samples per shortest edge and per
/// shortest segment delay, the same rule the default resolution gives the solver's step, is common practice, no source.
/// </summary>
public class FigureRecordPlanTests
{
    // 400 ps edge, 200 ps segment delay: the shortest feature is 200 ps.
    static string Net(string simulation) => $@"
source: {{ waveform: step, low: 0 V, high: 1 V, rise: 400 ps, delay: 0.5 ns, resistance: 25 ohm }}
line:
  - segment: {{ length: 40 mm, z0: 50 ohm, delay: 5 ns/m }}
probes:
  - {{ name: src, at: source }}
  - {{ name: rx, at: load }}
simulation: {{ duration: 12 ns{simulation} }}
";

    [Theory]
    [InlineData("")]
    [InlineData(", output_step: 5 ps")]
    public void Without_a_coarse_output_step_the_figures_use_the_output_record(string simulation)
    {
        var plan = WaveSim.Core.Simulate.Plan(TestScenarios.Parse(Net(simulation)));
        Assert.Null(plan.FigureStep);
        Assert.Equal(0, plan.FigureRows);
        var r = TestScenarios.Run(Net(simulation));
        Assert.Same(r.Time, r.FigureTime);
        Assert.Same(r.Probe("rx").Volts, r.Probe("rx").FigureVolts);
    }

    [Theory]
    [InlineData(20, 1)]
    [InlineData(80, 4)]
    public void A_coarse_output_step_keeps_a_figure_record_of_every_kth_solver_step(int resolution, int stride)
    {
        string sim = $", output_step: 1 ns, resolution: {resolution}";
        var plan = WaveSim.Core.Simulate.Plan(TestScenarios.Parse(Net(sim)));
        // dt = 200 ps / resolution exactly (one segment, so the step makes its Courant number 1).
        Assert.Equal(200e-12 / resolution, plan.Dt, 1e-18);
        Assert.Equal(stride * plan.Dt, plan.FigureStep!.Value, 1e-18);
        Assert.Equal((long)Math.Round(12e-9 / plan.FigureStep.Value) + 1, plan.FigureRows);
        // Memory: the grid (16 B per cell), the output rows (time + V and I per probe) and the figure rows (time + V per probe).
        long expected = plan.TotalCells * 16 + plan.OutputRows * (1 + 2 * 2) * 8 + plan.FigureRows * (1 + 2) * 8;
        Assert.Equal(expected, plan.MemoryBytes);

        var r = TestScenarios.Run(Net(sim));
        Assert.Equal(13, r.Time.Length);
        Assert.Equal(plan.FigureRows, r.FigureTime.Length);
        Assert.Equal(12e-9, r.FigureTime[^1], 1e-18);
        // The figure record holds the solver's own values: the output sample at 2 ns is the figure sample at 2 ns.
        int k = (int)Math.Round(2e-9 / plan.FigureStep.Value);
        Assert.Equal(r.Probe("rx").Volts[2], r.Probe("rx").FigureVolts[k], 1e-12);
    }

    [Fact]
    public void A_long_run_thins_the_figure_record_to_its_budget_but_not_to_the_output_step()
    {
        // 2 ms at dt = 10 ps is 2e8 steps: every step of two probes would take 4.8 GB.
        var plan = WaveSim.Core.Simulate.Plan(TestScenarios.Parse(Net(", output_step: 1 us").Replace("duration: 12 ns", "duration: 2 ms")));
        Assert.True(plan.FigureRows * (1 + 2) * 8 <= GridPlan.FigureRecordBudgetBytes, $"{plan.FigureRows} rows");
        // One solver step less between samples would not fit: the record is no thinner than the budget needs.
        Assert.True(2e-3 / (plan.FigureStep!.Value - plan.Dt) + 1 > GridPlan.FigureRecordBudgetBytes / (3 * 8), $"{plan.FigureStep} s: thinner than needed");
        Assert.True(plan.FigureStep < 1e-6);
        Assert.Equal(0, plan.FigureStep!.Value / plan.Dt % 1, 1e-6);   // still whole solver steps
    }
}
