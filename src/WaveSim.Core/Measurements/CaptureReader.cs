using System.Globalization;
using System.Text.RegularExpressions;
using CsvHelper;
using CsvHelper.Configuration;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Reads a measured waveform (oscilloscope or reflectometer export) from a delimited text file.
/// </summary>
/// <remarks>
/// <para>Layout rules:</para>
/// <list type="bullet">
/// <item>Delimiter: tab, semicolon or comma, taken from the last non-blank line (always a data row); when
/// several occur there, tab wins over semicolon over comma.</item>
/// <item>Numbers use a decimal point (invariant culture). A decimal comma is rejected with a one-line error,
/// because "1,5" cannot be told apart from two fields in a comma-separated file.</item>
/// <item>Data block: the first row from which the next three rows (or all remaining rows, if fewer) are numeric
/// rows with the same field count. A numeric row has at least two fields, each a number, blank or NaN, and at least one number.
/// Everything before it is metadata; the row just before it is the header when it has the same field count
/// and is not numeric. Every row after the start must be a data row: a stray text cell is an error naming
/// its line, not a silent restart of the block. <see cref="CaptureOptions.Skip"/> overrides the search.</item>
/// <item>Rows whose selected time or voltage cell is blank or NaN are dropped and reported in
/// <see cref="Capture.Warnings"/>. Time must increase strictly; uneven steps are kept as they are.</item>
/// </list>
/// <para>Every problem throws <see cref="InputException"/> with one line "file line N: ...".</para>
/// </remarks>
public static partial class CaptureReader
{
    const int BlockProbeRows = 3;

    [GeneratedRegex(@"^[+-]?[0-9]+,[0-9]+(?:[eE][+-]?[0-9]+)?$")]
    private static partial Regex DecimalCommaNumber();

    [GeneratedRegex(@"^0[0-9]+$")]
    private static partial Regex LeadingZeroDigits();

