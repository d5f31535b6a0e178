using CsCheck;
using WaveSim.Core;
using WaveSim.Core.Buffers;
using WaveSim.Tests.Properties;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// Random damage to the full-feature file (a character replaced, a line deleted or repeated): the reader and everything
/// built on it either succeed or fail with a one-line <see cref="InputException"/> naming the file; never another
/// exception (common practice for hostile input, no source).
/// </summary>
public class MalformedFileProperties
{
    public static TheoryData<string> Seeds => PropertySeeds.Rows(PropertySeeds.Numbered(150));

    static readonly string[] Lines = FullFeatureFile.Text.Split('\n');

    static readonly Gen<(int Line, int How, int Pos, char Ch)> DamageGen =
        Gen.Select(Gen.Int[0, Lines.Length - 1], Gen.Int[0, 2], Gen.Int[0, 80], Gen.Char[' ', '~']);

    static string Damage((int Line, int How, int Pos, char Ch) d)
    {
        var lines = Lines.ToList();
        switch (d.How)
        {
            case 0:
                string l = lines[d.Line];
                if (l.Length > 0) { int p = d.Pos % l.Length; lines[d.Line] = l[..p] + d.Ch + l[(p + 1)..]; }
                break;
            case 1: lines.RemoveAt(d.Line); break;
            default: lines.Insert(d.Line, lines[d.Line]); break;
        }
        return string.Join('\n', lines);
    }

    static bool Survives((int Line, int How, int Pos, char Ch) d)
    {
        string text = Damage(d);
        try
        {
            BufferFile f = BufferFileReader.Parse(text, "damaged.ibs");
            foreach (BufferModel m in f.Models)
                foreach (Corner c in m.Corners)
                {
                    BufferCurves k = m.Curves(c);
                    _ = (k.OutputResistanceHigh, k.OutputResistanceLow);
                    if (m.Drives) _ = (SwitchingCoefficients.For(m, c, true), SwitchingCoefficients.For(m, c, false));
                }
            foreach (BufferModel m in f.Models)
            {
                if (m.HasIvTables) _ = BufferCharts.IvChart(m, m.Corners);
                if (m.Drives) _ = BufferCharts.SwitchingChart(m, m.Corners);
            }
            _ = BufferSummary.Json(f, f.Models, [Corner.Typ, Corner.Min, Corner.Max]);
            return true;
        }
        catch (InputException ex) when (ex.Message.StartsWith("damaged.ibs", StringComparison.Ordinal) && !ex.Message.Contains('\n'))
        {
            return true;
        }
        catch (Exception ex)
        {
            throw new Xunit.Sdk.XunitException($"{ex.GetType().Name}: {ex.Message}\n--- damage {d} ---");
        }
    }

    [Theory, MemberData(nameof(Seeds))]
    public void Damaged_files_fail_with_one_line_or_read(string seed) => Assert.True(Survives(PropertySeeds.Replay(DamageGen, seed)));

    [SkippableFact]
    public void Soak_damaged_files() => PropertySeeds.Explore(DamageGen, Survives);
}
