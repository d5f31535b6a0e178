using WaveSim.Core;
using WaveSim.Core.Reports;

namespace WaveSim.Tests.Reports;

/// <summary>Two nets with hand-computed receiver behaviour, and a helper that builds their reports.</summary>
internal static class ReportScenarios
{
    // Matched lossless line: 50 ohm driver, 50 ohm line, 50 ohm load. The load sees launch = VS*Z0/(Z0+RS) = 0.5 V once
    // (Pozar eq. 2.35; H): with Vih 0.35 V, Vil 0.15 V both noise margins are 0.15 V and there is one crossing.
    // The comment line holds a web address and markup that the report must show escaped inside the scenario text only.
    public const string Matched = @"# see https://example.invalid/notes <script>alert(1)</script> & more
title: matched net
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 50 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { r: 50 ohm, receiver: { vih: 0.35 V, vil: 0.15 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 10 ns, resolution: 10 }
";

    // ReferenceData/published-checks.md §10, case B1 (H, derived; standard lattice-diagram method, Γ from Pozar eq. 2.35): 1 V step, RS = 10 ohm, Z0 = 50 ohm, open end;
    // GammaS = -2/3, GammaL = +1. Load: 1.66667, 0.55556, 1.29630, 0.80247, ..., final 1 V (here TD = 1 ns).
    // With Vih 0.75 V, Vil 0.6 V: 0 -> 1.667 (high), -> 0.556 (low), -> 1.296 (high), then 0.802, 1.132, 0.912 ... stay high:
    // 3 threshold crossings for one edge -> fail; noise margins 1 - 0.75 = 0.25 V and 0.6 - 0 = 0.6 V -> both pass.
    public const string Ringing = @"title: ringing net
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, resistance: 10 ohm }
line:
  - segment: { length: 200 mm, z0: 50 ohm, delay: 5 ns/m }
load: { receiver: { vih: 0.75 V, vil: 0.6 V } }
probes:
  - { name: drv, at: source }
  - { name: rx, at: load }
simulation: { duration: 40 ns, resolution: 10 }
";

    public static HtmlReportResult Build(string yaml)
    {
        var s = TestScenarios.Parse(yaml);
        return HtmlReport.Build(ReportInput.For(Simulate.Run(s, HtmlReport.RunOptions()), yaml));
    }
}
