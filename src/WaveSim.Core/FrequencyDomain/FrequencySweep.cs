using System.Numerics;
using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>Input impedance and probe transfers of a scenario over a range of frequencies.</summary>
public static class FrequencySweep
{
    /// <summary>Solves <paramref name="scenario"/> at <paramref name="points"/> frequencies from <paramref name="fStart"/> to <paramref name="fStop"/>, Hz.</summary>
    /// <param name="scenario">The scenario (its driver waveform is not used: every transfer is per volt).</param>
    /// <param name="fStart">First frequency, Hz (&gt; 0 for a logarithmic sweep, ≥ 0 otherwise).</param>
    /// <param name="fStop">Last frequency, Hz (&gt; <paramref name="fStart"/>).</param>
    /// <param name="points">Number of frequencies, at least 2.</param>
    /// <param name="log">Space the frequencies evenly in log10(f) rather than in f.</param>
    /// <exception cref="InputException">The range or the number of points is not valid.</exception>
    /// <exception cref="NumericalException">The network has no solution at some frequency.</exception>
    public static FrequencyResponse Compute(Scenario scenario, double fStart, double fStop, int points, bool log)
    {
        if (points < 2) throw new InputException($"frequency sweep: need at least 2 points (got {points})");
        if (!double.IsFinite(fStart) || !double.IsFinite(fStop) || !(fStop > fStart))
            throw new InputException($"frequency sweep: the stop frequency ({Quantity.Format(fStop, "Hz")}) must be above the start ({Quantity.Format(fStart, "Hz")})");
        if (log ? !(fStart > 0) : !(fStart >= 0))
            throw new InputException($"frequency sweep: the start frequency must be {(log ? "above 0 Hz for a logarithmic sweep" : "0 Hz or more")} (got {Quantity.Format(fStart, "Hz")})");

        var circuit = CircuitBuilder.Build(scenario, scenario.Probes);
        var f = new double[points];
        for (int k = 0; k < points; k++)
        {
            double x = (double)k / (points - 1);
            f[k] = log ? fStart * Math.Pow(fStop / fStart, x) : fStart + (fStop - fStart) * x;
        }
        f[^1] = fStop;
        var zin = new Complex[points];
        var load = new Complex[points];
        int np = scenario.Probes.Count;
        var volts = Enumerable.Range(0, np).Select(_ => new Complex[points]).ToArray();
        var amps = Enumerable.Range(0, np).Select(_ => new Complex[points]).ToArray();
        for (int k = 0; k < points; k++)
        {
            var pt = FrequencyDomainSolver.At(circuit, new Complex(0, 2 * Math.PI * f[k]), f[k]);
            zin[k] = pt.Zin; load[k] = pt.Load;
            for (int p = 0; p < np; p++) { volts[p][k] = pt.Volts[p]; amps[p][k] = pt.Amps[p]; }
        }
        var probes = scenario.Probes.Select((p, i) => new ProbeTransfer(p.Name, volts[i], amps[i])).ToArray();
        return new FrequencyResponse(scenario.Title, f, log, zin, load, probes);
    }
}
