using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Core.Terminations;

/// <summary>
/// The overlay of the receiver waveform of every strategy that applies, with the receiver thresholds when given. The net as
/// drawn is a pale band beneath the others; a strategy whose curve coincides with another's says so in the legend.
/// </summary>
public static class TerminationPictures
{
    /// <summary>The chart for terminations.png.</summary>
    public static ChartSpec Receiver(TerminationStudyResult r)
    {
        var series = new List<Rendering.PlotSeries>();
        Scenario? any = null;
        ProbeSpec? spec = null;
        foreach (var o in r.Outcomes)
        {
            if (o.Result is not { } res) continue;
            any = res.Scenario;
            spec = res.Scenario.Probes.First(p => p.Name == r.ReceiverProbe);
            // The net as drawn is what every strategy is judged against: a pale band beneath them, never hidden by one that
            // leaves it unchanged (a Thevenin pair equal to the user's own VTT termination).
            var look = o.Design.Kind == TerminationKind.AsDrawn ? TraceLook.Reference : TraceLook.Line;
            series.Add(new Rendering.PlotSeries(o.Design.Name, res.Time, res.Probe(r.ReceiverProbe).Volts) { Look = look });
        }
        var lines = new List<ReferenceLine>();
        if (any is not null && spec is not null && NetPaths.ReceiverAt(any, spec) is { } rx)
        {
            lines.Add(new ReferenceLine(rx.Vih, "VIH " + Quantity.Format(rx.Vih, "V", 3)));
            lines.Add(new ReferenceLine(rx.Vil, "VIL " + Quantity.Format(rx.Vil, "V", 3)));
        }
        string title = $"Terminations at {r.ReceiverProbe} (Z0 {Quantity.Format(r.Z0, "Ω", 3)})";
        return new ChartSpec(title, "Time", "s", [new ChartPanel($"Voltage at {r.ReceiverProbe}", "V", series) { ReferenceLines = lines }]);
    }
}
