using System.Globalization;
using System.Text;
using WaveSim.Core.Units;

namespace WaveSim.Core.Measurements;

/// <summary>Writes the line found by <see cref="TdrAnalysis"/> as a scenario that <c>wavesim run</c> accepts.</summary>
/// <remarks>
/// Segments get their length from the profile and a delay of length / v; lumped elements sit between segments at their
/// distance (a segment they fall inside is split there; one within a rise time of a segment end is moved onto it, so no
/// sliver of line forces a tiny time step), the two parts of a pair one after the other in the order found. The source is the
/// reflectometer that took the trace, probed at its port; the far end is open or shorted when the profile ended so, a C or an
/// L to ground when the end was recognised as capacitive or inductive, otherwise terminated in the last segment's impedance.
/// </remarks>
public static class TdrScenarioWriter
{
    /// <summary>The scenario YAML text.</summary>
    /// <param name="result">The analysis.</param>
    /// <param name="title">The scenario's title.</param>
    /// <returns>YAML text.</returns>
    public static string Yaml(TdrResult result, string title)
    {
        ArgumentNullException.ThrowIfNull(result);
        double v = result.VelocityMps;
        double snap = v * result.RiseS / 2;
        var items = new List<string>();
        var lumped = result.Lumped.OrderBy(l => l.AtM).ToList();
        int li = 0;
        foreach (var seg in result.Segments)
        {
            double start = seg.StartM;
            while (li < lumped.Count && lumped[li].AtM < seg.EndM - snap)
            {
                double at = Math.Max(start, lumped[li].AtM);
                if (at - start > snap)
                {
                    items.Add(Segment(at - start, seg.Z0Ohm, v));
                    start = at;
                }
                items.Add(Element(lumped[li]));
                li++;
            }
            if (seg.EndM - start > 0)
                items.Add(Segment(seg.EndM - start, seg.Z0Ohm, v));
        }
        for (; li < lumped.Count; li++)
            items.Add(Element(lumped[li]));   // past the last segment's end: at its end
        if (!items.Any(s => s.Contains("segment", StringComparison.Ordinal)))
            throw new InputException("the trace shows no stretch of line to write as a scenario");

        string load = result.End switch
        {
            TdrEnd.Open => "open",
            TdrEnd.Short => "short",
            TdrEnd.Capacitive => $"{{ c: {Num(result.EndValue!.Value)} F }}",
            TdrEnd.Inductive => $"{{ l: {Num(result.EndValue!.Value)} H }}",
            _ => $"{{ r: {Num(result.Segments[^1].Z0Ohm)} ohm }}",
        };
        double window = result.TimeS[^1] + 2 * result.RiseS;
        double delay = Reflectometer.LeadRises * result.RiseS;
        var sb = new StringBuilder();
        sb.Append("# Line found by wavesim tdr (layer peeling): segments of one impedance and lumped elements.\n");
        sb.Append("# Distances assume a velocity of ").Append(Quantity.Format(v, "m/s")).Append("; the source is the reflectometer.\n");
        sb.Append("title: ").Append(Quote(title)).Append('\n');
        sb.Append("source: { waveform: step, low: 0 V, high: ").Append(Num(Reflectometer.OpenCircuitV * result.IncidentV))
          .Append(" V, rise: ").Append(Num(result.RiseS)).Append(" s, delay: ").Append(Num(delay))
          .Append(" s, resistance: ").Append(Num(result.ReferenceOhm)).Append(" ohm }\n");
        sb.Append("line:\n");
        foreach (string item in items)
            sb.Append("  - ").Append(item).Append('\n');
        sb.Append("load: ").Append(load).Append('\n');
        sb.Append("probes:\n  - { name: ").Append(Reflectometer.PortProbe).Append(", at: source }\n");
        sb.Append("simulation: { duration: ").Append(Num(window + delay)).Append(" s }\n");
        return sb.ToString();
    }

    static string Segment(double length, double z0, double v) =>
        $"segment: {{ length: {Num(length)} m, z0: {Num(z0)} ohm, delay: {Num(length / v)} s }}";

    static string Element(TdrLumped l) => l.Kind == LumpedKind.ShuntCapacitance
        ? $"shunt: {{ c: {Num(l.Value)} F }}"
        : $"series: {{ l: {Num(l.Value)} H }}";

    static string Num(double x) => x.ToString("G6", CultureInfo.InvariantCulture);

    static string Quote(string s) => "\"" + s.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\"";
}
