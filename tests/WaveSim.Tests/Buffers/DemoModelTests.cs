using WaveSim.Core.Buffers;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// The invented demo models in scenarios/buffers read cleanly and hold what make-demo-models.py says it wrote them from.
/// </summary>
public class DemoModelTests
{
    static BufferFile Read(string name) => BufferFileReader.Read(Repository.PathOf("scenarios", "buffers", name));

    [Fact]
    public void Both_demo_files_read_without_warnings()
    {
        BufferFile a = Read("demo33.ibs"), b = Read("demo18.ibs");
        Assert.Empty(a.Warnings);
        Assert.Empty(b.Warnings);
        Assert.Equal([BufferModelType.InputOutput, BufferModelType.Input], a.Models.Select(m => m.Type).ToArray());
        Assert.Equal([BufferModelType.Output, BufferModelType.OpenDrain], b.Models.Select(m => m.Type).ToArray());
        Assert.Equal(3.3, a.Models[0].VoltageRange!.Value.Typ);
        Assert.Equal(1.8, b.Models[0].PullupReferenceAt(Corner.Typ));
    }

    [Fact]
    public void The_ground_referred_tables_are_passive()
    {
        // A transistor to ground and a diode to ground deliver no energy (P = V·I ≥ 0; IvCurve.IsPassive states the test).
        foreach (BufferModel m in Read("demo33.ibs").Models.Concat(Read("demo18.ibs").Models))
            foreach (Corner c in m.Corners)
            {
                BufferCurves k = m.Curves(c);
                if (k.Pulldown is { } pd) Assert.True(pd.IsPassive, $"{m.Name} {c} pulldown");
                Assert.True(k.GndClamp!.IsPassive, $"{m.Name} {c} GND clamp");
            }
    }

    [Fact]
    public void The_two_equation_method_finds_the_raised_cosine_the_demo_waveforms_were_made_with()
    {
        // make-demo-models.py: Ku rises as 1/2 − 1/2 cos(π (t − 0.1 ns)/Tsw) with Tsw = 0.8 ns (typ), Kd = 1 − Ku. The files
        // round currents to 4 significant digits and volts to 0.1 mV, and the method's central difference on 32.75 ps
        // samples is off by h²/6·|V'''|·C_comp ≈ 1e-4 A, about 4e-3 of K (derived as in SwitchingCoefficientTests); 0.02 allows both.
        BufferModel m = Read("demo33.ibs").Model("demo33_io");
        SwitchingTable s = SwitchingCoefficients.For(m, Corner.Typ, rising: true);
        Assert.Equal(SwitchingMethod.TwoWaveforms, s.Method);
        static double Ku(double t) => t <= 0.1e-9 ? 0 : t >= 0.9e-9 ? 1 : 0.5 - 0.5 * Math.Cos(Math.PI * (t - 0.1e-9) / 0.8e-9);
        for (int k = 0; k < s.Time.Length; k++)
        {
            Assert.Equal(Ku(s.Time[k]), s.Ku[k], 0.02);
            Assert.Equal(1 - Ku(s.Time[k]), s.Kd[k], 0.02);
        }
    }
}
