using System.Globalization;
using WaveSim.Core.Lines;

namespace WaveSim.Tests.Solver.FrequencyLoss;

/// <summary>The lines the frequency-loss tests run: an FR-4 microstrip and a polyethylene coax, both matched at both ends.</summary>
internal static class LossScenarios
{
    public const string MicrostripGeometry = "{ kind: microstrip, width: 0.3 mm, height: 0.17 mm, thickness: 35 um, er: 4.3, tand: 0.02 }";
    public const string CoaxGeometry = "{ kind: coax, inner: 0.81 mm, outer: 2.95 mm, er: 2.25, tand: 0.0004 }";

    static string F(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Lossless Z0 of a geometry written as in a scenario.</summary>
    public static double Z0(string kind, Dictionary<string, double> dims) =>
        CrossSection.Compute(new CrossSectionSpec(kind, dims)).Z0;

    public static double MicrostripZ0 => Z0("microstrip", new() { ["width"] = 0.3e-3, ["height"] = 0.17e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["tand"] = 0.02 });
    public static double CoaxZ0 => Z0("coax", new() { ["inner"] = 0.81e-3, ["outer"] = 2.95e-3, ["er"] = 2.25, ["tand"] = 0.0004 });

    /// <summary>A matched line of one geometry segment, driven by a 1 V step.</summary>
    public static string Matched(string geometry, double z0, string length, string mid, string rise, string duration, string loss = "frequency", double resolution = 10) => $@"
source: {{ waveform: step, high: 1 V, rise: {rise}, delay: {rise}, resistance: {F(z0)} ohm }}
line:
  - segment:
      length: {length}
      geometry: {geometry}
      loss: {loss}
load: {{ r: {F(z0)} ohm }}
probes:
  - {{ name: src, at: source }}
  - {{ name: mid, at: {mid} }}
  - {{ name: rx, at: load }}
simulation: {{ duration: {duration}, resolution: {F(resolution)} }}
";

    public static string Microstrip(string loss = "frequency", double resolution = 10) =>
        Matched(MicrostripGeometry, MicrostripZ0, "50 cm", "25 cm", "100 ps", "6 ns", loss, resolution);

    public static string Coax(string loss = "frequency", double resolution = 10) =>
        Matched(CoaxGeometry, CoaxZ0, "10 m", "5 m", "1 ns", "110 ns", loss, resolution);
}
