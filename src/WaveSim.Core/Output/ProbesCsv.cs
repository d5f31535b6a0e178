using System.Globalization;
using CsvHelper;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Output;

/// <summary>Writes probes.csv: time_s, then &lt;probe&gt;_V and &lt;probe&gt;_A for every probe, invariant culture, round-trip doubles.</summary>
public static class ProbesCsv
{
    /// <summary>Writes the result's probe waveforms to <paramref name="writer"/> (left open), row by row.</summary>
    public static void Write(SimulationResult result, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(result);
        Write(result.Time, result.Probes, writer);
    }

    /// <summary>Writes probe waveforms recorded at <paramref name="time"/> (a coupled run's too) to <paramref name="writer"/> (left open).</summary>
    public static void Write(double[] time, IReadOnlyList<ProbeTrace> probes, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(time);
        ArgumentNullException.ThrowIfNull(probes);
        using var csv = new CsvWriter(writer, CultureInfo.InvariantCulture, leaveOpen: true);
        csv.WriteField("time_s");
        foreach (var p in probes) { csv.WriteField(p.Name + "_V"); csv.WriteField(p.Name + "_A"); }
        csv.NextRecord();
        for (int k = 0; k < time.Length; k++)
        {
            csv.WriteField(Cell(time[k]));
            foreach (var p in probes)
            {
                csv.WriteField(Cell(p.Volts[k]));
                csv.WriteField(Cell(p.Amps[k]));
            }
            csv.NextRecord();
        }
    }

    static string Cell(double v) => CsvNumber.Format(v);
}
