using System.Globalization;
using System.Text;
using WaveSim.Core;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Units;

namespace WaveSim.Tests.Scenarios;

/// <summary>
/// Variants by key path (<see cref="ScenarioValues"/>): each is checked against the loader reading the same value from text (the
/// file format is the outside reference: the variant must be the scenario a user gets by writing that value), and the line
/// arithmetic against the lossless-line relations Z0 = √(L/C), v = 1/√(LC) (Pozar, Microwave Engineering, 4th ed., §2.1).
/// </summary>
public class ScenarioValuesTests
{
    const string Yaml = @"# a comment that must survive
source: { waveform: step, high: 1 V, rise: 100 ps }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns }   # trace
  - shunt: { c: 1 pF }
load: open
simulation: { duration: 10 ns }
";

    // Two segments, a branch with its own load, a receiver and a pulse whose fall is not written (it follows the rise).
    const string Net = @"title: key paths
source: { waveform: pulse, high: 1 V, rise: 100 ps, width: 2 ns, delay: 0.5 ns, resistance: 10 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
  - shunt: { c: 1 pF }
  - branch:
      name: stub
      line: [ { segment: { length: 30 mm, z0: 60 ohm, delay: 6 ns/m } } ]
      load: { c: 1.5 pF }
  - segment: { length: 0.1 m, l: 300 nH/m, c: 100 pF/m }
load: { r: 100 ohm, receiver: { vih: 0.7 V, vil: 0.3 V } }
probes:
  - { name: mid, at: 250 mm }
  - { name: rx, at: load }
simulation: { duration: 15 ns, resolution: 10 }
";

    [Fact]
    public void Changing_values_reads_back_in_SI_and_the_document_keeps_comments()
    {
        var document = TestScenarios.Document(Yaml);
        var v = ScenarioValues.With(document.Scenario, "line[0].segment.z0", "75 ohm");
        v = ScenarioValues.With(v, "line[1].shunt.c", "2 pF");
        v = ScenarioValues.With(v, "load.r", "33 ohm");
        v = ScenarioValues.With(v, "source.resistance", "10 ohm");
        Assert.Equal(75, ((Segment)v.Line[0]).Z0, 1e-9);
        Assert.Equal(2e-12, ((Shunt)v.Line[1]).Parts.C!.Value, 1e-24);
        Assert.Equal(33, v.Load.R!.Value, 1e-12);
        Assert.Equal(10, v.Source.Resistance, 1e-12);
        string edited = document.Edited([new KeyChange("line[0].segment.z0", 75, Dimension.Resistance)]);
        Assert.Contains("# trace", edited);
        Assert.Equal(75, ((Segment)ScenarioLoader.Parse(edited, "edited.yaml").Line[0]).Z0, 1e-9);
    }

    [Theory]
    [InlineData("line[5].segment.z0", "no item [5]")]
    [InlineData("line[0].segment.z0", "is a capacitance")]
    [InlineData("simulation.nonsense", "unknown key 'nonsense'")]
    [InlineData("loud.r", "no 'loud'")]
    [InlineData("line[1].segment.z0", "is a shunt, not a segment")]
    [InlineData("line[0]", "names a whole item")]
    [InlineData("line[0].segment.geometry.width", "not by a geometry")]
    [InlineData("line[0].segment.loss.tand", "no 'loss' mapping")]
    [InlineData("load..r", "is not a scenario key path")]
    public void A_key_that_does_not_exist_or_a_wrong_unit_is_a_clear_error_naming_the_key(string path, string fragment)
    {
        var s = TestScenarios.Parse(Yaml);
        var ex = Assert.ThrowsAny<InputException>(() => ScenarioValues.With(s, path, "3 pF"));
        Assert.Contains(fragment, ex.Message);
        Assert.DoesNotContain("--", ex.Message);   // the library names keys, never command-line options
        if (fragment != "is not a scenario key path") Assert.StartsWith(path + ":", ex.Message);
    }

    [Fact]
    public void Values_are_read_in_SI_in_either_of_a_delays_dimensions()
    {
        var s = TestScenarios.Parse(Net);
        Assert.Equal(50, ScenarioValues.Read(s, "line[0].segment.z0")!.Value, 1e-9);
        // A 200 mm segment at 5 ns/m: 1 ns in all, 5 ns/m per length.
        Assert.Equal(5e-9, ScenarioValues.Read(s, "line[0].segment.delay")!.Value, 1e-21);
        Assert.Equal(1e-9, ScenarioValues.Read(s, "line[0].segment.delay", Dimension.Time)!.Value, 1e-21);
        // l and c per length: Z0 = √(L/C) = √(300 nH / 100 pF) = 54.77 Ω, v = 1/√(LC) = 1/√(3e-17) s/m (Pozar §2.1).
        Assert.Equal(Math.Sqrt(300e-9 / 100e-12), ScenarioValues.Read(s, "line[3].segment.z0")!.Value, 1e-9);
        Assert.Equal(1 / Math.Sqrt(300e-9 * 100e-12), ScenarioValues.Read(s, "line[3].segment.velocity")!.Value, 1e-3);
        Assert.Equal(1.5e-12, ScenarioValues.Read(s, "line[2].branch.load.c")!.Value, 1e-24);
        Assert.Equal(60, ScenarioValues.Read(s, "line[2].branch.line[0].segment.z0")!.Value, 1e-9);
        Assert.Equal(0.3, ScenarioValues.Read(s, "load.receiver.vil")!.Value, 1e-12);
        Assert.Equal(100e-12, ScenarioValues.Read(s, "source.fall")!.Value, 1e-24);   // not written: follows the rise
        Assert.Null(ScenarioValues.Read(s, "load.c"));                                  // not in the scenario
        Assert.Null(ScenarioValues.Read(s, "simulation.output_step"));
    }

    [Fact]
    public void A_new_z0_keeps_the_delay_and_a_new_delay_keeps_the_z0()
    {
        // Pozar §2.1: L = Z0·τ and C = τ/Z0 per length for delay per length τ, so Z0 and τ can each be changed alone.
        var s = TestScenarios.Parse(Net);
        var z = (Segment)ScenarioValues.With(s, "line[0].segment.z0", 75, Dimension.Resistance).Line[0];
        Assert.Equal(75, z.Z0, 1e-9);
        Assert.Equal(1e-9, z.Delay, 1e-21);
        var d = (Segment)ScenarioValues.With(s, "line[0].segment.delay", 1.5e-9, Dimension.Time).Line[0];
        Assert.Equal(50, d.Z0, 1e-9);
        Assert.Equal(1.5e-9, d.Delay, 1e-21);
        var e = (Segment)ScenarioValues.With(s, "line[0].segment.eps_eff", 4, Dimension.Number).Line[0];
        Assert.Equal(2 / Quantity.SpeedOfLight, e.Delay / e.Length, 1e-21);   // τ = √eps_eff / c
    }

    [Theory]
    [InlineData("load.c", 10.0, "Capacitance", "1e-18 F to 1 F in size")]
    [InlineData("line[0].segment.length", 5e6, "Length", "1e-9 m to 1e6 m in size")]
    [InlineData("load.r", -5.0, "Resistance", "must not be negative")]
    [InlineData("line[0].segment.z0", 0.0, "Resistance", "must be greater than zero")]
    [InlineData("simulation.resolution", 0.5, "Number", "must be at least 1")]
    [InlineData("line[0].segment.velocity", 4e8, "Velocity", "faster than light")]
    [InlineData("load.receiver.vil", 0.9, "Voltage", "must be below vih")]
    [InlineData("source.rise", 2e-9, "Time", "longer than")]   // the probe at 250 mm stays; a 2 ns rise is fine for a pulse
    [InlineData("line[0].segment.length", 0.1, "Length", "outside the line")]
    [InlineData("line[3].segment.c", 1e-12, "CapacitancePerLength", "faster than light")]
    public void A_value_the_loader_would_refuse_is_refused_with_the_key_and_the_rule(string path, double value, string dimension, string fragment)
    {
        // The ranges are the dimensions' sensible ranges (docs/scenario-format.md), the rules the loader's own.
        var s = TestScenarios.Parse(Net);
        var dim = (Dimension)typeof(Dimension).GetField(dimension)!.GetValue(null)!;
        if (fragment == "longer than")
        {
            // A pulse takes any rise; a bit pattern's edge must fit in a bit: 1.25 × 2 ns > 1 ns.
            s = TestScenarios.Parse(Net.Replace("waveform: pulse, high: 1 V, rise: 100 ps, width: 2 ns", "waveform: bits, pattern: \"0110\", bit_time: 1 ns, high: 1 V, rise: 100 ps"));
        }
        var ex = Assert.ThrowsAny<InputException>(() => ScenarioValues.With(s, path, value, dim));
        Assert.StartsWith(path + ":", ex.Message);
        Assert.Contains(fragment, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void The_original_scenario_is_unchanged_after_a_variant_and_its_lists_cannot_be_written()
    {
        var s = TestScenarios.Parse(Net);
        string before = Describe(s);
        var v = ScenarioValues.With(s, [new("line[0].segment.z0", 75, Dimension.Resistance), new("load.r", 50, Dimension.Resistance),
            new("line[2].branch.load.c", 3e-12, Dimension.Capacitance)]);
        Assert.Equal(before, Describe(s));
        Assert.NotEqual(before, Describe(v));
        Assert.Throws<NotSupportedException>(() => ((IList<LineElement>)s.Line)[0] = new Shunt(new LumpedParts(C: 1e-12)));
        // A list handed to a scenario is copied: changing it afterwards does not reach the scenario.
        var list = s.Line.ToList();
        var copy = s with { Line = list };
        list.Clear();
        Assert.Equal(4, copy.Line.Count);
    }

    [Fact]
    public void Changes_that_only_fit_together_are_accepted_together()
    {
        // A trapezoid's ramps and width must fit in its period (the loader's rule): a wider pulse needs the longer period too.
        var s = TestScenarios.Parse(Net.Replace("waveform: pulse,", "waveform: trapezoid, period: 4 ns,"));
        Assert.Throws<InputException>(() => ScenarioValues.With(s, "source.width", 5e-9, Dimension.Time));
        var v = ScenarioValues.With(s, [new("source.width", 5e-9, Dimension.Time), new("source.period", 6e-9, Dimension.Time)]);
        Assert.Equal(6e-9, v.Source.Period, 1e-21);
    }

    [Theory]
    [InlineData("line[0].segment.z0=75 ohm", "z0: 50 ohm, delay: 5 ns/m", "z0: 75 ohm, delay: 5 ns/m")]
    [InlineData("line[0].segment.delay=7 ns/m", "z0: 50 ohm, delay: 5 ns/m", "z0: 50 ohm, delay: 7 ns/m")]
    [InlineData("line[0].segment.delay=1.2 ns", "z0: 50 ohm, delay: 5 ns/m", "z0: 50 ohm, delay: 1.2 ns")]
    [InlineData("line[0].segment.length=260 mm", "length: 200 mm", "length: 260 mm")]
    [InlineData("line[3].segment.l=250 nH/m", "l: 300 nH/m", "l: 250 nH/m")]
    [InlineData("line[1].shunt.c=2.2 pF", "shunt: { c: 1 pF }", "shunt: { c: 2.2 pF }")]
    [InlineData("line[2].branch.line[0].segment.z0=45 ohm", "z0: 60 ohm", "z0: 45 ohm")]
    [InlineData("line[2].branch.load.c=0.5 pF", "load: { c: 1.5 pF }", "load: { c: 0.5 pF }")]
    [InlineData("source.rise=300 ps", "rise: 100 ps", "rise: 300 ps")]
    [InlineData("source.resistance=33 ohm", "resistance: 10 ohm", "resistance: 33 ohm")]
    [InlineData("load.r=47 ohm", "r: 100 ohm", "r: 47 ohm")]
    [InlineData("load.to=0.5 V", "r: 100 ohm,", "r: 100 ohm, to: 0.5 V,")]
    [InlineData("load.receiver.vih=0.8 V", "vih: 0.7 V", "vih: 0.8 V")]
    [InlineData("simulation.resolution=20", "resolution: 10", "resolution: 20")]
    [InlineData("simulation.output_step=5 ps", "resolution: 10", "resolution: 10, output_step: 5 ps")]
    public void A_sweep_variant_is_the_scenario_the_loader_reads_from_the_text_with_that_value(string vary, string from, string to)
    {
        var grid = SweepGrid.Build(TestScenarios.Parse(Net), [SweepAxis.Parse(vary)]);
        var loaded = TestScenarios.Parse(Net.Replace(from, to));
        Assert.Equal(Describe(loaded), Describe(grid.Points[0].Scenario));
    }

    // A microstrip given by its cross-section, once with constant loss and once with the cross-section's frequency-dependent loss.
    const string Board = @"source: { waveform: step, high: 1 V, rise: 100 ps, resistance: 20 ohm }
line:
  - segment:
      length: 100 mm
      geometry: { kind: microstrip, width: 0.3 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02, at: 1 GHz }
  - segment:
      length: 50 mm
      geometry: { kind: microstrip, width: 0.2 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02 }
      loss: frequency
load: { r: 50 ohm }
simulation: { duration: 5 ns, resolution: 10 }
";

    [Theory]
    [InlineData("line[0].segment.geometry.width=0.25 mm", "width: 0.3 mm", "width: 0.25 mm")]
    [InlineData("line[0].segment.geometry.er=3.8", "er: 4.3, tand: 0.02, at", "er: 3.8, tand: 0.02, at")]
    [InlineData("line[1].segment.geometry.height=0.2 mm", "width: 0.2 mm, height: 0.17 mm", "width: 0.2 mm, height: 0.2 mm")]
    [InlineData("line[0].segment.r=2 ohm/m", "length: 100 mm\n", "length: 100 mm\n      r: 2 ohm/m\n")]
    [InlineData("line[0].segment.g=1 mS/m", "length: 100 mm\n", "length: 100 mm\n      g: 1 mS/m\n")]
    public void A_geometry_variant_is_derived_again_as_the_loader_derives_it(string vary, string from, string to)
    {
        from = from.Replace("\\n", "\n"); to = to.Replace("\\n", "\n");
        var s = TestScenarios.Parse(Board);
        var grid = SweepGrid.Build(s, [SweepAxis.Parse(vary)]);
        var loaded = TestScenarios.Parse(Board.Replace(from, to));
        Assert.NotEqual(Describe(s), Describe(loaded));
        Assert.Equal(Describe(loaded), Describe(grid.Points[0].Scenario));
        Assert.Equal(((Segment)loaded.Line[0]).Derived!.Z0, ((Segment)grid.Points[0].Scenario.Line[0]).Derived!.Z0, 1e-9);
    }

    [Theory]
    [InlineData("line[0].segment.z0", "50 ohm", "takes its impedance and delay from it")]
    [InlineData("line[1].segment.r", "1 ohm/m", "with 'loss: frequency'")]
    [InlineData("line[0].segment.geometry.gap", "1 mm", "unknown key 'gap' for microstrip")]
    [InlineData("line[0].segment.geometry.kind", "1 mm", "is not a number")]
    [InlineData("line[0].segment.geometry.width", "-1 mm", "width")]
    public void A_geometry_segment_refuses_what_its_file_would_refuse(string path, string text, string fragment)
    {
        var s = TestScenarios.Parse(Board);
        var ex = Assert.ThrowsAny<InputException>(() => ScenarioValues.With(s, path, text));
        Assert.StartsWith(path + ":", ex.Message);
        Assert.Contains(fragment, ex.Message);
    }

    const string Lossy = @"source: { waveform: step, high: 1 V, rise: 100 ps }
line:
  - segment: { length: 1 m, z0: 50 ohm, delay: 5 ns/m, loss: { r_dc: 5 ohm/m, skin_at: 1 GHz, r_skin: 40 ohm/m, tand: 0.02, er: 4.3, at: 1 GHz } }
load: { r: 50 ohm }
simulation: { duration: 15 ns, resolution: 10 }
";

    [Theory]
    [InlineData("line[0].segment.loss.tand=0.01", "tand: 0.02", "tand: 0.01")]
    [InlineData("line[0].segment.loss.r_skin=60 ohm/m", "r_skin: 40 ohm/m", "r_skin: 60 ohm/m")]
    [InlineData("line[0].segment.loss.r_dc=2 ohm/m", "r_dc: 5 ohm/m", "r_dc: 2 ohm/m")]
    [InlineData("line[0].segment.z0=60 ohm", "z0: 50 ohm", "z0: 60 ohm")]
    public void A_loss_variant_fits_its_loss_model_again_as_the_loader_does(string vary, string from, string to)
    {
        var grid = SweepGrid.Build(TestScenarios.Parse(Lossy), [SweepAxis.Parse(vary)]);
        Assert.Equal(Describe(TestScenarios.Parse(Lossy.Replace(from, to))), Describe(grid.Points[0].Scenario));
    }

    [Theory]
    [InlineData("line[0].segment.loss.r_skin", "3 ohm/m", "must be greater than r_dc")]
    [InlineData("line[0].segment.loss.tand", "1.5", "must be below 1")]
    [InlineData("line[0].segment.r", "1 ohm/m", "cannot be given as 'r' too")]
    public void A_loss_value_the_loader_would_refuse_is_refused(string path, string text, string fragment)
    {
        var ex = Assert.ThrowsAny<InputException>(() => ScenarioValues.With(TestScenarios.Parse(Lossy), path, text));
        Assert.StartsWith(path + ":", ex.Message);
        Assert.Contains(fragment, ex.Message);
    }

    [Fact]
    public void The_document_knows_how_and_where_a_value_is_written()
    {
        var document = TestScenarios.Document(Net);
        Assert.Equal("5 ns/m", document.Written("line[0].segment.delay"));
        Assert.Null(document.Written("source.fall"));
        Assert.Null(document.Written("line[1].segment.z0"));
        Assert.Equal((4, 51), document.Position("line[0].segment.delay"));
    }

    [Fact]
    public void One_key_table_gives_the_dimensions_of_the_loader_sweeps_and_fits()
    {
        Assert.Equal([Dimension.DelayPerLength, Dimension.Time], ScenarioKeys.ForPath("line[0].segment.delay")!.Dimensions);
        Assert.Equal([Dimension.ResistancePerLength], ScenarioKeys.ForPath("line[2].branch.line[0].segment.r")!.Dimensions);
        Assert.Equal([Dimension.Resistance], ScenarioKeys.ForPath("line[1].series.r")!.Dimensions);
        Assert.Equal([Dimension.Voltage], ScenarioKeys.ForPath("load.receiver.vih")!.Dimensions);
        Assert.Null(ScenarioKeys.ForPath("source.waveform"));
        // Every numeric key of a mapping the loader accepts is in the table, and nothing else is.
        foreach (var k in ScenarioKeys.All)
            Assert.Contains(k.Key, k.Scope switch
            {
                "source" => ScenarioLoader.SourceKeys, "segment" => ScenarioLoader.SegmentKeys, "shunt" or "series" => ScenarioLoader.LumpedKeys,
                "load" => ScenarioLoader.LoadKeys, "receiver" => ScenarioLoader.ReceiverKeys, "simulation" => ScenarioLoader.SimulationKeys,
                "loss" => ["r_dc", "skin_at", "r_skin", "tand", "er", "at"], _ => [],
            });
    }

    [Fact]
    public void A_fall_never_written_follows_the_rise_and_a_written_one_stays()
    {
        var s = TestScenarios.Parse(Net);
        Assert.Equal(3e-10, (s.Source with { Rise = 3e-10 }).Fall, 1e-24);
        var written = TestScenarios.Parse(Net.Replace("rise: 100 ps,", "rise: 100 ps, fall: 200 ps,"));
        Assert.Equal(2e-10, (written.Source with { Rise = 3e-10 }).Fall, 1e-24);
    }

    /// <summary>Every value of a scenario, 12 significant digits (a variant's L and C may differ from the file's in the last bit).</summary>
    static string Describe(Scenario s)
    {
        var b = new StringBuilder();
        string F(double? x) => x is { } v ? v.ToString("G12", CultureInfo.InvariantCulture) : "-";
        var src = s.Source;
        b.Append($"source {src.Waveform} {F(src.Low)} {F(src.High)} {F(src.Rise)} {F(src.Fall)} {F(src.Delay)} {F(src.Width)} {F(src.Period)} {F(src.BitTime)} {F(src.Resistance)} {string.Concat(src.Bits.Select(x => x ? '1' : '0'))}\n");
        void Line(IReadOnlyList<LineElement> line, string indent)
        {
            foreach (var e in line)
            {
                switch (e)
                {
                    case Segment g: b.Append($"{indent}segment {F(g.Length)} {F(g.R)} {F(g.L)} {F(g.G)} {F(g.C)} {Loss(g.Loss)}\n"); break;
                    case Shunt h: b.Append($"{indent}shunt {F(h.Parts.R)} {F(h.Parts.L)} {F(h.Parts.C)}\n"); break;
                    case Series r: b.Append($"{indent}series {F(r.Parts.R)} {F(r.Parts.L)} {F(r.Parts.C)}\n"); break;
                    case Branch br: b.Append($"{indent}branch {br.Name} {Load(br.Load)}\n"); Line(br.Line, indent + "  "); break;
                }
            }
        }
        string Loss(WaveSim.Core.Model.FrequencyLoss? l) => l is null ? "-"
            : $"{F(l.RDc)} {F(l.SkinCorner)} {F(l.Dielectric?.EpsInfinity)} {F(l.Dielectric?.DeltaEps)} {F(l.ReferencePermittivity)} {F(l.Filling)}";
        string Load(LoadSpec l) => $"{F(l.R)} {F(l.To)} {F(l.C)} {F(l.L)} {l.Short} {F(l.Receiver?.Vih)} {F(l.Receiver?.Vil)}";
        Line(s.Line, "");
        b.Append($"load {Load(s.Load)}\n");
        foreach (var p in s.Probes) b.Append($"probe {p.Name} {string.Join("/", p.BranchPath)} {p.Anchor} {F(p.Distance)}\n");
        b.Append($"simulation {F(s.Simulation.Duration)} {F(s.Simulation.OutputStep)} {F(s.Simulation.Resolution)}\n");
        b.Append($"{s.Title} {s.LengthUnit} {F(s.LengthFactor)} {s.FilePath}\n");
        return b.ToString();
    }
}