    /// <summary>Reads the capture at <paramref name="path"/>.</summary>
    /// <param name="path">The file to read.</param>
    /// <param name="options">Column choice, skipped lines and unit scales; null for the defaults.</param>
    /// <returns>The samples in s and V, with warnings about dropped rows.</returns>
    /// <exception cref="InputException">The file is missing, unreadable or malformed; the message names the line.</exception>
    public static Capture Read(string path, CaptureOptions? options = null)
    {
        options ??= new CaptureOptions();
        string name = Path.GetFileName(path);
        ValidateOptions(options, name);

        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new InputException($"{name}: file not found");
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"{name}: cannot read the file ({ex.Message.ReplaceLineEndings(" ")})");
        }

        return Parse(text, name, path, options);
    }

    internal static Capture Parse(string text, string name, string source, CaptureOptions options)
    {
        char delimiter = DetectDelimiter(text, name);
        List<(int Line, string[] Fields)> rows = SplitRows(text, delimiter);

        (int start, string[]? header) = LocateDataBlock(rows, delimiter, options, name);
        int fieldCount = rows[start].Fields.Length;
        int timeCol = ResolveColumn(options.TimeColumn, header, rows[start], -1, "time", name);
        int voltCol = ResolveColumn(options.VoltColumn, header, rows[start], timeCol, "voltage", name);
        if (timeCol == voltCol)
            throw new InputException($"{name}: the time and voltage columns are the same (column {timeCol + 1})");

        var time = new List<double>(rows.Count - start);
        var volts = new List<double>(rows.Count - start);
        var droppedLines = new List<int>();
        int previousLine = 0;
        double previousRaw = double.NegativeInfinity;

        for (int i = start; i < rows.Count; i++)
        {
            (int line, string[] fields) = rows[i];
            int needed = Math.Max(timeCol, voltCol) + 1;
            if (fields.Length < needed)
                throw new InputException(
                    $"{name} line {line}: {fields.Length} field(s), but column {needed} is needed (the data block has {fieldCount})");

            double? t = Cell(fields[timeCol], line, timeCol, delimiter, name);
            double? v = Cell(fields[voltCol], line, voltCol, delimiter, name);
            if (t is null || v is null)
            {
                droppedLines.Add(line);
                continue;
            }

            if (!(t.Value > previousRaw))
                throw new InputException(
                    $"{name} line {line}: time {Invariant(t.Value)} is not later than {Invariant(previousRaw)} on line {previousLine}; time must increase strictly");
            previousRaw = t.Value;
            previousLine = line;
            time.Add(Sample(t.Value * options.TimeScale, Units.Dimension.Time, "time", name, line));
            volts.Add(Sample(v.Value * options.VoltScale, Units.Dimension.Voltage, "voltage", name, line));
        }

        if (time.Count < 2)
            throw new InputException($"{name}: fewer than two samples ({time.Count} usable data row(s) from line {rows[start].Line})");

        var warnings = new List<string>();
        if (droppedLines.Count > 0)
        {
            string shown = string.Join(", ", droppedLines.Take(10));
            string more = droppedLines.Count > 10 ? $", ... ({droppedLines.Count - 10} more)" : "";
            warnings.Add($"{name}: dropped {droppedLines.Count} row(s) with a blank or NaN cell (line(s) {shown}{more})");
        }

        string timeLabel = header is not null && timeCol < header.Length && header[timeCol].Trim().Length > 0
            ? $"'{header[timeCol].Trim()}'"
            : (timeCol + 1).ToString(CultureInfo.InvariantCulture);
        return new Capture(time.ToArray(), volts.ToArray(), source)
        {
            DroppedRows = droppedLines.Count, Warnings = warnings, TimeColumn = timeLabel,
        };
    }

    static void ValidateOptions(CaptureOptions o, string name)
    {
        if (o.Skip is < 0)
            throw new InputException($"{name}: lines to skip must be 0 or more, got {o.Skip}");
        if (!(o.TimeScale > 0) || double.IsInfinity(o.TimeScale))
            throw new InputException($"{name}: time scale must be a positive number of seconds per file unit, got {Invariant(o.TimeScale)}");
        if (o.VoltScale == 0 || !double.IsFinite(o.VoltScale))
            throw new InputException($"{name}: voltage scale must be a non-zero number of volts per file unit, got {Invariant(o.VoltScale)}");
    }

    static char DetectDelimiter(string text, string name)
    {
        string[] lines = text.Split('\n');
        for (int i = lines.Length - 1; i >= 0; i--)
        {
            string line = lines[i].Trim();
            if (line.Length == 0)
                continue;
            foreach (char d in "\t;,")
                if (line.Contains(d))
                    return d;
            throw new InputException($"{name} line {i + 1}: no comma, semicolon or tab; expected at least two columns (time and voltage)");
        }
        throw new InputException($"{name}: the file is empty");
    }

    /// <summary>CsvHelper's parser does the splitting (quotes, trimming); RawRow gives the physical line.</summary>
    static List<(int Line, string[] Fields)> SplitRows(string text, char delimiter)
    {
        var config = new CsvConfiguration(CultureInfo.InvariantCulture)
        {
            Delimiter = delimiter.ToString(),
            HasHeaderRecord = false,
            IgnoreBlankLines = true,
            TrimOptions = TrimOptions.Trim,
            BadDataFound = null,   // metadata may hold stray quotes; only the numeric block matters
            MissingFieldFound = null,
        };
        var rows = new List<(int, string[])>();
        using var reader = new StringReader(text);
        using var parser = new CsvParser(reader, config);
        while (parser.Read())
        {
            string[]? record = parser.Record;
            if (record is null || record.All(string.IsNullOrWhiteSpace))
                continue;
            rows.Add((parser.RawRow, record));
        }
        return rows;
    }

    static (int Start, string[]? Header) LocateDataBlock(List<(int Line, string[] Fields)> rows, char delimiter, CaptureOptions options, string name)
    {
        if (options.Skip is int skip)
        {
            int first = rows.FindIndex(r => r.Line > skip);
            if (first < 0)
                throw new InputException($"{name}: nothing left after skipping {skip} line(s)");
            if (IsNumericRow(rows[first].Fields))
                return (first, null);
            if (first + 1 >= rows.Count)
                throw new InputException($"{name}: fewer than two samples (only a header after skipping {skip} line(s))");
            return (first + 1, rows[first].Fields);
        }

        for (int i = 0; i < rows.Count; i++)
        {
            int probe = Math.Min(BlockProbeRows, rows.Count - i);
            int count = rows[i].Fields.Length;
            bool block = true;
            for (int k = i; k < i + probe && block; k++)
                block = rows[k].Fields.Length == count && IsNumericRow(rows[k].Fields);
            if (!block)
                continue;
            string[]? header = i > 0 && rows[i - 1].Fields.Length == count && !IsNumericRow(rows[i - 1].Fields)
                ? rows[i - 1].Fields
                : null;
            return (i, header);
        }
        throw new InputException(
            $"{name}: no block of numeric rows found (expected columns of numbers with a decimal point, separated by '{Describe(delimiter)}')");
    }

    static bool IsNumericRow(string[] fields)
    {
        if (fields.Length < 2)
            return false;
        int numbers = 0;
        foreach (string f in fields)
        {
            if (IsMissing(f))
                continue;
            if (LooksNumeric(f))
                numbers++;
            else
                return false;
        }
        return numbers >= 1;
    }

    static int ResolveColumn(string? spec, string[]? header, (int Line, string[] Fields) firstRow, int exclude, string role, string name)
    {
        int count = firstRow.Fields.Length;
        if (string.IsNullOrWhiteSpace(spec))
        {
            for (int c = exclude + 1; c < count; c++)
                if (LooksNumeric(firstRow.Fields[c]))
                    return c;
            throw new InputException($"{name} line {firstRow.Line}: no numeric {role} column found; give the column by name or 1-based number");
        }

        spec = spec.Trim();
        if (int.TryParse(spec, NumberStyles.None, CultureInfo.InvariantCulture, out int oneBased))
        {
            if (oneBased < 1 || oneBased > count)
                throw new InputException($"{name}: {role} column {oneBased} not found; the data rows have {count} columns (numbered from 1)");
            return oneBased - 1;
        }

        if (header is null)
            throw new InputException($"{name}: column '{spec}' not found; the file has no header row, give a column number 1..{count}");
        for (int c = 0; c < header.Length; c++)
            if (string.Equals(header[c].Trim(), spec, StringComparison.OrdinalIgnoreCase))
                return c;
        string available = string.Join(", ", header.Select(h => $"'{h.Trim()}'"));
        throw new InputException($"{name}: column '{spec}' not found; available: {available}");
    }

    /// <summary>
    /// A scaled sample, refused when its size is beyond the largest a scenario accepts for its dimension (a voltage of
    /// 1e308 overflowed the comparison's arithmetic into a numerical failure). Small sizes are sample values, not
    /// durations or levels, so only the upper end of the range applies.
    /// </summary>
    static double Sample(double value, Units.Dimension dim, string what, string name, int line)
    {
        if (Math.Abs(value) <= dim.SensibleRange!.Value.Max && double.IsFinite(value)) return value;
        throw new InputException($"{name} line {line}: {what} {Invariant(value)} {dim.SiUnit} (after scaling) is beyond the largest "
            + $"accepted, {dim.SensibleRange.Value.Max.ToString("0.###e0", CultureInfo.InvariantCulture)} {dim.SiUnit} in size; check the file's units and scale");
    }

    /// <summary>A number, or null for a blank / NaN cell (the row is dropped).</summary>
    static double? Cell(string field, int line, int column, char delimiter, string name)
    {
        if (IsMissing(field))
            return null;
        string where = $"{name} line {line} column {column + 1}";
        if (field.Contains(',') && DecimalCommaNumber().IsMatch(field))
            throw new InputException($"{where}: '{field}' has a decimal comma; decimal comma is not supported; export with a decimal point");
        if (delimiter == ',' && LeadingZeroDigits().IsMatch(field))
            throw new InputException(
                $"{where}: '{field}' looks like the fraction of a decimal-comma number; decimal comma is not supported; export with a decimal point");
        if (!TryNumber(field, out double value))
            throw new InputException($"{where}: '{field}' is not a number");
        if (!double.IsFinite(value))
            throw new InputException($"{where}: '{field}' is not a finite number");
        return value;
    }

    /// <summary>A number, or a decimal-comma number (accepted here so that <see cref="Cell"/> can name it).</summary>
    static bool LooksNumeric(string field) => TryNumber(field, out _) || DecimalCommaNumber().IsMatch(field);

    static bool IsMissing(string field) =>
        field.Length == 0 || field.Equals("nan", StringComparison.OrdinalIgnoreCase);

    static bool TryNumber(string field, out double value) =>
        double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && !double.IsNaN(value);

    static string Invariant(double x) => x.ToString("G6", CultureInfo.InvariantCulture);

    static string Describe(char d) => d switch { '\t' => "tab", ';' => ";", _ => "," };
}
