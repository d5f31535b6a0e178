using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Measurements;

/// <summary>
/// A step reflectometer: simulated on a scenario, or recognised in a capture of the port voltage.
/// </summary>
/// <remarks>
/// <para>The simulated instrument is a step of <see cref="OpenCircuitV"/> open-circuit behind the instrument
/// resistance Rs, probed at its port (the source node). Rs is also the reference impedance Z0ref, so the incident step is
/// v_inc = V·Z0ref/(Z0ref + Rs) = 1 V, and a matched instrument re-reflects nothing, as layer peeling assumes.</para>
/// <para>A capture must start on the baseline before the incident edge, and the edge should be followed by at least two rise
/// times at the reference impedance (the instrument's own cable or fixture): the incident amplitude is read there unless it is
/// given. The edge is modelled as a linear ramp with the capture's own 10-90 % rise time, centred on its 50 % instant, and
/// subtracted; a real edge of another shape leaves a small blip within one rise time of the reference plane.</para>
/// </remarks>
public static class Reflectometer
{
    /// <summary>Open-circuit step of the simulated instrument, V: 1 V incident into a matched line.</summary>
    public const double OpenCircuitV = 2.0;

    /// <summary>Rise times of flat baseline before the simulated instrument's edge starts: 10.</summary>
    public const double LeadRises = 10;

    /// <summary>Name of the port probe of the simulated instrument.</summary>
    public const string PortProbe = "port";

    /// <summary>10-90 % rise time of the simulated instrument's step when none is given, s: 35 ps.</summary>
    public const double DefaultRiseS = 35e-12;

