using WaveSim.Core;
using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// The switching coefficients against drivers whose waveforms are known in closed form or integrated independently: the
/// two-equation method must give back the Ku(t), Kd(t) the waveforms were made with.
/// </summary>
public class SwitchingCoefficientTests
{
    const double Ru = 40, Rd = 30, Rc = 200, Rf = 50, Vcc = ResistiveDriver.Supply;

    // The invented coefficients the waveforms are made with: a linear rise of Ku and a quadratic fall of Kd (deliberately
    // not 1 − Ku, so the two are recovered independently).
    static double KuOf(double t, double T) => Math.Clamp(t / T, 0, 1);
    static double KdOf(double t, double T) => 1 - Math.Pow(Math.Clamp(t / T, 0, 1), 2);

    /// <summary>
    /// The pin voltage of a resistive driver with coefficients ku, kd and a clamp R_c into R_f to V_f, with no capacitance:
    /// Kirchhoff's current law at the pin with Ohm's law, (V_f − V)/R_f = ku (V − Vcc)/R_u + kd V/R_d + V/R_c, solved for V
    /// (derived here; ReferenceData/buffers.md §2).
    /// </summary>
    static double Pin(double ku, double kd, double vf, double ru = Ru) =>
        (vf / Rf + ku * Vcc / ru) / (1 / Rf + ku / ru + kd / Rd + 1 / Rc);

    [Fact]
    public void Two_equations_give_back_the_coefficients_of_a_resistive_driver_exactly()
    {
        const double T = 1e-9;
        double[] t = Enumerable.Range(0, 51).Select(k => k * 0.03e-9).ToArray();
        double[] low = t.Select(x => Pin(KuOf(x, T), KdOf(x, T), 0)).ToArray();
        double[] high = t.Select(x => Pin(KuOf(x, T), KdOf(x, T), Vcc)).ToArray();
        BufferModel m = ResistiveDriver.Model(Ru, Rd, Rc, rising:
        [
            ResistiveDriver.Waveform(true, Rf, 0, t, low),
            ResistiveDriver.Waveform(true, Rf, Vcc, t, high),
        ]);
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        Assert.Equal(SwitchingMethod.TwoWaveforms, s.Method);
        Assert.Equal(t, s.Time);
        for (int k = 0; k < t.Length; k++)
        {
            Assert.Equal(KuOf(t[k], T), s.Ku[k], 1e-9);
            Assert.Equal(KdOf(t[k], T), s.Kd[k], 1e-9);
        }
    }

