using WaveSim.Core;
using WaveSim.Core.Coupled;
using WaveSim.Core.Model;

namespace WaveSim.Tests.Coupled;

/// <summary>Builders of coupled scenarios for the tests (per-inch values converted to SI).</summary>
internal static class CoupledNets
{
    public const double Inch = 0.0254;
    public const double NanoHenryPerInch = 1e-9 / Inch, PicoFaradPerInch = 1e-12 / Inch;

    public static ConductorMatrix M(params double[][] rows) => new(rows);

    public static ConductorMatrix Scaled(ConductorMatrix m, double k) =>
        new(Enumerable.Range(0, m.Size).Select(i => Enumerable.Range(0, m.Size).Select(j => m[i, j] * k).ToArray()).ToArray());

    public static SourceSpec Step(double high = 1, double rise = 200e-12, double delay = 0.5e-9, double r = 50) =>
        new() { Waveform = WaveformKind.Step, High = high, Rise = rise, Delay = delay, Resistance = r };

    /// <summary>A source branch on conductor <paramref name="at"/> to the reference.</summary>
    public static EndBranch Driver(int at, SourceSpec spec, bool invert = false) => new(at, null, spec.Resistance, Source: new CoupledSource(spec, invert));

    public static EndBranch Resistor(int at, double r, int? to = null) => new(at, to, r);

    /// <summary>Probes near and far on every conductor: "c0_near", "c0_far", …</summary>
    public static List<CoupledProbe> EndProbes(int n) =>
        Enumerable.Range(0, n).SelectMany(k => new[]
        {
            new CoupledProbe($"c{k}_near", k, null, CoupledAnchor.Near),
            new CoupledProbe($"c{k}_far", k, null, CoupledAnchor.Far),
        }).ToList();

    public static CoupledScenario Net(IReadOnlyList<CoupledSection> sections, IReadOnlyList<EndBranch> near, IReadOnlyList<EndBranch> far,
        double duration, IReadOnlyList<CoupledProbe>? probes = null, double? outputStep = null, double resolution = 20)
    {
        int n = sections[0].L.Size;
        return new CoupledScenario
        {
            Conductors = Enumerable.Range(0, n).Select(k => $"c{k}").ToList(),
            Sections = sections, Near = near, Far = far,
            Probes = probes ?? EndProbes(n),
            Simulation = new SimulationSpec(duration, outputStep, resolution),
        };
    }

    public static CoupledResult Solve(CoupledScenario s, bool energy = false) =>
        CoupledRun.Solve(s, new CoupledRunOptions { TrackEnergy = energy }, CancellationToken.None);

    /// <summary>Linear interpolation of a probe record at <paramref name="t"/>.</summary>
    public static double At(double[] time, double[] v, double t)
    {
        int i = Array.BinarySearch(time, t);
        if (i >= 0) return v[i];
        i = ~i;
        if (i <= 0) return v[0];
        if (i >= time.Length) return v[^1];
        double f = (t - time[i - 1]) / (time[i] - time[i - 1]);
        return v[i - 1] + f * (v[i] - v[i - 1]);
    }
}
