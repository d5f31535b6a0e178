using WaveSim.Core;
using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// The reader against a file written from the standard's keyword list (<see cref="FullFeatureFile"/>): every value lands
/// where the standard (ANSI/EIA-656-B, IBIS 5.0; from memory) says it belongs, and every malformed variant fails with a
/// one-line error naming the file, the line and the keyword.
/// </summary>
public class BufferFileReaderTests
{
    static BufferFile Read(string text = FullFeatureFile.Text) => BufferFileReader.Parse(text, FullFeatureFile.Name);

    [Fact]
    public void Header_component_package_and_pins_are_read()
    {
        BufferFile f = Read();
        Assert.Equal("5.0", f.Version);
        Assert.Equal("full.ibs", f.FileName);
        BufferComponent c = Assert.Single(f.Components);
        Assert.Equal("TESTPART", c.Name);
        Assert.Equal("Nobody in particular", c.Manufacturer);
        // Scale suffixes of the standard: n = 1e-9, p = 1e-12; trailing unit letters are ignored (IBIS 5.0, from memory).
        Assert.Equal(new CornerValue(0.3, 0.2, null), c.Package!.R);
        Assert.Equal(3e-9, c.Package.L.Typ, 15);
        Assert.Equal(4e-9, c.Package.L.Max!.Value, 15);
        Assert.Null(c.Package.C.Min);
        Assert.Equal(0.3, c.Package.R.At(Corner.Max)); // NA falls back to typ
        Assert.Equal(9, c.Pins.Count);
        BufferPin dq0 = c.Pins[0];
        Assert.Equal(("1", "DQ0", "pp_io"), (dq0.Name, dq0.Signal, dq0.Model));
        Assert.Equal(0.5, dq0.R);
        Assert.Equal(2.5e-9, dq0.L!.Value, 15);
        Assert.Equal(0.8e-12, dq0.C!.Value, 1e-24);
        Assert.Null(c.Pins[1].R);
        Assert.Null(c.Pins[2].L);
        Assert.True(c.Pins.Single(p => p.Signal == "VDD").IsReserved);
    }

    [Fact]
    public void Model_sub_parameters_and_types_are_read()
    {
        BufferFile f = Read();
        Assert.Equal(["pp_io", "rx", "od", "tri", "out_only"], f.Models.Select(m => m.Name).ToArray());
        Assert.Equal([BufferModelType.InputOutput, BufferModelType.Input, BufferModelType.OpenDrain, BufferModelType.ThreeState, BufferModelType.Output],
                     f.Models.Select(m => m.Type).ToArray());
        BufferModel m = f.Model("PP_IO"); // names are looked up without regard to case
        Assert.Equal(("Non-Inverting", "Active-High"), (m.Polarity, m.Enable));
        Assert.Equal((0.8, 2.0, 1.5, 0.0), (m.Vinl, m.Vinh, m.Vmeas, m.Vref));
        Assert.Equal(10e-12, m.Cref!.Value, 1e-24);
        Assert.Equal(1000, m.Rref!.Value, 9);
        Assert.Equal(4e-12, m.CComp.Typ, 1e-24);
        Assert.Equal(5e-12, m.CComp.At(Corner.Max), 1e-24);
        Assert.Equal(new CornerValue(3.3, 3.0, 3.6), m.VoltageRange);
        Assert.Equal(new CornerValue(0.1, null, 0.2), m.PulldownReference);
        Assert.Equal(3.1, m.PullupReferenceAt(Corner.Min));
        Assert.Equal(3.3, m.PowerClampReferenceAt(Corner.Max)); // NA: typ
        Assert.Equal(0.0, m.GndClampReferenceAt(Corner.Typ));
        Assert.Equal(2e-12, f.Model("rx").CComp.At(Corner.Min), 1e-24); // NA C_comp: typ
    }

