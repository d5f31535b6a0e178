using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Io;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Reads a measured waveform (oscilloscope or reflectometer export) from a delimited text file, row by row.
/// </summary>
/// <remarks>
/// <para>Layout rules:</para>
/// <list type="bullet">
/// <item>Delimiter: tab, semicolon or comma, one per file, found with the data block (below); when a row could be read with
/// several, tab wins over semicolon over comma. A file that mixes them is refused naming the first line in another delimiter,
/// whether it comes after the data block starts or before it (a few comma rows ahead of semicolon ones were once taken
/// as metadata in silence and shifted the comparison).</item>
/// <item>Numbers use a decimal point (invariant culture). A decimal comma is rejected with a one-line error,
/// because "1,5" cannot be told apart from two fields in a comma-separated file.</item>
/// <item>Data block: the first row from which the next three rows (or all remaining rows, if fewer) are numeric
/// rows with the same field count and delimiter. A numeric row has at least two fields, each a number, blank or NaN, and at
/// least one number. Everything before it is metadata; the row just before it is the header when it has the same field count
/// and is not numeric. Every row after the start must be a data row: a stray text cell is an error naming
/// its line, not a silent restart of the block. <see cref="CaptureOptions.Skip"/> overrides the search.</item>
/// <item>Rows whose selected time or voltage cell is blank or NaN are dropped and reported in
/// <see cref="Capture.Warnings"/>. Time must increase strictly; uneven steps are kept as they are.</item>
/// <item>Size: the file is read through <see cref="BoundedText"/> (at most <see cref="InputLimits.CaptureBytes"/>, text only,
/// a regular file) and streamed, so memory follows the rows kept; more than <see cref="InputLimits.CaptureRows"/> data rows are
/// refused naming the first line beyond, never decimated in silence (docs/limits.md).</item>
/// </list>
/// <para>Every problem throws <see cref="InputException"/> with one line "file line N: ...". Cells quoted in messages are
/// short, clean excerpts (<see cref="EchoText.Excerpt"/>).</para>
/// </remarks>
public static partial class CaptureReader
{
    const int BlockProbeRows = 3;
    const int DroppedLinesShown = 10;
    const int HeadersShown = 20;
    const string Delimiters = "\t;,";

    [GeneratedRegex(@"^[+-]?[0-9]+,[0-9]+(?:[eE][+-]?[0-9]+)?$")]
    private static partial Regex DecimalCommaNumber();

    [GeneratedRegex(@"^0[0-9]+$")]
    private static partial Regex LeadingZeroDigits();

    /// <summary>Reads the capture at <paramref name="path"/>.</summary>
    /// <param name="path">The file to read.</param>
    /// <param name="options">Column choice, skipped lines and unit scales; null for the defaults.</param>
    /// <returns>The samples in s and V, with warnings about dropped rows.</returns>
    /// <exception cref="InputException">The file is missing, unreadable, too large or malformed; the message names the line.</exception>
    public static Capture Read(string path, CaptureOptions? options = null)
    {
        options ??= new CaptureOptions();
        string name = Path.GetFileName(path);
        ValidateOptions(options, name);
        try
        {
            var lines = BoundedText.Lines(path, InputLimits.CaptureBytes, "capture", InputLimits.LineChars, EchoText.Excerpt(name, 100));
            return Parse(lines, name, path, options, InputLimits.CaptureRows);
        }
        catch (FileReadException ex)
        {
            throw new InputException(ex.Message);   // callers see the one bad-input type, whatever part of the reading refused
        }
    }

    /// <summary>Reads a capture from its lines (line 1 first); <paramref name="maxRows"/> data rows at most.</summary>
    internal static Capture Parse(IEnumerable<string> lines, string name, string source, CaptureOptions options, int maxRows)
    {
        name = EchoText.Excerpt(name, 100);
        var rows = new DataRows(name, options, maxRows);
        using (IEnumerator<string> e = lines.GetEnumerator())
        {
            int number = 0;
            while (e.MoveNext())
                rows.Add(++number, e.Current);
        }
        return rows.Finish(source);
    }

