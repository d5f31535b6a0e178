using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Malformed captures give one-line <see cref="InputException"/>s naming the file and the line
/// (the rule for bad input; no other exception type may escape: Assert.Throws checks the exact type).
/// </summary>
public class CaptureReaderErrorTests
{
    static InputException Fails(string content, CaptureOptions? options = null)
    {
        using var file = new TempFile("capture.csv", content);
        var ex = Assert.Throws<InputException>(() => CaptureReader.Read(file.Path, options));
        Assert.DoesNotContain('\n', ex.Message);
        Assert.StartsWith("capture.csv", ex.Message);
        return ex;
    }

    static Capture Reads(string content, CaptureOptions? options = null)
    {
        using var file = new TempFile("capture.csv", content);
        return CaptureReader.Read(file.Path, options);
    }

    [Fact]
    public void Decimal_comma_with_semicolons_is_refused_naming_the_line()
    {
        var ex = Fails("Model;demo\ntime;volts\n0;0\n1,5;2,3\n2;2\n3;3\n");
        Assert.Contains("line 4 column 1", ex.Message);
        Assert.Contains("decimal comma is not supported; export with a decimal point", ex.Message);
    }

    [Fact]
    public void Decimal_comma_with_tabs_is_refused_naming_the_line()
    {
        var ex = Fails("t\tv\n0,001\t0,5\n0,002\t0,6\n0,003\t0,7\n");
        Assert.Contains("line 2 column 1", ex.Message);
        Assert.Contains("decimal comma is not supported; export with a decimal point", ex.Message);
    }

    [Fact]
    public void Decimal_comma_in_a_comma_separated_file_is_caught_by_the_leading_zero_fraction()
    {
        // "0,001,0,5" splits into 0 | 001 | 0 | 5: a fraction with a leading zero is no number an exporter writes.
        var ex = Fails("time,volts\n0,001,0,5\n0,002,0,6\n0,003,0,7\n");
        Assert.Contains("line 2 column 2", ex.Message);
        Assert.Contains("decimal comma is not supported; export with a decimal point", ex.Message);
    }

    [Fact]
    public void Missing_named_column_lists_the_available_ones()
    {
        var ex = Fails("time,v_ch1\n0,0\n1,1\n2,2\n", new CaptureOptions { VoltColumn = "volts" });
        Assert.Equal("capture.csv: column 'volts' not found; available: 'time', 'v_ch1'", ex.Message);
    }

    [Fact]
    public void Column_number_beyond_the_data_is_refused()
    {
        var ex = Fails("0,0\n1,1\n2,2\n", new CaptureOptions { VoltColumn = "3" });
        Assert.Contains("column 3 not found", ex.Message);
    }

    [Fact]
    public void Text_in_a_number_cell_names_line_and_column()
    {
        var ex = Fails("Model,demo\ntime,volts\n0,0\n1e-9,0.1\n2e-9,0.2\n3e-9,abc\n4e-9,0.4\n");
        Assert.Equal("capture.csv line 6 column 2: 'abc' is not a number", ex.Message);
    }

    [Fact]
    public void Fewer_than_two_samples_is_refused()
    {
        var ex = Fails("time,volts\n0,1\n");
        Assert.Contains("fewer than two samples", ex.Message);
    }

    [Fact]
    public void Time_that_does_not_increase_names_the_line()
    {
        var ex = Fails("time,volts\n0,0\n2,1\n1,2\n3,3\n");
        Assert.StartsWith("capture.csv line 4: time 1 is not later than 2 on line 3", ex.Message);
    }

    [Fact]
    public void Missing_file_is_an_input_error()
    {
        var ex = Assert.Throws<InputException>(() => CaptureReader.Read("/nonexistent/capture.csv", null));
        Assert.Equal("capture.csv: file not found", ex.Message);
    }

    [Fact]
    public void Rows_with_blank_or_NaN_cells_are_dropped_and_reported_with_their_lines()
    {
        // Line 5 has a blank voltage, line 7 a NaN time; a blank line (6) is skipped silently.
        Capture c = Reads("Model,demo\ntime,volts\n0,0\n1,0.1\n2,\n\nNaN,0.3\n4,0.4\n");
        Assert.Equal([0.0, 1, 4], c.Time);
        Assert.Equal([0.0, 0.1, 0.4], c.Volts);
        Assert.Equal(2, c.DroppedRows);
        Assert.Equal("capture.csv: dropped 2 row(s) with a blank or NaN cell (line(s) 5, 7)", Assert.Single(c.Warnings));
    }

    [Fact]
    public void Uneven_sampling_and_a_negative_start_are_kept_as_they_are()
    {
        Capture c = Reads("-2.5\t1\n-1\t2\n0.25\t3\n4\t4\n", new CaptureOptions { TimeScale = 1e-9, VoltScale = 1e-3 });
        Assert.Equal([-2.5e-9, -1e-9, 0.25e-9, 4e-9], c.Time);
        Assert.Equal([1e-3, 2e-3, 3e-3, 4e-3], c.Volts);
    }

    [Fact]
    public void Skip_overrides_detection_and_the_next_line_is_the_header()
    {
        // Three numeric metadata lines (channel number, scale, offset) look like a table to the search ...
        const string content = "1,0.5,0\n2,0.2,0.1\n3,1,0\nt,v\n0,5\n1,6\n";
        var ex = Fails(content);
        Assert.StartsWith("capture.csv line 4 column 1: 't' is not a number", ex.Message);
        // ... so Skip = 3 says where the table begins.
        Capture c = Reads(content, new CaptureOptions { Skip = 3, VoltColumn = "v" });
        Assert.Equal([5.0, 6], c.Volts);
    }

    [Fact]
    public void Default_columns_are_the_first_two_numeric_ones()
    {
        Capture c = Reads("index;t;v\n1;0;5\n2;1;6\n3;2;7\n", new CaptureOptions { TimeColumn = "t", VoltColumn = "v" });
        Assert.Equal([5.0, 6, 7], c.Volts);
        Capture d = Reads("index;t;v\n1;0;5\n2;1;6\n3;2;7\n");
        Assert.Equal([1.0, 2, 3], d.Time);   // first numeric column is the time by default
        Assert.Equal([0.0, 1, 2], d.Volts);
    }
}
