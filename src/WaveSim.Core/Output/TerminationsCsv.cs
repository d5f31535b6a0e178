using System.Globalization;
using CsvHelper;
using WaveSim.Core.Analysis;
using WaveSim.Core.Terminations;

namespace WaveSim.Core.Output;

/// <summary>
/// Writes terminations.csv: one row per strategy; <c>strategy</c>, the simulated part values in SI (series_r_ohm,
/// parallel_r_ohm, thevenin_r1_ohm, thevenin_r2_ohm, rc_r_ohm, rc_c_F; empty for other strategies), for Thevenin the level asked
/// for and the level its pair gives (thevenin_target_V, thevenin_level_V), <c>&lt;probe&gt;.&lt;figure&gt;</c>
/// for every probe and figure, then power_high_W and power_low_W (static, DC), power_avg_W (the simulated mean over the record),
/// <c>change</c> (what the strategy changes in the net as drawn) and <c>verdict</c>. Invariant culture, round-trip doubles;
/// a strategy that does not apply has only its name, its change (why it does not apply) and "n/a".
/// </summary>
public static class TerminationsCsv
{
    /// <summary>The part columns, in output order.</summary>
    public static IReadOnlyList<string> PartColumns { get; } =
        ["series_r_ohm", "parallel_r_ohm", "thevenin_r1_ohm", "thevenin_r2_ohm", "rc_r_ohm", "rc_c_F"];

    /// <summary>The header row.</summary>
    public static IReadOnlyList<string> Columns(TerminationStudyResult r) =>
        new[] { "strategy" }.Concat(PartColumns).Concat(["thevenin_target_V", "thevenin_level_V"])
            .Concat(r.Probes.SelectMany(p => SignalFigures.FigureNames.Select(f => p + "." + f)))
            .Concat(["power_high_W", "power_low_W", "power_avg_W", "change", "verdict"]).ToArray();

    /// <summary>Writes the CSV to <paramref name="writer"/>.</summary>
    public static void Write(TerminationStudyResult r, TextWriter writer)
    {
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        foreach (string c in Columns(r)) csv.WriteField(c);
        csv.NextRecord();
        foreach (var o in r.Outcomes)
        {
            csv.WriteField(o.Design.Name);
            foreach (string col in PartColumns)
                csv.WriteField(o.Design.Parts.FirstOrDefault(p => p.Column == col) is { } part ? Cell(part.Used) : "");
            csv.WriteField(Cell(TerminationReport.TheveninTarget(o.Design)));
            csv.WriteField(Cell(TerminationReport.TheveninLevel(o.Design)));
            for (int i = 0; i < r.Probes.Count; i++)
                foreach (string f in SignalFigures.FigureNames)
                    csv.WriteField(o.Figures.Count > i && o.Figures[i].GetNumber(f) is { } x ? Cell(x) : "");
            csv.WriteField(Cell(o.PowerHighW));
            csv.WriteField(Cell(o.PowerLowW));
            csv.WriteField(Cell(o.PowerAverageW));
            csv.WriteField(o.Design.Kind == TerminationKind.AsDrawn && o.Result is not null ? "" : o.Design.Note ?? "");
            csv.WriteField(o.Verdict);
            csv.NextRecord();
        }
    }

    static string Cell(double? v) => v is { } x ? CsvNumber.Format(x) : "";
}