    [Fact]
    public void Tables_ramp_and_waveforms_are_read_with_their_corners()
    {
        BufferModel m = Read().Model("pp_io");
        Assert.Equal(4, m.Pulldown!.Rows.Count);
        Assert.Equal(-0.11, m.Pulldown.Rows[0].Y.Typ, 15);
        Assert.Equal(-0.11, m.Pulldown.Rows[0].Y.At(Corner.Max), 15); // NA: typ
        Assert.Equal(0.12, m.Pulldown.Rows[3].Y.At(Corner.Max), 15);
        Assert.Equal(-2.0, m.GndClamp!.Rows[0].Y.At(Corner.Min));
        Assert.Equal(1.2 / 0.5e-9, m.Ramp!.Rising.Rate(Corner.Typ), 3);
        Assert.Equal(1.2 / 0.5e-9, m.Ramp.Rising.Rate(Corner.Max), 3); // NA ratio: typ
        Assert.Equal(0.9 / 600e-12, m.Ramp.Falling.Rate(Corner.Min), 3);
        Assert.Equal(25, m.Ramp.RLoad);
        Assert.Equal(2, m.RisingWaveforms.Count);
        SwitchingWaveform w = m.RisingWaveforms[0];
        Assert.Equal((50.0, 0.0, 2e-12), (w.RFixture, w.VFixture.Typ, w.CFixture));
        Assert.Equal(3.6, m.RisingWaveforms[1].VFixture.At(Corner.Max));
        Assert.Equal(3, w.Table.Rows.Count);
        Assert.Equal(1e-9, w.Table.Rows[1].X, 1e-24);
        Assert.Equal(1.5, w.Table.Rows[1].Y.At(Corner.Max)); // NA: typ
        Assert.Single(m.FallingWaveforms);
        Assert.Equal(50, Read().Model("od").Ramp!.RLoad); // the standard's default R_load (from memory)
    }

    [Fact]
    public void Pullup_and_power_clamp_are_mirrored_about_their_reference_and_the_others_shifted()
    {
        // The standard's convention (IBIS 5.0, from memory; ReferenceData/buffers.md §1): [Pullup] and [POWER Clamp] are tabulated against
        // reference − pin voltage; [Pulldown] and [GND Clamp] against pin voltage − reference. Currents are into the pin.
        BufferModel m = Read().Model("pp_io");
        BufferCurves typ = m.Curves(Corner.Typ);
        // [Pullup] row "1.0  -40mA": at a pin voltage of 3.3 − 1.0 V the pullup sources 40 mA.
        Assert.Equal(-0.040, typ.Pullup!.Current(3.3 - 1.0), 12);
        // Min corner: reference 3.1 V, row "1.0 ... -30mA".
        Assert.Equal(-0.030, m.Curves(Corner.Min).Pullup!.Current(3.1 - 1.0), 12);
        // [Pulldown] row "1.0  50mA" with its reference 0.1 V: at pin 1.1 V.
        Assert.Equal(0.050, typ.Pulldown!.Current(1.1), 12);
        Assert.Equal(0.060, m.Curves(Corner.Max).Pulldown!.Current(1.2), 12); // max reference 0.2 V
        // [POWER Clamp] row "-3.3  1.5A": at pin 3.3 + 3.3 V, 1.5 A flows into the pin.
        Assert.Equal(1.5, typ.PowerClamp!.Current(6.6), 12);
        Assert.Equal(-2.0, typ.GndClamp!.Current(-3.3), 12);
        Assert.Equal(3.3, typ.HighReference);
        Assert.Equal(0.1, typ.LowReference);
    }

