using System.Text.Json.Nodes;
using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Core.Output;

/// <summary>One probe's eye diagram, or why there is none.</summary>
/// <param name="Probe">The probe.</param>
/// <param name="Diagram">The folded traces and figures; null when the record is too short for one window after the skip.</param>
/// <param name="Thresholds">The receiver's thresholds at a load probe that has them, else null.</param>
/// <param name="FirstBitStartS">Instant bit 0 begins at the probe: the source's delay plus the line delay to the probe, moved to centre the eye between the crossings (<see cref="RunEyes.AlignedStart"/>), s.</param>
/// <param name="SkipS">Start-up time left out, s.</param>
/// <param name="Note">Why <paramref name="Diagram"/> is null.</param>
public sealed record ProbeEye(ProbeTrace Probe, EyeDiagram? Diagram, ReceiverThresholds? Thresholds, double FirstBitStartS, double SkipS, string? Note);

/// <summary>
/// Eye diagrams of a run whose source is a bit pattern: every probe folded at the bit time, with bit 0 placed at the
/// source's delay plus the line's delay to the probe (then centred between the measured crossings), and the first max(2 bit times, 2 × the total line delay) left out
/// so that the line has filled and the first reflections have died down (common practice, no source).
/// </summary>
public static class RunEyes
{
    /// <summary>True when the scenario's source is a bit pattern.</summary>
    public static bool Applies(Scenario s) => s.Source.Waveform == WaveformKind.Bits && s.Source.BitTime > 0;

    /// <summary>The start-up time left out: max(2 bit times, 2 × the total delay of every segment of the net), s.</summary>
    public static double SkipTime(Scenario s) => Math.Max(2 * s.Source.BitTime, 2 * TotalDelay(s.Line));

    /// <summary>An eye per probe, in the scenario's probe order; empty unless <see cref="Applies"/>.</summary>
    public static IReadOnlyList<ProbeEye> Compute(SimulationResult r)
    {
        var s = r.Scenario;
        if (!Applies(s)) return [];
        double skip = SkipTime(s);
        var list = new List<ProbeEye>();
        for (int i = 0; i < r.Probes.Count; i++)
        {
            var spec = s.Probes[i];
            var rx = spec.Anchor == ProbeAnchor.Load ? RunSummary.LoadOf(s, spec.BranchPath).Receiver : null;
            // The figure record, not the thinned output record: output_step must not move the eye's edges.
            double start = AlignedStart(r.FigureTime, r.Probes[i].FigureVolts, s.Source.Delay + DelayTo(s.Line, spec, 0), s.Source.BitTime, skip);
            try
            {
                var eye = EyeAnalysis.Compute(r.FigureTime, r.Probes[i].FigureVolts, s.Source.BitTime, start, rx?.Vih, rx?.Vil, skip);
                list.Add(new ProbeEye(r.Probes[i], eye, rx, start, skip, null));
            }
            catch (InputException ex)
            {
                list.Add(new ProbeEye(r.Probes[i], null, rx, start, skip, ex.Message));
            }
        }
        return list;
    }

    /// <summary>The eye object of summary.json: the eye figures (threshold variants with thresholds), the bits folded and the skip.</summary>
    public static JsonObject Json(ProbeEye e)
    {
        var o = e.Diagram?.Figures.ToJsonObject() ?? new JsonObject { ["eye_height_V"] = null, ["eye_width_s"] = null };
        o["bits_analysed"] = e.Diagram?.Figures.TraceCount ?? 0;
        o["first_bit_start_s"] = e.FirstBitStartS;
        o["skip_s"] = e.SkipS;
        if (e.Note is not null) o["note"] = e.Note;
        return o;
    }

    /// <summary>The eye picture of one probe as PNG bytes (thresholds drawn when known); null without a diagram.</summary>
    public static byte[]? RenderPng(string title, ProbeEye e, int width, int height)
    {
        if (e.Diagram is not { } d) return null;
        var lines = e.Thresholds is { } t
            ? new List<ReferenceLine> { new(t.Vih, "VIH " + Quantity.Format(t.Vih, "V", 3)), new(t.Vil, "VIL " + Quantity.Format(t.Vil, "V", 3)) }
            : [];
        var f = d.Figures;
        string figures = f.EyeHeightV is { } h && f.EyeWidthS is { } w
            ? $": eye {Quantity.Format(h, "V", 3)} × {(w / d.BitTimeS).ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} UI"
            : ": eye closed";
        return EyePlot.RenderPng($"{title} — {e.Probe.Name}{figures}", d.Traces.Select(x => (x.T, x.V)).ToList(), d.BitTimeS, width, height,
            new EyePlotOptions { Thresholds = lines });
    }

    /// <summary>
    /// The bit-0 start moved by the mean phase of the waveform's crossings of its mid level (after the skip), so that the
    /// eye is centred between the crossings even when the edges are slowed or delayed by loads (common practice, no source).
    /// The mean is taken on the circle (phases modulo one bit time), so crossings either side of a bit boundary average right.
    /// Without crossings the start is <paramref name="nominal"/>.
    /// </summary>
    public static double AlignedStart(double[] time, double[] volts, double nominal, double bitTime, double skip)
    {
        int from = Array.FindIndex(time, t => t >= nominal + skip);
        if (from < 0 || from >= time.Length - 1) return nominal;
        double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
        for (int k = from; k < volts.Length; k++) { lo = Math.Min(lo, volts[k]); hi = Math.Max(hi, volts[k]); }
        double mid = 0.5 * (lo + hi), sin = 0, cos = 0;
        for (int k = from + 1; k < volts.Length; k++)
        {
            if ((volts[k - 1] < mid) == (volts[k] < mid)) continue;
            double t = time[k - 1] + (mid - volts[k - 1]) / (volts[k] - volts[k - 1]) * (time[k] - time[k - 1]);
            double phase = 2 * Math.PI * (t - nominal) / bitTime;
            sin += Math.Sin(phase); cos += Math.Cos(phase);
        }
        if (sin == 0 && cos == 0) return nominal;
        return nominal + Math.Atan2(sin, cos) / (2 * Math.PI) * bitTime;
    }

    /// <summary>Sum of the delays of every segment of a line and its branches, s.</summary>
    public static double TotalDelay(IReadOnlyList<LineElement> line) => line.Sum(e => e switch
    {
        Segment s => s.Delay,
        Branch b => TotalDelay(b.Line),
        _ => 0,
    });

    /// <summary>The one-way segment delay from the driver to the probe's position, s (lumped parts add none).</summary>
    public static double DelayTo(IReadOnlyList<LineElement> line, ProbeSpec p, int depth)
    {
        bool here = depth == p.BranchPath.Count;
        double t = 0, pos = 0;
        foreach (var e in line)
        {
            switch (e)
            {
                case Segment s:
                    if (here && p.Anchor == ProbeAnchor.Source) return t;
                    if (here && p.Anchor == ProbeAnchor.Distance && p.Distance <= pos + s.Length)
                        return t + s.Delay * (p.Distance - pos) / s.Length;
                    t += s.Delay; pos += s.Length;
                    break;
                case Branch b when !here && b.Name == p.BranchPath[depth]:
                    return t + DelayTo(b.Line, p, depth + 1);
            }
        }
        return t;
    }
}
