using WaveSim.Core.Buffers;
using WaveSim.Core.Model;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// The rules of <c>source: { buffer: ... }</c>: the model gives the levels and edges, so <c>high</c>, <c>low</c>, <c>rise</c>,
/// <c>fall</c> and <c>resistance</c> are refused beside it; the waveform must be one that switches (step, pulse, trapezoid,
/// bits); the time step is chosen for the shorter of the model's 20-80 % rise and fall times.
/// </summary>
internal static class BufferDriver
{
    static readonly string[] Refused = ["high", "low", "rise", "fall", "resistance"];

    /// <summary>The error for a key the buffer replaces, or null.</summary>
    public static ScenarioException? Conflict(YamlMap s) =>
        Refused.FirstOrDefault(s.Has) is { } k
            ? s.Error(s.Node(k)!, s.Join(k), $"a buffer driver takes its levels and edges from its model: leave '{k}' out beside 'buffer' (none of high, low, rise, fall, resistance)")
            : null;

    /// <summary>The high level: the pullup reference of the corner (the open-drain's, which has none, the voltage range's, else 0).</summary>
    public static double High(BufferSpec b) => b.Model.Pullup is not null ? b.Model.PullupReferenceAt(b.Corner) : b.Model.VoltageRange?.At(b.Corner) ?? 0;

    /// <summary>The low level: the pulldown reference of the corner.</summary>
    public static double Low(BufferSpec b) => b.Model.PulldownReferenceAt(b.Corner);

    /// <summary>The shorter of the model's [Ramp] 20-80 % rise and fall times in the corner (s).</summary>
    public static double EdgeTime(BufferSpec b) => b.Model.Ramp is { } r
        ? Math.Min(r.Rising.DeltaT.At(b.Corner), r.Falling.DeltaT.At(b.Corner))
        : throw new InputException($"{b.Model.Source}:{b.Model.Line}: [Model] {b.Model.Name}: a driver needs [Ramp]");

    /// <summary>Checks the waveform and the model's switching tables; returns the spec.</summary>
    public static SourceSpec Check(YamlMap s, SourceSpec spec)
    {
        if (spec.Waveform is not (WaveformKind.Step or WaveformKind.Pulse or WaveformKind.Trapezoid or WaveformKind.Bits))
            throw s.Error(s.Node("waveform")!, s.Join("waveform"), $"a buffer driver switches on step, pulse, trapezoid or bits, not '{spec.Waveform.ToString().ToLowerInvariant()}'");
        var b = spec.Buffer!;
        try
        {
            _ = SwitchingCoefficients.For(b.Model, b.Corner, rising: true);
            _ = SwitchingCoefficients.For(b.Model, b.Corner, rising: false);
        }
        catch (InputException ex) { throw s.Error(s.Node("buffer")!, s.Join("buffer"), ex.Message); }
        return spec;
    }

    /// <summary>What the switching tables say of how they were made when it is a fall-back (one line each), for warnings.</summary>
    public static IEnumerable<string> Notes(BufferSpec b) =>
        new[] { true, false }.Select(rising => SwitchingCoefficients.For(b.Model, b.Corner, rising))
            .Where(t => t.Method == SwitchingMethod.Ramp).SelectMany(t => t.Notes);
}