    [Fact]
    public void Skipped_keywords_and_sub_parameters_are_warned_about_with_their_line()
    {
        BufferFile f = Read();
        string text = FullFeatureFile.Text;
        Assert.Contains(f.Warnings, w => w.StartsWith($"full.ibs:{FullFeatureFile.LineOf(text, "[Temperature Range]")}: [Temperature Range]: skipped", StringComparison.Ordinal));
        Assert.Contains(f.Warnings, w => w.StartsWith($"full.ibs:{FullFeatureFile.LineOf(text, "Vpeak")}: [Model] pp_io: sub-parameter 'Vpeak'", StringComparison.Ordinal));
        Assert.Equal(2, f.Warnings.Count);
    }

    [Fact]
    public void Corners_of_a_model_are_those_its_columns_give()
    {
        BufferFile f = Read();
        Assert.Equal([Corner.Typ, Corner.Min, Corner.Max], f.Model("pp_io").Corners);
        Assert.Equal([Corner.Typ], f.Model("tri").Corners);
        var ex = Assert.Throws<InputException>(() => f.Model("tri").Curves(Corner.Max));
        Assert.StartsWith($"full.ibs:{FullFeatureFile.LineOf(FullFeatureFile.Text, "[Model]         tri")}: [Model] tri: has no max corner", ex.Message);
    }

    [Fact]
    public void A_model_name_not_in_the_file_lists_the_names_there_are()
    {
        var ex = Assert.Throws<InputException>(() => Read().Model("nosuch"));
        Assert.Equal("full.ibs: [Model] 'nosuch' is not in the file; its models are pp_io, rx, od, tri, out_only", ex.Message);
    }

    /// <summary>Malformed variants of the full file: (what to replace, its replacement, the marker of the line the error names, what the message says).</summary>
    public static TheoryData<string, string, string, string> Malformed => new()
    {
        { "1.0        50mA      40mA     60mA", "1.0        50mA", "1.0        50mA",
          "[Model] pp_io: [pulldown]: a row needs 4 columns (voltage, I(typ), I(min), I(max); NA allowed for min and max), got 2" },
        { "3      CLK          rx", "3      CLK          rxx", "3      CLK",
          "[Pin]: pin 3: model 'rxx' is not a [Model] of the file; its models are pp_io, rx, od, tri, out_only (or POWER, GND, NC)" },
        { "-0.6       0         NA       NA\n3.3        0         NA       NA\n[POWER Clamp]", "-0.6       0         NA       NA\n-0.7        0         NA       NA\n[POWER Clamp]",
          "-0.7        0", "[Model] pp_io: [GND Clamp]: voltage -0.7 does not exceed the previous row's (-0.6, line" },
        { "1.0        -40mA     -30mA    -50mA", "1.0        -4O0mA     -30mA    -50mA", "-4O0mA", "I(typ): '-4O0mA' is not a number" },
        { "1.0        -40mA     -30mA    -50mA", "1.0        NA     -30mA    -50mA", "1.0        NA", "I(typ) cannot be NA" },
        { "Model_type      Input", "Model_type      Terminator", "Terminator", "Model_type 'Terminator' is not read by this version; expected Input, Output, I/O, 3-state, Open_drain" },
        { "C_comp          2pF     NA      NA\n", "", "[Model]         rx", "[Model] rx: C_comp is missing" },
        { "dV/dt_f  1/0.5n  NA  NA\n", "", "[Ramp]\ndV/dt_r  1/1n", "[Model] od: [Ramp]: dV/dt_f is missing" },
        { "dV/dt_r  1/1n  NA  NA", "dV/dt_r  1.0  NA  NA", "dV/dt_r  1.0", "dV/dt_r: '1.0' is not a ratio dV/dt" },
        { "R_fixture = 50\nV_fixture = 3.3\n0 ", "V_fixture = 3.3\n0 ", "[Falling Waveform]", "[Falling Waveform]: R_fixture is missing" },
        { "R_fixture = 50\nV_fixture = 0\n0 ", "R_fixture = -50\nV_fixture = 0\n0 ", "R_fixture = -50", "R_fixture must be positive" },
        { "[End]", "", "[End]", "the file has no [End]" },
        { "[Comment Char]  #_char", "[Comment Char]  A_char", "[Comment Char]", "[Comment Char]: expected a character from" },
        { "[Voltage Range] 1.8V NA NA\n", "", "[Model]         tri", "[Pullup] needs [Voltage Range] or [Pullup Reference]" },
        { "[Ramp]\ndV/dt_r  0.9/0.3n", "[Pullup]\n0 0 NA NA\n1 1mA NA NA\n[Ramp]\ndV/dt_r  0.9/0.3n", "[Pullup]\n0 0 NA NA", "[Model] out_only: [Pullup]: is given twice in one model" },
        { "[Model]         tri", "[Model]         rx", "[Model]         rx\nModel_type      3-state", "model 'rx' is defined twice" },
        { "[Pulldown]\n0    0     NA  NA\n1.8  30mA  NA  NA\n", "[Pulldown]\n0    0     NA  NA\n", "[Pulldown]\n0    0     NA  NA\n[Pullup]", "has 1 row(s); expected at least two" },
        { "[Component]     TESTPART", "[Pulldown]\n0 0 0 0\n1 1 1 1\n[Component]     TESTPART", "[Pulldown]\n0 0 0 0", "appears outside a [Model]" },
        { "C_comp          3pF  3pF  3pF", "C_comp          3pF  3pF", "C_comp          3pF  3pF", "C_comp needs 3 values (typ, min, max; NA allowed for min and max), got 2" },
        { "[IBIS Ver]      5.0\n", "", "[File Name]", "[File Name]: the file must start with [IBIS Ver]" },
    };

