namespace WaveSim.Tests.Properties;

/// <summary>
/// Second-order convergence of the whole scheme (leapfrog cells with R and G, trapezoidal lumped parts) on a lossy net with
/// lumped parts (the delays are whole numbers of steps at every resolution here, so only the truncation error is measured): halving the step cuts the difference from a fine reference about fourfold
/// (the leapfrog and the trapezoidal rule are both second order; Taflove and Hagness 2005, ch. 2; Dahlquist 1963).
/// The order is measured as log2(e(h)/e(h/2)), as in convergence studies generally.
/// </summary>
public class ConvergenceTests
{
    static string Net(int resolution) => $@"
source: {{ waveform: gaussian, high: 1 V, width: 400 ps, delay: 0 ns, resistance: 30 ohm }}
line:
  - segment: {{ length: 100 mm, z0: 50 ohm, delay: 0.6 ns, r: 40 ohm/m }}
  - shunt: {{ r: 20 ohm, c: 2 pF }}
  - segment: {{ length: 50 mm, z0: 70 ohm, delay: 0.4 ns, r: 60 ohm/m, g: 20 mS/m }}
load: {{ r: 200 ohm, c: 1 pF }}
probes: [ {{ name: rx, at: load }}, {{ name: src, at: source }} ]
simulation: {{ duration: 6 ns, output_step: 10 ps, resolution: {resolution} }}
";

    [Fact]
    public void Halving_the_step_cuts_the_error_about_fourfold()
    {
        var reference = TestScenarios.Run(Net(256));
        double Error(int res)
        {
            var r = TestScenarios.Run(Net(res));
            double worst = 0;
            foreach (string p in new[] { "rx", "src" })
                for (int k = 0; k < r.Time.Length; k++)
                    worst = Math.Max(worst, Math.Abs(r.Probe(p).Volts[k] - reference.Probe(p).Volts[k]));
            return worst;
        }
        double e1 = Error(8), e2 = Error(16), e3 = Error(32);
        double order1 = Math.Log2(e1 / e2), order2 = Math.Log2(e2 / e3);
        Assert.True(order1 > 1.6 && order2 > 1.6, $"errors {e1:E3}, {e2:E3}, {e3:E3}: measured orders {order1:F2}, {order2:F2}");
    }
}
