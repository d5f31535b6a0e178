using System.Globalization;
using CsvHelper;
using WaveSim.Core.Analysis;
using WaveSim.Core.Sweeps;

namespace WaveSim.Core.Output;

/// <summary>
/// Writes sweep.csv: one row per point in sweep order; the varied keys first (column = key path, SI value), then
/// <c>&lt;probe&gt;.&lt;figure&gt;</c> for every probe and every name in <see cref="SignalFigures.FigureNames"/>.
/// Invariant culture, round-trip doubles, an empty cell where a figure does not apply.
/// </summary>
public static class SweepCsv
{
    /// <summary>The header row.</summary>
    public static IReadOnlyList<string> Columns(SweepResult r) =>
        r.Axes.Select(a => a.KeyPath)
            .Concat(r.Probes.SelectMany(p => SignalFigures.FigureNames.Select(f => p + "." + f)))
            .ToArray();

    /// <summary>Writes the CSV to <paramref name="writer"/>.</summary>
    public static void Write(SweepResult r, TextWriter writer)
    {
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string c in Columns(r)) csv.WriteField(c);
        csv.NextRecord();
        foreach (var p in r.Points)
        {
            for (int k = 0; k < p.Values.Count; k++)
                csv.WriteField(r.Axes[k].Choices is { } names ? names[(int)p.Values[k]] : Cell(p.Values[k]));
            foreach (var f in p.Figures)
                foreach (string name in SignalFigures.FigureNames)
                    csv.WriteField(f.GetNumber(name) is { } x ? Cell(x) : "");
            csv.NextRecord();
        }
    }

    static string Cell(double v) => CsvNumber.Format(v);

    /// <summary>Writes a shard's rows: an <c>index</c> column (the point's place in sweep order) before the columns of <see cref="Write"/>.</summary>
    public static void WritePartial(SweepResult r, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(r);
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        csv.WriteField("index");
        foreach (string c in Columns(r)) csv.WriteField(c);
        csv.NextRecord();
        foreach (var p in r.Points)
        {
            csv.WriteField(p.Index.ToString(CultureInfo.InvariantCulture));
            foreach (double v in p.Values) csv.WriteField(Cell(v));
            foreach (var f in p.Figures)
                foreach (string name in SignalFigures.FigureNames)
                    csv.WriteField(f.GetNumber(name) is { } x ? Cell(x) : "");
            csv.NextRecord();
        }
    }

    /// <summary>Reads the rows <see cref="WritePartial"/> wrote for a sweep of the same axes and probes.</summary>
    /// <exception cref="InputException">Other columns, or a cell that is not a number (naming the file and line).</exception>
    public static IReadOnlyList<SweepPointResult> ReadPartial(SweepResult template, TextReader reader, string name)
    {
        ArgumentNullException.ThrowIfNull(template);
        var expected = new[] { "index" }.Concat(Columns(template)).ToArray();
        using var csv = new CsvParser(reader, CultureInfo.InvariantCulture, leaveOpen: true);
        if (!csv.Read() || !csv.Record!.SequenceEqual(expected))
            throw new InputException($"{name}: line 1: the columns are not those of this sweep");
        int na = template.Axes.Count, nf = SignalFigures.FigureNames.Count;
        var rows = new List<SweepPointResult>();
        while (csv.Read())
        {
            var rec = csv.Record!;
            long line = csv.Row;
            if (rec.Length != expected.Length) throw new InputException($"{name}: line {line}: {rec.Length} cells, expected {expected.Length}");
            double? At(int i) => rec[i].Length == 0 ? null
                : double.TryParse(rec[i], NumberStyles.Float, CultureInfo.InvariantCulture, out double v) ? v
                : throw new InputException($"{name}: line {line}: column '{expected[i]}': '{rec[i]}' is not a number");
            if (!int.TryParse(rec[0], NumberStyles.None, CultureInfo.InvariantCulture, out int index))
                throw new InputException($"{name}: line {line}: column 'index': '{rec[0]}' is not a point index");
            var values = Enumerable.Range(1, na).Select(i => At(i) ?? throw new InputException($"{name}: line {line}: column '{expected[i]}' is empty")).ToArray();
            var figures = template.Probes.Select((_, p) => FigureNumbers.ToFigures(Enumerable.Range(1 + na + p * nf, nf).Select(At).ToArray())).ToArray();
            rows.Add(new SweepPointResult(index, values, figures));
        }
        return rows;
    }
}