    /// <summary>The reading state: the search for the data block, then the data rows as they come.</summary>
    sealed class DataRows(string name, CaptureOptions options, int maxRows)
    {
        // Before the block: the rows that may start it, the row before them (the header candidate) and the first metadata row
        // that reads as numbers in each delimiter (a data row in a delimiter the block does not use).
        readonly Queue<(int Line, string Text)> _pending = new();
        (int Line, string Text)? _previous;
        readonly int?[] _numericMetadata = new int?[Delimiters.Length];
        bool _anyText;

        // After the block is found.
        char _delimiter;
        int _blockLine, _fieldCount, _timeCol = -1, _voltCol = -1;
        string[]? _header;
        readonly List<double> _time = [], _volts = [];
        readonly List<int> _droppedShown = [];
        int _dropped, _previousLine;
        double _previousRaw = double.NegativeInfinity;

        bool Found => _timeCol >= 0;

        public void Add(int line, string text)
        {
            if (text.Trim().Length == 0)
                return;
            _anyText = true;
            if (Found)
            {
                DataRow(line, text);
                return;
            }
            if (options.Skip is int skip)
            {
                if (line > skip) StartAfterSkip(line, text, skip);
                return;
            }
            _pending.Enqueue((line, text));
            if (_pending.Count == BlockProbeRows && !TryStart())
                Shift();
        }

        public Capture Finish(string source)
        {
            while (!Found && _pending.Count > 0 && !TryStart())
                Shift();
            if (!Found)
            {
                if (!_anyText) throw new InputException($"{name}: the file is empty");
                if (options.Skip is int skip)
                    throw new InputException(_previous is null
                        ? $"{name}: nothing left after skipping {skip} line(s)"
                        : $"{name}: fewer than two samples (only a header after skipping {skip} line(s))");
                throw new InputException(
                    $"{name}: no block of numeric rows found (expected columns of numbers with a decimal point, separated by commas, semicolons or tabs)");
            }
            if (_time.Count < 2)
                throw new InputException($"{name}: fewer than two samples ({_time.Count} usable data row(s) from line {_blockLine})");

            var warnings = new List<string>();
            if (_dropped > 0)
            {
                string shown = string.Join(", ", _droppedShown);
                string more = _dropped > DroppedLinesShown ? $", ... ({_dropped - DroppedLinesShown} more)" : "";
                warnings.Add($"{name}: dropped {_dropped} row(s) with a blank or NaN cell (line(s) {shown}{more})");
            }
            string timeLabel = _header is not null && _timeCol < _header.Length && _header[_timeCol].Length > 0
                ? $"'{EchoText.Excerpt(_header[_timeCol])}'"
                : (_timeCol + 1).ToString(CultureInfo.InvariantCulture);
            return new Capture(_time.ToArray(), _volts.ToArray(), source)
            {
                DroppedRows = _dropped, Warnings = warnings, TimeColumn = timeLabel,
            };
        }

        /// <summary>The pending rows start the block in some delimiter: take it and read them as data.</summary>
        bool TryStart()
        {
            var probe = _pending.ToArray();
            foreach (char d in Delimiters)
            {
                string[] first = Split(probe[0].Text, d);
                if (!probe.All(r => Split(r.Text, d) is var f && f.Length == first.Length && IsNumericRow(f)))
                    continue;
                for (int k = 0; k < Delimiters.Length; k++)
                    if (Delimiters[k] != d && _numericMetadata[k] is int other)
                        throw Mixed(other, Delimiters[k], probe[0].Line, d);
                string[]? header = _previous is { } p && Split(p.Text, d) is var h && h.Length == first.Length && !IsNumericRow(h) ? h : null;
                Begin(d, probe[0].Line, first, header);
                _pending.Clear();
                foreach (var (line, text) in probe)
                    DataRow(line, text);
                return true;
            }
            return false;
        }

