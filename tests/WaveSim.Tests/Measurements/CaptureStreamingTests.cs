using System.Globalization;
using System.Text;
using WaveSim.Core;
using WaveSim.Core.Io;
using WaveSim.Core.Measurements;
using WaveSim.Tests.Fuzz;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Captures read row by row (issue 14): one delimiter per file, mixed ones refused naming the line; a stated row limit
/// (<see cref="InputLimits.CaptureRows"/>) and byte limit instead of reading whatever the file holds. The layout rules are
/// the reader's own (docs/measurements.md); expected values come from the generated files themselves.
/// </summary>
public class CaptureStreamingTests
{
    static InputException Fails(string content)
    {
        using var file = new TempFile("capture.csv", content);
        var ex = Assert.Throws<InputException>(() => CaptureReader.Read(file.Path));
        Assert.DoesNotContain('\n', ex.Message);
        return ex;
    }

    // Comma rows followed by semicolon ones: the comma rows were taken as metadata in silence and `compare` reported a
    // -6.9 ns offset with exit 0. Either order, and whether or not the first rows are enough to start the block, is refused.
    [Fact]
    public void Semicolon_rows_after_a_comma_block_are_refused_naming_the_line()
    {
        var ex = Fails("t,v\n0,0\n1e-9,0.5\n2e-9,1\n3e-9;1\n4e-9;1\n");
        Assert.StartsWith("capture.csv line 5: numbers separated by semicolons, but the data block from line 2 is separated by commas",
            ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_few_comma_rows_before_a_semicolon_block_are_refused_naming_the_first()
    {
        var ex = Fails("t;v\n0,0\n1e-9,0.5\n2e-9;1\n3e-9;1\n4e-9;1\n5e-9;1\n");
        Assert.StartsWith("capture.csv line 2: numbers separated by commas, but the data block from line 4 is separated by semicolons",
            ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Text_metadata_in_another_delimiter_is_still_metadata()
    {
        Capture c = ReadText("Model,demo,2\nDate;2024\nt;v\n0;0\n1;1\n2;2\n");
        Assert.Equal([0.0, 1, 2], c.Time);
    }

    [Fact]
    public void Quoted_cells_are_read()
    {
        Capture c = ReadText("\"t\",\"v\"\n\"0\",\"0.5\"\n\"1\", \"1.5\"\n");
        Assert.Equal([0.5, 1.5], c.Volts);
        Assert.Equal("'t'", c.TimeColumn);
    }

    [Fact]
    public void More_rows_than_the_limit_are_refused_naming_the_first_line_beyond()
    {
        string text = "t,v\n" + Rows(150);
        var ex = Assert.Throws<InputException>(() => CaptureReader.Parse(text.Split('\n'), "c.csv", "c.csv", new CaptureOptions(), maxRows: 100));
        Assert.StartsWith("c.csv line 102: more than 100 data rows, the most a capture may hold", ex.Message, StringComparison.Ordinal);
        Assert.Equal(100, CaptureReader.Parse(("t,v\n" + Rows(100)).Split('\n'), "c.csv", "c.csv", new CaptureOptions(), 100).Time.Length);
    }

    [Fact]
    public void A_generated_capture_of_300000_rows_is_read_whole()
    {
        using var file = new TempFile("big.csv", "time_s,volts_V\n" + Rows(300_000));
        Capture c = CaptureReader.Read(file.Path);
        Assert.Equal(300_000, c.Time.Length);
        Assert.Equal(299_999 * 1e-12, c.Time[^1], 1e-24);
        Assert.Equal(299_999 % 7 * 0.125, c.Volts[^1]);
    }

    [Fact]
    public void A_capture_over_the_byte_limit_is_refused_before_it_is_read()
    {
        using var file = new TempFile("huge.csv", "");
        using (var fs = new FileStream(file.Path, FileMode.Open)) fs.SetLength(InputLimits.CaptureBytes + 1);   // sparse: no disk used
        var ex = Assert.Throws<InputException>(() => CaptureReader.Read(file.Path));
        Assert.Equal("huge.csv: larger than 1 GiB, the most a capture may be (docs/limits.md)", ex.Message);
    }

    [SkippableFact]
    public void The_zero_device_is_refused_as_a_capture()
    {
        Skip.IfNot(OperatingSystem.IsLinux() && File.Exists("/dev/zero"), "needs Linux and /dev/zero");
        var ex = Assert.Throws<InputException>(() => CaptureReader.Read("/dev/zero"));
        Assert.Equal("zero: not a regular file but a character device; a capture is read from a regular file", ex.Message);
    }

    [Fact]
    public void A_binary_file_is_refused_as_not_text()
    {
        var ex = Fails("t,v\n0,0\n1,1\n\0\u0001\u0002");
        Assert.Equal("capture.csv: line 4 holds a NUL character: not a text file; a capture is plain text", ex.Message);
    }

    [Fact]
    public void A_cell_is_quoted_as_a_short_clean_excerpt()
    {
        var ex = Fails("t,v\n0,0\n1,1\n2,2\n3,\u001b[2J" + new string('s', 500) + "\n");
        Assert.Equal("capture.csv line 5 column 2: '[2J" + new string('s', 37) + "…' is not a number", ex.Message);
    }

    // The 1e7-row capture of issue 14 (323 MB) took 2.9 GB resident. It is refused on reaching the row limit, read as a
    // stream: the child's peak resident size stays far below what holding the file would take.
    [SkippableFact]
    public void Soak_a_ten_million_row_capture_is_refused_in_bounded_memory()
    {
        Skip.If(Properties.PropertySeeds.Soak == 0, "writes a 300 MB file: runs only with WAVESIM_SOAK=N");
        using var cli = new CliRunner();
        string capture = cli.PathOf("c.csv");
        using (var w = new StreamWriter(capture, false, new UTF8Encoding(false), 1 << 20))
        {
            w.Write("time_s,volts_V\n");
            for (int i = 0; i < 10_000_000; i++)
                w.Write(string.Create(CultureInfo.InvariantCulture, $"{i * 1e-13:R},{(i > 5_000_000 ? 1.0 : 0.0):R}\n"));
        }
        string scenario = cli.Write("s.yaml", InputMutants.CaptureScenario);
        var o = ChildCli.Run(cli.Dir, TimeSpan.FromMinutes(10), 3L << 30, "compare", scenario, "--capture", capture, "--probe", "rx", "--out", cli.PathOf("out"));
        Assert.Equal(2, o.Code);
        Assert.Contains($"c.csv line {InputLimits.CaptureRows + 2}: more than 8,000,000 data rows", o.Err, StringComparison.Ordinal);
        Assert.True(o.PeakBytes < 1L << 30, $"peak resident size {o.PeakBytes >> 20} MiB");
    }

    static Capture ReadText(string content)
    {
        using var file = new TempFile("capture.csv", content);
        return CaptureReader.Read(file.Path);
    }

    static string Rows(int n)
    {
        var sb = new StringBuilder(n * 20);
        for (int i = 0; i < n; i++)
            sb.Append(CultureInfo.InvariantCulture, $"{i}e-12,{i % 7 * 0.125}\n");
        return sb.ToString();
    }
}