    /// <summary>
    /// The velocity that turns round-trip times into distances: <paramref name="velocity"/> when given, else
    /// c/√<paramref name="epsEff"/>, else the first segment's own velocity.
    /// </summary>
    /// <param name="scenario">The device under test.</param>
    /// <param name="velocity">A velocity, m/s, positive and not above c; or null.</param>
    /// <param name="epsEff">An effective permittivity, at least 1; or null. Not together with <paramref name="velocity"/>.</param>
    /// <returns>The velocity, m/s.</returns>
    /// <exception cref="InputException">Both are given, or one is out of range (naming its parameter).</exception>
    public static double DistanceVelocity(Scenario scenario, double? velocity, double? epsEff)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        if (velocity is not null && epsEff is not null)
            throw new InputException("give a velocity or an effective permittivity, not both") { Parameter = nameof(epsEff) };
        if (velocity is { } v)
        {
            if (!(v > 0) || !double.IsFinite(v)) throw new InputException($"expected a positive velocity, got {v} m/s") { Parameter = nameof(velocity) };
            if (v > Units.Quantity.SpeedOfLight * (1 + 1e-9)) throw new InputException($"{v} m/s is faster than light") { Parameter = nameof(velocity) };
            return v;
        }
        if (epsEff is { } e)
        {
            if (!(e >= 1) || !double.IsFinite(e)) throw new InputException($"must be at least 1, got {e}") { Parameter = nameof(epsEff) };
            return Units.Quantity.SpeedOfLight / Math.Sqrt(e);
        }
        return scenario.Line.OfType<Segment>().First().Velocity;
    }

    /// <summary>The scenario with its source replaced by the reflectometer, probed at the port, run for a round trip of the line.</summary>
    /// <param name="scenario">The device under test.</param>
    /// <param name="riseS">10-90 % rise time of the step, s. Must be positive.</param>
    /// <param name="sourceOhm">Instrument resistance, Ω. Must be positive.</param>
    /// <returns>The instrument scenario: the edge starts after <see cref="LeadRises"/> rise times; the run lasts past one round trip of every segment.</returns>
    public static Scenario Instrument(Scenario scenario, double riseS, double sourceOhm)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        RequirePositive(riseS, "rise time", "s");
        RequirePositive(sourceOhm, "instrument resistance", "ohm");
        double start = LeadRises * riseS;
        double roundTrip = 2 * GridPlan.AllSegments(scenario.Line, "line").Sum(s => s.Seg.Delay);
        double duration = start + 1.25 * riseS + 1.1 * roundTrip + 20 * riseS;
        return scenario with
        {
            Title = scenario.Title + " (reflectometer)",
            Source = new SourceSpec
            {
                Waveform = WaveformKind.Step, Low = 0, High = OpenCircuitV, Rise = riseS, Fall = riseS, Delay = start,
                Resistance = sourceOhm,
            },
            Probes = [new ProbeSpec(PortProbe, [], ProbeAnchor.Source)],
            Simulation = new SimulationSpec(duration, null, scenario.Simulation.Resolution),
        };
    }

    /// <summary>Simulates the reflectometer on <paramref name="scenario"/> (see <see cref="Instrument"/>).</summary>
    /// <param name="scenario">The device under test.</param>
    /// <param name="riseS">10-90 % rise time, s.</param>
    /// <param name="sourceOhm">Instrument resistance and reference impedance, Ω.</param>
    /// <param name="options">Simulation options; null for the defaults.</param>
    /// <param name="ct">Cancels the run.</param>
    /// <returns>The port record with the exactly known incident step.</returns>
    public static ReflectometerTrace Simulate(Scenario scenario, double riseS, double sourceOhm,
        SimulationOptions? options = null, CancellationToken ct = default)
    {
        Scenario instrument = Instrument(scenario, riseS, sourceOhm);
        SimulationResult r = Core.Simulate.Solve(instrument, options, ct);
        double ramp = 1.25 * riseS;
        double incident = OpenCircuitV * sourceOhm / (sourceOhm + sourceOhm);
        return new ReflectometerTrace(r.Time, r.Probe(PortProbe).Volts, instrument.Source.Delay + ramp / 2, incident, 0, ramp, sourceOhm);
    }

    /// <summary>
    /// Finds the incident step in a captured port record, with the edge's rise time either given, when it also sets the edge
    /// ramp (1.25 × the 10-90 % rise, as for the simulated instrument), or measured from the record starting from
    /// <see cref="DefaultRiseS"/>.
    /// </summary>
    /// <param name="capture">The port voltage record.</param>
    /// <param name="referenceOhm">The instrument's impedance, Ω.</param>
    /// <param name="incidentV">The incident step amplitude, V; null to read it from the plateau after the edge.</param>
    /// <param name="riseS">The edge's 10-90 % rise time, s; null to measure it.</param>
    /// <returns>The trace with its reference instant, incident amplitude, baseline and edge ramp.</returns>
    /// <exception cref="InputException">No rising incident edge can be found.</exception>
    public static ReflectometerTrace FromCapture(Capture capture, double referenceOhm, double? incidentV, double? riseS)
    {
        var trace = FromCapture(capture, referenceOhm, incidentV, riseS ?? DefaultRiseS);
        return riseS is { } given ? trace with { RampS = 1.25 * given } : trace;
    }

    /// <summary>Finds the incident step in a captured port record (see the class remarks).</summary>
    /// <param name="capture">The port voltage record.</param>
    /// <param name="referenceOhm">The instrument's impedance, Ω.</param>
    /// <param name="incidentV">The incident step amplitude, V; null to read it from the plateau after the edge.</param>
    /// <param name="riseHintS">A first guess of the edge's 10-90 % rise time, s, to find the plateau; refined from the record.</param>
    /// <returns>The trace with its reference instant, incident amplitude, baseline and edge ramp.</returns>
    /// <exception cref="InputException">No rising incident edge can be found.</exception>
    public static ReflectometerTrace FromCapture(Capture capture, double referenceOhm, double? incidentV, double riseHintS)
    {
        ArgumentNullException.ThrowIfNull(capture);
        RequirePositive(referenceOhm, "reference impedance", "ohm");
        RequirePositive(riseHintS, "rise time", "s");
        double[] t = capture.Time, v = capture.Volts;
        int n = t.Length;
        int head = Math.Max(3, n / 50);
        if (n < 2 * head + 2)
            throw new InputException($"{Path.GetFileName(capture.Source)}: {n} samples are too few for a reflectometer trace (need the baseline, the edge and what follows)");
        double baseline = 0, threshold = 0;
        int first = -1;
        for (int attempt = 0; attempt < 4; attempt++)
        {
            // The baseline is the mean of the first samples; if the edge starts among them, take fewer.
            baseline = 0;
            double sq = 0;
            for (int i = 0; i < head; i++) baseline += v[i] / head;
            for (int i = 0; i < head; i++) sq += (v[i] - baseline) * (v[i] - baseline) / head;
            double range = v.Max(x => Math.Abs(x - baseline));
            threshold = Math.Max(8 * Math.Sqrt(sq), 0.02 * range);
            first = Array.FindIndex(v, x => Math.Abs(x - baseline) > threshold);
            if (first > head || head <= 3)
                break;
            head = Math.Max(3, first / 2);
        }
        if (first <= 0 || !(v[first] > baseline))
            throw new InputException($"{Path.GetFileName(capture.Source)}: no rising incident edge after a flat baseline; a reflectometer trace starts before the edge");
        if (incidentV is { } given && !(given > 0 && double.IsFinite(given)))
            throw new InputException($"expected a positive voltage, got {given} V") { Parameter = "incidentV" };

        double ramp = 1.25 * riseHintS, inc = incidentV ?? 0, t50 = t[first];
        for (int pass = 0; pass < 6; pass++)
        {
            if (incidentV is null)
                inc = Plateau(t, v, t[first] + 1.5 * ramp, t[first] + 3 * ramp) - baseline;
            if (!(inc > threshold))
                throw new InputException($"{Path.GetFileName(capture.Source)}: the incident step is lost in the noise; give its size") { Parameter = "incidentV" };
            double t10 = Crossing(t, v, baseline + 0.1 * inc), t90 = Crossing(t, v, baseline + 0.9 * inc);
            t50 = Crossing(t, v, baseline + 0.5 * inc);
            if (!double.IsFinite(t10) || !double.IsFinite(t90) || !(t90 > t10))
                throw new InputException($"{Path.GetFileName(capture.Source)}: the incident edge does not pass 10 % and 90 % of its step ({inc:G4} V)");
            double next = 1.25 * (t90 - t10);
            bool settled = Math.Abs(next - ramp) <= 0.02 * ramp;
            ramp = next;
            if (settled) break;
        }
        return new ReflectometerTrace(t, v, t50, inc, baseline, ramp, referenceOhm);
    }

    static double Plateau(double[] t, double[] v, double from, double to)
    {
        var inside = new List<double>();
        for (int i = 0; i < t.Length; i++)
            if (t[i] >= from && t[i] <= to) inside.Add(v[i]);
        if (inside.Count == 0)
        {
            int i = Array.FindIndex(t, x => x >= from);
            return i >= 0 ? v[i] : v[^1];
        }
        inside.Sort();
        return inside[inside.Count / 2];
    }

    /// <summary>First upward crossing of <paramref name="level"/>, interpolated; NaN if none.</summary>
    static double Crossing(double[] t, double[] v, double level)
    {
        for (int i = 1; i < t.Length; i++)
            if (v[i - 1] < level && v[i] >= level)
                return t[i - 1] + (level - v[i - 1]) / (v[i] - v[i - 1]) * (t[i] - t[i - 1]);
        return double.NaN;
    }

    static void RequirePositive(double x, string what, string unit)
    {
        if (!(x > 0) || double.IsInfinity(x))
            throw new InputException($"the {what} must be positive, got {x} {unit}");
    }
}
