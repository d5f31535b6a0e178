using WaveSim.Core;
using WaveSim.Core.Analysis;
using static WaveSim.Tests.Analysis.Waveforms;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Signal figures on synthetic waveforms whose figures are known by construction; each expected value is
/// worked out by hand in the comment beside it. Figure terms (state levels, 10 %/90 % reference levels,
/// transition duration, overshoot, post-transition undershoot, settling): IEEE Std 181-2011, "IEEE Standard
/// for Transitions, Pulses, and Related Waveforms" (from memory). Ringback, noise margins, threshold
/// crossings: common practice, no source. Tolerance 0.5 % of each value.
/// </summary>
public class SignalQualityTests
{
    const double Ns = 1e-9, Ps = 1e-12;

    // Piecewise-linear rising edge with a ring: 0 V until 1 ns, 6 V/ns up to 1.2 V at 1.2 ns, down to 0.9 V
    // at 1.5 ns, up to 1.04 V at 1.8 ns, down to 1.0 V at 2.1 ns, flat to 10 ns.
    static (double[] T, double[] V) RingingRise() => PiecewiseLinear(1 * Ps,
        (0, 0), (1 * Ns, 0), (1.2 * Ns, 1.2), (1.5 * Ns, 0.9), (1.8 * Ns, 1.04), (2.1 * Ns, 1.0), (10 * Ns, 1.0));

    [Fact]
    public void Rising_piecewise_linear_ring_gives_every_figure_by_construction()
    {
        var (t, v) = RingingRise();
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { SourceEdgeTimeS = 0.5 * Ns });

