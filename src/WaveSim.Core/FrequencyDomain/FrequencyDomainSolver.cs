using System.Numerics;
using WaveSim.Core.Model;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>
/// The scenario solved in the frequency domain: every segment as its exact distributed two-port, lumped parts as impedances,
/// one small complex linear system per frequency. Independent of the time-domain leapfrog: no grid, no time step.
/// </summary>
public static class FrequencyDomainSolver
{
    /// <summary>The small-signal solution at <paramref name="frequency"/>, Hz (≥ 0), per volt of the driver's open-circuit voltage.</summary>
    /// <exception cref="InputException">The frequency is negative or not finite.</exception>
    /// <exception cref="NumericalException">The network has no solution at this frequency.</exception>
    public static FrequencyPoint At(Scenario scenario, double frequency)
    {
        if (!(frequency >= 0) || !double.IsFinite(frequency))
            throw new InputException($"frequency must be a finite value of 0 Hz or more (got {frequency})");
        var circuit = CircuitBuilder.Build(scenario, scenario.Probes);
        return At(circuit, new Complex(0, 2 * Math.PI * frequency), frequency);
    }

    internal static FrequencyPoint At(Circuit c, Complex s, double frequency)
    {
        var x = new NodalSolver(c).Solve(s, 1, dc: false)
            ?? throw new NumericalException($"the network has no solution at {Units.Quantity.Format(frequency, "Hz")} (an ideal loop with no impedance?)");
        var v = new Complex[c.Probes.Count];
        var i = new Complex[c.Probes.Count];
        for (int p = 0; p < v.Length; p++) (v[p], i[p]) = Read(c, c.Probes[p], x);
        return new FrequencyPoint(frequency, x[0] / x[c.DriverCurrent], x[c.LoadJunction], v, i);
    }

    /// <summary>The DC operating point at every probe (capacitors open, inductors shorted, segments as their exact R-G ladders).</summary>
    /// <exception cref="InputException">The DC current is unlimited (a loop of ideal parts with no resistance).</exception>
    public static DcLevels DcOperatingPoint(Scenario scenario) =>
        DcOperatingPoint(scenario, CircuitBuilder.Build(scenario, scenario.Probes));

    internal static DcLevels DcOperatingPoint(Scenario scenario, Circuit c)
    {
        var x = new NodalSolver(c).Solve(Complex.Zero, scenario.Source.InitialLevel, dc: true);
        // An ideal loop (0 ohm driver, lossless line, short) is singular or, after rounding, gives absurd currents.
        if (x is null || x.Skip(c.Junctions).Any(v => v.Magnitude > 1e6))
            throw new InputException("the driver's initial level drives an unlimited DC current through a loop with no resistance (0 ohm driver, lossless line, shorted load?): give the driver or the load a resistance");
        var v = new double[c.Probes.Count];
        var i = new double[c.Probes.Count];
        for (int p = 0; p < v.Length; p++)
        {
            var (pv, pi) = Read(c, c.Probes[p], x);
            (v[p], i[p]) = (pv.Real, pi.Real);
        }
        return new DcLevels(v, i);
    }

    /// <summary>
    /// The probes' voltages and currents at <paramref name="times"/> (s, ≥ 0), by a numerical Laplace transform of the driver's
    /// waveform (see <see cref="TransientTransform"/>) plus the DC operating point.
    /// </summary>
    /// <exception cref="InputException">A time is negative or not finite, or the DC operating point is undefined.</exception>
    public static TimeResponseResult TimeResponse(Scenario scenario, double[] times) => TimeResponse(scenario, times, scenario.Probes);

    internal static TimeResponseResult TimeResponse(Scenario scenario, double[] times, IReadOnlyList<ProbeSpec> probes)
    {
        if (times.Any(t => !(t >= 0) || !double.IsFinite(t)))
            throw new InputException("time-response instants must be finite and 0 s or later");
        var circuit = CircuitBuilder.Build(scenario, probes);
        var dc = DcOperatingPoint(scenario, circuit);
        var transform = TransientTransform.For(scenario, times);
        var (volts, amps) = transform.Run(scenario.Source, circuit, times);
        var traces = new ProbeResponse[probes.Count];
        for (int p = 0; p < traces.Length; p++)
        {
            for (int k = 0; k < times.Length; k++) { volts[p][k] += dc.Volts[p]; amps[p][k] += dc.Amps[p]; }
            traces[p] = new ProbeResponse(probes[p].Name, volts[p], amps[p]);
        }
        return new TimeResponseResult((double[])times.Clone(), traces, transform.Step, transform.Points, transform.Damping);
    }

    static (Complex V, Complex I) Read(Circuit c, ProbeTap tap, Complex[] x)
    {
        Complex sum = 0;
        foreach (var r in tap.Currents) sum += x[c.Index(r)];
        return (x[tap.Junction], tap.Weight * sum);
    }

    /// <summary>Every probe's voltage and current transfer at s, written into the given slots (for the transform's loop).</summary>
    internal static void Transfer(NodalSolver solver, Circuit c, Complex s, Complex[] volts, Complex[] amps)
    {
        var x = solver.Solve(s, 1, dc: false)
            ?? throw new NumericalException($"the network has no solution at s = {s} (an ideal loop with no impedance?)");
        for (int p = 0; p < c.Probes.Count; p++) (volts[p], amps[p]) = Read(c, c.Probes[p], x);
    }
}
