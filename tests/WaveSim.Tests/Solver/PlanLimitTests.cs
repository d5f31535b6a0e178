using WaveSim.Core;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.Solver;

/// <summary>
/// The memory limit's advice names only what shrinks the estimate, and the library names no command-line option. Estimates by
/// hand from the plan's own accounting (GridPlan.MemoryBytes: 16 bytes per cell, 8 bytes per value of every output row;
/// ReferenceData/edge-windows.md §6).
/// </summary>
public class PlanLimitTests
{
    // 20 km of 5 ns/m cable (100 µs) on a 10 ps edge: dt = 10 ps / 20 = 0.5 ps, 2e8 cells × 16 B = 3.2 GB of grid alone. No
    // output step can bring that under 2 GB. 1 ns of record: 2000 steps, 4e11 cell updates.
    const string GridBound = @"title: long cable
source: { waveform: step, low: 0 V, high: 1 V, rise: 10 ps, resistance: 50 ohm }
line:
  - segment: { length: 20 km, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: rx, at: load }
simulation: { duration: 1 ns }
";

    // 100 mm (500 ps, 100 cells at 5 ps) for 1 ms at every step: 2e8 output rows × (1 + 2 × 2 probes) × 8 B = 8 GB of output
    // record, 2e10 cell updates (under 1e11). At one row per duration the figure record keeps at most 256 MiB: under 2 GB.
    const string OutputBound = @"title: long record
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 100 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm }
probes:
  - { name: near, at: source }
  - { name: far, at: load }
simulation: { duration: 1 ms }
";

    [Fact]
    public void A_grid_too_big_is_not_told_to_change_its_output_step_and_the_library_names_no_option()
    {
        var s = TestScenarios.Parse(GridBound);
        var plan = Simulate.Plan(s);
        Assert.True(plan.TotalCells * 16L > GridPlan.MemoryLimitBytes);
        var ex = Assert.Throws<PlanLimitException>(() => Simulate.Solve(s));
        Assert.StartsWith("the run needs about", ex.Message);
        Assert.DoesNotContain("output_step", ex.Message);
        Assert.DoesNotContain("--", ex.Message);
        Assert.Equal(["memory", "cell updates"], ex.Exceeded.Select(x => x.Limit));
        Assert.All(PlanAdvisor.Problems(s, plan), p => Assert.DoesNotContain("--", p));
    }

    [Fact]
    public void An_output_record_too_big_is_told_to_make_its_output_step_coarser()
    {
        var s = TestScenarios.Parse(OutputBound);
        var plan = Simulate.Plan(s);
        Assert.True(plan.OutputRows * 5L * 8 > GridPlan.MemoryLimitBytes);
        var ex = Assert.Throws<PlanLimitException>(() => Simulate.CheckLimits(s, plan));
        Assert.Contains("make simulation.output_step coarser", ex.Message);
        Assert.DoesNotContain("--", ex.Message);
        Assert.Equal(["memory"], ex.Exceeded.Select(x => x.Limit));
    }

    [Fact]
    public void The_command_line_adds_how_to_force_the_run_and_check_prints_the_figure_step()
    {
        using var cli = new CliRunner();
        string file = cli.Write("big.yaml", OutputBound);
        var (code, _, err) = CliRunner.Run("run", file, "--out", cli.PathOf("out"));
        Assert.Equal(2, code);
        Assert.EndsWith("(use --force to run anyway)", err.Trim());
        var (checkCode, stdout, _) = CliRunner.Run("check", file);
        Assert.Equal(0, checkCode);
        Assert.Contains("(use --force to run anyway)", stdout);
        // A 1 ns output step is coarser than the figures need (20 samples per 100 ps edge): check shows both steps.
        var (_, fine, _) = CliRunner.Run("check", cli.Write("coarse.yaml", OutputBound.Replace("duration: 1 ms", "duration: 10 ns, output_step: 1 ns")));
        var plan = Simulate.Plan(TestScenarios.Parse(OutputBound.Replace("duration: 1 ms", "duration: 10 ns, output_step: 1 ns")));
        Assert.Contains($"output step 1 ns (11 rows), figure step {Core.Units.Quantity.Format(plan.FigureStep!.Value, "s")}", fine);
    }
}
