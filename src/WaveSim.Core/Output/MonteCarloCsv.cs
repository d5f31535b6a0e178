using System.Globalization;
using CsvHelper;
using WaveSim.Core.Analysis;
using WaveSim.Core.Sweeps;
using WaveSim.Core.Tolerances;

namespace WaveSim.Core.Output;

/// <summary>
/// Writes and reads montecarlo.csv: one row per sample (or corner) in index order: <c>index</c>, each varied key (SI; a buffer's corner by its name),
/// <c>&lt;probe&gt;.&lt;figure&gt;</c> for every probe and figure, then <c>pass:&lt;limit&gt;</c> (1 or 0) per limit and
/// <c>pass</c> (every limit met). Invariant culture, round-trip doubles, an empty cell where a figure does not apply; a
/// shard writes the same columns for its own rows, and the rows read back give the very same doubles.
/// </summary>
public static class MonteCarloCsv
{
    /// <summary>The header row.</summary>
    public static IReadOnlyList<string> Columns(ToleranceResult r, IReadOnlyList<SweepLimit> limits)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(limits);
        var cols = new List<string> { "index" };
        cols.AddRange(r.Keys.Select(k => k.KeyPath));
        cols.AddRange(r.AllFigures().Select(f => f.Column));
        if (limits.Count > 0) { cols.AddRange(limits.Select(l => "pass:" + l)); cols.Add("pass"); }
        return cols;
    }

    /// <summary>Writes the CSV.</summary>
    public static void Write(ToleranceResult r, IReadOnlyList<SweepLimit> limits, TextWriter writer)
    {
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string c in Columns(r, limits)) csv.WriteField(c);
        csv.NextRecord();
        foreach (var p in r.Points)
        {
            csv.WriteField(p.Index.ToString(CultureInfo.InvariantCulture));
            for (int j = 0; j < p.Values.Count; j++) csv.WriteField(r.Keys[j].Distribution.Name(p.Values[j]) ?? CsvNumber.Format(p.Values[j]));
            foreach (var f in p.Figures)
                foreach (string name in SignalFigures.FigureNames)
                    csv.WriteField(f.GetNumber(name) is { } x ? CsvNumber.Format(x) : "");
            if (limits.Count > 0)
            {
                foreach (var l in limits) csv.WriteField(l.IsMet(r.Value(p, l.Target)) ? "1" : "0");
                csv.WriteField(r.Passes(p, limits) ? "1" : "0");
            }
            csv.NextRecord();
        }
    }

    /// <summary>Reads the rows of a CSV written by <see cref="Write"/> for the same keys, probes and limits.</summary>
    /// <param name="template">Gives the keys and probes the columns must match (its points are ignored).</param>
    /// <param name="limits">The limits whose columns the file holds.</param>
    /// <param name="reader">The text.</param>
    /// <param name="name">The file's name, for messages.</param>
    /// <exception cref="InputException">Other columns, or a cell that is not a number.</exception>
    public static IReadOnlyList<SweepPointResult> Read(ToleranceResult template, IReadOnlyList<SweepLimit> limits, TextReader reader, string name)
    {
        ArgumentNullException.ThrowIfNull(template);
        var expected = Columns(template, limits);
        using var csv = new CsvParser(reader, CultureInfo.InvariantCulture, leaveOpen: true);
        if (!csv.Read() || !csv.Record!.SequenceEqual(expected))
            throw new InputException($"{name}: line 1: the columns are not those of this run ({string.Join(",", expected.Take(4))},…)");
        int nk = template.Keys.Count, nf = SignalFigures.FigureNames.Count;
        var rows = new List<SweepPointResult>();
        while (csv.Read())
        {
            var rec = csv.Record!;
            long line = csv.Row;
            if (rec.Length != expected.Count) throw new InputException($"{name}: line {line}: {rec.Length} cells, expected {expected.Count}");
            double? Cell(int i) => rec[i].Length == 0 ? null
                : double.TryParse(rec[i], NumberStyles.Float, CultureInfo.InvariantCulture, out double v) ? v
                : throw new InputException($"{name}: line {line}: column '{expected[i]}': '{rec[i]}' is not a number");
            if (!int.TryParse(rec[0], NumberStyles.None, CultureInfo.InvariantCulture, out int index))
                throw new InputException($"{name}: line {line}: column 'index': '{rec[0]}' is not a sample index");
            double Key(int i) => template.Keys[i - 1].Distribution.Choices is { } names
                ? names.ToList().IndexOf(rec[i]) is var c and >= 0 ? c : throw new InputException($"{name}: line {line}: column '{expected[i]}': '{rec[i]}' is not one of {string.Join(", ", names)}")
                : Cell(i) ?? throw new InputException($"{name}: line {line}: column '{expected[i]}' is empty");
            var values = Enumerable.Range(1, nk).Select(Key).ToArray();
            var figures = template.Probes.Select((_, p) => FigureNumbers.ToFigures(Enumerable.Range(1 + nk + p * nf, nf).Select(Cell).ToArray())).ToArray();
            rows.Add(new SweepPointResult(index, values, figures));
        }
        return rows;
    }
}
