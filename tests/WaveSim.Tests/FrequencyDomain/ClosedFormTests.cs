using System.Numerics;
using WaveSim.Core.FrequencyDomain;

namespace WaveSim.Tests.FrequencyDomain;

/// <summary>
/// The frequency-domain solution against closed forms of uniform lines: Pozar, Microwave Engineering, 4th ed. 2012, eq. 2.35
/// (Γ = (ZL − Z0)/(ZL + Z0)), eqs. 2.44-2.45 (shorted and open lossless lines) and the quarter-wave transformer of section 2.5
/// (equation numbers from memory); the distortionless line (Pozar section 2.7; ReferenceData/published-checks.md §7).
/// </summary>
public class ClosedFormTests
{
    static string Net(string sourceR, string load, string segment = "{ length: 1 m, z0: 50 ohm, delay: 5 ns }") => $@"
source: {{ waveform: step, high: 1 V, rise: 100 ps, resistance: {sourceR} }}
line:
  - segment: {segment}
load: {load}
probes:
  - {{ name: src, at: source }}
  - {{ name: mid, at: 0.3 m }}
  - {{ name: rx, at: load }}
simulation: {{ duration: 20 ns }}
";

    static void Near(Complex expected, Complex actual, double tol) =>
        Assert.True((expected - actual).Magnitude <= tol * Math.Max(1, expected.Magnitude), $"expected {expected}, got {actual}");

    [Theory]
    [InlineData(1e6)]
    [InlineData(37e6)]
    [InlineData(0.49e9)]
    [InlineData(3.3e9)]
    public void Matched_lossless_line_delivers_half_the_source_delayed(double f)
    {
        // Rs = Z0 = RL: Γ = 0 at both ends (Pozar eq. 2.35), so V_load = 0.5·e^(−jωT), Zin = Z0, and 0.3 of the way along 0.5·e^(−jω0.3T).
        var s = TestScenarios.Parse(Net("50 ohm", "{ r: 50 ohm }"));
        var pt = FrequencyDomainSolver.At(s, f);
        double w = 2 * Math.PI * f, t = 5e-9;
        Near(0.5 * Complex.Exp(new Complex(0, -w * t)), pt.Load, 1e-9);
        Near(0.5 * Complex.Exp(new Complex(0, -w * t)), pt.Volts[2], 1e-9);
        Near(0.5 * Complex.Exp(new Complex(0, -w * 0.3 * t)), pt.Volts[1], 1e-9);
        Near(0.5, pt.Volts[0], 1e-9);
        Near(50, pt.Zin, 1e-9);
        Near(0.01 * Complex.Exp(new Complex(0, -w * 0.3 * t)), pt.Amps[1], 1e-9); // forward wave only: I = V/Z0
    }

    [Theory]
    [InlineData(10e6)]
    [InlineData(37e6)]
    [InlineData(130e6)]
    [InlineData(1.234e9)]
    public void Shorted_and_open_lossless_lines_have_reactive_input_impedance(double f)
    {
        // Pozar eqs. 2.44-2.45 (from memory): shorted Zin = j·Z0·tan(βl), open Zin = −j·Z0·cot(βl), βl = ωT.
        double bl = 2 * Math.PI * f * 5e-9;
        var shorted = FrequencyDomainSolver.At(TestScenarios.Parse(Net("10 ohm", "short")), f);
        var open = FrequencyDomainSolver.At(TestScenarios.Parse(Net("10 ohm", "open")), f);
        Near(new Complex(0, 50 * Math.Tan(bl)), shorted.Zin, 1e-9);
        Near(new Complex(0, -50 / Math.Tan(bl)), open.Zin, 1e-9);
        Assert.Equal(0, shorted.Load.Magnitude, 1e-9);
    }

    [Theory]
    [InlineData("{ r: 100 ohm }", 25)]
    [InlineData("{ r: 25 ohm }", 100)]
    [InlineData("{ r: 10 ohm }", 250)]
    public void Quarter_wave_line_transforms_the_load_to_z0_squared_over_zl(string load, double zin)
    {
        // Quarter-wave transformer (Pozar section 2.5): at l = λ/4, Zin = Z0²/ZL. T = 5 ns is a quarter period at 50 MHz.
        var pt = FrequencyDomainSolver.At(TestScenarios.Parse(Net("50 ohm", load)), 50e6);
        Near(zin, pt.Zin, 1e-9);
    }

    [Theory]
    [InlineData(1e5)]
    [InlineData(1e7)]
    [InlineData(1e8)]
    [InlineData(1e9)]
    [InlineData(1e10)]
    public void Distortionless_line_attenuates_every_frequency_alike(double f)
    {
        // ReferenceData/published-checks.md §7 (Pozar Sec. 2.7): R/L = G/C gives α = R/Z0, β = ω√(LC), Zc = √(L/C) real and flat. L = 250 nH/m,
        // C = 100 pF/m, R = 5 ohm/m, G = 2 mS/m, 10 m, both ends matched: |H| = 0.5·e^-1 = 0.18394 flat, phase −ωT with T = 50 ns.
        var s = TestScenarios.Parse(Net("50 ohm", "{ r: 50 ohm }", "{ length: 10 m, l: 250 nH/m, c: 100 pF/m, r: 5 ohm/m, g: 2 mS/m }"));
        var pt = FrequencyDomainSolver.At(s, f);
        Assert.Equal(0.5 * Math.Exp(-1), pt.Load.Magnitude, 1e-9);
        Assert.Equal(0.18394, pt.Load.Magnitude, 5);
        Near(0.5 * Math.Exp(-1) * Complex.Exp(new Complex(0, -2 * Math.PI * f * 50e-9)), pt.Load, 1e-9);
        Near(50, pt.Zin, 1e-9);
    }

    [Theory]
    [InlineData(1e9)]
    [InlineData(2e10)]
    public void Very_long_lossy_line_looks_like_its_characteristic_impedance_without_overflow(double f)
    {
        // With e^(−2γl) far below rounding the reflected wave is gone and Zin = Zc = √((R+jωL)/(G+jωC)) (Pozar section 2.7);
        // here Re(γl) is in the thousands, where cosh(γl) would overflow. The far-end voltage underflows to (near) zero.
        var s = TestScenarios.Parse(Net("50 ohm", "open", "{ length: 100 m, l: 250 nH/m, c: 100 pF/m, r: 20 ohm/m, g: 1 S/m }"));
        var pt = FrequencyDomainSolver.At(s, f);
        var jw = new Complex(0, 2 * Math.PI * f);
        Near(Complex.Sqrt((20 + jw * 250e-9) / (1 + jw * 100e-12)), pt.Zin, 1e-9);
        Assert.True(pt.Load.Magnitude < 1e-300, $"far end {pt.Load}");
        Assert.All(pt.Volts.Concat(pt.Amps), v => Assert.True(double.IsFinite(v.Real) && double.IsFinite(v.Imaginary)));
    }
}