        /// <summary>The oldest pending row cannot start the block: it is metadata.</summary>
        void Shift()
        {
            var row = _pending.Dequeue();
            for (int k = 0; k < Delimiters.Length; k++)
                if (_numericMetadata[k] is null && Split(row.Text, Delimiters[k]) is var f && IsNumericRow(f) && f.Count(LooksNumeric) >= 2)
                    _numericMetadata[k] = row.Line;
            _previous = row;
        }

        void StartAfterSkip(int line, string text, int skip)
        {
            if (_previous is null && DelimiterOf(text) is { } d)
            {
                string[] fields = Split(text, d);
                Begin(d, line, fields, null);
                DataRow(line, text);
                return;
            }
            if (_previous is not { } header)
            {
                _previous = (line, text);   // the header; the data start on the next row
                return;
            }
            char delimiter = DelimiterOf(text) ?? Delimiters.FirstOrDefault(c => text.Contains(c), ',');
            Begin(delimiter, line, Split(text, delimiter), Split(header.Text, delimiter));
            DataRow(line, text);
        }

        void Begin(char delimiter, int line, string[] firstRow, string[]? header)
        {
            _delimiter = delimiter;
            _blockLine = line;
            _fieldCount = firstRow.Length;
            _header = header;
            _timeCol = ResolveColumn(options.TimeColumn, header, line, firstRow, -1, "time", name);
            _voltCol = ResolveColumn(options.VoltColumn, header, line, firstRow, _timeCol, "voltage", name);
            if (_timeCol == _voltCol)
                throw new InputException($"{name}: the time and voltage columns are the same (column {_timeCol + 1})");
        }

        void DataRow(int line, string text)
        {
            string[] fields = Split(text, _delimiter);
            if (fields.All(f => f.Length == 0))
                return;
            int needed = Math.Max(_timeCol, _voltCol) + 1;
            double? t, v;
            try
            {
                if (fields.Length < needed)
                    throw new InputException(
                        $"{name} line {line}: {fields.Length} field(s), but column {needed} is needed (the data block has {_fieldCount})");
                t = Cell(fields[_timeCol], line, _timeCol, _delimiter, name);
                v = Cell(fields[_voltCol], line, _voltCol, _delimiter, name);
            }
            catch (InputException) when (OtherDelimiter(text) is char other)
            {
                // A row that does not read in the block's delimiter but does in another: the file mixes them.
                throw Mixed(line, other, _blockLine, _delimiter);
            }
            if (t is null || v is null)
            {
                if (_dropped++ < DroppedLinesShown) _droppedShown.Add(line);
                return;
            }
            if (!(t.Value > _previousRaw))
                throw new InputException(
                    $"{name} line {line}: time {Invariant(t.Value)} is not later than {Invariant(_previousRaw)} on line {_previousLine}; time must increase strictly");
            if (_time.Count >= maxRows)
                throw new InputException(
                    $"{name} line {line}: more than {maxRows.ToString("N0", CultureInfo.InvariantCulture)} data rows, the most a capture may hold "
                    + "(docs/limits.md); export a shorter record or a coarser sample interval");
            _previousRaw = t.Value;
            _previousLine = line;
            _time.Add(Sample(t.Value * options.TimeScale, Units.Dimension.Time, "time", name, line));
            _volts.Add(Sample(v.Value * options.VoltScale, Units.Dimension.Voltage, "voltage", name, line));
        }

        char? OtherDelimiter(string text) =>
            Delimiters.Where(d => d != _delimiter).Select(d => (char?)d).FirstOrDefault(d => IsNumericRow(Split(text, d!.Value)));

        InputException Mixed(int line, char found, int blockLine, char block) => new(
            $"{name} line {line}: numbers separated by {Describe(found)}, but the data block from line {blockLine} is separated by "
            + $"{Describe(block)}; a capture uses one delimiter throughout: export it again or remove the rows in the other one");
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

