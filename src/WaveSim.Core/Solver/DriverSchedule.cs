using WaveSim.Core.Buffers;
using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// When a buffer driver switches and how: its edges start where the scenario's waveform would start its ramps (a step at
/// <c>delay</c>; a pulse or trapezoid at each ramp's start; bits at each boundary where the level changes); before the first
/// edge it holds the first state; an Inverting model drives each state the other way. Each edge follows its switching table (<see cref="SwitchingCoefficients"/>), and an edge
/// that starts before the previous one has finished carries on from where that one stands: the table is mapped linearly
/// so that it starts at the present Ku, Kd and ends at its own end values.
/// </summary>
internal sealed class DriverSchedule
{
    readonly DriverLaw _law;
    readonly SwitchingTable _rise, _fall;
    readonly double[] _start;
    readonly bool[] _rising;
    readonly (double Ku, double Kd)[] _from;
    readonly bool _firstHigh;
    readonly double _mid;
    int _hint;

    public DriverSchedule(SourceSpec source, BufferSpec buffer, double duration, DriverLaw law)
    {
        _law = law;
        _mid = 0.5 * (source.Low + source.High);
        _rise = SwitchingCoefficients.For(buffer.Model, buffer.Corner, rising: true);
        _fall = SwitchingCoefficients.For(buffer.Model, buffer.Corner, rising: false);
        var edges = Edges(source, duration, out _firstHigh);
        // An inverting model drives the opposite state of the waveform's: every edge and the first state flip.
        if (buffer.Model.Inverts)
        {
            _firstHigh = !_firstHigh;
            edges = [.. edges.Select(e => (e.T, !e.Rising))];
        }
        _start = edges.Select(e => e.T).ToArray();
        _rising = edges.Select(e => e.Rising).ToArray();
        _from = new (double, double)[edges.Count];
        var now = State(_firstHigh);
        for (int e = 0; e < edges.Count; e++)
        {
            _from[e] = now;
            if (e + 1 < edges.Count) now = OnEdge(e, _start[e + 1] - _start[e]);
        }
    }

    /// <summary>The settled coefficients of a state: the end values of the edge that reaches it.</summary>
    (double Ku, double Kd) State(bool high) => high ? (_rise.Ku[^1], _rise.Kd[^1]) : (_fall.Ku[^1], _fall.Kd[^1]);

    /// <summary>Holds the driver in a settled state (for a DC solve): the first state, or the one the first edge goes to.</summary>
    public void Hold(bool afterFirstEdge) => (_law.Ku, _law.Kd) = State(afterFirstEdge && _start.Length > 0 ? _rising[0] : _firstHigh);

    /// <summary>Holds the driver settled at the level nearer <paramref name="level"/> (V): high above the mid level, else low.</summary>
    public void HoldLevel(double level) => (_law.Ku, _law.Kd) = State(level > _mid);

    /// <summary>True when the driver has an edge (a settled level after it exists).</summary>
    public bool HasEdge => _start.Length > 0;

    /// <summary>Sets the law's Ku and Kd for instant <paramref name="t"/> (called with increasing t, so the search is short).</summary>
    public void At(double t)
    {
        int e = _hint;
        while (e + 1 < _start.Length && _start[e + 1] <= t) e++;
        while (e > 0 && _start[e] > t) e--;
        _hint = e;
        (_law.Ku, _law.Kd) = _start.Length == 0 || t < _start[0] ? State(_firstHigh) : OnEdge(e, t - _start[e]);
    }

    (double Ku, double Kd) OnEdge(int e, double tau)
    {
        var table = _rising[e] ? _rise : _fall;
        return (Map(table.Ku, table.PullupAt(tau), _from[e].Ku), Map(table.Kd, table.PulldownAt(tau), _from[e].Kd));
    }

    /// <summary>The table's value moved so the edge starts at <paramref name="from"/>: linear in the table's own value,
    /// start → from, end → end.</summary>
    static double Map(double[] k, double value, double from)
    {
        double k0 = k[0], k1 = k[^1];
        return Math.Abs(k1 - k0) > 1e-12 ? from + (value - k0) * (k1 - from) / (k1 - k0) : from + (value - k0);
    }

    /// <summary>The edges' start instants up to <paramref name="duration"/> and whether each rises; the first state.</summary>
    static List<(double T, bool Rising)> Edges(SourceSpec s, double duration, out bool firstHigh)
    {
        var edges = new List<(double, bool)>();
        firstHigh = false;
        switch (s.Waveform)
        {
            case WaveformKind.Step:
                edges.Add((s.Delay, true));
                break;
            case WaveformKind.Pulse:
                edges.Add((s.Delay, true)); edges.Add((s.Delay + SourceWaveform.EdgeLength(s, s.Rise) + s.Width, false));
                break;
            case WaveformKind.Trapezoid:
                for (double t0 = s.Delay; t0 <= duration; t0 += s.Period) { edges.Add((t0, true)); edges.Add((t0 + SourceWaveform.EdgeLength(s, s.Rise) + s.Width, false)); }
                break;
            case WaveformKind.Bits:
                firstHigh = s.Bits[0];
                for (long k = 1; s.Delay + k * s.BitTime <= duration; k++)
                {
                    bool now = s.Bits[(int)(k % s.Bits.Count)], before = s.Bits[(int)((k - 1) % s.Bits.Count)];
                    if (now != before) edges.Add((s.Delay + k * s.BitTime, now));
                }
                break;
            default:
                throw new InputException($"a buffer driver switches on a step, pulse, trapezoid or bits waveform, not {s.Waveform.ToString().ToLowerInvariant()}");
        }
        return edges;
    }
}
