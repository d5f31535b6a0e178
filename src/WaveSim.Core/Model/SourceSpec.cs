using System.Collections.Immutable;

namespace WaveSim.Core.Model;

/// <summary>The shape of the driver's open-circuit voltage.</summary>
public enum WaveformKind
{
    /// <summary>One edge from low to high.</summary>
    Step,
    /// <summary>One rise, a time at high, one fall.</summary>
    Pulse,
    /// <summary>A pulse repeated every period.</summary>
    Trapezoid,
    /// <summary>A Gaussian bump from low to high and back.</summary>
    Gaussian,
    /// <summary>A raised cosine between low and high.</summary>
    Sine,
    /// <summary>An NRZ bit pattern (explicit or PRBS).</summary>
    Bits,
    /// <summary>A table of time and voltage read from a CSV file.</summary>
    Table,
}

/// <summary>The Thevenin driver: an open-circuit waveform behind an output resistance. Times in s, voltages in V, resistance in ohm.</summary>
public sealed record SourceSpec
{
    /// <summary>The waveform shape.</summary>
    public WaveformKind Waveform { get; init; } = WaveformKind.Step;
    /// <summary>Initial (and low) level, V.</summary>
    public double Low { get; init; }
    /// <summary>High level, V.</summary>
    public required double High { get; init; }
    /// <summary>10-90 % rise time, s; the edge is a linear 0-100 % ramp lasting 1.25 times this.</summary>
    public double Rise { get; init; }
    /// <summary>10-90 % fall time, s. Until it is set it follows <see cref="Rise"/>, as a scenario without <c>fall</c> does.</summary>
    public double Fall { get => _fall ?? Rise; init => _fall = value; }
    readonly double? _fall;
    /// <summary>Start of the first edge, s.</summary>
    public double Delay { get; init; }
    /// <summary>Pulse and trapezoid: time at high between the ramps; Gaussian: full width at half maximum, s.</summary>
    public double Width { get; init; }
    /// <summary>Trapezoid and sine: repetition period, s.</summary>
    public double Period { get; init; }
    /// <summary>Bits: the unit interval, s.</summary>
    public double BitTime { get; init; }
    /// <summary>Bits: the pattern of 0 and 1, repeated.</summary>
    public IReadOnlyList<bool> Bits { get; init => field = value.ToImmutableArray(); } = ImmutableArray<bool>.Empty;
    /// <summary>Table: sample times (s, ascending) and voltages (V).</summary>
    public ImmutableArray<double> TableTime { get; init; } = [];
    /// <summary>Table: voltages matching <see cref="TableTime"/>.</summary>
    public ImmutableArray<double> TableVolts { get; init; } = [];
    /// <summary>Driver output resistance, ohm (0 = ideal).</summary>
    public double Resistance { get; init; }

    /// <summary>
    /// A driver from a buffer model in place of the Thevenin source; null for none. The waveform then only says when it
    /// switches; <see cref="High"/> and <see cref="Low"/> hold its pullup and pulldown references and <see cref="Rise"/> and
    /// <see cref="Fall"/> the shorter of its 20-80 % rise and fall times (the edge the time step is chosen for).
    /// </summary>
    public BufferSpec? Buffer { get; init; }

    /// <summary>
    /// The shortest 10-90 % edge the run carries, s (0: edges as given). A rise or fall below it, a zero one included, is run as a
    /// Gaussian-filtered step of this 10-90 time; <see cref="Simulate.Run"/> sets it from the grid (a few solver steps).
    /// It does not enter <see cref="ShortestFeature"/>, so it never changes the time step.
    /// </summary>
    public double MinimumEdge { get; init; }

    /// <summary>The open-circuit voltage at time <paramref name="t"/>, V.</summary>
    public double Value(double t) => SourceWaveform.Evaluate(this, t);

    /// <summary>The level the network rests at before the first edge (the DC operating point's source voltage).</summary>
    public double InitialLevel => Waveform == WaveformKind.Table && TableVolts.Length > 0 ? TableVolts[0] : Low;

    /// <summary>The shortest time feature of the waveform (edge, width, period or table spacing), used to choose the solver's step.</summary>
    public double ShortestFeature => SourceWaveform.ShortestFeature(this);

    /// <summary>
    /// The level the first edge goes to and would stay at: <see cref="High"/> for a step, pulse, trapezoid or bit pattern;
    /// null for shapes that never hold a level (Gaussian, sine, table).
    /// </summary>
    public double? FirstEdgeLevel => Waveform is WaveformKind.Step or WaveformKind.Pulse or WaveformKind.Trapezoid or WaveformKind.Bits
        ? High : null;

    /// <summary>The instant the first edge crosses the 50 % level between low and high, s.</summary>
    public double FirstEdgeMidpoint => SourceWaveform.FirstEdgeMidpoint(this);
}