    [Theory, MemberData(nameof(Malformed))]
    public void A_malformed_variant_fails_with_file_line_keyword_and_what_was_expected(string find, string replace, string marker, string expected)
    {
        string text = FullFeatureFile.Text.Replace("\r\n", "\n");
        Assert.Contains(find, text);
        int at = text.IndexOf(find, StringComparison.Ordinal);
        string bad = text[..at] + replace + text[(at + find.Length)..];
        var ex = Assert.Throws<InputException>(() => BufferFileReader.Parse(bad, "bad.ibs"));
        int line = marker == "[End]" ? bad.Split('\n').Length : FullFeatureFile.LineOf(bad, marker.Split('\n')[0]);
        if (marker.Contains('\n')) line = LineOfSequence(bad, marker);
        Assert.StartsWith($"bad.ibs:{line}: ", ex.Message);
        Assert.Contains(expected, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    /// <summary>The line of the first line of a multi-line <paramref name="marker"/> in <paramref name="text"/>.</summary>
    static int LineOfSequence(string text, string marker)
    {
        int at = text.IndexOf(marker, StringComparison.Ordinal);
        Assert.True(at >= 0, $"'{marker}' not in the variant");
        return text[..at].Count(ch => ch == '\n') + 1;
    }

    [Fact]
    public void A_missing_file_and_a_folder_are_one_line_errors()
    {
        string missing = Path.Combine(Path.GetTempPath(), "wavesim-no-such-" + Guid.NewGuid().ToString("N") + ".ibs");
        Assert.Equal($"{missing}: no such buffer model file", Assert.Throws<InputException>(() => BufferFileReader.Read(missing)).Message);
        Assert.EndsWith("is a folder, not a buffer model file", Assert.Throws<InputException>(() => BufferFileReader.Read(Path.GetTempPath())).Message);
    }

    [Fact]
    public void Text_that_is_not_a_buffer_model_is_refused()
    {
        Assert.Contains("is not a text file", Assert.Throws<InputException>(() => BufferFileReader.Parse("[IBIS Ver] 5.0\0", "x.ibs")).Message);
        Assert.StartsWith("x.ibs:1: [IBIS Ver]: text 'title: a scenario'",
            Assert.Throws<InputException>(() => BufferFileReader.Parse("title: a scenario\n", "x.ibs")).Message);
    }
}
