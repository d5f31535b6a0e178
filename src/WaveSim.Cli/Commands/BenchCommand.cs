using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core.Solver;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim bench`: times the solver's segment kernel on one thread and prints cell updates per second.</summary>
public static class BenchCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var cells = IntegerOption.Create("--cells", "Cells in the test line (at least 2)", 2, int.MaxValue, 10_000, "N");
        var steps = IntegerOption.Optional("--steps", "Timed steps per repetition (default: about 2.5e9 cell updates, about 1 s)", 1, int.MaxValue, "N");
        var repeat = IntegerOption.Create("--repeat", "Timed repetitions; the fastest is reported, since other work only slows a run", 1, int.MaxValue, KernelBench.DefaultRepeats, "N");
        var lossless = new Option<bool>("--lossless") { Description = "Time a lossless line instead of a lossy one" };
        var json = new Option<bool>("--json") { Description = "Print one JSON object instead of text" };

        var cmd = new Command("bench", "Time the solver's kernel on one core") { cells, steps, repeat, lossless, json };
        cmd.SetAction(pr => CommandGuard.Run(pr.InvocationConfiguration.Error, () =>
        {
            int n = pr.GetValue(cells);
            int m = pr.GetValue(steps) ?? KernelBench.DefaultSteps(n);
            bool ll = pr.GetValue(lossless);
            var all = LibraryErrors.Naming(() => KernelBench.Measure(n, m, ll, pr.GetValue(repeat)), ("cells", "--cells"), ("steps", "--steps"), ("repeats", "--repeat"));
            var r = all.MaxBy(x => x.CellUpdatesPerSecond)!;
            var o = pr.InvocationConfiguration.Output;
            var inv = CultureInfo.InvariantCulture;
            if (pr.GetValue(json))
                o.WriteLine(string.Format(inv, "{{\"cells\": {0}, \"steps\": {1}, \"seconds\": {2:R}, \"cell_updates_per_s\": {3:R}}}",
                    n, m, r.Seconds, r.CellUpdatesPerSecond));
            else
            {
                o.WriteLine(string.Format(inv, "{0} line, {1} cells x {2} steps in {3:F3} s on one thread ({4}): {5:E3} cell updates/s",
                    ll ? "lossless" : "lossy", n, m, r.Seconds, KernelBench.VectorDescription, r.CellUpdatesPerSecond));
                o.WriteLine(string.Format(inv, "CPU time {0:F3} s ({1:P0} of a core): {2:E3} cell updates per CPU second",
                    r.CpuTimeS, r.CoreShare, r.CellUpdatesPerCpuSecond));
                if (all.Count > 1)
                    o.WriteLine(string.Format(inv, "fastest of {0} repetitions; all: {1}", all.Count,
                        string.Join(", ", all.Select(x => x.CellUpdatesPerSecond.ToString("E3", inv)))));
            }
            return 0;
        }));
        return cmd;
    }
}
