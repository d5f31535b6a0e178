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
}
