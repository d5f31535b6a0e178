using WaveSim.Core;
using WaveSim.Core.Analysis;
using static WaveSim.Tests.Analysis.Waveforms;

namespace WaveSim.Tests.Analysis;

/// <summary>
/// Eye figures on an ideal NRZ PRBS7 pattern with linear edges, whose openings follow by construction:
/// a rising edge of duration tr starting at a bit boundary b crosses level L at b + L·tr, a falling edge of
/// duration tf at b + (1 − L)·tf (levels 0 V and 1 V). PRBS7 = x^7 + x^6 + 1, ITU-T Rec. O.150 (from memory).
/// </summary>
public class EyeAnalysisTests
{
    const double Ps = 1e-12, Ui = 100 * Ps, Start = 200 * Ps;

    /// <summary>127 bits of the maximal-length sequence from the 7-stage register, seed all ones.</summary>
    static int[] Prbs7()
    {
        int reg = 0x7F;
        var bits = new int[127];
        for (int i = 0; i < bits.Length; i++)
        {
            int bit = ((reg >> 6) ^ (reg >> 5)) & 1;
            reg = ((reg << 1) | bit) & 0x7F;
            bits[i] = bit;
        }
        return bits;
    }

    /// <summary>NRZ waveform: idle 0 V before the first bit, edges start at bit boundaries, last bit held.</summary>
    static (double[] T, double[] V) Nrz(int[] bits, double tr, double tf) =>
        Sample(1 * Ps, Start + (bits.Length + 2) * Ui, x =>
        {
            int k = (int)Math.Floor((x - Start) / Ui + 1e-9);
            if (k < 0) return 0;
            k = Math.Min(k, bits.Length - 1);
            double now = bits[k], before = k == 0 ? 0 : bits[k - 1];
            double since = x - (Start + k * Ui);
            double edge = now > before ? tr : tf;
            if (now == before || since >= edge) return now;
            return before + (now - before) * since / edge;
        });

    [Fact]
    public void Prbs7_generator_has_full_period_and_balance()
    {
        // A maximal-length sequence of degree 7 has 2^6 = 64 ones and 63 zeros per period
        // (Golomb, "Shift Register Sequences", balance property; from memory).
        var bits = Prbs7();
        Assert.Equal(64, bits.Sum());
    }

    [Fact]
    public void Ideal_nrz_eye_with_equal_edges_opens_one_bit_at_mid_level()
    {
        const double te = 20 * Ps;
        var (t, v) = Nrz(Prbs7(), te, te);
        var eye = EyeAnalysis.Compute(t, v, Ui, Start, vih: 0.7, vil: 0.3, skipTime: 0);
        var f = eye.Figures;

        Near(1.0, f.EyeHeightV);                        // by construction: swing 1 V at every bit centre
        Near(0.5, f.MidLevelV);
        // Every edge crosses 0.5 V at te/2 after its boundary, so the crossings coincide: width = 1 UI.
        Near(Ui, f.EyeWidthS);
        // Thresholds: opens at b + max(0.7 tr, 0.3 tf)... i.e. 0.5 UI + 14 ps, closes at 1.5 UI + min(0.3 tf, 0.3 tr)
        // = 1.5 UI + 6 ps: width = UI - 0.4 te = 92 ps.
        Near(Ui - 0.4 * te, f.EyeWidthThresholdsS);
        Near(0.3, f.EyeHeightThresholdsV);              // min(1 - 0.7, 0.3 - 0)
        Assert.Equal(f.TraceCount, eye.Traces.Count);
        Assert.Equal(128, f.TraceCount);                // windows k = 0 .. 127 fit the record
        Assert.Equal(f.TraceCount, f.OnesCount + f.ZerosCount);
        foreach (var tr in eye.Traces)
        {
            Assert.Equal(0, tr.T[0]);
            Assert.Equal(2 * Ui, tr.T[^1], 1e-20);
            Assert.Equal(tr.T.Length, tr.V.Length);
        }
        Assert.Equal(EyeFigures.FigureNames, f.ToJsonObject().Select(p => p.Key));
    }

    [Fact]
    public void Unequal_rise_and_fall_narrow_the_eye_by_construction()
    {
        const double tr = 20 * Ps, tf = 30 * Ps;
        var (t, v) = Nrz(Prbs7(), tr, tf);
        var f = EyeAnalysis.Compute(t, v, Ui, Start, 0.7, 0.3, 0).Figures;

        // Mid-level crossings at b + tr/2 (rising) and b + tf/2 (falling): width = UI - |tr - tf|/2 = 95 ps.
        Near(Ui - Math.Abs(tr - tf) / 2, f.EyeWidthS);
        // Opens at 0.5 UI + max(0.7 tr, 0.7 tf) = +21 ps; closes at 1.5 UI + min(0.3 tf, 0.3 tr) = +6 ps: 85 ps.
        Near(Ui - 21 * Ps + 6 * Ps, f.EyeWidthThresholdsS);
        Near(1.0, f.EyeHeightV);
    }

    [Fact]
    public void Thresholds_outside_the_levels_close_the_threshold_eye()
    {
        var (t, v) = Nrz(Prbs7(), 20 * Ps, 20 * Ps);
        var f = EyeAnalysis.Compute(t, v, Ui, Start, vih: 1.1, vil: 0.3, skipTime: 0).Figures;

        Assert.Equal(0, f.EyeWidthThresholdsS);         // no "1" ever reaches 1.1 V
        Near(-0.1, f.EyeHeightThresholdsV);             // 1.0 - 1.1
    }

    [Fact]
    public void Skip_time_drops_the_first_windows_and_no_thresholds_drops_their_keys()
    {
        var (t, v) = Nrz(Prbs7(), 20 * Ps, 20 * Ps);
        var f = EyeAnalysis.Compute(t, v, Ui, Start, null, null, skipTime: 10 * Ui).Figures;

        Assert.Equal(118, f.TraceCount);                // k = 10 .. 127
        Assert.Null(f.EyeWidthThresholdsS);
        Assert.Equal(["eye_height_V", "eye_width_s"], f.ToJsonObject().Select(p => p.Key));
    }

    [Fact]
    public void Bad_eye_input_gives_input_exceptions()
    {
        var (t, v) = Nrz(Prbs7(), 20 * Ps, 20 * Ps);
        Assert.Throws<InputException>(() => EyeAnalysis.Compute(t, v, 0, Start, null, null, 0));
        Assert.Throws<InputException>(() => EyeAnalysis.Compute(t, v, Ui, Start, 0.7, null, 0));
        Assert.Throws<InputException>(() => EyeAnalysis.Compute(t, v, Ui, Start, 0.3, 0.7, 0));
        Assert.Throws<InputException>(() => EyeAnalysis.Compute(t, v, Ui, Start, null, null, -1e-12));
        Assert.Throws<InputException>(() => EyeAnalysis.Compute(t, v, Ui, Start, null, null, 1e-6)); // skips everything
    }
}
