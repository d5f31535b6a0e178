using WaveSim.Core;
using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Terminations;

namespace WaveSim.Tests.Terminations;

/// <summary>The termination planner and study on small lossless nets.</summary>
public class TerminationTests
{
    // ReferenceData/published-checks.md §10, case B1 (lattice-diagram method, Γ from Pozar eq. 2.35): 1 V step, RS = 10 ohm, Z0 = 50 ohm, open end, TD = 5 ns.
    internal const string B1 = @"title: B1
source: { waveform: step, low: 0 V, high: 1 V, rise: 200 ps, delay: 1 ns, resistance: 10 ohm }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }
load: open
probes:
  - { name: drv, at: source }
  - { name: near, at: 10 mm }
  - { name: rx, at: load }
simulation: { duration: 200 ns, resolution: 10 }
";

    [Fact]
    public void Series_termination_launches_half_the_step_and_the_open_end_doubles_it_without_overshoot()
    {
        // ReferenceData/published-checks.md §10, case B2 (common practice, no source): series R = Z0 − R_driver; launch 0.5·VS; the open far end reaches VS
        // at T; the near end holds a 0.5·VS shelf for 2T. Exact levels from the lattice-diagram method (ReferenceData/published-checks.md
        // §10): launch = VS·Z0/(Z0 + RS + R), ΓS = (RS + R − Z0)/(RS + R + Z0), ΓL = +1 (Pozar eq. 2.35).
        var s = TestScenarios.Parse(B1);
        var series = TerminationPlanner.Design(s).Single(d => d.Kind == TerminationKind.Series);
        var part = Assert.Single(series.Parts);
        Assert.Equal(40, part.Ideal, 1e-12);
        Assert.Equal(40.2, part.Used, 1e-9);   // IEC 60063 E96 value nearest 40 ohm
        Assert.Equal(39, part.E24, 1e-9);      // IEC 60063 E24 value nearest 40 ohm
        Assert.IsType<Series>(series.Variant!.Line[0]);

        var r = Simulate.Solve(series.Variant);
        double z0 = 50, rsTotal = 10 + part.Used, launch = z0 / (z0 + rsTotal), gs = (rsTotal - z0) / (rsTotal + z0);
        double t0 = 1e-9, ramp = 1.25 * 200e-12, td = 5e-9, tNear = 0.01 * 5e-9;

        // The shelf at the near end: from the launched edge to the return of the reflection, one round trip later.
        for (double t = t0 + ramp + tNear + 0.1e-9; t < t0 + 2 * td - tNear - 0.1e-9; t += 0.25e-9)
            Assert.True(Math.Abs(r.At("near", t) - launch) < 1e-6, $"near end at {t:E3} s: {r.At("near", t)} V, expected {launch} V");
        Assert.Equal(0.5, launch, 3e-3);

        // The far end: 2·launch after T, then the small rounding reflection; never above VS by more than |ΓS|.
        Assert.Equal(2 * launch, r.At("rx", t0 + td + ramp + 1e-9), 1e-6);
        var f = SignalQuality.Compute(r.Time, r.Probe("rx").Volts, new SignalQualityOptions { InitialLevelV = 0, FinalLevelV = 1 });
        Assert.True(f.OvershootPct <= 100 * Math.Abs(gs) + 0.05, $"overshoot {f.OvershootPct} % beyond the rounding (|ΓS| = {100 * Math.Abs(gs):F2} %)");
    }

    [Fact]
    public void Series_and_parallel_cure_the_ringing_and_the_parallel_one_costs_V_squared_over_R()
    {
        var study = TerminationStudy.Run(TestScenarios.Parse(B1));
        TerminationOutcome Get(TerminationKind k) => study.Outcomes.Single(o => o.Design.Kind == k);
        Assert.Equal("rx", study.ReceiverProbe);
        Assert.Equal(50, study.Z0, 1e-9);

        // B1: the unterminated line (the net as drawn) overshoots to 1.66667 V (66.7 %).
        Assert.Equal(TerminationKind.AsDrawn, study.Outcomes[0].Design.Kind);
        Assert.Equal(66.667, Get(TerminationKind.AsDrawn).Receiver!.OvershootPct!.Value, 0.1);
        Assert.Null(Get(TerminationKind.None).Result);   // no load resistor to remove: the same net as drawn
        Assert.True(Get(TerminationKind.Series).Receiver!.OvershootPct < 5);
        Assert.True(Get(TerminationKind.Parallel).Receiver!.OvershootPct < 5);

        // Ohm's law at DC (lossless line, capacitors open): parallel R at the load, driver 10 ohm,
        // V = VS·R/(R + RS), P = V²/R at the high level, nothing at the low level (0 V).
        var par = Get(TerminationKind.Parallel);
        double rp = par.Design.Parts[0].Used, v = 1 * rp / (rp + 10);
        Assert.Equal(v * v / rp, par.PowerHighW!.Value, 1e-12);
        Assert.Equal(0, par.PowerLowW!.Value, 1e-15);
        // The mean over the 200 ns record (Joule's law on the lattice diagram): no current until the edge's midpoint reaches the
        // load at 1 ns + 0.125 ns + TD = 6.125 ns, then V²/R (the launch 50/60 V meets ΓL = (49.9 − 50)/99.9 ≈ −0.001 and lands on
        // the DC level within 0.1 %).
        Assert.Equal(v * v / rp * (200e-9 - 6.125e-9) / 200e-9, par.PowerAverageW!.Value, v * v / rp * 0.005);

        // Series resistor into an open end: no DC current, no static power.
        Assert.Equal(0, Get(TerminationKind.Series).PowerHighW!.Value, 1e-15);

        // Thevenin pair (Ohm's law and Kirchhoff's current law at the load node): R1 to Vcc = 1 V, R2 to ground, driver 10 ohm.
        var th = Get(TerminationKind.Thevenin);
        double r1 = th.Design.Parts[0].Used, r2 = th.Design.Parts[1].Used;
        Assert.Equal(100, r1, 1e-9); // Z0·Vcc/Vt with Vt = Vcc/2
        double vn = (1 / 10.0 + 1 / r1) / (1 / 10.0 + 1 / r1 + 1 / r2);
        Assert.Equal((1 - vn) * (1 - vn) / r1 + vn * vn / r2, th.PowerHighW!.Value, 1e-12);
        double vl = (1 / r1) / (1 / 10.0 + 1 / r1 + 1 / r2);
        Assert.Equal((1 - vl) * (1 - vl) / r1 + vl * vl / r2, th.PowerLowW!.Value, 1e-12);

        // RC: R·C at least three round trips (ReferenceData/published-checks.md §10, AC termination, common practice, no source); blocks DC.
        var rc = Get(TerminationKind.Rc);
        Assert.True(rc.Design.Parts[0].Used * rc.Design.Parts[1].Used >= 3 * 2 * 5e-9 * (1 - 1e-12));
        Assert.Equal(0, rc.PowerHighW!.Value, 1e-15);
        Assert.True(Get(TerminationKind.AsDrawn).Failures.Count > 0);
    }

    [Fact]
    public void The_table_starts_with_the_net_as_drawn_and_says_which_strategies_replace_its_termination()
    {
        // No outside source: what each strategy does to the user's own termination (50 ohm to VTT 1.65 V) must be printed.
        using var cli = new CliRunner();
        string file = cli.Write("vtt.yaml", VerdictTests.VttBus);
        var (code, stdout, err) = CliRunner.Run("terminations", file, "--out", Path.Combine(cli.Dir, "out"));
        Assert.True(code == 0, err);
        var rows = stdout.Split('\n').Select(l => l.TrimEnd()).ToList();
        int header = rows.FindIndex(l => l.TrimStart().StartsWith("strategy"));
        Assert.StartsWith("  as drawn ", rows[header + 1]);
        Assert.Contains("(the load as drawn: R 50 Ω to 1.65 V", rows[header + 2]);
        foreach (string kind in new[] { "parallel", "thevenin" })
        {
            int i = rows.FindIndex(l => l.StartsWith("  " + kind + " ") && l.Contains(" mW "));
            Assert.Equal("(replaces the load resistor 50 Ω to 1.65 V as drawn)", rows[i + 1].Trim());
        }
        int s = rows.FindIndex(l => l.StartsWith("  series ") && l.Contains(" mW "));
        Assert.Contains("keeps the load resistor 50 Ω to 1.65 V as drawn", rows[s + 1]);
        var csv = File.ReadAllLines(Path.Combine(cli.Dir, "out", "terminations.csv"));
        Assert.StartsWith("as drawn,", csv[1]);
        Assert.Contains("replaces the load resistor 50 Ω to 1.65 V as drawn", csv.Single(l => l.StartsWith("parallel,")));
        Assert.Contains("removes the load resistor 50 Ω to 1.65 V as drawn", csv.Single(l => l.StartsWith("none,")));
    }

    [Fact]
    public void A_failing_row_names_its_rules_briefly_and_the_account_of_each_receiver_follows_the_table()
    {
        // The series row of the VTT bus: its settled low is 1.65·(18 + 32.4)/(18 + 32.4 + 50) = 0.8283 V at both receivers
        // (Ohm's law, resistive divider at DC; ReferenceData/termination-verdicts.md), above VIL 0.8 V, so the levels rule fails
        // at rx1 and rx2. The cell must stay short (the rules and receivers), and each receiver's account gets its own line.
        using var cli = new CliRunner();
        string file = cli.Write("vtt.yaml", VerdictTests.VttBus);
        var (code, stdout, err) = CliRunner.Run("terminations", file, "--out", Path.Combine(cli.Dir, "out"));
        Assert.True(code == 0, err);
        var rows = stdout.Split('\n').Select(l => l.TrimEnd()).ToList();
        string row = rows.First(l => l.StartsWith("  series ") && l.Contains(" mW "));
        Assert.Matches(@"fail: levels(, \w+)* at rx1, rx2$", row);
        int why = rows.FindIndex(l => l.StartsWith("why "));
        Assert.True(why > rows.IndexOf(row), "the account follows the table");
        var accounts = rows.Skip(why + 1).TakeWhile(l => l.StartsWith("  ")).Where(l => l.StartsWith("  series ")).ToList();
        Assert.Equal(2, accounts.Count);
        Assert.Contains(accounts, l => l.Contains("rx1: settled low 828 mV is above VIL 800 mV (margin -28.3 mV)"));
        Assert.Contains(accounts, l => l.Contains("rx2: settled low 828 mV is above VIL 800 mV (margin -28.3 mV)"));
    }

    [Fact]
    public void The_command_writes_the_table_the_csv_and_the_overlay()
    {
        using var cli = new CliRunner();
        string file = cli.Write("b1.yaml", B1);
        string outDir = Path.Combine(cli.Dir, "out");
        var (code, stdout, err) = CliRunner.Run("terminations", file, "--out", outDir, "--series", "E24", "--max-settling", "20ns");
        Assert.True(code == 0, err);
        Assert.Contains("series", stdout);
        var csv = File.ReadAllLines(Path.Combine(outDir, "terminations.csv"));
        Assert.Equal(7, csv.Length);
        Assert.StartsWith("strategy,series_r_ohm,parallel_r_ohm,thevenin_r1_ohm,thevenin_r2_ohm,rc_r_ohm,rc_c_F,", csv[0]);
        Assert.EndsWith("power_high_W,power_low_W,power_avg_W,change,verdict", csv[0]);
        Assert.StartsWith("as drawn,", csv[1]);
        Assert.StartsWith("series,39,", csv[3]); // E24 nearest 40 ohm (IEC 60063)
        Assert.True(new FileInfo(Path.Combine(outDir, "terminations.png")).Length > 1000);
        var (badCode, _, badErr) = CliRunner.Run("terminations", file, "--series", "E12");
        Assert.Equal(2, badCode);
        Assert.Contains("--series", badErr);
    }
}
