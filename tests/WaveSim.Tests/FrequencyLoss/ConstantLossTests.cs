using System.Security.Cryptography;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Tests.FrequencyLoss;

/// <summary>Segments without frequency-dependent loss keys run exactly as before it existed.</summary>
public class ConstantLossTests
{
    /// <summary>
    /// The constant G this geometry segment carried before a tand became a wideband dielectric: ωC·tan δ_eff at 0.35/t_r
    /// (t_r = 150 ps). It is now written as an explicit <c>g</c>, the one way to ask for a constant G, with the same double,
    /// so the constant-R/G arithmetic is still checked bit for bit.
    /// </summary>
    static readonly double FormerG = WaveSim.Core.Lines.CrossSection.Compute(new WaveSim.Core.Lines.CrossSectionSpec("microstrip",
        new Dictionary<string, double> { ["width"] = 0.3e-3, ["height"] = 0.17e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["tand"] = 0.02 })).ConductanceAt(0.35 / 150e-12);

    static readonly string Yaml = @"
source: { waveform: pulse, low: 0.1 V, high: 1.1 V, rise: 150 ps, width: 1 ns, delay: 0.3 ns, resistance: 22 ohm }
line:
  - segment: { length: 0.2 m, z0: 50 ohm, delay: 6.7 ns/m, r: 20 ohm/m, g: 5 mS/m }
  - shunt: { c: 2 pF }
  - segment:
      length: 80 mm
      geometry: { kind: microstrip, width: 0.3 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02 }
      g: G_FORMER S/m
  - segment: { length: 0.15 m, l: 300 nH/m, c: 110 pF/m, r: 30 ohm/m }
load: { r: 75 ohm, c: 2 pF }
probes:
  - { name: src, at: source }
  - { name: mid, at: 0.25 m }
  - { name: rx, at: load }
simulation: { duration: 12 ns, resolution: 12 }
".Replace("G_FORMER", FormerG.ToString("R", System.Globalization.CultureInfo.InvariantCulture));

    /// <summary>SHA-256 of every probe's volts and amps (IEEE doubles, little-endian). First taken on the solver as it was before
    /// frequency-dependent loss was added (commit ae11625, hash 6B2DC151…), and matched by every later commit until the kernel
    /// deliberately moved to one fused multiply-add per update; renewed then, on the commit that made that change alone.
    /// A deliberate change to the constant-R/G arithmetic must renew it the same way.</summary>
    const string ReferenceHash = "756A7EFC7C4880BA01C8240C4C42CE9E090BDA0FE51B5A1049AF0F53E159A8DB";

    static string Hash(SimulationResult r)
    {
        using var sha = SHA256.Create();
        var bytes = new List<byte>();
        foreach (var p in r.Probes)
        {
            foreach (double v in p.Volts) bytes.AddRange(BitConverter.GetBytes(v));
            foreach (double a in p.Amps) bytes.AddRange(BitConverter.GetBytes(a));
        }
        return Convert.ToHexString(sha.ComputeHash(bytes.ToArray()));
    }

    [Fact]
    public void Constant_R_and_G_results_are_bit_identical_to_the_solver_before_frequency_loss()
    {
        // Regression against the project's own earlier output (no outside source: the requirement is identity).
        var r = TestScenarios.Run(Yaml);
        string h = Hash(r);
        Console.WriteLine("constant-loss hash " + h);
        Assert.Equal(ReferenceHash, h);
    }

    [Fact]
    public void Without_loss_keys_segments_keep_their_constant_R_and_G()
    {
        // R_dc = ρ/(w·t) with annealed copper 1.7241e-8 ohm·m (IACS; CHECKS.md section 4); G = the explicit g, bit for bit.
        var s = TestScenarios.Parse(Yaml);
        var segs = s.Line.OfType<Segment>().ToArray();
        Assert.All(segs, x => Assert.Null(x.Loss));
        Assert.All(segs, x => Assert.Equal(x.Delay, x.FrontDelay));
        Assert.Equal(20, segs[0].R);
        Assert.Equal(5e-3, segs[0].G);
        Assert.Equal(1.7241e-8 / (0.3e-3 * 35e-6), segs[1].R, 1e-9);
        Assert.Equal(FormerG, segs[1].G);
        Assert.Equal(30, segs[2].R);
        Assert.Equal(0, segs[2].G);
        // An explicit 'loss: constant' beside a geometry is the same as leaving it out.
        var same = TestScenarios.Parse(Yaml.Replace("tand: 0.02 }", "tand: 0.02 }\n      loss: constant"));
        var again = (Segment)same.Line[2];
        Assert.Null(again.Loss);
        Assert.Equal((segs[1].R, segs[1].L, segs[1].G, segs[1].C), (again.R, again.L, again.G, again.C));
    }
}