    [Fact]
    public void The_min_corner_uses_its_own_tables_and_fixture_voltage()
    {
        const double T = 1e-9, RuMin = 60, VfMin = 3.0;
        double[] t = Enumerable.Range(0, 21).Select(k => k * 0.06e-9).ToArray();
        double[] Wave(double vf, double ru) => t.Select(x => Pin(KuOf(x, T), KdOf(x, T), vf, ru)).ToArray();
        BufferModel m = ResistiveDriver.Model(Ru, Rd, Rc, ruMin: RuMin, rising:
        [
            ResistiveDriver.Waveform(true, Rf, 0, t, Wave(0, Ru), vMin: Wave(0, RuMin)),
            ResistiveDriver.Waveform(true, Rf, Vcc, t, Wave(Vcc, Ru), vFixtureMin: VfMin, vMin: Wave(VfMin, RuMin)),
        ]);
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Min, rising: true);
        for (int k = 0; k < t.Length; k++)
        {
            Assert.Equal(KuOf(t[k], T), s.Ku[k], 1e-9);
            Assert.Equal(KdOf(t[k], T), s.Kd[k], 1e-9);
        }
    }

    [Fact]
    public void With_C_comp_and_C_fixture_the_coefficients_of_an_integrated_edge_come_back()
    {
        // The waveforms are integrated from (C_comp + C_f) dV/dt = (V_f − V)/R_f − Ku (V − Vcc)/R_u − Kd V/R_d − V/R_c with
        // classical fourth-order Runge-Kutta (Press et al., Numerical Recipes, 3rd ed., §17.1; ReferenceData/buffers.md §3) at 0.1 ps steps, Ku a raised
        // cosine over 1 ns from 0.2 ns and Kd = 1 − Ku, then sampled every 10 ps. The method's dV/dt is a central difference
        // on those samples, whose error is h²/6·|V'''| (Numerical Recipes §5.7): with |V'''| ≤ Vcc (π/1 ns)³ ≈ 1e29 V/s³ and
        // h = 10 ps that is 1.7e6 V/s, times C ≤ 4 pF, 7e-6 A; divided by the smallest current a unit of K moves through a
        // fixture (about Vcc/(R_u + R_f) ≈ 0.037 A) it is 2e-4 of K. The tolerance 2e-3 leaves a factor of ten (derived).
        const double cComp = 3e-12, cFix = 1e-12, t0 = 0.2e-9, tsw = 1e-9, h = 0.1e-12;
        static double Ku(double t) => t <= t0 ? 0 : t >= t0 + tsw ? 1 : 0.5 - 0.5 * Math.Cos(Math.PI * (t - t0) / tsw);
        double[] sampleT = Enumerable.Range(0, 201).Select(k => k * 10e-12).ToArray();
        double[] Integrate(double vf, double cf)
        {
            double Dv(double t, double v) => ((vf - v) / Rf - Ku(t) * (v - Vcc) / Ru - (1 - Ku(t)) * v / Rd - v / Rc) / (cComp + cf);
            double v = Pin(0, 1, vf), time = 0;
            var outV = new double[sampleT.Length];
            outV[0] = v;
            for (int k = 1; k < sampleT.Length; k++)
                while (time < sampleT[k] - h / 2)
                {
                    double k1 = Dv(time, v), k2 = Dv(time + h / 2, v + h / 2 * k1), k3 = Dv(time + h / 2, v + h / 2 * k2), k4 = Dv(time + h, v + h * k3);
                    v += h / 6 * (k1 + 2 * k2 + 2 * k3 + k4);
                    time += h;
                    outV[k] = v;
                }
            return outV;
        }
        BufferModel m = ResistiveDriver.Model(Ru, Rd, Rc, cComp, rising:
        [
            ResistiveDriver.Waveform(true, Rf, 0, sampleT, Integrate(0, cFix), cFixture: cFix),
            ResistiveDriver.Waveform(true, Rf, Vcc, sampleT, Integrate(Vcc, 0)),
        ]);
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        double worst = 0;
        for (int k = 0; k < sampleT.Length; k++)
        {
            worst = Math.Max(worst, Math.Abs(s.Ku[k] - Ku(sampleT[k])));
            worst = Math.Max(worst, Math.Abs(s.Kd[k] - (1 - Ku(sampleT[k]))));
        }
        Assert.True(worst < 2e-3, $"largest coefficient error {worst}");
        // Without the capacitances' current the same waveforms would give visibly wrong coefficients: the check can fail.
        BufferModel noC = ResistiveDriver.Model(Ru, Rd, Rc, 0, rising:
        [
            ResistiveDriver.Waveform(true, Rf, 0, sampleT, Integrate(0, cFix)),
            ResistiveDriver.Waveform(true, Rf, Vcc, sampleT, Integrate(Vcc, 0)),
        ]);
        SwitchingTable wrong = SwitchingCoefficients.For(noC, Corner.Typ, rising: true);
        Assert.True(Enumerable.Range(0, sampleT.Length).Max(k => Math.Abs(wrong.Ku[k] - Ku(sampleT[k]))) > 10 * 2e-3);
    }

    [Fact]
    public void The_ramp_rule_blends_over_the_20_80_time_divided_by_0_6()
    {
        // Common practice, no source (ReferenceData/buffers.md §6): the 20-80 % time covers 60 % of the swing, so the whole blend takes dt / 0.6.
        BufferModel m = ResistiveDriver.Model(Ru, Rd);
        SwitchingTable rise = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        Assert.Equal(SwitchingMethod.Ramp, rise.Method);
        Assert.Equal(0.3e-9 / 0.6, rise.Time[^1], 1e-21);
        Assert.Equal(0.5, rise.PullupAt(0.25e-9), 12);
        Assert.Equal(0.5, rise.PulldownAt(0.25e-9), 12);
        Assert.Equal(1.0, rise.PullupAt(1e-9));
        Assert.Equal(0.45e-9 / 0.6, SwitchingCoefficients.For(m, Corner.Min, rising: true).Time[^1], 1e-21);
        SwitchingTable fall = SwitchingCoefficients.For(m, Corner.Typ, rising: false);
        Assert.Equal((1.0, 0.0), (fall.PullupAt(0), fall.PulldownAt(0)));
        Assert.Equal((0.0, 1.0), (fall.PullupAt(1e-9), fall.PulldownAt(1e-9)));
        Assert.Empty(rise.Notes);
    }

    [Fact]
    public void One_waveform_per_edge_falls_back_to_the_ramp_rule_and_says_so()
    {
        double[] t = [0, 1e-9];
        BufferModel m = ResistiveDriver.Model(Ru, Rd, rising: [ResistiveDriver.Waveform(true, Rf, 0, t, [0, 1.5])]);
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        Assert.Equal(SwitchingMethod.Ramp, s.Method);
        Assert.Contains("one [Rising Waveform] (line 1); the two-equation method needs two with different V_fixture, so the [Ramp] rule is used", Assert.Single(s.Notes));
        BufferModel same = ResistiveDriver.Model(Ru, Rd, falling:
            [ResistiveDriver.Waveform(false, Rf, 0, t, [1.5, 0]), ResistiveDriver.Waveform(false, 25, 0, t, [1.0, 0])]);
        Assert.Contains("the same V_fixture", Assert.Single(SwitchingCoefficients.For(same, Corner.Typ, rising: false).Notes));
    }

    [Fact]
    public void An_open_drain_gets_its_pulldown_coefficient_from_one_waveform()
    {
        // KCL at the pin with the pulldown alone into R_f to Vcc: (Vcc − V)/R_f = Kd V/R_d, so V = Vcc/(1 + Kd R_f/R_d) (derived; ReferenceData/buffers.md §2).
        const double T = 0.8e-9;
        double[] t = Enumerable.Range(0, 41).Select(k => k * 0.025e-9).ToArray();
        double Kd(double x) => 1 - KuOf(x, T);
        double[] v = t.Select(x => Vcc / (1 + Kd(x) * Rf / Rd)).ToArray();
        BufferModel m = ResistiveDriver.Model(Ru, Rd, type: BufferModelType.OpenDrain, rising: [ResistiveDriver.Waveform(true, Rf, Vcc, t, v)]);
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        Assert.Equal(SwitchingMethod.OneSided, s.Method);
        for (int k = 0; k < t.Length; k++)
        {
            Assert.Equal(Kd(t[k]), s.Kd[k], 1e-9);
            Assert.Equal(0, s.Ku[k]);
        }
        SwitchingTable fall = SwitchingCoefficients.For(m, Corner.Typ, rising: false); // no falling waveform: the ramp rule
        Assert.Equal((0.0, 0.0), (fall.PullupAt(0), fall.PulldownAt(0)));
        Assert.Equal((0.0, 1.0), (fall.PullupAt(1e-9), fall.PulldownAt(1e-9)));
    }

    [Fact]
    public void An_input_does_not_switch()
    {
        BufferModel m = ResistiveDriver.Model(Ru, Rd) with { Type = BufferModelType.Input, Name = "rx" };
        Assert.Equal("resistive.ibs:1: [Model] rx: is an Input model; it does not switch",
            Assert.Throws<InputException>(() => SwitchingCoefficients.For(m, Corner.Typ, true)).Message);
    }

    [Fact]
    public void A_driver_without_its_tables_is_refused_not_dereferenced()
    {
        BufferModel m = ResistiveDriver.Model(Ru, Rd) with { Pullup = null };
        Assert.Equal("resistive.ibs:1: [Model] resistive: Model_type Output needs [Pullup] and [Pulldown] to switch",
            Assert.Throws<InputException>(() => SwitchingCoefficients.For(m, Corner.Typ, true)).Message);
    }

    [Fact]
    public void A_corner_the_model_lacks_is_refused()
    {
        BufferModel m = ResistiveDriver.Model(Ru, Rd, ramp: new BufferRamp(new RampRate(new CornerValue(1, null, null), new CornerValue(1e-9, null, null)),
                                                                            new RampRate(new CornerValue(1, null, null), new CornerValue(1e-9, null, null)), 50, 1));
        Assert.Contains("has no max corner", Assert.Throws<InputException>(() => SwitchingCoefficients.For(m, Corner.Max, true)).Message);
    }
}
