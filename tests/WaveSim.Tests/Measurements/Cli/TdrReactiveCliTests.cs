using System.Text.Json;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>`wavesim tdr` on a cable with a connector and a capacitive far end: what it reports and the scenario it writes.</summary>
public class TdrReactiveCliTests
{
    // The truth is the scenario's own values: the check is the analysis recovering them from the simulated reflectometer.
    const string Cable = @"title: connector and capacitive end on a 75 ohm cable
source: { waveform: step, high: 1 V, rise: 200 ps }
line:
  - segment: { length: 2.5 m, z0: 75 ohm, velocity: 0.66 c }
  - series: { l: 12 nH }
  - shunt: { c: 2.5 pF }
  - segment: { length: 2.5 m, z0: 75 ohm, velocity: 0.66 c }
load: { c: 22 pF }
simulation: { duration: 60 ns, resolution: 10 }
";

    [Fact]
    public void The_connector_is_both_parts_at_its_place_the_end_is_22_pF_and_the_scenario_written_holds_just_those()
    {
        // Pair and end relations: ReferenceData/tdr-lumped.md; distance v·t/2: ReferenceData/published-checks.md §11.
        // Tolerances as the task set them: one rise-time distance v·t_r/2 (19.8 mm at 200 ps), 10 % on values.
        using var run = new CliRunner();
        string scenario = run.Write("cable.yaml", Cable);
        string found = run.PathOf("found.yaml");
        var (code, output, err) = CliRunner.Run("tdr", scenario, "--rise", "200ps", "--source-resistance", "75ohm",
            "--to-scenario", found, "--out", run.PathOf("tdr"), "--json");
        Assert.True(code == 0, err);

        double v = 0.66 * Quantity.SpeedOfLight, tol = v * 200e-12 / 2;
        var root = JsonDocument.Parse(output).RootElement;
        var lumped = root.GetProperty("lumped").EnumerateArray().ToList();
        Assert.Equal(2, lumped.Count);
        Assert.All(lumped, p => Assert.True(p.GetProperty("pair").GetBoolean()));
        Assert.InRange(lumped[0].GetProperty("series_l_H").GetDouble(), 0.9 * 12e-9, 1.1 * 12e-9);
        Assert.InRange(lumped[1].GetProperty("shunt_c_F").GetDouble(), 0.9 * 2.5e-12, 1.1 * 2.5e-12);
        Assert.All(lumped, p => Assert.InRange(p.GetProperty("at_m").GetDouble(), 2.5 - tol, 2.5 + tol));
        Assert.Equal("capacitive", root.GetProperty("end").GetString());
        Assert.InRange(root.GetProperty("end_c_F").GetDouble(), 0.9 * 22e-12, 1.1 * 22e-12);
        Assert.InRange(root.GetProperty("end_m").GetDouble(), 5 - tol, 5 + tol);
        var segment = Assert.Single(root.GetProperty("segments").EnumerateArray().ToList());
        Assert.InRange(segment.GetProperty("z0_ohm").GetDouble(), 74, 76);

        // The scenario written: line, series L, shunt C, line, and the C at the end; no invented segments.
        var written = ScenarioLoader.Load(found);
        Assert.Collection(written.Line,
            e => Assert.InRange(Assert.IsType<Segment>(e).Z0, 74, 76),
            e => Assert.InRange(Assert.IsType<Series>(e).Parts.L ?? 0, 0.9 * 12e-9, 1.1 * 12e-9),
            e => Assert.InRange(Assert.IsType<Shunt>(e).Parts.C ?? 0, 0.9 * 2.5e-12, 1.1 * 2.5e-12),
            e => Assert.InRange(Assert.IsType<Segment>(e).Z0, 74, 76));
        Assert.InRange(written.Load.C ?? 0, 0.9 * 22e-12, 1.1 * 22e-12);
        Assert.Null(written.Load.R);
    }

    [Fact]
    public void A_scenario_file_that_cannot_be_written_leaves_no_output_folder_either()
    {
        // Outputs are whole or absent (BRIEF rule): the scenario file is staged before the folder is committed.
        using var run = new CliRunner();
        string scenario = run.Write("cable.yaml", Cable);
        string blocker = run.Write("blocker", "a file where a folder would have to be");
        var (code, _, err) = CliRunner.Run("tdr", scenario, "--rise", "500ps", "--to-scenario", Path.Combine(blocker, "found.yaml"),
            "--out", run.PathOf("tdr"));

        Assert.NotEqual(0, code);
        Assert.StartsWith("error:", err.Trim());
        Assert.False(Directory.Exists(run.PathOf("tdr")), "the output folder was committed although the scenario file failed");
        Assert.DoesNotContain(Directory.GetFileSystemEntries(run.Dir), f => f.Contains(".partial-", StringComparison.Ordinal));
    }
}
