using System.Globalization;
using System.Text;
using System.Text.Json;
using WaveSim.Core.Measurements;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>`wavesim tdr` on a captured reflectometer trace, and the scenario it writes, run again.</summary>
public class TdrCommandTests
{
    const string Line = @"title: via on a stepped line
source: { waveform: step, high: 1 V, rise: 35 ps }
line:
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
  - shunt: { c: 1 pF }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
  - segment: { length: 0.1 m, z0: 75 ohm, delay: 0.5 ns }
  - segment: { length: 0.1 m, z0: 50 ohm, delay: 0.5 ns }
load: { r: 50 ohm }
simulation: { duration: 5 ns, resolution: 10 }
";

    [Fact]
    public void A_captured_trace_gives_segments_and_a_shunt_C_and_the_scenario_written_runs_and_reads_back_the_same()
    {
        // Layer peeling (Bruckstein and Kailath, SIAM Review 29(3), 1987) with Z = Z0(1+ρ)/(1-ρ), distance v·t/2 and
        // C = -2A/Z0 (Laplace transform of the shunt-C reflection; ReferenceData/published-checks.md §11). The capture is the solver's port voltage with 1 mV of seeded noise, written
        // as an instrument export would be; tolerances 1 ohm, 10 % on C, 3 mm on positions (common practice, no source).
        using var run = new CliRunner();
        string scenario = run.Write("line.yaml", Line);
        var s = ScenarioLoader.Parse(Line, "line.yaml");
        var trace = Reflectometer.Simulate(s, 35e-12, 50);
        double[] noise = SyntheticCapture.Noise(trace.Time.Length, 0.001, seed: 3);
        var text = new StringBuilder("Instrument,demo reflectometer\nUnits,s,V\ntime,port\n");
        for (int k = 0; k < trace.Time.Length; k++)
            text.Append(trace.Time[k].ToString("R", CultureInfo.InvariantCulture)).Append(',')
                .Append((trace.Volts[k] + noise[k]).ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        string capture = run.Write("trace.csv", text.ToString());
        string found = run.PathOf("found.yaml");

        var (code, output, err) = CliRunner.Run("tdr", scenario, "--capture", capture, "--to-scenario", found, "--out", run.PathOf("tdr"), "--json");

        Assert.True(code == 0, err);
        var root = JsonDocument.Parse(output).RootElement;
        var segments = root.GetProperty("segments").EnumerateArray().ToList();
        Assert.Equal(3, segments.Count);   // 50 (with the via), 75, 50
        double[] z = [50, 75, 50];
        double[] ends = [0.2, 0.3];
        for (int i = 0; i < 3; i++)
            Assert.InRange(segments[i].GetProperty("z0_ohm").GetDouble(), z[i] - 1, z[i] + 1);
        for (int i = 0; i < 2; i++)
            Assert.InRange(segments[i].GetProperty("end_m").GetDouble(), ends[i] - 0.003, ends[i] + 0.003);
        var lumped = Assert.Single(root.GetProperty("lumped").EnumerateArray().ToList());
        Assert.InRange(lumped.GetProperty("shunt_c_F").GetDouble(), 0.9e-12, 1.1e-12);
        Assert.InRange(lumped.GetProperty("at_m").GetDouble(), 0.097, 0.103);
        foreach (string f in new[] { "tdr.csv", "tdr.json", "tdr.png" })
            Assert.True(File.Exists(run.PathOf(Path.Combine("tdr", f))), f);

        // The scenario written: `run` accepts it, and its line is the one measured.
        var written = ScenarioLoader.Load(found);
        var segs = written.Line.OfType<Segment>().ToList();
        Assert.Contains(written.Line, e => e is Shunt { Parts.C: > 0.9e-12 and < 1.1e-12 });
        Assert.All(segs, g => Assert.InRange(g.Velocity, 0.999 * 2e8, 1.001 * 2e8));
        var (runCode, _, runErr) = CliRunner.Run("run", found, "--out", run.PathOf("rerun"));
        Assert.True(runCode == 0, runErr);

        // Simulated again as a reflectometer, it shows the same profile.
        var again = TdrAnalysis.Analyse(Reflectometer.Simulate(written, 35e-12, 50), 2e8);
        Assert.Equal(3, again.Segments.Count);
        for (int i = 0; i < 3; i++)
            Assert.InRange(again.Segments[i].Z0Ohm, z[i] - 1, z[i] + 1);
        Assert.InRange(Assert.Single(again.Lumped).Value, 0.9e-12, 1.1e-12);
    }
}