        Near(0.0, f.LowV, absoluteFloor: 1e-12);          // by construction: v(t0) = 0
        Near(1.0, f.HighV);                               // by construction: last 5 % all 1.0 V
        Assert.True(f.Rising);
        Assert.False(f.IsPulse);
        Near(20.0, f.OvershootPct);                       // (1.2 - 1) / 1 = 20 %
        Near(10.0, f.UndershootPct);                      // min after the 1.2 V peak is 0.9 V: 10 %
        Near(0.3, f.RingbackV);                           // after the 0.5 V crossing: 1.2 V peak to 0.9 V trough
        Near(0.9 / 6 * Ns - 0.1 / 6 * Ns, f.Rise1090S);   // 6 V/ns: 10 % at 1+0.1/6 ns, 90 % at 1.15 ns -> 133.3 ps
        Assert.Null(f.Fall9010S);
        Near(1 * Ns + 0.5 / 6 * Ns - 0.5 * Ns, f.Delay50S); // 50 % at 1.0833 ns minus source 0.5 ns
        // Enters the 0.95..1.05 V band on the 0.9 -> 1.04 V segment: 1.5 ns + 0.3 ns * 0.05/0.14; stays in after.
        Near(1.5 * Ns + 0.3 * Ns * 0.05 / 0.14 - 0.5 * Ns, f.SettlingS);
        Assert.True(f.Monotonic);
        Assert.Equal(1, f.ThresholdCrossings);           // one crossing of 0.5 V
        Assert.Null(f.NoiseMarginHighV);
        Assert.False(f.HasThresholds);
    }

    [Fact]
    public void Settling_counts_from_the_edge_arrival_and_delay_from_the_source_edge()
    {
        // The same record, seen at a probe 0.4 ns of line from the driver: the edge arrives at 0.5 + 0.4 ns. Settling (band entry
        // at 1.5 ns + 0.3 ns · 0.05/0.14, by construction) counts from there; delay_50_s still counts the flight from 0.5 ns.
        var (t, v) = RingingRise();
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { SourceEdgeTimeS = 0.5 * Ns, LineDelayS = 0.4 * Ns });
        Near(1.5 * Ns + 0.3 * Ns * 0.05 / 0.14 - (0.5 * Ns + 0.4 * Ns), f.SettlingS);
        Near(1 * Ns + 0.5 / 6 * Ns - 0.5 * Ns, f.Delay50S);
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, v, new SignalQualityOptions { SourceEdgeTimeS = 0, LineDelayS = -1e-9 }));
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, v, new SignalQualityOptions { LineDelayS = double.PositiveInfinity }));
    }

    [Fact]
    public void Thresholds_give_noise_margins_ringback_margin_and_band_crossings()
    {
        var (t, v) = RingingRise();
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.7, VilV = 0.3 });

        Near(0.3, f.NoiseMarginHighV);                   // 1.0 - 0.7
        Near(0.3, f.NoiseMarginLowV);                    // 0.3 - 0.0
        Near(0.2, f.MarginAfterCrossingV);               // lowest value after crossing 0.7 V is 0.9 V
        Near(0.3, f.RingbackV);                          // 1.2 -> 0.9 V after the Vih crossing
        Assert.Equal(1, f.ThresholdCrossings);
        Assert.Empty(f.NonMonotonicEdges);
        Near(1.5 * Ns + 0.3 * Ns * 0.05 / 0.14, f.SettlingS); // from t0 without a source edge
        Assert.Null(f.Delay50S);
    }

    [Fact]
    public void Falling_edge_swaps_roles_of_levels_and_thresholds()
    {
        var (t, rise) = RingingRise();
        double[] v = rise.Select(x => 1.0 - x).ToArray();   // mirror image: 1 V -> 0 V, undershoot to -0.2 V
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.7, VilV = 0.3 });

        Assert.False(f.Rising);
        Near(0.0, f.LowV, absoluteFloor: 1e-12);
        Near(1.0, f.HighV);
        Near(20.0, f.OvershootPct);                      // down to -0.2 V: 20 % of 1 V beyond the final level
        Near(10.0, f.UndershootPct);                     // back up to +0.1 V after the trough
        Near(0.9 / 6 * Ns - 0.1 / 6 * Ns, f.Fall9010S);  // same slope: 133.3 ps
        Assert.Null(f.Rise1090S);
        Near(0.3, f.RingbackV);                          // -0.2 -> +0.1 V after crossing Vil
        Near(0.2, f.MarginAfterCrossingV);               // Vil - highest value after crossing = 0.3 - 0.1
        Near(0.3, f.NoiseMarginHighV);
        Near(0.3, f.NoiseMarginLowV);
    }

    [Fact]
    public void Exponentially_decaying_ring_matches_its_closed_form_extremes()
    {
        // v = 0 until 1 ns, linear to 1 V at 1.1 ns, then 1 + A e^(-s/tau) sin(w s), s = t - 1.1 ns.
        // By construction the extremes sit where tan(w s) = w tau: peak at s* = atan(w tau)/w,
        // first trough half a period later, smaller by e^(-pi/(w tau)).
        const double A = 0.3, tau = 0.4 * Ns;
        double w = 2 * Math.PI * 2e9;
        var (t, v) = Sample(1 * Ps, 15 * Ns, x =>
            x < 1 * Ns ? 0 : x < 1.1 * Ns ? (x - 1 * Ns) / (0.1 * Ns)
            : 1 + A * Math.Exp(-(x - 1.1 * Ns) / tau) * Math.Sin(w * (x - 1.1 * Ns)));
        double sPeak = Math.Atan(w * tau) / w;
        double peak = A * Math.Exp(-sPeak / tau) * Math.Sin(w * sPeak);
        double trough = peak * Math.Exp(-Math.PI / (w * tau));

        var f = SignalQuality.Compute(t, v);

        Near(peak * 100, f.OvershootPct);               // 22.39 %
        Near(trough * 100, f.UndershootPct);            // 11.98 %
        Near(peak + trough, f.RingbackV);               // peak-to-following-trough drop
        Near(80 * Ps, f.Rise1090S);                     // 10 % at 1.01 ns, 90 % at 1.09 ns on the ramp
        Assert.True(f.Monotonic);
    }

    [Fact]
    public void Series_terminated_near_end_staircase_counts_the_shelf_in_the_rise_time()
    {
        // ReferenceData/published-checks.md §10, case B2 (common practice, no source; levels by the lattice-diagram method): with series termination the near end holds a 0.5*VS shelf for 2T.
        // Here T = 0.95 ns: 100 ps ramps at 1 ns (0 -> 0.5 V) and at 3 ns (0.5 -> 1 V).
        var (t, v) = PiecewiseLinear(1 * Ps, (0, 0), (1 * Ns, 0), (1.1 * Ns, 0.5), (3 * Ns, 0.5), (3.1 * Ns, 1.0), (10 * Ns, 1.0));
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { SourceEdgeTimeS = 0.55 * Ns });

        Near(3.08 * Ns - 1.02 * Ns, f.Rise1090S);       // 10 % at 1.02 ns, 90 % at 3.08 ns (2.06 ns)
        Near(1.1 * Ns - 0.55 * Ns, f.Delay50S);         // the shelf is the 50 % level: reached at 1.1 ns
        Near(3.09 * Ns - 0.55 * Ns, f.SettlingS);       // 0.95 V reached at 3.09 ns
        Near(0, f.OvershootPct, absoluteFloor: 1e-9);
        Near(0, f.UndershootPct, absoluteFloor: 1e-9);
        Near(0, f.RingbackV, absoluteFloor: 1e-9);
        Assert.True(f.Monotonic);                       // a shelf is not a reversal
        Assert.Equal(1, f.ThresholdCrossings);
    }

    [Fact]
    public void Lattice_diagram_ringing_gives_overshoot_crossings_and_settling()
    {
        // ReferenceData/published-checks.md §10, case B1 (H, derived; standard lattice-diagram method; Gamma from Pozar eq. 2.35): 1 V step,
        // RS = 10 ohm, Z0 = 50 ohm, open end, TD = 5 ns. Load shelf k (from T + 2kT) = 1 + (2/3)(-2/3)^k:
        // 1.66667, 0.55556, 1.29630, 0.80247, ...; here every step is a 100 ps linear ramp.
        const double T = 5 * Ns, ramp = 100 * Ps;
        double Shelf(int k) => k < 0 ? 0 : 1 + 2.0 / 3 * Math.Pow(-2.0 / 3, k);
        Assert.Equal(1.66667, Shelf(0), 5);
        Assert.Equal(0.55556, Shelf(1), 5);
        Assert.Equal(1.29630, Shelf(2), 5);
        Assert.Equal(0.80247, Shelf(3), 5);
        double V(double x)
        {
            int k = (int)Math.Floor((x - T) / (2 * T));
            double since = x - T - 2 * k * T;
            return since >= ramp ? Shelf(k) : Shelf(k - 1) + (Shelf(k) - Shelf(k - 1)) * since / ramp;
        }
        var (t, v) = Sample(10 * Ps, 30 * T, V);
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions
        {
            VihV = 1.2, VilV = 0.8, InitialLevelV = 0, FinalLevelV = 1, SourceEdgeTimeS = 0,
        });

        Near(200.0 / 3, f.OvershootPct);                // 1.66667 V: 66.67 %
        Near(400.0 / 9, f.UndershootPct);               // 0.55556 V: 44.44 %
        Near(Shelf(0) - Shelf(1), f.RingbackV);         // 1.11111 V
        Near(Shelf(1) - 1.2, f.MarginAfterCrossingV);   // -0.644 V: ringback re-enters the band
        Near(ramp * (0.9 - 0.1) / Shelf(0), f.Rise1090S); // 10 % and 90 % both on the first ramp: 48 ps
        // Crossings of the 0.8/1.2 V band: up to 1.667 (1), down to 0.556 (2), up to 1.296 (3); 0.802 V and
        // every later shelf stay inside the band.
        Assert.Equal(3, f.ThresholdCrossings);
        // |Shelf(k) - 1| = (2/3)^(k+1): first within 5 % for k = 7 (0.0390); that ramp starts at T + 14T and
        // leaves the band (from Shelf(6) = 1.0585) at 1.05 V.
        double enter = 15 * T + ramp * (Shelf(6) - 1.05) / (Shelf(6) - Shelf(7));
        Near(enter, f.SettlingS);
        Assert.Empty(f.NonMonotonicEdges);

        // Without thresholds the 50 % level is crossed once: the lowest shelf after the first (0.556 V) stays above it.
        var plain = SignalQuality.Compute(t, v, new SignalQualityOptions { InitialLevelV = 0, FinalLevelV = 1 });
        Assert.Equal(1, plain.ThresholdCrossings);
    }

    [Fact]
    public void Ringing_waveform_crosses_the_threshold_band_a_known_number_of_times()
    {
        // By construction: 0 -> 1.5 -> 0.45 -> 1.2 -> 0.2 -> 1.0 V.
        var (t, v) = PiecewiseLinear(1 * Ps, (0, 0), (1 * Ns, 0), (1.2 * Ns, 1.5), (1.5 * Ns, 0.45),
            (1.8 * Ns, 1.2), (2.1 * Ns, 0.2), (2.4 * Ns, 1.0), (10 * Ns, 1.0));

        // 50 % level (0.5 V) is crossed by all five segments.
        Assert.Equal(5, SignalQuality.Compute(t, v).ThresholdCrossings);
        // Band 0.3..0.7 V: 0 -> 1.5 (1); 0.45 stays inside; 1.2 -> 0.2 (2); 0.2 -> 1.0 (3).
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.7, VilV = 0.3 });
        Assert.Equal(3, f.ThresholdCrossings);
        Assert.True(f.Monotonic);                       // each straight edge is monotonic
    }

    [Fact]
    public void Dip_inside_the_threshold_band_is_listed_as_a_non_monotonic_edge()
    {
        // By construction: 0 -> 0.6 V at 1.06 ns, back to 0.5 V at 1.1 ns, up to 1 V at 1.2 ns.
        var (t, v) = PiecewiseLinear(1 * Ps, (0, 0), (1 * Ns, 0), (1.06 * Ns, 0.6), (1.1 * Ns, 0.5), (1.2 * Ns, 1.0), (10 * Ns, 1.0));
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.7, VilV = 0.3 });

        Assert.False(f.Monotonic);                      // reversal 0.1 V = 10 % of swing > 1 % tolerance
        var edge = Assert.Single(f.NonMonotonicEdges);
        Assert.True(edge.Rising);
        Near(0.1, edge.ReversalV);
        Near(1 * Ns + 0.06 * Ns * 0.3 / 0.6, edge.StartS); // Vil crossing at 1.03 ns
        Near(1.1 * Ns + 0.1 * Ns * 0.2 / 0.5, edge.EndS);  // Vih crossing at 1.14 ns
    }

    [Fact]
    public void Pulse_figures_describe_the_first_edge_and_its_plateau()
    {
        // By construction: 0 V, 10 V/ns to 1.1 V at 1.11 ns, down to the 1.0 V plateau at 1.2 ns, plateau
        // until 5 ns, back to 0 V at 5.1 ns.
        var (t, v) = PiecewiseLinear(1 * Ps, (0, 0), (1 * Ns, 0), (1.11 * Ns, 1.1), (1.2 * Ns, 1.0), (5 * Ns, 1.0), (5.1 * Ns, 0), (10 * Ns, 0));
        var f = SignalQuality.Compute(t, v);

        Assert.True(f.IsPulse);
        Near(1.0, f.HighV);                             // plateau, not the 0 V end of the record
        Near(0.0, f.LowV, absoluteFloor: 1e-12);
        Near(80 * Ps, f.Rise1090S);                     // 1.01 ns to 1.09 ns
        Assert.Null(f.Fall9010S);                       // only the first edge is measured
        Near(10.0, f.OvershootPct);
        Near(0, f.UndershootPct, absoluteFloor: 1e-9);  // the second edge is not an undershoot
        Near(0.1, f.RingbackV);                         // 1.1 -> 1.0 V
        Near(1.11 * Ns + 0.09 * Ns * 0.5, f.SettlingS); // 1.05 V on the 1.1 -> 1.0 V segment
        Assert.Equal(2, f.ThresholdCrossings);          // up and down through 0.5 V
        Assert.True(f.Monotonic);                       // both edges
    }

    [Fact]
    public void Negative_going_pulse_uses_its_low_plateau()
    {
        // By construction: 3.3 V idle, 33 V/ns down to 0 V at 1.1 ns, low until 4 ns, back to 3.3 V at 4.1 ns.
        var (t, v) = PiecewiseLinear(1 * Ps, (0, 3.3), (1 * Ns, 3.3), (1.1 * Ns, 0), (4 * Ns, 0), (4.1 * Ns, 3.3), (8 * Ns, 3.3));
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 2.0, VilV = 0.8 });

        Assert.True(f.IsPulse);
        Assert.False(f.Rising);
        Near(0.0, f.LowV, absoluteFloor: 1e-9);
        Near(3.3, f.HighV);
        Near(80 * Ps, f.Fall9010S);                     // 90 % to 10 % of a 100 ps linear fall
        Near(0.8, f.NoiseMarginLowV);                   // 0.8 - 0
        Near(1.3, f.NoiseMarginHighV);                  // 3.3 - 2.0
        Near(0.8, f.MarginAfterCrossingV);              // Vil - highest value after the trough (0 V)
        Assert.Equal(2, f.ThresholdCrossings);
        Assert.Contains("\"low_V\"", f.ToJsonObject().ToJsonString());
    }

    [Fact]
    public void Flat_waveform_gives_no_edge_figures_and_no_exception()
    {
        var (t, v) = Sample(1 * Ps, 1 * Ns, _ => 0.8);
        var f = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 2.0, VilV = 0.8, SourceEdgeTimeS = 0 });

        Near(0.8, f.LowV);
        Near(0.8, f.HighV);
        Assert.Null(f.Rising);
        Assert.Null(f.OvershootPct);
        Assert.Null(f.UndershootPct);
        Assert.Null(f.RingbackV);
        Assert.Null(f.Rise1090S);
        Assert.Null(f.Fall9010S);
        Assert.Null(f.Delay50S);
        Assert.Null(f.SettlingS);
        Assert.Null(f.Monotonic);
        Assert.Null(f.NoiseMarginHighV);
        Assert.Equal(0, f.ThresholdCrossings);
        Assert.Equal(0, SignalQuality.Compute(t, v).ThresholdCrossings);
    }

    [Fact]
    public void Output_keys_are_the_figure_names()
    {
        var (t, v) = RingingRise();
        var with = SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.7, VilV = 0.3 }).ToJsonObject();
        var without = SignalQuality.Compute(t, v).ToJsonObject();

        Assert.Equal(SignalFigures.FigureNames, with.Select(p => p.Key));
        Assert.Equal(SignalFigures.FigureNames.Take(13), without.Select(p => p.Key));
        Assert.Equal(15, SignalFigures.FigureNames.Count);
        Assert.Null(without["delay_50_s"]);
        Assert.Equal(1, (int)with["threshold_crossings"]!);
        Assert.True((bool)with["monotonic"]!);
        var f = SignalQuality.Compute(t, v);
        Assert.Equal(1.0, f.GetNumber("monotonic"));
        Assert.Throws<InputException>(() => f.GetNumber("rise_time"));
    }

    [Fact]
    public void Bad_input_gives_input_exceptions()
    {
        double[] t = [0, 1e-12, 2e-12], v = [0, 1, 1];
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, [0, 1]));
        Assert.Throws<InputException>(() => SignalQuality.Compute([0, 1e-12, 1e-12], v));
        Assert.Throws<InputException>(() => SignalQuality.Compute([0], [0]));
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, v, new SignalQualityOptions { VihV = 0.3, VilV = 0.7 }));
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, v, new SignalQualityOptions { SettleBand = 0.7 }));
        Assert.Throws<InputException>(() => SignalQuality.Compute(t, [0, double.NaN, 1]));
    }
}