    /// <summary>The delimiter in which <paramref name="text"/> is a numeric row, by priority; null when none.</summary>
    static char? DelimiterOf(string text)
    {
        foreach (char d in Delimiters)
            if (IsNumericRow(Split(text, d)))
                return d;
        return null;
    }

    /// <summary>
    /// The fields of one line: split at the delimiter outside double quotes, each trimmed and unquoted ("" inside quotes is
    /// one quote). A stray quote in metadata runs to the end of the line, which is harmless there.
    /// </summary>
    internal static string[] Split(string line, char delimiter)
    {
        var fields = new List<string>();
        int start = 0;
        bool quoted = false;
        for (int i = 0; i <= line.Length; i++)
        {
            if (i < line.Length)
            {
                char ch = line[i];
                if (ch == '"') quoted = !quoted;
                if (ch != delimiter || quoted) continue;
            }
            string f = line[start..i].Trim();
            if (f.Length >= 2 && f[0] == '"' && f[^1] == '"')
                f = f[1..^1].Replace("\"\"", "\"", StringComparison.Ordinal).Trim();
            fields.Add(f);
            start = i + 1;
        }
        return [.. fields];
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

    static int ResolveColumn(string? spec, string[]? header, int line, string[] firstRow, int exclude, string role, string name)
    {
        int count = firstRow.Length;
        if (string.IsNullOrWhiteSpace(spec))
        {
            for (int c = exclude + 1; c < count; c++)
                if (LooksNumeric(firstRow[c]))
                    return c;
            throw new InputException($"{name} line {line}: no numeric {role} column found; give the column by name or 1-based number");
        }

        spec = spec.Trim();
        if (int.TryParse(spec, NumberStyles.None, CultureInfo.InvariantCulture, out int oneBased))
        {
            if (oneBased < 1 || oneBased > count)
                throw new InputException($"{name}: {role} column {oneBased} not found; the data rows have {count} columns (numbered from 1)");
            return oneBased - 1;
        }

        string asked = EchoText.Excerpt(spec);
        if (header is null)
            throw new InputException($"{name}: column '{asked}' not found; the file has no header row, give a column number 1..{count}");
        for (int c = 0; c < header.Length; c++)
            if (string.Equals(header[c], spec, StringComparison.OrdinalIgnoreCase))
                return c;
        string available = string.Join(", ", header.Take(HeadersShown).Select(h => $"'{EchoText.Excerpt(h)}'"))
            + (header.Length > HeadersShown ? $", ... ({header.Length - HeadersShown} more)" : "");
        throw new InputException($"{name}: column '{asked}' not found; available: {available}");
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
        string shown = EchoText.Excerpt(field);
        if (field.Contains(',') && DecimalCommaNumber().IsMatch(field))
            throw new InputException($"{where}: '{shown}' has a decimal comma; decimal comma is not supported; export with a decimal point");
        if (delimiter == ',' && LeadingZeroDigits().IsMatch(field))
            throw new InputException(
                $"{where}: '{shown}' looks like the fraction of a decimal-comma number; decimal comma is not supported; export with a decimal point");
        if (!TryNumber(field, out double value))
            throw new InputException($"{where}: '{shown}' is not a number");
        if (!double.IsFinite(value))
            throw new InputException($"{where}: '{shown}' is not a finite number");
        return value;
    }

    /// <summary>A number, or a decimal-comma number (accepted here so that <see cref="Cell"/> can name it).</summary>
    static bool LooksNumeric(string field) => TryNumber(field, out _) || DecimalCommaNumber().IsMatch(field);

    static bool IsMissing(string field) =>
        field.Length == 0 || field.Equals("nan", StringComparison.OrdinalIgnoreCase);

    static bool TryNumber(string field, out double value) =>
        double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && !double.IsNaN(value);

    static string Invariant(double x) => x.ToString("G6", CultureInfo.InvariantCulture);

    static string Describe(char d) => d switch { '\t' => "tabs", ';' => "semicolons", _ => "commas" };
}
