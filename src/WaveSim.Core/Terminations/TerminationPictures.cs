using WaveSim.Core.Model;
using WaveSim.Core.Output;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Core.Terminations;

/// <summary>The overlay of the receiver waveform of every strategy that applies, with the receiver thresholds when given.</summary>
public static class TerminationPictures
{
    /// <summary>The chart for terminations.png.</summary>
    public static ChartSpec Receiver(TerminationStudyResult r)
    {
        var series = new List<Rendering.Series>();
        Scenario? any = null;
        ProbeSpec? spec = null;
        foreach (var o in r.Outcomes)
        {
            if (o.Result is not { } res) continue;
            any = res.Scenario;
            spec = res.Scenario.Probes.First(p => p.Name == r.ReceiverProbe);
            series.Add(new Rendering.Series(o.Design.Name, res.Time, res.Probe(r.ReceiverProbe).Volts));
        }
        var lines = new List<ReferenceLine>();
        if (any is not null && spec is not null && spec.Anchor == ProbeAnchor.Load && RunSummary.LoadOf(any, spec.BranchPath).Receiver is { } rx)
        {
            lines.Add(new ReferenceLine(rx.Vih, "VIH " + Quantity.Format(rx.Vih, "V", 3)));
            lines.Add(new ReferenceLine(rx.Vil, "VIL " + Quantity.Format(rx.Vil, "V", 3)));
        }
        string title = $"Terminations at {r.ReceiverProbe} (Z0 {Quantity.Format(r.Z0, "Ω", 3)})";
        return new ChartSpec(title, "Time", "s", [new ChartPanel($"Voltage at {r.ReceiverProbe}", "V", series) { ReferenceLines = lines }]);
    }
}
