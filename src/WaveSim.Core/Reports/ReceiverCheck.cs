using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Output;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Reports;

/// <summary>
/// The pass/fail judgement of one probe against its receiver's thresholds. Null members are "not judged"
/// (no thresholds at this probe, or the figure does not apply).
/// </summary>
/// <param name="Probe">The probe's name.</param>
/// <param name="Thresholds">The receiver thresholds at the probe's load, or null (then nothing is judged).</param>
/// <param name="MarginHighOk">Settled high level minus Vih is above 0 (not for bit patterns).</param>
/// <param name="MarginLowOk">Vil minus settled low level is above 0 (not for bit patterns).</param>
/// <param name="ExpectedCrossings">Edges of the source that reach the probe inside the record (not for bit patterns).</param>
/// <param name="CrossingsOk">The threshold crossings equal <paramref name="ExpectedCrossings"/>.</param>
/// <param name="EyeOk">Bit pattern: the eye opens beyond both thresholds (height and width against them above 0).</param>
public sealed record ReceiverCheck(string Probe, ReceiverThresholds? Thresholds, bool? MarginHighOk, bool? MarginLowOk,
    int? ExpectedCrossings, bool? CrossingsOk, bool? EyeOk)
{
    /// <summary>True when every judged item passes, false when one fails, null when nothing is judged.</summary>
    public bool? Pass
    {
        get
        {
            bool?[] items = [MarginHighOk, MarginLowOk, CrossingsOk, EyeOk];
            if (Thresholds is null || items.All(x => x is null)) return null;
            return items.All(x => x is not false);
        }
    }

    /// <summary>The rule in words, as printed in the report (common practice, no source).</summary>
    public const string Rule =
        "A probe at a load with receiver thresholds (Vih, Vil) passes when both noise margins are above zero " +
        "(settled high level above Vih, settled low level below Vil) and the waveform crosses between the regions " +
        "at or below Vil and at or above Vih exactly as often as the source has edges that reach the probe within the record " +
        "(once for a single step; a ringing net that re-crosses a threshold fails). For a bit-pattern source the eye replaces both checks " +
        "(a bit stream has no single settled level): the eye's height and width measured against the thresholds must both be above zero. " +
        "Probes without thresholds are not judged. This is a rule of thumb, not a standard.";

    /// <summary>Judges every probe of a run (in probe order); <paramref name="eyes"/> from <see cref="RunEyes.Compute"/>.</summary>
    public static IReadOnlyList<ReceiverCheck> Judge(SimulationResult r, IReadOnlyList<(ProbeTrace Probe, SignalFigures Figures)> figures, IReadOnlyList<ProbeEye> eyes)
    {
        var s = r.Scenario;
        bool bits = RunEyes.Applies(s);
        var list = new List<ReceiverCheck>();
        for (int i = 0; i < figures.Count; i++)
        {
            var (p, f) = figures[i];
            var spec = s.Probes[i];
            var rx = spec.Anchor == ProbeAnchor.Load ? RunSummary.LoadOf(s, spec.BranchPath).Receiver : null;
            if (rx is null) { list.Add(new ReceiverCheck(p.Name, null, null, null, null, null, null)); continue; }
            bool? high = f.NoiseMarginHighV is { } h ? h > 0 : null;
            bool? low = f.NoiseMarginLowV is { } l ? l > 0 : null;
            if (bits)
            {
                var e = eyes.FirstOrDefault(x => x.Probe.Name == p.Name)?.Diagram?.Figures;
                bool? eyeOk = e is null ? null : e.EyeHeightThresholdsV is { } eh && e.EyeWidthThresholdsS is { } ew && eh > 0 && ew > 0;
                // A bit stream has no single settled high and low: the eye against the thresholds holds both margins.
                list.Add(new ReceiverCheck(p.Name, rx, null, null, null, null, eyeOk));
            }
            else
            {
                int expected = ExpectedEdges(r, RunEyes.DelayTo(s.Line, spec, 0));
                list.Add(new ReceiverCheck(p.Name, rx, high, low, expected, f.ThresholdCrossings == expected, null));
            }
        }
        return list;
    }

    /// <summary>
    /// Edges of the source's open-circuit waveform that reach a probe <paramref name="delay"/> seconds down the line within the
    /// record: crossings of the source's mid level by the source sampled at (t − delay) on the output grid.
    /// </summary>
    public static int ExpectedEdges(SimulationResult r, double delay)
    {
        var src = r.Scenario.Source;
        double lo = src.Low, hi = src.High;
        if (src.Waveform == WaveformKind.Table && src.TableVolts.Length > 0) { lo = src.TableVolts.Min(); hi = src.TableVolts.Max(); }
        double[] v = r.Time.Select(t => src.Value(Math.Max(0, t - delay))).ToArray();
        return WaveformMath.CountLevelCrossings(v, 0.5 * (lo + hi));
    }
}
